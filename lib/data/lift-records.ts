import 'server-only';
import type { DemandUse } from '../../models/demand-use';
import type { RamCommissioningReading } from '../../models/ram-commissioning-reading';
import type { RamSite } from '../../models/ram-site';
import type { SeasonalTaskRow } from '../../models/seasonal-task';
import type { Tank } from '../../models/tank';
import type { WaterSource } from '../../models/water-source';
import type { YieldReadingRow } from '../../models/yield-reading';
import type {
  CommissioningRecord,
  DemandUseRecord,
  RamSiteRecord,
  SeasonalTaskRecord,
  TankRecord,
  WaterSourceRecord,
  YieldReadingRecord,
} from '../lift/records';

/** Model rows -> plain records (the API shapes), never ORM instances. */
export const sourceRecord = (row: WaterSource): WaterSourceRecord => ({
  id: row.id,
  name: row.name,
  kind: row.kind,
  notes: row.notes,
  designYieldChoice: row.designYieldChoice,
  designReadingId: row.designReadingId,
  enteredYieldM3s: row.enteredYieldM3s,
  otherDrawM3s: row.otherDrawM3s,
});

export const yieldReadingRecord = (row: YieldReadingRow): YieldReadingRecord => ({
  id: row.id,
  sourceId: row.sourceId,
  measuredOn: row.measuredOn,
  season: row.season,
  bucketVolumeM3: row.bucketVolumeM3,
  bucketSeconds: row.bucketSeconds,
  flowM3s: row.flowM3s,
  note: row.note,
});

export const ramSiteRecord = (row: RamSite): RamSiteRecord => ({
  id: row.id,
  name: row.name,
  sourceId: row.sourceId,
  tankId: row.tankId,
  driveFlowM3s: row.driveFlowM3s,
  fallM: row.fallM,
  drivePipe: {
    lengthM: row.driveLengthM,
    insideDiameterM: row.driveInsideDiameterM,
    material: row.driveMaterial,
    rigid: row.driveRigid,
  },
  liftM: row.liftM,
  pumpElevationM: row.pumpElevationM ?? null,
  deliveryPipe: {
    routeId: row.deliveryRouteId,
    lengthM: row.deliveryLengthM,
    pipeId: row.deliveryPipeId,
    insideDiameterM: row.deliveryInsideDiameterM,
    hazenWilliamsC: row.deliveryHazenC,
    pressureRatingPa: row.deliveryRatingPa,
  },
  sizeClassId: row.sizeClassId,
  pumpCount: row.pumpCount,
  measuredEfficiency: row.measuredEfficiency,
  efficiencyTableId: row.efficiencyTableId ?? 'trade-pocketbook',
  notes: row.notes,
});

export const commissioningRecord = (row: RamCommissioningReading): CommissioningRecord => ({
  id: row.id,
  ramSiteId: row.ramSiteId,
  measuredOn: row.measuredOn,
  beatsPerMinute: row.beatsPerMinute,
  deliveredBucketVolumeM3: row.deliveredBucketVolumeM3,
  deliveredBucketSeconds: row.deliveredBucketSeconds,
  deliveredFlowM3s: row.deliveredFlowM3s,
  driveMeasure: row.driveMeasure,
  driveBucketVolumeM3: row.driveBucketVolumeM3,
  driveBucketSeconds: row.driveBucketSeconds,
  driveFlowM3s: row.driveFlowM3s,
  pressureAtPumpPa: row.pressureAtPumpPa,
  supplyHeadM: row.supplyHeadM,
  deliveryHeadM: row.deliveryHeadM,
  notes: row.notes,
});

export const tankRecord = (row: Tank): TankRecord => ({
  id: row.id,
  name: row.name,
  volumeM3: row.volumeM3,
  baseElevationM: row.baseElevationM,
  lowLevelM: row.lowLevelM,
  overflowLevelM: row.overflowLevelM,
  supplyKind: row.supplyKind,
  supplySourceId: row.supplySourceId,
  supplyFlowM3s: row.supplyFlowM3s,
  supplyHoursPerDay: row.supplyHoursPerDay,
  supplyStartHour: row.supplyStartHour,
  reserveDays: row.reserveDays,
  outlets: row.outlets,
  notes: row.notes,
});

export const demandUseRecord = (row: DemandUse): DemandUseRecord => ({
  id: row.id,
  position: row.position,
  label: row.label,
  kind: row.kind,
  count: row.count,
  areaM2: row.areaM2,
  figureId: row.figureId,
  ownFigure: row.ownFigure,
  season: row.season,
  deliveryKind: row.deliveryKind,
  patternPresetId: row.patternPresetId,
  hourlyFractions: row.hourlyFractions,
  peakFactor: row.peakFactor,
  deliveryHours: row.deliveryHours,
  startHour: row.startHour,
});

export const seasonalTaskRecord = (row: SeasonalTaskRow): SeasonalTaskRecord => ({
  id: row.id,
  kind: row.kind,
  title: row.title,
  detail: row.detail,
  dueOn: row.dueOn,
  done: row.done,
  doneOn: row.doneOn,
  source: row.source,
});
