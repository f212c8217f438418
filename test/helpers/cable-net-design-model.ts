// The 3D model a cable-net design was analysed on, rebuilt from the brief, the options and the design
// (its prestress and smeared self-weight): for tests and benches that solve combinations on it.
import type { Brief } from "../../src/brief";
import type { Design } from "../../src/schemes/types";
import { cableNet } from "../../src/schemes/cable-net";
import { cableNetLayout } from "../../src/schemes/cable-net/geometry";
import { NET_HOOP_PRESTRESS_SHARE } from "../../src/schemes/cable-net/analysis";
import { cableNetModel, PRESTRESS_STRAIN } from "../../src/analysis/models/cable-net-model";
import { capHeightAt } from "../../src/mechanics/spherical-cap";
import { GRAVITY_M_PER_S2 } from "../../src/mechanics/gravity";

export function cableNetDesignModel(brief: Brief, o: typeof cableNet.defaults, d: Design) {
  const layout = cableNetLayout(brief, o.masts, o.mastRingRatio, o.mastHeightRatio, o.radialCablesPerMast, o.hangerSpacingM);
  const prestressN = (d.analysis?.prestressKN ?? 0) * 1000;
  const selfWeightKPa = (d.selfWeightKgPerM2 * GRAVITY_M_PER_S2) / 1000;
  const ea = prestressN / PRESTRESS_STRAIN;
  const net = cableNetModel({
    masts: layout.masts, cablesPerSide: layout.cablesPerSide, mastRadiusM: layout.mastRadiusM, mastHeadM: layout.mastHeadM, edgeRadiusM: layout.cap.baseRadiusM,
    centralRingRadiusM: layout.centralRingRadiusM, hoopRadiiM: layout.hoopRadiiM, prestressN, hoopShare: NET_HOOP_PRESTRESS_SHARE,
    permanentPa: (selfWeightKPa + brief.servicesKPa) * 1000, eaN: { outer: ea, inner: ea, hoop: ea / 2, ring: 10 * ea },
    // its centre held at the crown when the design holds it (the default)
    ...(o.centre === "held-down" ? { centreHeldAtM: capHeightAt(layout.cap, layout.centralRingRadiusM) } : {}),
  });
  return { layout, prestressN, selfWeightKPa, net };
}
