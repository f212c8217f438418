import { describe, it, expect } from "vitest";
import { defaultFactorRows, FactorRowSchema, groupEditRows, provenanceOf, FACTOR_PROVENANCE } from "../../../src/carbon";
import { MATERIALS } from "../../../src/materials";

const rows = defaultFactorRows();
const steel: string[] = MATERIALS.filter((m) => m.kind === "steel").map((m) => m.id);

describe("groupEditRows", () => {
  it("multiplies every steel row's A1–A3 and leaves the others", () => {
    const result = groupEditRows(rows, "material", FactorRowSchema, { keys: steel, field: "a1a3KgCO2ePerKg", op: "times", value: 0.8 });
    if (!result.ok) throw new Error(result.problems.join("\n"));
    for (const row of result.rows) {
      const before = rows.find((r) => r.material === row.material)!;
      expect(row.a1a3KgCO2ePerKg).toBe(steel.includes(row.material) ? Number((before.a1a3KgCO2ePerKg * 0.8).toPrecision(12)) : before.a1a3KgCO2ePerKg);
    }
    expect(result.changes.map((c) => c.key).sort()).toEqual([...steel].sort());
  });
  it("sets a value, through the same validation as a cell edit: one refused row refuses all, named", () => {
    const result = groupEditRows(rows, "material", FactorRowSchema, { keys: steel, field: "wasteRatePct", op: "set", value: 60 });
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.problems).toHaveLength(steel.length);
    expect(result.problems[0]).toMatch(/^steel-[a-z-]+: 60 \(expected a number from 0 to 50 %\)$/);
  });
});

describe("provenanceOf", () => {
  it("every bundled row with a published value read holds it (issue 14: the defaults are the cited values), but strand, whose cited row is a floor", () => {
    // reference/carbon-factors.md: the ICE V3.0 rows as read; wire rod (2.27) leaves out drawing, stranding and galvanising
    for (const p of FACTOR_PROVENANCE) {
      const row = rows.find((r) => r.material === p.material)!;
      if (p.citedA1a3KgCO2ePerKg === null) expect(provenanceOf(row).status, p.material).toBe("unsupported");
      else if (p.material === "steel-strand") expect(row.a1a3KgCO2ePerKg).toBeGreaterThan(p.citedA1a3KgCO2ePerKg);
      else {
        expect(provenanceOf(row).status, p.material).toBe("cited");
        if (p.citedModuleDKgCO2ePerKg !== null) expect(row.moduleDKgCO2ePerKg, p.material).toBe(p.citedModuleDKgCO2ePerKg);
      }
    }
  });
  it("a value other than the cited one says so", () => {
    const hollow = rows.find((r) => r.material === "steel-hot-finished-hollow")!;
    // ICE V3.0 "Steel, global seamless tube" 2.13 (reference/carbon-factors.md); an edit to 1.94 (the value the table held until 5 Dec 2026, from memory)
    expect(provenanceOf({ ...hollow, a1a3KgCO2ePerKg: 1.94 })).toMatchObject({ status: "differs", text: expect.stringMatching(/not the published value \(ICE V3\.0: 2\.13\)/) });
  });
  it("a fabric with no readable source says so plainly", () => {
    const ptfe = rows.find((r) => r.material === "fabric-ptfe-glass")!;
    expect(provenanceOf(ptfe)).toMatchObject({ status: "unsupported", text: expect.stringMatching(/^No published source read supports/) });
  });
  it("every bundled material has a provenance record", () => {
    expect(FACTOR_PROVENANCE.map((p) => p.material).sort()).toEqual(MATERIALS.map((m) => m.id).sort());
  });
});
