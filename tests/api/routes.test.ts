import { createHash } from 'node:crypto';
import { beforeAll, describe, expect, it } from 'vitest';
import * as listRoute from '@/app/api/projects/[projectId]/routes/route';
import * as routeRoute from '@/app/api/routes/[routeId]/route';
import * as pointsRoute from '@/app/api/routes/[routeId]/points/route';
import * as cleanupRoute from '@/app/api/routes/[routeId]/cleanup/route';
import * as reverseRoute from '@/app/api/routes/[routeId]/reverse/route';
import * as splitRoute from '@/app/api/routes/[routeId]/split/route';
import * as trimRoute from '@/app/api/routes/[routeId]/trim/route';
import * as joinRoute from '@/app/api/routes/[routeId]/join/route';
import * as sourceRoute from '@/app/api/routes/[routeId]/source/route';
import { getObject } from '@/lib/storage';
import { models } from '@/models';
import { call, createTeamFixture } from '../support/api';
import { GPS_OPTIONS, fixtureText, gpsTrackCsv, importFile, readRoute } from '../support/route-calls';

type Fixture = Awaited<ReturnType<typeof createTeamFixture>>;
let f: Fixture;
let surveyor: string;

beforeAll(async () => {
  f = await createTeamFixture();
  surveyor = f.users.surveyor.id;
});

const post = (handler: typeof reverseRoute.POST, routeId: string, body?: unknown, userId = surveyor) =>
  call(handler, { method: 'POST', path: `/api/routes/${routeId}/x`, params: { routeId }, body, userId });
const putPoints = (routeId: string, body: unknown, userId = surveyor) =>
  call(pointsRoute.PUT, { method: 'PUT', path: `/api/routes/${routeId}/points`, params: { routeId }, body, userId });
const asInput = (p: any) => ({
  sourceSeq: p.seq,
  latitude: p.latitude,
  longitude: p.longitude,
  chainageM: p.chainageM,
  elevationM: p.elevationM,
  label: p.label,
  heightSource: p.heightSource,
  confidenceM: p.confidenceM,
  excluded: p.excluded,
});

describe('importing survey files', () => {
  it('imports a GPX track: segments joined, waypoints snapped as features, original kept byte for byte', async () => {
    const text = fixtureText('walked-route.gpx');
    const res = await importFile(surveyor, f.projectId, 'walked-route.gpx', text, {
      format: 'gpx',
      name: 'Alder Spring to Long Meadow',
    });
    expect(res.status).toBe(201);
    expect(res.json.route).toMatchObject({
      name: 'Alder Spring to Long Meadow',
      sourceFormat: 'gpx',
      sourceFile: { fileName: 'walked-route.gpx', contentType: 'application/gpx+xml' },
    });
    const detail = await readRoute(f.users.reviewer.id, res.json.route.id);
    expect(detail.points.length).toBe(res.json.route.pointCount);
    expect(detail.points[0]).toMatchObject({
      seq: 0,
      chainageM: 0,
      elevationM: 812.4,
      rawElevationM: 812.4,
      heightSource: 'gps',
      excluded: false,
    });
    const chainages = detail.points.map((p: any) => p.chainageM);
    expect(chainages).toEqual([...chainages].sort((a, b) => a - b));
    expect(detail.route.lengthM).toBeCloseTo(chainages[chainages.length - 1], 6);
    expect(detail.route.slopeLengthM).toBeGreaterThan(detail.route.lengthM);
    expect(detail.route.features.map((x: any) => x.label)).toEqual(['Alder Spring box', 'Gully crossing']);
    expect(detail.route.importNotes.map((n: any) => n.code)).toContain('gpx-segments-joined');
    // Vertical ≤ 15 m (95 %): U.S. DoD, GPS SPS Performance Standard, 2020 ed. §3.4 (core.md §6.4 [R28]).
    expect(detail.gpsWarning).toMatchObject({ severity: 'danger', verticalErrorM: 15 });

    const file = await models().Attachment.findOne({ where: { fileName: 'walked-route.gpx', projectId: f.projectId } });
    expect(file!.sha256).toBe(createHash('sha256').update(text).digest('hex'));
    const stored = await getObject(file!.storageKey);
    expect(new TextDecoder().decode(stored!.bytes)).toBe(text);
    const download = await call(sourceRoute.GET, {
      method: 'GET',
      path: 'x',
      params: { routeId: res.json.route.id },
      userId: f.users.reviewer.id,
    });
    expect(download.status).toBe(200);
    expect(download.text).toBe(text);
    expect(download.headers.get('content-disposition')).toContain('filename="walked-route.gpx"');
  });

  it('imports a semicolon CSV with decimal commas and heights in feet, converting to metres', async () => {
    const res = await importFile(surveyor, f.projectId, 'handheld.csv', fixtureText('handheld-semicolon.csv'), {
      format: 'gps-csv',
      name: 'Handheld walk',
      elevationUnit: 'ft',
      mapping: { latitude: 0, longitude: 1, elevation: 2, time: 3, name: null, accuracy: null },
    });
    expect(res.status).toBe(201);
    const detail = await readRoute(surveyor, res.json.route.id);
    // 2665.4 ft × 0.3048 m/ft = 812.41392 m (international foot, exact by the 1959 international yard and pound
    // agreement)
    expect(detail.points[0].elevationM).toBeCloseTo(812.41392, 5);
    expect(detail.points[0].latitude).toBeCloseTo(45.5012, 6);
  });

  it('imports a level book with its closure and an inclinometer traverse with reduced heights', async () => {
    const level = await importFile(surveyor, f.projectId, 'level-book.csv', fixtureText('level-book.csv'), {
      format: 'level-book-csv',
      name: 'Levelled line',
      startElevationM: 40,
      closingElevationM: 42.88,
    });
    expect(level.status).toBe(201);
    const lv = await readRoute(surveyor, level.json.route.id);
    // Arithmetic check of the book: last RL = 40 + ΣBS − ΣFS = 40 + 16.624 − 13.741 = 42.883 m; closing mark 42.880 m.
    expect(lv.route.closureErrorM).toBeCloseTo(42.883 - 42.88, 6);
    expect(lv.points.map((p: any) => p.heightSource)).toEqual(Array(8).fill('level'));
    expect(lv.gpsWarning).toBeNull();
    const incl = await importFile(surveyor, f.projectId, 'clino.csv', fixtureText('inclinometer.csv'), {
      format: 'inclinometer-csv',
      name: 'Clinometer walk',
      startElevationM: 812.4,
      startLabel: 'Alder Spring intake',
    });
    expect(incl.status).toBe(201);
    const ic = await readRoute(surveyor, incl.json.route.id);
    // First leg: 30 m at −4.5°: horizontal 30·cos 4.5° = 29.9075 m, drop 30·sin 4.5° = 2.3538 m (closed form).
    expect(ic.points[1].chainageM).toBeCloseTo(29.9075, 3);
    expect(ic.points[1].elevationM).toBeCloseTo(812.4 - 2.3538, 3);
  });
});

