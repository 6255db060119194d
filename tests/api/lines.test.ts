import { beforeAll, describe, expect, it } from 'vitest';
import * as lineRoute from '@/app/api/lines/[lineId]/route';
import * as analysisRoute from '@/app/api/lines/[lineId]/analysis/route';
import * as stationsRoute from '@/app/api/lines/[lineId]/stations/route';
import * as duplicateRoute from '@/app/api/lines/[lineId]/duplicate/route';
import { copyNameOf } from '@/lib/data/lines';
import * as projectLines from '@/app/api/projects/[projectId]/lines/route';
import { models } from '@/models';
import { call, createTeamFixture } from '../support/api';

type Fixture = Awaited<ReturnType<typeof createTeamFixture>>;

const designOf = (overrides: Record<string, unknown> = {}) => ({
  start: { kind: 'water-level', levelM: 241 },
  end: { kind: 'outlet', elevationM: 200, residualHeadM: 5 },
  flow: { kind: 'design', flowM3s: 0.001 },
  stretches: [
    { fromM: 0, toM: 150, pipe: 'pe100-iso4427-sdr11-63mm' },
    { fromM: 150, toM: 400, pipe: 'pe100-iso4427-sdr11-50mm' },
  ],
  devices: [{ kind: 'washout', chainageM: 390 }],
  settings: { frictionMethod: 'darcy-weisbach', waterTemperatureC: 12 },
  ...overrides,
});

