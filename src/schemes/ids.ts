// The scheme ids, in the order pages list the schemes. `SchemeId` comes from this tuple, and the
// registry (./index.ts) is checked against it by the compiler: a model for every id, none extra,
// each under its own id. It sits in its own file so that the contract (./types.ts) can name the
// ids without importing the registry, which imports every scheme, which import the contract.
export const SCHEME_IDS = ["cable-dome", "cable-net", "geodesic-dome", "truss-roof", "concrete-shell", "timber-dome"] as const;

export type SchemeId = (typeof SCHEME_IDS)[number];