describe('clean-up proposals', () => {
  let routeId: string;
  beforeAll(async () => {
    const res = await importFile(surveyor, f.projectId, 'spiky.csv', gpsTrackCsv(30, { 10: 18, 20: -14 }), {
      ...GPS_OPTIONS,
      name: 'Spiky walk',
    });
    expect(res.status).toBe(201);
    routeId = res.json.route.id;
  });

  it('finds both spikes and proposes putting them back on the grade', async () => {
    const detail = await readRoute(surveyor, routeId);
    const spikes = detail.proposals.filter((p: any) => p.kind === 'grade-spike');
    expect(spikes.map((p: any) => p.index)).toEqual([10, 20]);
    expect(spikes[0]).toMatchObject({ field: 'elevationM', from: 400 - 8 + 18 });
    expect(spikes[0].to).toBeCloseTo(400 - 8, 1);
  });

  it('accepting fixes the cleaned height, keeps the raw one, and the proposal is gone', async () => {
    const before = await readRoute(surveyor, routeId);
    const spike = before.proposals.find((p: any) => p.index === 10);
    const res = await post(cleanupRoute.POST, routeId, { accept: [spike] });
    expect(res.status).toBe(200);
    // The answer is the route's view (header, thinned profile, proposals), never its points.
    expect(res.json.points).toBeUndefined();
    expect(res.json.proposals.map((p: any) => p.index)).not.toContain(10);
    const after = await readRoute(surveyor, routeId);
    expect(after.points[10].elevationM).toBeCloseTo(spike.to, 9);
    expect(after.points[10].rawElevationM).toBeCloseTo(410, 9);
    const again = await post(cleanupRoute.POST, routeId, { accept: [spike] });
    expect(again.status).toBe(409);
    expect(again.json.error.message).toMatch(/point 11: the height changed/);
  });

  it('rejecting remembers the decision and never changes a height', async () => {
    const before = await readRoute(surveyor, routeId);
    const spike = before.proposals.find((p: any) => p.index === 20);
    const res = await post(cleanupRoute.POST, routeId, { reject: [spike] });
    expect(res.status).toBe(200);
    expect(res.json.proposals.filter((p: any) => p.index === 20)).toEqual([]);
    const after = await readRoute(surveyor, routeId);
    expect(after.points[20].elevationM).toBe(before.points[20].elevationM);
    expect(after.points[20].dismissedChecks).toEqual(['grade-spike', 'median-outlier']);
  });

  it('a reviewer may not decide (403) and nothing changes', async () => {
    const before = await readRoute(surveyor, routeId);
    const res = await post(
      cleanupRoute.POST,
      routeId,
      { reject: [{ kind: 'smoothing', index: 1, field: 'elevationM', from: 1, to: 2 }] },
      f.users.reviewer.id,
    );
    expect(res.status).toBe(403);
    expect((await readRoute(surveyor, routeId)).route.updatedAt).toBe(before.route.updatedAt);
  });

  it('an accepted deletion leaves the point in the table but out of the cleaned length', async () => {
    const before = await readRoute(surveyor, routeId);
    const res = await post(cleanupRoute.POST, routeId, {
      accept: [{ kind: 'duplicate', index: 29, field: 'deleted', from: false, to: true }],
    });
    expect(res.status).toBe(200);
    const after = await readRoute(surveyor, routeId);
    expect(after.points).toHaveLength(30);
    expect(after.points[29]).toMatchObject({ excluded: true, rawElevationM: before.points[29].rawElevationM });
    expect(res.json.route.lengthM).toBeCloseTo(before.points[28].chainageM, 6);
    // The view's cleaned profile stops where the kept points do; the raw one still reaches the excluded point.
    expect(res.json.profile.cleaned.at(-1).chainageM).toBe(after.points[28].chainageM);
    expect(res.json.profile.raw.at(-1).chainageM).toBe(after.points[29].chainageM);
  });
});

