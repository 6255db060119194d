import { describe, expect, it } from 'vitest';
import { planRamPump } from '@/hydraulics/ram/plan-ram';
import { deliveryLengthM, planRamSite, ramPlanOptions } from '@/lib/lift/ram-plan';
import type { LiftRecords, RamSiteRecord, TankRecord } from '@/lib/lift/records';
import { buildLiftSummary } from '@/lib/lift/summary';

const L_PER_MIN = 1e-3 / 60;
const site = (id: string, patch: Partial<RamSiteRecord> = {}): RamSiteRecord => ({
  id,
  name: id,
  sourceId: null,
  tankId: 'tank',
  driveFlowM3s: 20 * L_PER_MIN,
  fallM: 2,
  drivePipe: { lengthM: 14, insideDiameterM: 0.03505, material: 'steel', rigid: null },
  liftM: 10.7,
  pumpElevationM: null,
  deliveryPipe: {
    routeId: null,
    lengthM: 107,
    pipeId: null,
    insideDiameterM: 0.02093,
    hazenWilliamsC: 150,
    pressureRatingPa: 689_476,
  },
  sizeClassId: null,
  pumpCount: 1,
  measuredEfficiency: null,
  efficiencyTableId: 'trade-pocketbook',
  notes: '',
  ...patch,
});
const tank: TankRecord = {
  id: 'tank',
  name: 'Tank',
  volumeM3: 1.25,
  baseElevationM: null,
  lowLevelM: 0,
  overflowLevelM: null,
  supplyKind: 'ram-sites',
  supplySourceId: null,
  supplyFlowM3s: null,
  supplyHoursPerDay: 24,
  supplyStartHour: 0,
  reserveDays: 0,
  outlets: [],
  notes: '',
};
const records = (patch: Partial<LiftRecords>): LiftRecords => ({
  sources: [],
  yieldReadings: [],
  ramSites: [],
  commissioning: [],
  tanks: [tank],
  demandUses: [],
  seasonalTasks: [],
  routes: [],
  ...patch,
});

describe('ram plan from a stored site', () => {
  it('takes the delivery length from the chosen surveyed route, else the length entered', () => {
    const routed = site('a', { deliveryPipe: { ...site('a').deliveryPipe, routeId: 'route-1', lengthM: 50 } });
    expect(deliveryLengthM(routed, [{ id: 'route-1', name: 'Up the knoll', lengthM: 123.4 }])).toBe(123.4);
    expect(deliveryLengthM(routed, [])).toBe(50);
  });

  it('plans exactly as the core does for the same inputs', () => {
    const options = ramPlanOptions(site('a'), { routes: [], tankVolumeM3: 1.25 });
    const outcome = planRamSite(site('a'), { routes: [], tankVolumeM3: 1.25 });
    expect(outcome.ok && outcome.value.deliveredFlowM3s).toBe(planRamPump(options).deliveredFlowM3s);
  });

  it('answers a failed outcome naming the field instead of throwing', () => {
    const outcome = planRamSite(site('a', { liftM: 1 }), { routes: [], tankVolumeM3: null });
    expect(outcome).toMatchObject({ ok: false, field: 'liftM' });
  });
});

describe('lift summary', () => {
  it('fills a tank from every ram site that delivers to it: supply is the sum of their delivered flows', () => {
    const summary = buildLiftSummary(records({ ramSites: [site('a'), site('b', { liftM: 14 })] }));
    const delivered = summary.ramSites.map((view) => (view.plan.ok ? view.plan.value.deliveredFlowM3s : Number.NaN));
    const [view] = summary.tanks;
    expect(view.supply.flowM3s).toBeCloseTo(delivered[0] + delivered[1], 15);
    // Fill-time identity: volume / inflow.
    expect(view.sizing.ok && view.sizing.value.fillTimeS).toBeCloseTo(1.25 / (delivered[0] + delivered[1]), 6);
  });

  it('says why a tank cannot be sized when nothing delivers to it', () => {
    const [view] = buildLiftSummary(records({})).tanks;
    expect(view.sizing).toMatchObject({ ok: false, error: 'No ram site delivers to this tank yet.' });
  });

  it('compares commissioning with the table plan even when the site plans with a measured efficiency', () => {
    const measured = site('a', { measuredEfficiency: 0.3 });
    const reading = {
      id: 'r',
      ramSiteId: 'a',
      measuredOn: '2026-09-12',
      beatsPerMinute: 60,
      deliveredBucketVolumeM3: 0.01,
      deliveredBucketSeconds: 240,
      deliveredFlowM3s: null,
      driveMeasure: 'waste' as const,
      driveBucketVolumeM3: 0.01,
      driveBucketSeconds: 30,
      driveFlowM3s: null,
      pressureAtPumpPa: null,
      supplyHeadM: 2,
      deliveryHeadM: 11,
      notes: '',
    };
    const [view] = buildLiftSummary(records({ ramSites: [measured], commissioning: [reading] })).ramSites;
    expect(view.plan.ok && view.plan.value.efficiency).toBe(0.3);
    const result = view.commissioning[0].result;
    expect(result.ok && result.value.plannedEfficiency).toBeCloseTo(view.tablePlan?.efficiency ?? Number.NaN, 12);
    expect(view.tablePlan?.efficiencyBasis).toBe('table');
  });

  it('takes the drive flow from the plan when the reading did not measure it, and says so', () => {
    const reading = {
      id: 'r',
      ramSiteId: 'a',
      measuredOn: '2026-09-12',
      beatsPerMinute: 60,
      deliveredBucketVolumeM3: null,
      deliveredBucketSeconds: null,
      deliveredFlowM3s: 2 * L_PER_MIN,
      driveMeasure: 'plan' as const,
      driveBucketVolumeM3: null,
      driveBucketSeconds: null,
      driveFlowM3s: null,
      pressureAtPumpPa: 110_000,
      supplyHeadM: 2,
      deliveryHeadM: null,
      notes: '',
    };
    const [view] = buildLiftSummary(records({ ramSites: [site('a')], commissioning: [reading] })).ramSites;
    const result = view.commissioning[0].result;
    expect(result.ok && result.value.driveBasis).toBe('planned');
    expect(result.ok && result.value.driveFlowM3s).toBeCloseTo(20 * L_PER_MIN, 15);
    // Delivery head read from the gauge: 110 kPa over ρg of water at 20 °C (998.2 kg/m³, from memory) is about 11.2 m.
    expect(result.ok && result.value.deliveryHeadM).toBeCloseTo(110_000 / (998.2 * 9.80665), 2);
  });
});
