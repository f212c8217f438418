/** The caution every results page, export, the command line and the README carry. */
export const CAUTION =
  "Feasibility-stage estimates for comparing schemes, not designs: every number comes from simplified published methods and assumed data, and must be checked against local codes and by licensed engineers before any decision that relies on it.";
