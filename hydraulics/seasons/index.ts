export { findLowPoints, assertPipeProfile, type PipeProfile, type LowPointOptions, type LowPoint } from './low-points';
export { winterTreatment, type WinterLine, type WinterTreatment } from './winter-treatment';
export {
  parseMonthDay,
  dateInYear,
  seasonStart,
  isUsualFirstFrostMonth,
  type Hemisphere,
  type Season,
} from './calendar';
export {
  seasonalTasks,
  type SeasonalTask,
  type SeasonalTaskKind,
  type SeasonalTaskOptions,
  type SeasonalTaskResult,
} from './seasonal-tasks';