describe('lines API', () => {
  let f: Fixture;
  beforeAll(async () => {
    f = await createTeamFixture();
  });

  const create = (body: unknown, userId = f.users.designer.id) =>
    call(projectLines.POST, { method: 'POST', path: '/api/x', params: { projectId: f.projectId }, body, userId });
  const patch = (lineId: string, body: unknown, userId = f.users.designer.id) =>
    call(lineRoute.PATCH, { method: 'PATCH', path: '/api/x', params: { lineId }, body, userId });
  const read = (lineId: string, userId = f.users.reviewer.id) =>
    call(lineRoute.GET, { method: 'GET', path: '/api/x', params: { lineId }, userId });

  it('creates a line with a starting design drawn up from the route', async () => {
    const res = await create({ name: '  Tank to trough  ', routeId: f.lineRouteId });
    expect(res.status).toBe(201);
    const line = res.json.line;
    expect(line).toMatchObject({
      name: 'Tank to trough',
      routeId: f.lineRouteId,
      routeName: 'Fixture route',
      revision: 1,
      preparedBy: 'Fixture designer',
    });
    // Source at the first station's ground (240 m), outlet at the last (200 m), one stretch end to end.
    expect(line.design.start).toEqual({ kind: 'water-level', levelM: 240 });
    expect(line.design.end).toEqual({ kind: 'outlet', elevationM: 200 });
    expect(line.design.stretches).toEqual([{ fromM: 0, toM: 400, pipe: 'pe100-iso4427-sdr11-50mm' }]);
    expect(line.design.flow).toEqual({ kind: 'find' });
  });

  it('creates a line on a chainage window with its own design and reads it back', async () => {
    const design = designOf({ stretches: [{ fromM: 100, toM: 300, pipe: 'pe100-iso4427-sdr11-50mm' }], devices: [] });
    const res = await create({
      name: 'Middle part',
      routeId: f.lineRouteId,
      fromChainageM: 100,
      toChainageM: 300,
      design,
    });
    expect(res.status).toBe(201);
    const back = await read(res.json.line.id);
    expect(back.status).toBe(200);
    expect(back.json.line).toMatchObject({
      fromChainageM: 100,
      toChainageM: 300,
      design: { stretches: design.stretches, fittings: [], pipes: [] },
    });
    const stations = await call(stationsRoute.GET, {
      method: 'GET',
      path: '/api/x',
      params: { lineId: res.json.line.id },
      userId: f.users.reviewer.id,
    });
    expect(stations.json.stations.map((s: { chainageM: number }) => s.chainageM)).toEqual([100, 200, 300]);
    expect(stations.json.stations[0]).toMatchObject({ groundElevationM: 231, latitudeDeg: expect.any(Number) });
  });

  it('refuses a design whose stretches leave a gap, naming the field', async () => {
    const design = designOf({
      stretches: [
        { fromM: 0, toM: 150, pipe: 'pe100-iso4427-sdr11-63mm' },
        { fromM: 160, toM: 400, pipe: 'pe100-iso4427-sdr11-50mm' },
      ],
    });
    const res = await create({ name: 'Gappy', routeId: f.lineRouteId, design });
    expect(res.status).toBe(400);
    expect(res.json.error.fields).toHaveProperty(['design.stretches.fromM.1']);
    expect(res.json.error.message).toMatch(/gap of 10 m/);
  });

  it('refuses shapes zod can see: unknown pipe kind, negative flow, unknown fields, a device off the line', async () => {
    const bad = await create({
      name: 'Bad',
      routeId: f.lineRouteId,
      design: designOf({ flow: { kind: 'design', flowM3s: -1 } }),
      colour: 'red',
    });
    expect(bad.status).toBe(400);
    // Worded as the screen names the field, the bound in the project's flow unit.
    expect(bad.json.error.fields['design.flow.flowM3s']).toEqual(['Design flow must be at least 0 L/s']);
    expect(bad.json.error.fields.colour).toEqual(['Unknown field "colour"']);
    const off = await create({
      name: 'Off',
      routeId: f.lineRouteId,
      design: designOf({ devices: [{ kind: 'washout', chainageM: 900 }] }),
    });
    expect(off.status).toBe(400);
    // Named as on screen, never by the core's internal path.
    expect(off.json.error.fields['design.devices.chainageM.0'][0]).toBe(
      'Device 1: chainage: ch. 900.0 m lies outside the line (ch. 0.0 m to 400.0 m)',
    );
    expect(off.json.error.message).not.toMatch(/devices\.chainageM/);
    const unknownPipe = await create({
      name: 'Pipe',
      routeId: f.lineRouteId,
      design: designOf({ stretches: [{ fromM: 0, toM: 400, pipe: 'copper-99mm' }] }),
    });
    expect(unknownPipe.status).toBe(400);
    expect(unknownPipe.json.error.fields['design.stretches.pipe.0'][0]).toMatch(/unknown pipe id "copper-99mm"/);
  });

  it('checks a custom pipe with the catalogue guard and accepts a sound one', async () => {
    const pipe = {
      id: 'old-barn-pipe',
      label: 'Old barn pipe 40 mm',
      material: 'pe',
      nominalSize: '40 mm',
      outsideDiameterM: 0.04,
      insideDiameterM: 0.034,
      wallM: 0.003,
      pressureRatingPa: 6e5,
      hazenWilliamsC: 140,
      roughnessM: 7e-6,
      waveSpeedMs: 300,
      source: 'measured on site',
    };
    const wrong = await create({
      name: 'Custom',
      routeId: f.lineRouteId,
      design: designOf({
        pipes: [{ ...pipe, insideDiameterM: 0.05 }],
        stretches: [{ fromM: 0, toM: 400, pipe: 'old-barn-pipe' }],
      }),
    });
    expect(wrong.status).toBe(400);
    expect(wrong.json.error.fields['design.pipes.0.insideDiameterM'][0]).toBe(
      'Custom pipe 1: inside diameter must be less than the outside diameter',
    );
    const ok = await create({
      name: 'Custom',
      routeId: f.lineRouteId,
      design: designOf({ pipes: [pipe], stretches: [{ fromM: 0, toM: 400, pipe: 'old-barn-pipe' }] }),
    });
    expect(ok.status).toBe(201);
    const analysis = await call(analysisRoute.POST, {
      method: 'POST',
      path: '/api/x',
      params: { lineId: ok.json.line.id },
      userId: f.users.reviewer.id,
    });
    expect(analysis.status).toBe(200);
    expect(analysis.json.analysis.stretches[0].pipe.id).toBe('old-barn-pipe');
  });

  it('refuses a route of another project with the 404 of a missing one', async () => {
    const other = await createTeamFixture();
    const res = await create({ name: 'Borrowed', routeId: other.lineRouteId });
    expect(res.status).toBe(404);
    expect(res.json.error.fields.routeId).toEqual(['Pick a route of this project']);
  });

  it('updates the design, counts revisions and refuses a stale editor with 409', async () => {
    const made = await create({ name: 'Revised', routeId: f.lineRouteId, design: designOf() });
    const id = made.json.line.id;
    const first = await patch(id, { design: designOf({ devices: [] }), baseRevision: 1 });
    expect(first.status).toBe(200);
    expect(first.json.line).toMatchObject({ revision: 2, design: { devices: [] } });
    const stale = await patch(id, { notes: 'late', baseRevision: 1 });
    expect(stale.status).toBe(409);
    expect(stale.json.error.code).toBe('conflict');
    // The same designer in another tab is told it was their own save, not someone else's.
    expect(stale.json.error.message).toMatch(/^You saved revision 2 of this line in another tab or window/);
    const colleague = await patch(id, { notes: 'late', baseRevision: 1 }, f.users.owner.id);
    expect(colleague.json.error.message).toMatch(/^Someone else saved revision 2 /);
    expect((await read(id)).json.line).toMatchObject({ revision: 2, notes: '' });
  });

  it('an update that no longer fits the line is refused and changes nothing', async () => {
    const made = await create({ name: 'Window', routeId: f.lineRouteId, design: designOf() });
    const res = await patch(made.json.line.id, { toChainageM: 300, fromChainageM: 0 });
    expect(res.status).toBe(400);
    expect(res.json.error.message).toMatch(/the last stretch runs past the end of the line/);
    const row = await models().Line.findByPk(made.json.line.id);
    expect(row).toMatchObject({ toChainageM: null, revision: 1 });
  });

  it('keeps the working copy from viewers (clients see approved revisions only) and lets them change nothing', async () => {
    const viewer = f.users.viewer.id;
    expect((await patch(f.lineId, { name: 'Taken over' }, viewer)).status).toBe(403);
    expect((await create({ name: 'Mine', routeId: f.lineRouteId }, viewer)).status).toBe(403);
    const del = await call(lineRoute.DELETE, {
      method: 'DELETE',
      path: '/api/x',
      params: { lineId: f.lineId },
      userId: viewer,
    });
    expect(del.status).toBe(403);
    const list = await call(projectLines.GET, {
      method: 'GET',
      path: '/api/x',
      params: { projectId: f.projectId },
      userId: viewer,
    });
    expect(list.status).toBe(403);
    expect((await read(f.lineId, viewer)).status).toBe(403);
    const reviewerList = await call(projectLines.GET, {
      method: 'GET',
      path: '/api/x',
      params: { projectId: f.projectId },
      userId: f.users.reviewer.id,
    });
    expect(reviewerList.json.lines.map((l: { name: string }) => l.name)).toContain('Fixture line');
    const outsider = await read(f.lineId, f.users.outsider.id);
    expect(outsider.status).toBe(404);
  });

  it('deleting a line removes its link and the end nodes only it joined, nothing else of the network', async () => {
    const res = await create({ name: 'Short-lived line', routeId: f.lineRouteId });
    expect(res.status).toBe(201);
    const lineId = res.json.line.id as string;
    const { sequelize } = models();
    const nodesOf = async () =>
      (
        (
          await sequelize.query('SELECT id FROM network_nodes WHERE project_id = :p ORDER BY id', {
            replacements: { p: f.projectId },
          })
        )[0] as { id: string }[]
      ).map((n) => n.id);
    const [ends] = await sequelize.query(
      'SELECT from_node_id AS a, to_node_id AS b FROM network_links WHERE line_id = :lineId',
      { replacements: { lineId } },
    );
    expect(ends).toHaveLength(1);
    const { a, b } = (ends as { a: string; b: string }[])[0];
    const before = await nodesOf();
    expect(before).toEqual(expect.arrayContaining([a, b]));
    const del = await call(lineRoute.DELETE, {
      method: 'DELETE',
      path: '/api/x',
      params: { lineId },
      userId: f.users.designer.id,
    });
    expect(del.status).toBe(204);
    expect(
      (await sequelize.query('SELECT 1 FROM network_links WHERE line_id = :lineId', { replacements: { lineId } }))[0],
    ).toHaveLength(0);
    expect(await nodesOf()).toEqual(before.filter((id) => id !== a && id !== b));
  });

  it('duplicates a line on the same route with its stretches, devices and settings, as a new network link', async () => {
    const made = await create({
      name: 'Orchard feed',
      routeId: f.lineRouteId,
      fromChainageM: 0,
      toChainageM: 400,
      design: designOf(),
    });
    const id = made.json.line.id as string;
    const dup = (body: unknown, userId = f.users.designer.id) =>
      call(duplicateRoute.POST, { method: 'POST', path: '/api/x', params: { lineId: id }, body, userId });
    const first = await dup({});
    expect(first.status).toBe(201);
    const copy = first.json.line;
    expect(copy.id).not.toBe(id);
    expect(copy).toMatchObject({
      name: 'Orchard feed (copy)',
      routeId: f.lineRouteId,
      fromChainageM: 0,
      toChainageM: 400,
      revision: 1,
    });
    expect(copy.design).toEqual(made.json.line.design);
    expect((await dup({})).json.line.name).toBe('Orchard feed (copy 2)');
    expect((await dup({ name: '  Orchard feed, PN 16  ' })).json.line.name).toBe('Orchard feed, PN 16');
    const { sequelize } = models();
    const [links] = await sequelize.query(
      'SELECT from_node_id AS a, to_node_id AS b FROM network_links WHERE line_id IN (:ids)',
      { replacements: { ids: [id, copy.id] } },
    );
    expect(links).toHaveLength(2);
    // Editing the copy leaves the original as it was.
    await patch(copy.id, { design: designOf({ devices: [] }), baseRevision: 1 });
    expect((await read(id)).json.line.design.devices).toEqual([{ kind: 'washout', chainageM: 390 }]);
    expect((await dup({}, f.users.surveyor.id)).status).toBe(403);
    expect((await dup({ name: '' })).status).toBe(400);
  });

  it('names copies after the first free "(copy n)"', () => {
    expect(copyNameOf('Spring line', new Set())).toBe('Spring line (copy)');
    expect(copyNameOf('Spring line (copy)', new Set(['Spring line (copy)']))).toBe('Spring line (copy 2)');
    expect(copyNameOf('Spring line', new Set(['Spring line (copy)', 'Spring line (copy 2)']))).toBe(
      'Spring line (copy 3)',
    );
  });

  it('analyses the saved line with the engineering core', async () => {
    const res = await call(analysisRoute.POST, {
      method: 'POST',
      path: '/api/x',
      params: { lineId: f.lineId },
      userId: f.users.reviewer.id,
    });
    expect(res.status).toBe(200);
    const a = res.json.analysis;
    expect(a.flowM3s).toBe(0.001);
    expect(a.points.chainageM[0]).toBe(0);
    expect(a.points.chainageM.at(-1)).toBe(400);
    // Energy balance of the core: start level minus end grade = friction + fittings (no tanks here).
    expect(241 - a.end.hydraulicGradeM).toBeCloseTo(a.totals.frictionLossM + a.totals.minorLossM, 9);
  });
});

