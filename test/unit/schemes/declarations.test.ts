import { describe, it, expect } from "vitest";
import { readFileSync } from "node:fs";
import { dirname, resolve } from "node:path";
import { SCHEMES } from "../../../src/schemes";
import { SCHEME_DECLARATIONS, SCHEME_IDS, ON_DEMAND_ANALYSIS_OPTION } from "../../../src/schemes/declarations";

// The two registries: the declarations (what the main-thread pages read) and the designs (the
// pipeline, the workers, the command line). It loops over the registries, naming no scheme.
const SRC = resolve(import.meta.dirname, "../../../src");

/** The modules a module imports for their values (`import type` and `export type` left out), as absolute paths. */
function valueImports(file: string): string[] {
  const text = readFileSync(file, "utf8");
  const specifiers = [...text.matchAll(/^(?:import|export)\s+(?!type\b)[^;]*?from\s+"([^"]+)";/gms)].map((m) => m[1] as string);
  return specifiers.filter((s) => s.startsWith(".")).map((s) => resolve(dirname(file), s.endsWith(".ts") ? s : `${s}.ts`));
}

/** Every module reached from `file` through value imports. */
function reached(file: string): Set<string> {
  const seen = new Set<string>();
  const visit = (f: string) => {
    if (seen.has(f)) return;
    seen.add(f);
    for (const next of valueImports(f)) visit(next);
  };
  visit(file);
  return seen;
}

describe("the declarations registry and the design registry", () => {
  it("list the same schemes in the order of SCHEME_IDS", () => {
    expect(SCHEME_DECLARATIONS.map((d) => d.id)).toEqual([...SCHEME_IDS]);
    expect(SCHEMES.map((m) => m.id)).toEqual([...SCHEME_IDS]);
  });

  it("build each design on its registered declaration (the same options, defaults and identity)", () => {
    SCHEME_DECLARATIONS.forEach((declaration, i) => {
      const model = SCHEMES[i];
      expect(model?.options, declaration.id).toBe(declaration.options);
      expect(model?.defaults, declaration.id).toBe(declaration.defaults);
      const { design: _design, ...identity } = model ?? { design: null };
      expect(identity, declaration.id).toEqual(declaration);
    });
  });

  it("reach no design code: the declarations import only declarations, the kit's declaration part and the contract", () => {
    const allowed = new Set([
      resolve(SRC, "schemes/declarations.ts"),
      resolve(SRC, "schemes/ids.ts"),
      resolve(SRC, "schemes/kit/declare.ts"),
      resolve(SRC, "schemes/kit/define-options.ts"),
      resolve(SRC, "schemes/kit/option-choices.ts"),
      ...SCHEME_IDS.map((id) => resolve(SRC, `schemes/${id}/declaration.ts`)),
    ]);
    const extra = [...reached(resolve(SRC, "schemes/declarations.ts"))].filter((f) => !allowed.has(f));
    expect(extra).toEqual([]);
  });
  it("the on-demand 3D analysis (the compare page's button, --buckling) is a toggle, off by default, of the schemes that declare it: the lattice domes", () => {
    const offering = SCHEME_DECLARATIONS.filter((d) => d.options.some((o) => o.key === ON_DEMAND_ANALYSIS_OPTION));
    expect(offering.map((d) => d.id).sort()).toEqual(["geodesic-dome", "timber-dome"]);
    for (const d of offering) {
      expect(d.options.find((o) => o.key === ON_DEMAND_ANALYSIS_OPTION)?.kind).toBe("toggle");
      expect(d.defaults[ON_DEMAND_ANALYSIS_OPTION]).toBe(false);
    }
  });
});
