/**
 * 16 distinguishable colours for stacked parts (elements of a cost, on-costs), each at least 3:1
 * against white (tested) and none a scheme colour; a stack of more than 16 parts repeats from the
 * start.
 */
export const PART_COLOURS: readonly string[] = [
  "#1b6ca8", "#b3461f", "#2e7d40", "#7b3fa0", "#8a6d00", "#b0306b", "#00727a", "#5c5c5c",
  "#a34f00", "#3d5a99", "#5f7a1f", "#8b2f2f", "#4a6b5a", "#94548f", "#5b4a8a", "#7a5c3a",
];
