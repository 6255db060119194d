import { beforeAll, describe, expect, it } from 'vitest';
import * as commissioningRoute from '@/app/api/projects/[projectId]/ram-sites/[siteId]/commissioning/route';
import * as siteRoute from '@/app/api/projects/[projectId]/ram-sites/[siteId]/route';
import * as sitesRoute from '@/app/api/projects/[projectId]/ram-sites/route';
import * as liftRoute from '@/app/api/projects/[projectId]/lift/route';
import { models } from '@/models';
import { call, createTeamFixture } from '../support/api';
import { commissioningBody, createRamSiteFixture, createTankFixture, ramSiteBody } from '../support/lift-fixtures';

type Fixture = Awaited<ReturnType<typeof createTeamFixture>>;
let f: Fixture;
let other: Fixture;

beforeAll(async () => {
  f = await createTeamFixture();
  other = await createTeamFixture();
});

const path = (projectId: string) => `/api/projects/${projectId}/ram-sites`;
const post = (body: unknown, projectId = f.projectId, userId = f.users.designer.id) =>
  call(sitesRoute.POST, { method: 'POST', path: path(projectId), params: { projectId }, body, userId });
const siteCount = (projectId = f.projectId) => models().RamSite.count({ where: { projectId } });

describe('POST ram-sites', () => {
  it('stores the site in SI and answers with its plan: a small creek ram delivers about 2.6 L/min (common practice, no source)', async () => {
    const tank = await createTankFixture(f.projectId, f.users.owner.id);
    const res = await post({ ...ramSiteBody(), tankId: tank.id });
    expect(res.status).toBe(201);
    expect(res.json.ramSite).toMatchObject({ fallM: 2, liftM: 10.7, tankId: tank.id, deliveryPipe: { lengthM: 107 } });
    // Issue facts (common practice, no source): ~2.6 L/min, ~3,700 L/day through 107 m of pipe up 10.7 m.
    expect(res.json.plan.deliveredLPerMin).toBeGreaterThan(2.0);
    expect(res.json.plan.deliveredLPerMin).toBeLessThan(3.3);
    // Fill-time identity: volume / delivered flow.
    expect(res.json.plan.tankFill.fillTimeS).toBeCloseTo(5 / res.json.plan.deliveredFlowM3s, 6);
    const row = await models().RamSite.findByPk(res.json.ramSite.id);
    expect(row?.driveFlowM3s).toBeCloseTo(20 / 60_000, 12);
  });

  const bad: [string, Record<string, unknown>, string][] = [
    ['a negative fall', { fallM: -2 }, 'fallM'],
    ['a lift below the fall', { liftM: 1.5 }, 'liftM'],
    ['a zero drive flow', { driveFlowM3s: 0 }, 'driveFlowM3s'],
    [
      'a drive pipe of no length',
      { drivePipe: { lengthM: 0, insideDiameterM: 0.035, material: 'steel' } },
      'drivePipe.lengthM',
    ],
    [
      'a delivery pipe with neither length nor route',
      { deliveryPipe: { insideDiameterM: 0.02, hazenWilliamsC: 150 } },
      'deliveryPipe.lengthM',
    ],
    ['a pipe not in the catalogue', { deliveryPipe: { lengthM: 100, pipeId: 'gold-pipe-1in' } }, 'deliveryPipe.pipeId'],
    ['half a pump', { pumpCount: 1.5 }, 'pumpCount'],
    ['an efficiency above 1', { measuredEfficiency: 1.2 }, 'measuredEfficiency'],
    ['an unknown size class', { sizeClassId: 'drive-999mm' }, 'sizeClassId'],
    ['a field the API does not know', { colour: 'red' }, 'colour'],
  ];
  it.each(bad)('refuses %s with a 400 naming the field, and writes nothing', async (_what, patch, field) => {
    const before = await siteCount();
    const res = await post({ ...ramSiteBody(), ...patch });
    expect(res.status).toBe(400);
    expect(res.json.error.code).toBe('bad_request');
    expect(Object.keys(res.json.error.fields)).toContain(field);
    expect(await siteCount()).toBe(before);
  });

  it('refuses a tank of another project (404 on tankId, as for an id in the address), and writes nothing', async () => {
    const foreignTank = await createTankFixture(other.projectId, other.users.owner.id);
    const before = await siteCount();
    const res = await post({ ...ramSiteBody(), tankId: foreignTank.id });
    expect(res.status).toBe(404);
    expect(res.json.error.fields.tankId).toEqual(['The tank is not part of this project']);
    expect(await siteCount()).toBe(before);
  });
});

