// Loads: EN 1990 combinations and the EN 1991 roof actions every scheme starts from.
export { eq610, eq610a, eq610b, ulsGravity, ulsUplift, type UlsResult } from "./combinations";
export { snowShapeMu1, snowShapeMu3 } from "./snow";
export { peakVelocityPressure, TERRAIN, type PeakVelocityPressure } from "./wind";
export { roofActions, designPressures, type RoofActions, type DesignPressures } from "./roof-actions";
