export * from './daily-patterns';
export { supplyHourlyVolumeM3, type SupplyProfileOptions } from './supply-profile';
export { massCurveStorage, type MassCurveOptions, type MassCurveResult } from './mass-curve';
export { simulateTank, type SimulateTankOptions, type SimulateTankResult } from './simulate-tank';
export { tankFillTimeS, type TankFillOptions } from './tank-fill';
export { requiredTankElevation, type OutletHeadNeed, type TankElevationResult } from './tank-elevation';
export { sizeStorage, type StorageDemand, type StorageSizingOptions, type StorageSizingResult } from './size-storage';
