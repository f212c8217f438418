// The net's model standing k consecutive circumferential cables for one (net9; equivalent-net
// lumping, common practice for cable nets, no source): which cables go together, and that the
// analysed cable has k × the EA and k × the prestress of one real cable and carries the plan band of
// the k together. The small net of cable-net-model.test.ts: circumferential cables at 5…25 m, masts at 18 m.
import { describe, it, expect } from "vitest";
import { cableNetModel, cableNetNodeCount, hoopGroups, type CableNetModelInput } from "../../../src/analysis/models/cable-net-model";

const input: CableNetModelInput = {
  masts: 6, cablesPerSide: 2, mastRadiusM: 18, mastHeadM: 12, edgeRadiusM: 30, centralRingRadiusM: 2,
  hoopRadiiM: [4, 7, 10, 13, 16, 20, 23, 26], prestressN: 200e3, hoopShare: 0.5, permanentPa: 400,
  // the circumferential cables' given EA far above what their prestress at PRESTRESS_STRAIN asks: the given one is the model's
  eaN: { outer: 2e9, inner: 2e9, hoop: 1e12, ring: 1e10 },
};
const full = cableNetModel(input);
const lumped = cableNetModel({ ...input, hoopsPerCable: 2 });
const circumferential = (net: typeof full, index: number) => net.model.members.filter((_, j) => net.tags[j]!.family === "circumferential" && net.tags[j]!.index === index);

describe("hoopGroups", () => {
  it("keeps the cable beside the mast heads alone on each side and groups the others consecutively, as evenly as they go, never across the mast ring", () => {
    expect(hoopGroups([5, 10, 15, 20, 25], 18, 1)).toEqual([[0], [1], [2], [3], [4]]);
    expect(hoopGroups([4, 7, 10, 13, 16, 20, 23, 26], 18, 2)).toEqual([[0, 1], [2, 3], [4], [5], [6, 7]]);
    expect(hoopGroups([5, 10, 15, 20, 25], 12, 3)).toEqual([[0], [1], [2], [3, 4]]);
    expect(hoopGroups([1, 2, 3, 4, 5, 6, 7, 8], 0.5, 3)).toEqual([[0], [1, 2], [3, 4, 5], [6, 7]]);
    expect(hoopGroups([1, 2, 3, 4, 5, 6, 7, 8], 8.5, 3)).toEqual([[0, 1], [2, 3, 4], [5, 6], [7]]);
    // a cable on the mast ring stays alone (no radial cable crosses it there)
    expect(hoopGroups([5, 10, 18, 20, 25], 18, 2)).toEqual([[0], [1], [2], [3], [4]]);
  });
});

describe("cableNetModel with hoopsPerCable = 2", () => {
  it("has fewer nodes, as cableNetNodeCount says without form finding", () => {
    expect(lumped.hoopGroups).toEqual([[0, 1], [2, 3], [4], [5], [6, 7]]);
    expect(cableNetNodeCount(input)).toBe(full.model.nodes.length);
    expect(cableNetNodeCount({ ...input, hoopsPerCable: 2 })).toBe(lumped.model.nodes.length);
    // 6 mast heads, 12 anchors and 12 ring nodes; each of the 12 radial cables a side crosses its side's circumferentials once
    expect(full.model.nodes.length).toBe(6 + 24 + 12 * 5 + 12 * 3);
    expect(lumped.model.nodes.length).toBe(6 + 24 + 12 * 3 + 12 * 2);
  });

  it("gives an analysed cable k × the EA of a real one (1 × where it stands alone)", () => {
    for (const m of circumferential(full, 1)) expect(m.eaN).toBe(1e12);
    for (const m of circumferential(lumped, 1)) expect(m.eaN).toBe(2e12);
    for (const m of circumferential(lumped, 3)) expect(m.eaN).toBe(1e12);
  });

  it("gives an analysed cable about the prestress of its real ones together: its mean found force within 8 % of the sum of theirs in the full net", () => {
    // not exact: the form finding moves the nodes in plan, and the lumped cable's shape is not its real ones' (measured 2–6 %)
    const mean = (net: typeof full, index: number) => circumferential(net, index).reduce((s, m) => s + m.initialForceN!, 0) / circumferential(net, index).length;
    lumped.hoopGroups.forEach((group, g) => {
      const together = group.reduce((s, i) => s + mean(full, i + 1), 0);
      expect(Math.abs(mean(lumped, g + 1) / together - 1)).toBeLessThan(0.08);
    });
  });

  it("loads an analysed cable with its real ones' plan band (the total unchanged)", () => {
    const onHoop = (index: number) => [...new Set(circumferential(lumped, index).flatMap((m) => [m.i, m.j]))];
    const area = (nodes: number[]) => nodes.reduce((s, k) => s + lumped.areaM2[k]!, 0);
    // cables at 4 and 7 m carry 3 to 8.5 m (half-way to the ring at 2 and to the cable at 10); at 23 and 26 m, 21.5 to 28 m
    expect(area(onHoop(1)) / (Math.PI * (8.5 ** 2 - 3 ** 2))).toBeCloseTo(1, 9);
    expect(area(onHoop(5)) / (Math.PI * (28 ** 2 - 21.5 ** 2))).toBeCloseTo(1, 9);
    const total = (net: typeof full) => net.areaM2.reduce((s, a) => s + a, 0);
    expect(total(lumped) / total(full)).toBeCloseTo(1, 12);
  });
});