describe('editing points', () => {
  it('saves a reordered, edited route whole: raw heights kept, chainage re-measured', async () => {
    const imported = await importFile(surveyor, f.projectId, 'edit.csv', gpsTrackCsv(6), {
      ...GPS_OPTIONS,
      name: 'Edit me',
    });
    const detail = await readRoute(surveyor, imported.json.route.id);
    const pts = detail.points.map(asInput);
    pts[2] = { ...pts[2], elevationM: 350, label: 'Old sheepfold' };
    pts.splice(4, 1); // delete the fifth point
    const res = await putPoints(detail.route.id, { points: pts, baseUpdatedAt: detail.route.updatedAt });
    expect(res.status).toBe(200);
    const saved = (await readRoute(surveyor, detail.route.id)).points;
    expect(saved).toHaveLength(5);
    expect(saved[2]).toMatchObject({
      elevationM: 350,
      rawElevationM: detail.points[2].rawElevationM,
      label: 'Old sheepfold',
    });
    expect(saved[4].rawElevationM).toBe(detail.points[5].rawElevationM);
    expect(saved[4].chainageM).toBeCloseTo(detail.points[5].chainageM, 6);
    const stale = await putPoints(detail.route.id, { points: pts, baseUpdatedAt: detail.route.updatedAt });
    expect(stale.status).toBe(409);
  });

  it('a sketched route: created empty, points typed by chainage, backwards chainage refused with the point named', async () => {
    const created = await call(listRoute.POST, {
      method: 'POST',
      path: 'x',
      params: { projectId: f.projectId },
      body: { name: 'Sketch to the trough' },
      userId: surveyor,
    });
    expect(created.status).toBe(201);
    const id = created.json.route.id;
    const p = (c: number, z: number) => ({
      sourceSeq: null,
      latitude: null,
      longitude: null,
      chainageM: c,
      elevationM: z,
      label: null,
      heightSource: 'map',
      confidenceM: 10,
      excluded: false,
    });
    const bad = await putPoints(id, { points: [p(0, 300), p(120, 290), p(80, 285)] });
    expect(bad.status).toBe(400);
    expect(bad.json.error.message).toBe(
      'point 3: chainage 80.00 m is less than 120.00 m at point 2; points must run in order along the route',
    );
    expect((await readRoute(surveyor, id)).points).toEqual([]);
    const awkward = 'Gate "B", {north} \\ NULL';
    const ok = await putPoints(id, { points: [p(0, 300), { ...p(80, 285), label: awkward }, p(120, 290)] });
    expect(ok.status).toBe(200);
    expect((await readRoute(surveyor, id)).points.map((x: any) => x.label)).toEqual([null, awkward, null]);
    expect(ok.json.route).toMatchObject({ pointCount: 3, lengthM: 120, sourceFormat: 'sketch' });
    expect(ok.json.route.slopeLengthM).toBeCloseTo(Math.hypot(80, 15) + Math.hypot(40, 5), 9);
    const list = await call(listRoute.GET, {
      method: 'GET',
      path: 'x',
      params: { projectId: f.projectId },
      userId: f.users.reviewer.id,
    });
    expect(list.json.routes.map((r: any) => r.name)).toContain('Sketch to the trough');
  });

  it('refuses a malformed point with the field named', async () => {
    const res = await putPoints(f.routeId, {
      points: [
        {
          sourceSeq: null,
          latitude: 91,
          longitude: 0,
          chainageM: null,
          elevationM: 1,
          label: null,
          heightSource: 'gps',
          confidenceM: null,
          excluded: false,
        },
      ],
    });
    expect(res.status).toBe(400);
    expect(res.json.error.fields['points.0.latitude']).toEqual(['Point 1: latitude must be at most 90 degrees']);
  });
});

