export { createBandMatrix, addToBand, bandEntry, type BandMatrix } from "./band-matrix";
export { buildAdjacency, type Adjacency } from "./build-adjacency";
export { reverseCuthillMcKee } from "./reverse-cuthill-mckee";
export { factorBandLdlt, type BandLdlt, type FactorBandLdltOptions } from "./factor-band-ldlt";
export { solveBandLdlt } from "./solve-band-ldlt";
export { bandNullVector } from "./band-null-vector";
