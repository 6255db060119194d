import { beforeAll, describe, expect, it } from 'vitest';
import * as lineRoute from '@/app/api/lines/[lineId]/route';
import * as analysisRoute from '@/app/api/lines/[lineId]/analysis/route';
import * as siteContextRoute from '@/app/api/lines/[lineId]/site-context/route';
import * as projectRoute from '@/app/api/projects/[projectId]/route';
import * as projectLines from '@/app/api/projects/[projectId]/lines/route';
import * as ramSiteRoute from '@/app/api/projects/[projectId]/ram-sites/[siteId]/route';
import * as generateTasks from '@/app/api/projects/[projectId]/seasonal-tasks/generate/route';
import { models } from '@/models';
import { call, createTeamFixture } from '../support/api';
import { createRamSiteFixture, ramSiteBody } from '../support/lift-fixtures';

type Fixture = Awaited<ReturnType<typeof createTeamFixture>>;

/** The fixture line (400 m, ground 240 m to 200 m, pipe 0 m deep) fed by a ram site instead of its source. */
const ramDesign = (ramSiteId: string, overrides: Record<string, unknown> = {}) => ({
  start: { kind: 'ram-site', ramSiteId },
  end: { kind: 'tank-inlet', elevationM: 200 },
  flow: { kind: 'pump-delivery' },
  stretches: [{ fromM: 0, toM: 400, pipe: 'pe100-iso4427-sdr11-50mm' }],
  ...overrides,
});

describe('a delivery line fed by a ram site', () => {
  let f: Fixture;
  let other: Fixture;
  let ramSiteId: string;
  let foreignRamSiteId: string;
  beforeAll(async () => {
    f = await createTeamFixture();
    other = await createTeamFixture();
    ramSiteId = (await createRamSiteFixture(f.projectId, f.users.owner.id)).id;
    foreignRamSiteId = (await createRamSiteFixture(other.projectId, other.users.owner.id)).id;
  });

  const patch = (body: unknown) =>
    call(lineRoute.PATCH, {
      method: 'PATCH',
      path: '/api/x',
      params: { lineId: f.lineId },
      body,
      userId: f.users.designer.id,
    });
  const analyse = async () =>
    (
      await call(analysisRoute.POST, {
        method: 'POST',
        path: '/api/x',
        params: { lineId: f.lineId },
        userId: f.users.reviewer.id,
      })
    ).json.analysis;
  const siteContext = async () =>
    (
      await call(siteContextRoute.GET, {
        method: 'GET',
        path: '/api/x',
        params: { lineId: f.lineId },
        userId: f.users.reviewer.id,
      })
    ).json;
  const putRam = (body: unknown) =>
    call(ramSiteRoute.PUT, {
      method: 'PUT',
      path: '/api/x',
      params: { projectId: f.projectId, siteId: ramSiteId },
      body,
      userId: f.users.designer.id,
    });

  it("lists the project's planned ram sites and its frost depth for the line", async () => {
    const context = await siteContext();
    expect(context.frostDepthM).toBeNull();
    expect(context.ramOutlets.map((o: { ramSiteId: string }) => o.ramSiteId)).toEqual([ramSiteId]);
  });

  it('starts the line at the ram: outlet grade = pump elevation + working head, flow = what the ram delivers', async () => {
    expect((await putRam({ ...ramSiteBody(), pumpElevationM: 236.5 })).status).toBe(200);
    const res = await patch({ design: ramDesign(ramSiteId) });
    expect(res.status).toBe(200);
    expect(res.json.line.design.start).toEqual({ kind: 'ram-site', ramSiteId });
    const [outlet] = (await siteContext()).ramOutlets;
    expect(outlet.pumpElevationM).toBe(236.5);
    const analysis = await analyse();
    expect(analysis.points.hydraulicGradeM[0]).toBeCloseTo(236.5 + outlet.workingHeadM, 9);
    expect(analysis.points.staticHeadM[0]).toBeCloseTo(236.5 + outlet.peakHeadAtPumpM, 9);
    expect(analysis.flowM3s).toBeCloseTo(outlet.deliveredFlowM3s, 15);
  });

  it('takes a change to the ram site at the next analysis, without saving the line again', async () => {
    const before = await analyse();
    const revision = (await models().Line.findByPk(f.lineId))!.revision;
    expect((await putRam({ ...ramSiteBody(), liftM: 14, pumpElevationM: 236.5 })).status).toBe(200);
    const after = await analyse();
    expect(after.points.hydraulicGradeM[0]).toBeGreaterThan(before.points.hydraulicGradeM[0] + 3);
    expect(after.flowM3s).toBeLessThan(before.flowM3s);
    expect((await models().Line.findByPk(f.lineId))!.revision).toBe(revision);
  });

  it('refuses a ram site of another project with a 404 naming the field, and writes nothing', async () => {
    const before = (await models().Line.findByPk(f.lineId))!;
    const res = await patch({ design: ramDesign(foreignRamSiteId) });
    expect(res.status).toBe(404);
    expect(Object.keys(res.json.error.fields)).toEqual(['design.start.ramSiteId']);
    const after = (await models().Line.findByPk(f.lineId))!;
    expect(after.revision).toBe(before.revision);
    expect(after.startCondition).toEqual({ kind: 'ram-site', ramSiteId });
  });

  it("refuses a new line fed by another project's ram site, and creates nothing", async () => {
    const count = await models().Line.count({ where: { projectId: f.projectId } });
    const res = await call(projectLines.POST, {
      method: 'POST',
      path: '/api/x',
      params: { projectId: f.projectId },
      userId: f.users.designer.id,
      body: { name: 'Borrowed ram', routeId: f.lineRouteId, design: ramDesign(foreignRamSiteId) },
    });
    expect(res.status).toBe(404);
    expect(res.json.error.fields).toHaveProperty(['design.start.ramSiteId']);
    expect(await models().Line.count({ where: { projectId: f.projectId } })).toBe(count);
  });

  it("refuses the ram's flow on a line not fed by a ram (400 on flow.kind)", async () => {
    const res = await patch({ design: ramDesign(ramSiteId, { start: { kind: 'water-level', levelM: 241 } }) });
    expect(res.status).toBe(400);
    expect(Object.keys(res.json.error.fields)).toContain('design.flow.kind');
  });
});