describe('reverse, split, trim and join', () => {
  const stationRoute = async (name: string) => {
    const res = await importFile(
      surveyor,
      f.projectId,
      `${name}.csv`,
      'chainage,elevation\n0,100\n50,95\n100,92\n150,90\n',
      {
        format: 'station-csv',
        name,
        chainageUnit: 'm',
        elevationUnit: 'm',
        mapping: { chainage: 0, elevation: 1, name: null },
      },
    );
    return res.json.route.id as string;
  };

  it('reverses a route: same length, heights in the other order', async () => {
    const id = await stationRoute('To reverse');
    const res = await post(reverseRoute.POST, id);
    expect(res.status).toBe(200);
    expect(res.json.profile.cleaned.map((p: any) => [p.chainageM, p.elevationM])).toEqual([
      [0, 90],
      [50, 92],
      [100, 95],
      [150, 100],
    ]);
    expect(res.json.route.lengthM).toBe(150);
  });

  it('splits at a chainage into two routes sharing the split station (interpolated)', async () => {
    const id = await stationRoute('To split');
    const res = await post(splitRoute.POST, id, { chainageM: 75, secondName: 'Lower part' });
    expect(res.status).toBe(201);
    expect(res.json.first).toMatchObject({ lengthM: 75, pointCount: 3 });
    expect(res.json.second).toMatchObject({ name: 'Lower part', lengthM: 75, pointCount: 3, sourceFormat: 'split' });
    const second = await readRoute(surveyor, res.json.second.id);
    expect(second.points[0]).toMatchObject({ chainageM: 0, elevationM: 93.5, rawElevationM: 93.5 });
    const outside = await post(splitRoute.POST, id, { chainageM: 500 });
    expect(outside.status).toBe(400);
    expect(outside.json.error.message).toMatch(/the split must fall inside the route \(0 m to 75 m\), got 500 m/);
    // Both parts came from one file: deleting one keeps it for the other.
    await call(routeRoute.DELETE, { method: 'DELETE', path: 'x', params: { routeId: id }, userId: surveyor });
    const download = await call(sourceRoute.GET, {
      method: 'GET',
      path: 'x',
      params: { routeId: res.json.second.id },
      userId: surveyor,
    });
    expect(download.status).toBe(200);
  });

  it('trims to a chainage range, restarting at zero', async () => {
    const id = await stationRoute('To trim');
    const res = await post(trimRoute.POST, id, { fromChainageM: 25, toChainageM: 100 });
    expect(res.status).toBe(200);
    expect((await readRoute(surveyor, id)).points.map((p: any) => [p.chainageM, p.elevationM])).toEqual([
      [0, 97.5],
      [25, 95],
      [75, 92],
    ]);
  });

  it('joins two routes end to start into a new route, leaving both as they were', async () => {
    const a = await stationRoute('Intake to ram');
    const b = await stationRoute('Ram to tank');
    const res = await post(joinRoute.POST, a, { otherRouteId: b, gapM: 10 });
    expect(res.status).toBe(201);
    expect(res.json.route).toMatchObject({
      name: 'Intake to ram + Ram to tank',
      lengthM: 310,
      pointCount: 8,
      sourceFormat: 'joined',
    });
    expect((await readRoute(surveyor, a)).route.lengthM).toBe(150);
    const foreign = await post(joinRoute.POST, a, { otherRouteId: (await createTeamFixture()).routeId });
    expect(foreign.status).toBe(404);
  });

  it('deleting a route removes its points, its file row and the stored object', async () => {
    const id = await stationRoute('To delete');
    const file = await models().Attachment.findOne({ where: { fileName: 'To delete.csv' } });
    const res = await call(routeRoute.DELETE, {
      method: 'DELETE',
      path: 'x',
      params: { routeId: id },
      userId: f.users.designer.id,
    });
    expect(res.status).toBe(204);
    expect(await models().RoutePoint.count({ where: { routeId: id } })).toBe(0);
    expect(await models().Attachment.findByPk(file!.id)).toBeNull();
    expect(await getObject(file!.storageKey)).toBeNull();
  });
});
