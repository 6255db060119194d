export { bucketFlowM3s, measuredFlowM3s, type BucketReading, type FlowMeasurement } from './bucket-flow';
export { parseIsoDate, formatIsoDate, addDays, MS_PER_DAY } from './iso-date';
export type { YieldReading, YieldSeason } from './yield-reading';
export {
  designYield,
  yieldDrawChecks,
  type DesignYieldChoice,
  type DesignYieldOptions,
  type DesignYieldResult,
} from './design-yield';