describe('PUT ram-sites/[siteId]', () => {
  it('replaces the site and re-plans it; a higher lift delivers less', async () => {
    const site = await createRamSiteFixture(f.projectId, f.users.owner.id);
    const params = { projectId: f.projectId, siteId: site.id };
    const low = await call(siteRoute.PUT, {
      method: 'PUT',
      path: `${path(f.projectId)}/${site.id}`,
      params,
      body: ramSiteBody(),
      userId: f.users.owner.id,
    });
    const high = await call(siteRoute.PUT, {
      method: 'PUT',
      path: `${path(f.projectId)}/${site.id}`,
      params,
      body: { ...ramSiteBody(), liftM: 16 },
      userId: f.users.owner.id,
    });
    expect(high.status).toBe(200);
    expect(high.json.plan.deliveredFlowM3s).toBeLessThan(low.json.plan.deliveredFlowM3s);
    expect((await models().RamSite.findByPk(site.id))?.liftM).toBe(16);
  });

  it('keeps the stored site when the new lift is below the fall (400)', async () => {
    const site = await createRamSiteFixture(f.projectId, f.users.owner.id);
    const params = { projectId: f.projectId, siteId: site.id };
    const res = await call(siteRoute.PUT, {
      method: 'PUT',
      path: 'x',
      params,
      body: { ...ramSiteBody(), fallM: 3, liftM: 2.5 },
      userId: f.users.designer.id,
    });
    expect(res.status).toBe(400);
    expect(res.json.error.fields.liftM[0]).toMatch(/above the fall/);
    const row = await models().RamSite.findByPk(site.id);
    expect([row?.fallM, row?.liftM]).toEqual([2, 10.7]);
  });

  it('answers 404 for a site of another project named under this one', async () => {
    const foreign = await createRamSiteFixture(other.projectId, other.users.owner.id);
    const params = { projectId: f.projectId, siteId: foreign.id };
    const res = await call(siteRoute.PUT, {
      method: 'PUT',
      path: 'x',
      params,
      body: ramSiteBody(),
      userId: f.users.owner.id,
    });
    expect(res.status).toBe(404);
    expect((await models().RamSite.findByPk(foreign.id))?.name).toBe('Fixture ram');
  });
});

describe('POST ram-sites/[siteId]/commissioning', () => {
  const postReading = (siteId: string, body: unknown) =>
    call(commissioningRoute.POST, {
      method: 'POST',
      path: 'x',
      params: { projectId: f.projectId, siteId },
      body,
      userId: f.users.designer.id,
    });

  it('logs the reading and answers the measured efficiency q·h/(Q·H), compared with the plan', async () => {
    const site = await createRamSiteFixture(f.projectId, f.users.owner.id);
    const res = await postReading(site.id, commissioningBody());
    expect(res.status).toBe(201);
    // 10 L in 240 s delivered; 10 L in 30 s wasted; drive = waste + delivered (D'Aubuisson efficiency, closed form).
    const q = 0.01 / 240;
    const Q = 0.01 / 30 + q;
    expect(res.json.result.measuredEfficiency).toBeCloseTo((q * 11) / (Q * 2), 12);
    expect(res.json.result.efficiencyRatioToPlan).toBeCloseTo(
      res.json.result.measuredEfficiency / res.json.result.plannedEfficiency,
      12,
    );
    expect(await models().RamCommissioningReading.count({ where: { ramSiteId: site.id } })).toBe(1);
  });

  const bad: [string, Record<string, unknown>, string][] = [
    ['negative beats', { beatsPerMinute: -5 }, 'beatsPerMinute'],
    ['no delivery head and no gauge pressure', { deliveryHeadM: null }, 'deliveryHeadM'],
    ['a bucket with no seconds', { deliveredBucketSeconds: null }, 'deliveredBucketSeconds'],
    [
      'a delivered flow at least the drive flow',
      { driveMeasure: 'drive', driveBucketSeconds: 500 },
      'deliveredFlowM3s',
    ],
    ['an impossible date', { measuredOn: '2026-02-30' }, 'measuredOn'],
  ];
  it.each(bad)('refuses %s with a 400 and writes nothing', async (_what, patch, field) => {
    const site = await createRamSiteFixture(f.projectId, f.users.owner.id);
    const res = await postReading(site.id, { ...commissioningBody(), ...patch });
    expect(res.status).toBe(400);
    expect(Object.keys(res.json.error.fields)).toContain(field);
    expect(await models().RamCommissioningReading.count({ where: { ramSiteId: site.id } })).toBe(0);
  });
});

describe('GET lift', () => {
  it('gives a viewer the plan and the commissioning comparison', async () => {
    const fixture = await createTeamFixture();
    const site = await createRamSiteFixture(fixture.projectId, fixture.users.owner.id);
    await call(commissioningRoute.POST, {
      method: 'POST',
      path: 'x',
      params: { projectId: fixture.projectId, siteId: site.id },
      body: commissioningBody(),
      userId: fixture.users.owner.id,
    });
    const res = await call(liftRoute.GET, {
      method: 'GET',
      path: 'x',
      params: { projectId: fixture.projectId },
      userId: fixture.users.reviewer.id,
    });
    expect(res.status).toBe(200);
    const [view] = res.json.lift.ramSites;
    expect(view.plan.ok).toBe(true);
    expect(view.plan.value.caution).toMatch(/local codes/);
    expect(view.commissioning[0].result.value.measuredEfficiency).toBeGreaterThan(0.5);
  });
});
