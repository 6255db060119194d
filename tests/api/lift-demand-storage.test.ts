import { beforeAll, describe, expect, it } from 'vitest';
import * as usesRoute from '@/app/api/projects/[projectId]/demand-uses/route';
import * as liftRoute from '@/app/api/projects/[projectId]/lift/route';
import * as tanksRoute from '@/app/api/projects/[projectId]/tanks/route';
import { US_GALLON_M3 } from '@/hydraulics/constants';
import { models } from '@/models';
import { call, createTeamFixture } from '../support/api';
import { demandUseBody, tankBody } from '../support/lift-fixtures';

type Fixture = Awaited<ReturnType<typeof createTeamFixture>>;
let f: Fixture;
beforeAll(async () => {
  f = await createTeamFixture();
});

const postUse = (body: unknown, fixture = f) =>
  call(usesRoute.POST, {
    method: 'POST',
    path: 'x',
    params: { projectId: fixture.projectId },
    body,
    userId: fixture.users.designer.id,
  });
const postTank = (body: unknown, fixture = f) =>
  call(tanksRoute.POST, {
    method: 'POST',
    path: 'x',
    params: { projectId: fixture.projectId },
    body,
    userId: fixture.users.designer.id,
  });

describe('demand uses', () => {
  it('totals published defaults: 4 people x 50 US gal and 12 cow-calf pairs x 68 L in summer', async () => {
    const fixture = await createTeamFixture();
    expect((await postUse(demandUseBody(), fixture)).status).toBe(201);
    const cattle = {
      kind: 'livestock',
      count: 12,
      figureId: 'cow-calf-pair',
      season: 'summer',
      deliveryKind: 'delivery-hours',
      deliveryHours: 4,
      startHour: 6,
    };
    expect((await postUse(cattle, fixture)).status).toBe(201);
    const res = await call(liftRoute.GET, {
      method: 'GET',
      path: 'x',
      params: { projectId: fixture.projectId },
      userId: fixture.users.reviewer.id,
    });
    const { uses, total } = res.json.lift.demand;
    // J. Renewable Energy (Hindawi) 2017 art. 8504283 Table 1: 50 US gal/person/day for a rural home.
    expect(uses[0].published.value).toBeCloseTo(50 * US_GALLON_M3, 12);
    // AAFC / PFRA Stockman's Guide: cow-calf pair 68 L/day in summer.
    expect(uses[1].published.value).toBeCloseTo(0.068, 12);
    expect(total.value.dailyVolumeM3).toBeCloseTo(4 * 50 * US_GALLON_M3 + 12 * 0.068, 9);
    // The trough refills in 4 h, so its peak is the day's need over 4 h (delivery window identity).
    expect(total.value.uses[1].peakFlowM3s).toBeCloseTo((12 * 0.068) / (4 * 3600), 12);
  });

  const bad: [string, Record<string, unknown>, string][] = [
    ['a negative head count', { count: -3 }, 'count'],
    ['part of a person', { count: 2.5 }, 'count'],
    ['an unknown published figure', { figureId: 'astronaut' }, 'figureId'],
    ['livestock with no season', { kind: 'livestock', figureId: 'horse', season: null }, 'season'],
    ['a peak factor below 1', { peakFactor: 0.5 }, 'peakFactor'],
    [
      'a pattern whose printed percentages sum to 95 %',
      { deliveryKind: 'pattern', patternPresetId: 'three-peaks-as-printed' },
      'patternPresetId',
    ],
    [
      'hourly fractions summing to 90 %',
      { deliveryKind: 'pattern', hourlyFractions: new Array(24).fill(0.9 / 24) },
      'hourlyFractions',
    ],
    [
      '23 hourly fractions',
      { deliveryKind: 'pattern', hourlyFractions: new Array(23).fill(1 / 23) },
      'hourlyFractions',
    ],
  ];
  it.each(bad)('refuses %s (400) and writes nothing', async (_what, patch, field) => {
    const before = await models().DemandUse.count({ where: { projectId: f.projectId } });
    const res = await postUse({ ...demandUseBody(), ...patch });
    expect(res.status).toBe(400);
    expect(Object.keys(res.json.error.fields)).toContain(field);
    expect(await models().DemandUse.count({ where: { projectId: f.projectId } })).toBe(before);
  });
});

describe('tanks and storage sizing', () => {
  it('sizes storage against the demand: fill time is volume / supply, and the tank elevation is checked', async () => {
    const fixture = await createTeamFixture();
    await postUse(
      { ...demandUseBody(), peakFactor: null, deliveryKind: 'pattern', patternPresetId: 'jordan-morning-evening' },
      fixture,
    );
    const created = await postTank(tankBody(), fixture);
    expect(created.status).toBe(201);
    const res = await call(liftRoute.GET, {
      method: 'GET',
      path: 'x',
      params: { projectId: fixture.projectId },
      userId: fixture.users.reviewer.id,
    });
    const [view] = res.json.lift.tanks;
    const supply = 2e-3 / 60;
    expect(view.supply.flowM3s).toBeCloseTo(supply, 15);
    expect(view.sizing.value.fillTimeS).toBeCloseTo(5 / supply, 6);
    expect(view.sizing.value.cumulativeSupplyM3).toHaveLength(25);
    expect(view.sizing.value.cumulativeSupplyM3[24]).toBeCloseTo(supply * 86_400, 9);
    // House at 100 m wanting 10 m residual with 2 m friction: 112 m; the tank's lowest level is 120.2 m.
    expect(view.sizing.value.elevation.required.minimumWaterLevelM).toBeCloseTo(112, 12);
    expect(view.sizing.value.elevation.shortfallM).toBe(0);
  });

  const bad: [string, Record<string, unknown>, string][] = [
    ['a tank of no volume', { volumeM3: 0 }, 'volumeM3'],
    ['an overflow below the lowest working level', { lowLevelM: 1, overflowLevelM: 0.5 }, 'overflowLevelM'],
    ['a source supply with no source', { supplyKind: 'source', supplyFlowM3s: null }, 'supplySourceId'],
    ['supply for 25 hours a day', { supplyHoursPerDay: 25 }, 'supplyHoursPerDay'],
    [
      'an outlet with a negative residual head',
      { outlets: [{ label: 'Tap', elevationM: 90, residualHeadM: -1, frictionLossM: 0 }] },
      'outlets.0.residualHeadM',
    ],
  ];
  it.each(bad)('refuses %s (400) and writes nothing', async (_what, patch, field) => {
    const before = await models().Tank.count({ where: { projectId: f.projectId } });
    const res = await postTank({ ...tankBody(), ...patch });
    expect(res.status).toBe(400);
    expect(Object.keys(res.json.error.fields)).toContain(field);
    expect(await models().Tank.count({ where: { projectId: f.projectId } })).toBe(before);
  });
});
