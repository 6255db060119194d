// Public surface of the survey core; the lead re-exports it from hydraulics/index.ts.
export type { RouteStation, GeoPosition } from './types';
export { geodesicInverse, geodesicDirect, geodesicInterpolate } from './geodesic';
export type {
  GeodesicInverseInput,
  GeodesicInverseResult,
  GeodesicDirectInput,
  GeodesicDirectResult,
} from './geodesic';
export { chainageAlongTrack, slopeLengthOfProfile } from './chainage';
export type { TrackChainage } from './chainage';
export { projectToLocalPlan, MEAN_EARTH_RADIUS_M } from './plan-projection';
export type { LocalPlan, PlanPoint } from './plan-projection';
export { reduceInclinometerLeg, reduceInclinometerTraverse, verticalAngleToDegrees } from './fieldbook/inclinometer';
export type {
  InclinometerLegInput,
  InclinometerLegResult,
  InclinometerTraverseInput,
  ReducedStation,
  VerticalAngleUnit,
} from './fieldbook/inclinometer';
export { reduceLevelBook, assertLevelBook } from './fieldbook/level-book';
export type {
  LevelBookReading,
  LevelBookInput,
  LevelBookResult,
  LevelBookMethod,
  ReducedLevel,
} from './fieldbook/level-book';
export {
  HEIGHT_SOURCES,
  DEFAULT_VERTICAL_UNCERTAINTY,
  defaultVerticalUncertaintyM,
  heightDatumOf,
} from './height-source';
export type { HeightDatum, HeightSource, VerticalUncertaintyDefault } from './height-source';
export { surveyHeightScatterM, WALKED_SCATTER_CAP_M } from './height-scatter';
export type { HeightConfidence } from './height-scatter';
export { consumerGpsHeightWarning } from './gps-height-warning';
export type { HeightDecision, GpsHeightWarning } from './gps-height-warning';
export { applyAcceptedChanges } from './cleanup/proposed-change';
export type { ProposedChange, CleanupKind } from './cleanup/proposed-change';
export { movingMedian } from './cleanup/moving-median';
export { detectGradeSpikes, detectMedianOutliers } from './cleanup/spikes';
export type { GradeSpikeOptions, MedianOutlierOptions } from './cleanup/spikes';
export { detectDuplicates } from './cleanup/duplicates';
export { detectOutOfOrder } from './cleanup/order';
export { proposeSmoothing, proposeBenchmarkOffset } from './cleanup/smoothing';
export { reverseRoute } from './route/reverse';
export { splitRoute } from './route/split';
export type { SplitRouteResult } from './route/split';
export { joinRoutes } from './route/join';
export type { JoinRouteResult } from './route/join';
export { trimRoute } from './route/trim';
export { interpolateStation, elevationAtChainage } from './route/interpolate';
export { locateOnRoute } from './locate-on-route';
export type { LocatableStation, RouteLocation } from './locate-on-route';
export { assertOrderedStations } from './route/ordered-stations';
