import { beforeAll, describe, expect, it } from 'vitest';
import * as liftRoute from '@/app/api/projects/[projectId]/lift/route';
import * as readingsRoute from '@/app/api/projects/[projectId]/sources/[sourceId]/yield-readings/route';
import * as sourceRoute from '@/app/api/projects/[projectId]/sources/[sourceId]/route';
import * as sourcesRoute from '@/app/api/projects/[projectId]/sources/route';
import * as sitesRoute from '@/app/api/projects/[projectId]/ram-sites/route';
import { models } from '@/models';
import { call, createTeamFixture } from '../support/api';
import {
  createSourceFixture,
  createYieldReadingFixture,
  ramSiteBody,
  sourceBody,
  yieldReadingBody,
} from '../support/lift-fixtures';

type Fixture = Awaited<ReturnType<typeof createTeamFixture>>;
let f: Fixture;
beforeAll(async () => {
  f = await createTeamFixture();
});

const L_PER_MIN = 1e-3 / 60;
const logReading = (projectId: string, sourceId: string, body: unknown, userId: string) =>
  call(readingsRoute.POST, { method: 'POST', path: 'x', params: { projectId, sourceId }, body, userId });
const readingCount = (sourceId: string) => models().YieldReading.count({ where: { sourceId } });

describe('source yield log', () => {
  it('takes the lowest recent dry-season reading as the design yield and warns when the ram draws more', async () => {
    const fixture = await createTeamFixture();
    const created = await call(sourcesRoute.POST, {
      method: 'POST',
      path: 'x',
      params: { projectId: fixture.projectId },
      body: sourceBody(),
      userId: fixture.users.designer.id,
    });
    expect(created.status).toBe(201);
    const sourceId = created.json.source.id;
    // A surveyor logs the field readings: 10 L in 20 s (dry, 30 L/min), 25 L/min direct (dry), 90 L/min (wet).
    const surveyor = fixture.users.surveyor.id;
    for (const body of [
      { measuredOn: '2026-08-14', season: 'dry', bucketVolumeM3: 0.01, bucketSeconds: 20 },
      { measuredOn: '2026-08-28', season: 'dry', flowM3s: 25 * L_PER_MIN },
      { measuredOn: '2026-04-02', season: 'wet', flowM3s: 90 * L_PER_MIN },
    ])
      expect((await logReading(fixture.projectId, sourceId, body, surveyor)).status).toBe(201);
    const ram = { ...ramSiteBody(), sourceId, driveFlowM3s: 30 * L_PER_MIN };
    expect(
      (
        await call(sitesRoute.POST, {
          method: 'POST',
          path: 'x',
          params: { projectId: fixture.projectId },
          body: ram,
          userId: fixture.users.owner.id,
        })
      ).status,
    ).toBe(201);

    const res = await call(liftRoute.GET, {
      method: 'GET',
      path: 'x',
      params: { projectId: fixture.projectId },
      userId: fixture.users.reviewer.id,
    });
    const [view] = res.json.lift.sources;
    expect(view.design.value.basis).toBe('lowest-recent-dry');
    expect(view.design.value.designYieldM3s).toBeCloseTo(25 * L_PER_MIN, 12);
    expect(view.drawM3s).toBeCloseTo(30 * L_PER_MIN, 12);
    expect(view.drawChecks.map((check: { code: string }) => check.code)).toEqual(['draw-exceeds-yield']);
    expect(view.readings.map((reading: { measuredOn: string }) => reading.measuredOn)).toEqual([
      '2026-08-28',
      '2026-08-14',
      '2026-04-02',
    ]);
  });

  const bad: [string, Record<string, unknown>, string][] = [
    ['a bucket and a flow at once', { flowM3s: 0.001 }, 'flowM3s'],
    ['zero seconds', { bucketSeconds: 0 }, 'bucketSeconds'],
    ['a negative volume', { bucketVolumeM3: -0.02 }, 'bucketVolumeM3'],
    ['an impossible date', { measuredOn: '2026-13-01' }, 'measuredOn'],
    ['an unknown season', { season: 'monsoon' }, 'season'],
  ];
  it.each(bad)('refuses a reading with %s (400) and writes nothing', async (_what, patch, field) => {
    const source = await createSourceFixture(f.projectId, f.users.owner.id);
    const res = await logReading(f.projectId, source.id, { ...yieldReadingBody(), ...patch }, f.users.surveyor.id);
    expect(res.status).toBe(400);
    expect(Object.keys(res.json.error.fields)).toContain(field);
    expect(await readingCount(source.id)).toBe(0);
  });

  it('refuses a design reading taken from another source (404 naming the field), keeping the source as it was', async () => {
    const { source } = await createYieldReadingFixture(f.projectId, f.users.owner.id);
    const { reading: foreign } = await createYieldReadingFixture(f.projectId, f.users.owner.id);
    const body = { ...sourceBody(), name: 'Changed', designYieldChoice: 'reading', designReadingId: foreign.id };
    const res = await call(sourceRoute.PUT, {
      method: 'PUT',
      path: 'x',
      params: { projectId: f.projectId, sourceId: source.id },
      body,
      userId: f.users.designer.id,
    });
    expect(res.status).toBe(404);
    expect(res.json.error.fields.designReadingId).toBeDefined();
    expect((await models().WaterSource.findByPk(source.id))?.name).toBe('Fixture creek');
  });

  it('asks for the entered figure when the design yield is to be entered', async () => {
    const res = await call(sourcesRoute.POST, {
      method: 'POST',
      path: 'x',
      params: { projectId: f.projectId },
      body: { ...sourceBody(), designYieldChoice: 'entered' },
      userId: f.users.designer.id,
    });
    expect(res.status).toBe(400);
    expect(res.json.error.fields.enteredYieldM3s).toEqual(['Enter the design yield']);
  });
});
