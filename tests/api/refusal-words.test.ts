import { beforeAll, describe, expect, it } from 'vitest';
import * as lineRoute from '@/app/api/lines/[lineId]/route';
import * as projectLines from '@/app/api/projects/[projectId]/lines/route';
import * as nodes from '@/app/api/projects/[projectId]/network/nodes/route';
import * as tanks from '@/app/api/projects/[projectId]/tanks/route';
import * as demandUses from '@/app/api/projects/[projectId]/demand-uses/route';
import * as takeOffs from '@/app/api/projects/[projectId]/network/take-offs/route';
import * as points from '@/app/api/routes/[routeId]/points/route';
import { models } from '@/models';
import { call, createTeamFixture } from '../support/api';
import { fixtureText, importFile, surveyTableCounts } from '../support/route-calls';

type Fixture = Awaited<ReturnType<typeof createTeamFixture>>;

const design = (settings: Record<string, unknown>) => ({
  start: { kind: 'water-level', levelM: 241 },
  end: { kind: 'outlet', elevationM: 200 },
  flow: { kind: 'design', flowM3s: 0.001 },
  stretches: [{ fromM: 0, toM: 400, pipe: 'pe100-iso4427-sdr11-50mm' }],
  settings,
});

/** A refused line body names the field as the screen does, with its bound in the project's units (1 ft = 0.3048 m). */
describe("refusals of the line endpoints speak the project's units", () => {
  let f: Fixture;
  beforeAll(async () => {
    f = await createTeamFixture();
  });
  const setUnits = (unitSystem: 'us' | 'metric') =>
    models().Project.update({ unitSystem }, { where: { id: f.projectId } });
  const create = (body: unknown) =>
    call(projectLines.POST, {
      method: 'POST',
      path: '/api/x',
      params: { projectId: f.projectId },
      body,
      userId: f.users.designer.id,
    });

  it('a new line with a cover beyond the bound: feet in a US project, metres in a metric one; nothing written', async () => {
    const before = await models().Line.count({ where: { projectId: f.projectId } });
    await setUnits('us');
    const us = await create({ name: 'Deep', routeId: f.lineRouteId, design: design({ defaultCoverM: 20 }) });
    await setUnits('metric');
    const metric = await create({ name: 'Deep', routeId: f.lineRouteId, design: design({ defaultCoverM: 20 }) });
    expect(us.status).toBe(400);
    expect(us.json.error.fields).toEqual({ 'design.settings.defaultCoverM': ['Pipe cover must be at most 32.81 ft'] });
    expect(us.json.error.message).toBe('Some fields are not valid: Pipe cover must be at most 32.81 ft');
    expect(metric.json.error.fields).toEqual({
      'design.settings.defaultCoverM': ['Pipe cover must be at most 10.00 m'],
    });
    expect(await models().Line.count({ where: { projectId: f.projectId } })).toBe(before);
  });

  it("a saved line's update with a device far off: named by its place, chainage in feet", async () => {
    await setUnits('us');
    const made = await create({ name: 'Main', routeId: f.lineRouteId });
    expect(made.status).toBe(201);
    const line = made.json.line;
    const res = await call(lineRoute.PATCH, {
      method: 'PATCH',
      path: '/api/x',
      params: { lineId: line.id },
      userId: f.users.designer.id,
      body: {
        name: line.name,
        notes: '',
        routeId: line.routeId,
        fromChainageM: null,
        toChainageM: null,
        baseRevision: line.revision,
        design: {
          ...line.design,
          devices: [
            { kind: 'valve', chainageM: 10 },
            { kind: 'washout', chainageM: 2e6 },
          ],
        },
      },
    });
    await setUnits('metric');
    expect(res.status).toBe(400);
    // 1,000 km = 3,280,840 ft.
    expect(res.json.error.fields['design.devices.1.chainageM']).toEqual([
      'Device 2: chainage must be at most 3,280,840 ft',
    ]);
    expect(JSON.stringify(res.json.error)).not.toMatch(/\d\.\d{4,}/);
    // A kind the line has no device for: a choice to make, in the names the device list shows.
    expect(res.json.error.fields['design.devices.0.kind']).toEqual([
      'Device 1: choose a kind: break-pressure tank, air-release valve, washout or isolation valve',
    ]);
  });

  it("a tank and a network part under the project: their forms' names, bounds in US units", async () => {
    await setUnits('us');
    const tank = await call(tanks.POST, {
      method: 'POST',
      path: '/api/x',
      params: { projectId: f.projectId },
      userId: f.users.designer.id,
      body: { name: 'Top', volumeM3: -1, supplyHoursPerDay: 30 },
    });
    const node = await call(nodes.POST, {
      method: 'POST',
      path: '/api/x',
      params: { projectId: f.projectId },
      userId: f.users.designer.id,
      body: { kind: 'outlet', name: 'Trough', elevationM: 9500 },
    });
    await setUnits('metric');
    expect(tank.status).toBe(400);
    expect(tank.json.error.fields.volumeM3).toEqual(['Volume must be more than 0 US gal']);
    expect(tank.json.error.fields.supplyHoursPerDay).toEqual(['Supply hours per day must be at most 24 h']);
    expect(node.status).toBe(400);
    expect(node.json.error.fields.elevationM).toEqual(['Elevation must be at most 29,527.56 ft']); // 9,000 m
  });

  it("a daily use and a take-off: the garden's area in square feet, the take-off's chainage in feet; nothing written", async () => {
    await setUnits('us');
    const usesBefore = await models().DemandUse.count({ where: { projectId: f.projectId } });
    const garden = await call(demandUses.POST, {
      method: 'POST',
      path: '/api/x',
      params: { projectId: f.projectId },
      userId: f.users.designer.id,
      body: {
        kind: 'garden',
        areaM2: -5,
        figureId: 'vegetables-inch-per-week',
        deliveryKind: 'delivery-hours',
        deliveryHours: 30,
        startHour: 6,
      },
    });
    const takeOff = await call(takeOffs.POST, {
      method: 'POST',
      path: '/api/x',
      params: { projectId: f.projectId },
      userId: f.users.designer.id,
      body: { lineId: f.lineId, chainageM: 2e6, name: 'Barn branch' },
    });
    await setUnits('metric');
    const metricGarden = await call(demandUses.POST, {
      method: 'POST',
      path: '/api/x',
      params: { projectId: f.projectId },
      userId: f.users.designer.id,
      body: { kind: 'garden', areaM2: -5, figureId: 'vegetables-inch-per-week' },
    });
    expect(garden.status).toBe(400);
    expect(garden.json.error.fields.areaM2).toEqual(['Garden area must be at least 0 ft²']);
    expect(garden.json.error.fields.deliveryHours).toEqual(['Hours of delivery must be at most 24 h']);
    expect(metricGarden.json.error.fields.areaM2).toEqual(['Garden area must be at least 0 m²']);
    expect(takeOff.status).toBe(400);
    expect(takeOff.json.error.fields.chainageM).toEqual(['Chainage must be at most 3,280,840 ft']);
    expect(await models().DemandUse.count({ where: { projectId: f.projectId } })).toBe(usesBefore);
  });

  it('a route save with a height out of range names the point, the bound in feet', async () => {
    await setUnits('us');
    const point = {
      sourceSeq: null,
      latitude: null,
      longitude: null,
      chainageM: 0,
      elevationM: 9500,
      label: null,
      heightSource: 'level',
      confidenceM: null,
      excluded: false,
    };
    const res = await call(points.PUT, {
      method: 'PUT',
      path: '/api/x',
      params: { routeId: f.lineRouteId },
      userId: f.users.designer.id,
      body: { points: [{ ...point, elevationM: 100 }, point] },
    });
    await setUnits('metric');
    expect(res.status).toBe(400);
    expect(res.json.error.fields['points.1.elevationM']).toEqual(['Point 2: elevation must be at most 29,527.56 ft']);
  });

  it('a page of rows saved from the route table names the point by its number in the table', async () => {
    const point = {
      sourceSeq: null,
      latitude: null,
      longitude: null,
      chainageM: 0,
      elevationM: 9500,
      label: null,
      heightSource: 'level',
      confidenceM: null,
      excluded: false,
    };
    // The table's third page starts at point 101 (seq 100); its second row is point 102.
    const res = await call(points.PUT, {
      method: 'PUT',
      path: '/api/x',
      params: { routeId: f.lineRouteId },
      userId: f.users.designer.id,
      body: { points: [{ ...point, elevationM: 100 }, point], window: { fromSeq: 100, toSeq: 102 } },
    });
    expect(res.status).toBe(400);
    expect(res.json.error.fields['points.1.elevationM']).toEqual(['Point 102: elevation must be at most 9,000.00 m']);
    expect(res.json.error.message).toBe('Some fields are not valid: Point 102: elevation must be at most 9,000.00 m');
  });

  it("a use's own figure: named as the form names it for its kind, its unit the project's", async () => {
    const use = (kind: string, ownFigure: unknown) =>
      call(demandUses.POST, {
        method: 'POST',
        path: '/api/x',
        params: { projectId: f.projectId },
        userId: f.users.designer.id,
        body: { kind, count: kind === 'fixed' ? null : 4, areaM2: kind === 'garden' ? 100 : null, ownFigure },
      });
    const usesBefore = await models().DemandUse.count({ where: { projectId: f.projectId } });
    await setUnits('us');
    const people = await use('people', -1);
    const garden = await use('garden', 'lots');
    const fixed = await use('fixed', -3);
    await setUnits('metric');
    const metricPeople = await use('people', -1);
    const metricGarden = await use('garden', 'lots');
    expect(people.status).toBe(400);
    expect(people.json.error.fields.ownFigure).toEqual(['Own figure per person must be at least 0 US gal/day']);
    expect(garden.json.error.fields.ownFigure).toEqual(['Own figure of depth must be a number (in/week)']);
    expect(fixed.json.error.fields.ownFigure).toEqual(['Daily volume must be at least 0 US gal/day']);
    expect(metricPeople.json.error.fields.ownFigure).toEqual(['Own figure per person must be at least 0 L/day']);
    expect(metricGarden.json.error.fields.ownFigure).toEqual(['Own figure of depth must be a number (mm/day)']);
    expect(await models().DemandUse.count({ where: { projectId: f.projectId } })).toBe(usesBefore);
  });

  it("a level book's start height out of range: the import screen's name, the bound in the project's units", async () => {
    const before = await surveyTableCounts();
    const book = (startElevationM: number) =>
      importFile(f.users.surveyor.id, f.projectId, 'book.csv', fixtureText('level-book.csv'), {
        format: 'level-book-csv',
        name: 'Level run',
        startElevationM,
        closingElevationM: -900,
      });
    await setUnits('us');
    const us = await book(12_000);
    const clino = await importFile(f.users.surveyor.id, f.projectId, 'clino.csv', fixtureText('inclinometer.csv'), {
      format: 'inclinometer-csv',
      name: 'Clino walk',
      startElevationM: -600,
    });
    await setUnits('metric');
    const metric = await book(12_000);
    expect(us.status).toBe(400);
    // 9,000 m = 29,527.56 ft; -500 m = -1,640.42 ft.
    expect(us.json.error.fields).toEqual({
      startElevationM: ['Reduced level of the first station must be at most 29,527.56 ft'],
      closingElevationM: ['Known level of the last station must be at least -1,640.42 ft'],
    });
    expect(us.json.error.message).toBe(
      'Some import options are not valid: Reduced level of the first station must be at most 29,527.56 ft',
    );
    expect(clino.json.error.fields.startElevationM).toEqual(['Height of the first mark must be at least -1,640.42 ft']);
    expect(metric.json.error.fields.startElevationM).toEqual([
      'Reduced level of the first station must be at most 9,000.00 m',
    ]);
    expect(await surveyTableCounts()).toEqual(before);
  });
});
