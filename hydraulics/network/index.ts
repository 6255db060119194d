export type * from './types';
export { solveNetwork } from './solve-network';
export { assertNetworkInput } from './validate-network';
export { DEFAULT_NETWORK_SETTINGS, DEFAULT_HAZEN_WILLIAMS_CONSTANT } from './settings';