describe('winter treatment per line, into the seasonal tasks', () => {
  let f: Fixture;
  beforeAll(async () => {
    f = await createTeamFixture();
  });
  const patchProject = (body: unknown) =>
    call(projectRoute.PATCH, {
      method: 'PATCH',
      path: '/api/x',
      params: { projectId: f.projectId },
      body,
      userId: f.users.owner.id,
    });

  it("keeps the project's frost depth, refusing a negative one", async () => {
    const bad = await patchProject({ frostDepthM: -0.2 });
    expect(bad.status).toBe(400);
    expect(bad.json.error.fields).toHaveProperty('frostDepthM');
    expect((await models().Project.findByPk(f.projectId))!.frostDepthM).toBeNull();
    expect((await patchProject({ frostDepthM: 0.9 })).status).toBe(200);
  });

  it('saves a drained line and lists its drain points by chainage in the drain-down task', async () => {
    // Give the fixture route a sag (ground 240, 231, 220, 228, 200 m at 100 m spacing): its one low point is at ch. 200
    // m.
    const { RoutePoint } = models();
    await RoutePoint.update({ elevationM: 220, rawElevationM: 220 }, { where: { routeId: f.lineRouteId, seq: 2 } });
    await RoutePoint.update({ elevationM: 228, rawElevationM: 228 }, { where: { routeId: f.lineRouteId, seq: 3 } });
    const line = (await models().Line.findByPk(f.lineId))!;
    const res = await call(lineRoute.PATCH, {
      method: 'PATCH',
      path: '/api/x',
      params: { lineId: f.lineId },
      userId: f.users.designer.id,
      body: {
        design: {
          start: line.startCondition,
          end: line.endCondition,
          flow: line.flow,
          stretches: line.stretches,
          settings: { defaultCoverM: 0.5 },
          winter: { treatment: 'drained-for-winter' },
        },
      },
    });
    expect(res.status).toBe(200);
    expect(res.json.line.design.winter).toEqual({ treatment: 'drained-for-winter' });
    const tasks = await call(generateTasks.POST, {
      method: 'POST',
      path: '/api/x',
      params: { projectId: f.projectId },
      userId: f.users.designer.id,
      body: { year: 2027, hemisphere: 'north', firstFrost: '10-15', lastFrost: '04-20' },
    });
    expect(tasks.status).toBe(201);
    const drainDown = tasks.json.tasks.find((t: { kind: string }) => t.kind === 'drain-down');
    expect(drainDown.detail).toContain('Fixture line');
    expect(drainDown.detail).toContain('ch. 200.0 m (low point)');
  });

  it('rejects an unknown winter treatment with a 400 naming it', async () => {
    const line = (await models().Line.findByPk(f.lineId))!;
    const res = await call(lineRoute.PATCH, {
      method: 'PATCH',
      path: '/api/x',
      params: { lineId: f.lineId },
      userId: f.users.designer.id,
      body: {
        design: {
          start: line.startCondition,
          end: line.endCondition,
          flow: line.flow,
          stretches: line.stretches,
          winter: { treatment: 'heated' },
        },
      },
    });
    expect(res.status).toBe(400);
    expect(Object.keys(res.json.error.fields)).toContain('design.winter.treatment');
  });
});
