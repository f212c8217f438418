import { describe, expect, it } from "vitest";
import { cableNetModel } from "../../../src/analysis/models/cable-net-model";

// Statics: the nodal tributary areas of the net's model must add up to its plan, so a uniform pressure
// puts its whole resultant p·πa² on the model (free nodes and held anchors together). Before, the outer
// half-strip beyond the last circumferential cable went to no node (19 % of the plan of a 60 m net with
// its last cable 3 m inside the edge) and the anchors' uplift missed its wind.
describe("cable net model: tributary plan areas", () => {
  for (const [label, hoops, per] of [["three circumferential cables", [14, 20, 26], 1], ["six, lumped two by two", [10, 13, 17, 21, 24, 27], 2]] as const) {
    it(`cover the whole plan, ${label}`, () => {
      const a = 30;
      const net = cableNetModel({
        masts: 3, cablesPerSide: 8, mastRadiusM: 19.5, mastHeadM: 10, edgeRadiusM: a, centralRingRadiusM: 3, hoopRadiiM: hoops,
        prestressN: 2e5, hoopShare: 0.5, permanentPa: 300, eaN: { outer: 1e8, inner: 1e8, hoop: 5e7, ring: 2e8 }, centreHeldAtM: 5, hoopsPerCable: per,
      });
      const total = net.areaM2.reduce((s, x) => s + x, 0);
      expect(total / (Math.PI * a * a)).toBeCloseTo(1, 9);
      const anchors = net.anchors.reduce((s, k) => s + (net.areaM2[k] as number), 0);
      // the outer half-strip: from half-way between the last cable and the edge, out to the edge
      const mid = ((hoops[hoops.length - 1] as number) + a) / 2;
      expect(anchors / (Math.PI * (a * a - mid * mid))).toBeCloseTo(1, 9);
      expect(net.mastHeads.every((k) => net.areaM2[k] === 0)).toBe(true);
    });
  }
});