describe('demo lines (seeded scenario)', () => {
  it('the PN 8 layout shows its over-pressure and siphon stretch; the PN 16 option has no danger or warning', async () => {
    const { Line } = models();
    const demo = await Line.findAll({ where: { projectId: '6f1c1e52-3a57-4c38-9b0e-0d5b1c7a2001' } });
    if (demo.length === 0) return; // a database without the demo scenario
    const designer = await models().User.findOne({ where: { email: 'designer@example.test' } });
    const analyse = async (name: string) => {
      const line = demo.find((l) => l.name === name)!;
      return (
        await call(analysisRoute.POST, {
          method: 'POST',
          path: '/api/x',
          params: { lineId: line.id },
          userId: designer!.id,
        })
      ).json.analysis;
    };
    const pn8 = await analyse('Spring box to house');
    const codes = pn8.warnings.map((w: { code: string }) => w.code);
    expect(codes).toContain('static-over-rating');
    expect(codes).toContain('negative-pressure');
    const pn16 = await analyse('Spring box to house, PN 16 option');
    expect(pn16.warnings.filter((w: { severity: string }) => w.severity !== 'info')).toEqual([]);
  });
});

describe('demo walked route (seeded scenario)', () => {
  it('the phone walk is read no finer than its stated accuracy: a short list, not one item per wiggle', async () => {
    const line = await models().Line.findByPk('6f1c1e52-3a57-4c38-9b0e-0d5b1c7a4601');
    if (!line) return; // a database without the demo scenario
    const designer = await models().User.findOne({ where: { email: 'designer@example.test' } });
    const res = await call(analysisRoute.POST, {
      method: 'POST',
      path: '/api/x',
      params: { lineId: line.id },
      userId: designer!.id,
    });
    expect(res.status).toBe(200);
    const { analysis } = res.json;
    expect(analysis.settings.heightScatterM).toBe(4); // the phone's stated vertical accuracy (lib/demo/ridge-walk.cjs)
    const count = (code: string) => analysis.warnings.filter((w: { code: string }) => w.code === code).length;
    // Worked out from the smooth ground (tests/hydraulics/checks/walked-route.test.ts): 3 summits, 3 sags.
    expect(count('air-release-needed')).toBe(3);
    expect(count('washout-needed')).toBe(3);
    expect(count('siphon-limit')).toBe(1);
    expect(count('static-over-rating')).toBe(1);
    expect(analysis.warnings.length).toBeLessThan(15);
  });
});
