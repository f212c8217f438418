import { describe, it, expect } from "vitest";
import { cableNetFormFinding, cableNetModel, type CableNetModelInput } from "../../../src/analysis/models/cable-net-model";
import { solveCableModel } from "../../../src/analysis/cable-solver";
import { lengthOf, type Vec3 } from "../../../src/analysis/model";

// A small net: 6 masts × 2 radial cables a side over a 60 m plan, circumferential cables every 5 m.
const input: CableNetModelInput = {
  masts: 6, cablesPerSide: 2, mastRadiusM: 18, mastHeadM: 12, edgeRadiusM: 30, centralRingRadiusM: 2,
  hoopRadiiM: [5, 10, 15, 20, 25], prestressN: 200e3, hoopShare: 0.5, permanentPa: 400,
  eaN: { outer: 2e9, inner: 2e9, hoop: 1e9, ring: 1e10 },
};
const net = cableNetModel(input);
const loads = net.areaM2.map((A, node) => ({ node, forceN: [0, 0, -input.permanentPa * A] as const })).filter((l) => l.forceN[2] !== 0);

describe("cableNetModel (force density form finding of a mast-supported net)", () => {
  it("one layout's form finding, asked at several prestresses in turn, gives at each what cableNetModel builds anew", () => {
    const at = cableNetFormFinding(input);
    for (const prestressN of [400e3, 100e3, 200e3]) {
      const again = at(prestressN);
      const fresh = cableNetModel({ ...input, prestressN });
      expect(again.model.nodes).toEqual(fresh.model.nodes);
      expect(again.model.members).toEqual(fresh.model.members);
      expect(again.areaM2).toEqual(fresh.areaM2);
    }
    // and the prestress matters: the nets at two prestresses differ
    expect(at(400e3).model.nodes).not.toEqual(at(100e3).model.nodes);
  });

  it("holds the mast heads and edge anchors, and frees every other node", () => {
    expect(net.mastHeads).toHaveLength(6);
    expect(net.anchors).toHaveLength(12);
    expect(net.model.supports.map((s) => s.node).sort((a, b) => a - b)).toEqual([...net.mastHeads, ...net.anchors].sort((a, b) => a - b));
  });

  it("the tributary areas cover the whole plan πa², the edge anchors the band outside π((r_last + a)/2)²", () => {
    const total = net.areaM2.reduce((s, a) => s + a, 0);
    expect(Math.abs(total / (Math.PI * 30 ** 2) - 1)).toBeLessThan(1e-9);
    const anchors = net.anchors.reduce((s, k) => s + (net.areaM2[k] as number), 0);
    expect(Math.abs(anchors / (Math.PI * (30 ** 2 - ((25 + 30) / 2) ** 2)) - 1)).toBeLessThan(1e-9);
  });

  it("is in equilibrium under the permanent load it was found for: Newton–Raphson moves it by nothing", () => {
    const s = solveCableModel({ ...net.model, loads });
    expect(s.converged).toBe(true);
    const largest = Math.max(...Array.from(s.displacementsM, Math.abs));
    expect(largest).toBeLessThan(1e-6);
    expect(s.slack.some(Boolean)).toBe(false);
  });

  it("balances the prestress pulls on a mast head horizontally (the inner cables scaled to the outer)", () => {
    const s = solveCableModel({ ...net.model, loads });
    const h = net.mastHeads[0]!;
    const [x, y] = net.model.nodes[h] as Vec3;
    const radial = ((s.reactionsN[3 * h] as number) * x + (s.reactionsN[3 * h + 1] as number) * y) / Math.hypot(x, y);
    expect(Math.abs(radial)).toBeLessThan(2e-3 * (s.reactionsN[3 * h + 2] as number));
  });

  it("twice the prestress: the same plan, the net hangs less under the same load", () => {
    const stiffer = cableNetModel({ ...input, prestressN: 2 * input.prestressN });
    const ringZ = (m: typeof net) => m.ringNodes.reduce((s, k) => s + (m.model.nodes[k] as Vec3)[2], 0) / m.ringNodes.length;
    expect(ringZ(stiffer)).toBeGreaterThan(ringZ(net));
    const span = (m: typeof net) => m.model.members.reduce((s, mm) => s + lengthOf(m.model.nodes[mm.i] as Vec3, m.model.nodes[mm.j] as Vec3), 0);
    expect(Number.isFinite(span(stiffer))).toBe(true);
  });
});

describe("cableNetModel with the central ring held down (option centre = held-down)", () => {
  const held = cableNetModel({ ...input, centreHeldAtM: 4 });
  // prestressed well above the weight (20×): the inner cables run taut from the ring up to the heads
  const taut = cableNetModel({ ...input, prestressN: 20 * input.prestressN, centreHeldAtM: 4 });
  it("holds the ring's nodes at the given height besides the mast heads and anchors", () => {
    const supported = held.model.supports.map((s) => s.node);
    expect(held.ringNodes.every((k) => supported.includes(k) && (held.model.nodes[k] as Vec3)[2] === 4)).toBe(true);
    expect(supported).toHaveLength(6 + 12 + held.ringNodes.length);
  });
  it("prestressed well above its weight, the inner net lies between the held ring and the mast heads", () => {
    const inner = taut.model.nodes.filter((_, k) => !taut.mastHeads.includes(k) && Math.hypot((taut.model.nodes[k] as Vec3)[0], (taut.model.nodes[k] as Vec3)[1]) < 18 - 1e-9);
    expect(inner.every(([, , z]) => z >= 4 - 1e-9 && z <= 12 + 1e-9)).toBe(true);
  });
  it("the supports' vertical reactions balance the loads; prestressed well above its weight the net pulls the held ring up", () => {
    const heldLoads = held.areaM2.map((A, node) => ({ node, forceN: [0, 0, -input.permanentPa * A] as const })).filter((l) => l.forceN[2] !== 0);
    const s = solveCableModel({ ...held.model, loads: heldLoads });
    expect(s.converged).toBe(true);
    const applied = heldLoads.reduce((sum, l) => sum + l.forceN[2], 0);
    const reactions = held.model.supports.reduce((sum, sp) => sum + (s.reactionsN[3 * sp.node + 2] as number), 0);
    expect(Math.abs(applied + reactions)).toBeLessThan(1e-6 * Math.abs(applied));
    const st = solveCableModel({ ...taut.model, loads: heldLoads });
    expect(st.converged).toBe(true);
    // the net pulls the held ring upwards: its supports pull down
    expect(taut.ringNodes.reduce((sum, k) => sum + (st.reactionsN[3 * k + 2] as number), 0)).toBeLessThan(0);
  });
});
