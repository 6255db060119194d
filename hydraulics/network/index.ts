export type * from './types';
export { solveNetwork } from './solve-network';
export { assertNetworkInput } from './validate-network';
export { DEFAULT_NETWORK_SETTINGS, DEFAULT_HAZEN_WILLIAMS_CONSTANT } from './settings';
export { sizeNetwork } from './sizing/size-network';
export { tankFillNodeId } from './sizing/tank-fill';
export type { SizingCandidate, SizingOptions, SizingResult, SizedPiece } from './sizing/types';
export { runNetworkDay, tankAreaM2 } from './day/run-network-day';
export { servedOutletsByTank, type ServedOutlet } from './day/served-outlets';
export { sizeTankStorage, type TankStorageOptions, type TankStorageResult } from './day/tank-storage';
export type { NetworkDayOptions, NetworkDayResult, NetworkDayStep } from './day/types';
export { lineFlowSchedule, type LinePieceLink } from './line-schedule';
// The solver's stages, public for the benchmark that times its linear step against a dense solve
export { compileNetwork, type CompiledNetwork } from './compile-network';
export { networkTopology, type NetworkTopology } from './topology';
export { GradientSolver, type HeadSystem } from './gradient-method';
