import { createCommissioningFixture, createRamSiteFixture } from './lift-ram-fixtures';
import { createDemandUse } from '@/lib/data/demand-uses';
import { createSeasonalTask } from '@/lib/data/seasonal-tasks';
import { createTank } from '@/lib/data/tanks';
import { addYieldReading, createSource } from '@/lib/data/water-sources';
import { DemandUseSchema } from '@/lib/validations/demand-uses';
import { SeasonalTaskSchema } from '@/lib/validations/seasonal-tasks';
import { TankSchema } from '@/lib/validations/tanks';
import { WaterSourceSchema, YieldReadingSchema } from '@/lib/validations/water-sources';

export { createCommissioningFixture, createRamSiteFixture };
export { commissioningBody, ramSiteBody } from './lift-ram-fixtures';

const L = 1e-3;

/** Request bodies (SI) that the API accepts; tests spread and break them. */
export const sourceBody = () => ({ name: 'Fixture creek', kind: 'creek', notes: '' });
export const yieldReadingBody = () => ({
  measuredOn: '2026-08-20',
  season: 'dry',
  bucketVolumeM3: 20 * L,
  bucketSeconds: 15,
  note: 'below the weir',
});
export const tankBody = () => ({
  name: 'Fixture tank',
  volumeM3: 5,
  baseElevationM: 120,
  lowLevelM: 0.2,
  overflowLevelM: 1.6,
  supplyKind: 'entered',
  supplyFlowM3s: (2 * L) / 60,
  reserveDays: 2,
  outlets: [{ label: 'House', elevationM: 100, residualHeadM: 10, frictionLossM: 2 }],
});
export const demandUseBody = () => ({
  kind: 'people',
  count: 4,
  figureId: 'us-rural-home',
  deliveryKind: 'peak-factor',
  peakFactor: 3,
});
export const seasonalTaskBody = () => ({ kind: 'silt-cleaning', title: 'Clean the settling box', dueOn: '2026-09-01' });

export async function createSourceFixture(projectId: string, userId: string) {
  return createSource(projectId, userId, WaterSourceSchema.parse(sourceBody()));
}

export async function createYieldReadingFixture(projectId: string, userId: string) {
  const source = await createSourceFixture(projectId, userId);
  const reading = await addYieldReading(projectId, source.id, userId, YieldReadingSchema.parse(yieldReadingBody()));
  return { source, reading };
}

export async function createTankFixture(projectId: string, userId: string) {
  return createTank(projectId, userId, TankSchema.parse(tankBody()));
}

export async function createDemandUseFixture(projectId: string) {
  return createDemandUse(projectId, DemandUseSchema.parse(demandUseBody()));
}

export async function createSeasonalTaskFixture(projectId: string) {
  return createSeasonalTask(projectId, SeasonalTaskSchema.parse(seasonalTaskBody()));
}
