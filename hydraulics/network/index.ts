export type * from './types';
export { solveNetwork } from './solve-network';
export { assertNetworkInput } from './validate-network';
export { DEFAULT_NETWORK_SETTINGS, DEFAULT_HAZEN_WILLIAMS_CONSTANT } from './settings';
export { sizeNetwork } from './sizing/size-network';
export type { SizingCandidate, SizingOptions, SizingResult, SizedPiece } from './sizing/types';
