import { beforeAll, describe, expect, it } from 'vitest';
import * as pointsRoute from '@/app/api/routes/[routeId]/points/route';
import * as proposalsRoute from '@/app/api/routes/[routeId]/proposals/route';
import * as viewRoute from '@/app/api/routes/[routeId]/view/route';
import { getRouteView } from '@/lib/data/routes';
import { forgetRouteViews, sharedRouteView } from '@/lib/data/route-view-cache';
import { smoothingProposals } from '@/lib/routes/proposals';
import { ROUTE_PROFILE_POINTS } from '@/lib/routes/profile-series';
import { call, createTeamFixture } from '../support/api';
import { GPS_OPTIONS, gpsTrackCsv, importFile, readRoute } from '../support/route-calls';

type Fixture = Awaited<ReturnType<typeof createTeamFixture>>;
let f: Fixture;
let surveyor: string;
/** A walked route long enough to be thinned: 3,000 fixes (one a second) with two spikes. */
let walkId: string;
const WALK = 3000;

beforeAll(async () => {
  f = await createTeamFixture();
  surveyor = f.users.surveyor.id;
  const res = await importFile(surveyor, f.projectId, 'long.csv', gpsTrackCsv(WALK, { 900: 25, 2400: -20 }), {
    ...GPS_OPTIONS,
    name: 'Long walk',
  });
  expect(res.status).toBe(201);
  walkId = res.json.route.id;
}, 60_000);

const get = (handler: typeof viewRoute.GET, routeId: string, query = '', userId = surveyor) =>
  call(handler, { method: 'GET', path: `/api/routes/${routeId}/x${query}`, params: { routeId }, userId });
const putPoints = (routeId: string, body: unknown) =>
  call(pointsRoute.PUT, {
    method: 'PUT',
    path: `/api/routes/${routeId}/points`,
    params: { routeId },
    body,
    userId: surveyor,
  });
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

describe('the route view: what the page draws, never the points', () => {
  it('thins both profiles on the server, keeps the ends and the spikes, and agrees with the whole route', async () => {
    const whole = await readRoute(surveyor, walkId);
    const res = await get(viewRoute.GET, walkId);
    expect(res.status).toBe(200);
    expect(res.json.points).toBeUndefined();
    const { raw, cleaned } = res.json.profile;
    expect(cleaned.length).toBeGreaterThan(100);
    expect(cleaned.length).toBeLessThan(WALK * 0.6);
    expect(raw.length).toBeLessThan(WALK * 0.6);
    expect(cleaned[0].chainageM).toBe(whole.points[0].chainageM);
    expect(cleaned.at(-1).chainageM).toBe(whole.points[WALK - 1].chainageM);
    // The spikes stand far out of the 4 m scatter, so the thinning keeps them.
    for (const seq of [900, 2400])
      expect(
        raw.some(
          (p: any) => p.chainageM === whole.points[seq].chainageM && p.elevationM === whole.points[seq].rawElevationM,
        ),
      ).toBe(true);
    const heights = whole.points.map((p: any) => p.elevationM);
    expect(res.json.heightRangeM).toEqual({ lowM: Math.min(...heights), highM: Math.max(...heights) });
    expect(res.json.proposals).toEqual(whole.proposals);
    expect(res.json.proposalPlaces.map((p: any) => p.chainageM)).toEqual(
      whole.proposals.map((p: any) => whole.points[p.index].chainageM),
    );
    expect(res.json.positioned).toBe(true);
    expect(res.json.plan.length).toBe(cleaned.length);
    // Smaller than the whole route's answer even at 3,000 points (at 100,000: about 300 kB, see route-read-100k).
    expect(res.text.length).toBeLessThan(JSON.stringify(whole).length);
    const coarse = await get(viewRoute.GET, walkId, '?profilePoints=100');
    expect(coarse.text.length).toBeLessThan(JSON.stringify(whole).length / 5);
  });

  it('takes ?profilePoints and refuses a bad one with the option named', async () => {
    const fine = await get(viewRoute.GET, walkId, '?profilePoints=200');
    expect(fine.status).toBe(200);
    const standard = await get(viewRoute.GET, walkId);
    expect(fine.json.profile.raw.length).toBeLessThan(standard.json.profile.raw.length);
    expect(standard.json.profile.raw.length).toBeGreaterThanOrEqual(Math.min(WALK, ROUTE_PROFILE_POINTS));
    for (const q of ['?profilePoints=10', '?profilePoints=abc', '?profilePoints=', '?pointz=100']) {
      const bad = await get(viewRoute.GET, walkId, q);
      expect(bad.status, q).toBe(400);
    }
    const bad = await get(viewRoute.GET, walkId, '?profilePoints=10');
    expect(bad.json.error.fields.profilePoints).toEqual(['profilePoints must be at least 50']);
  });
});

describe('pages of rows', () => {
  it('gives the rows by place along the route, with the total and the version they were read at', async () => {
    const whole = await readRoute(surveyor, walkId);
    const res = await get(pointsRoute.GET, walkId, '?offset=1950&limit=100');
    expect(res.status).toBe(200);
    expect(res.json.total).toBe(WALK);
    expect(res.json.offset).toBe(1950);
    expect(res.json.updatedAt).toBe(whole.route.updatedAt);
    expect(res.json.points).toEqual(whole.points.slice(1950, 2050));
    const first = await get(pointsRoute.GET, walkId);
    expect(first.json.points).toEqual(whole.points.slice(0, 50));
    const past = await get(pointsRoute.GET, walkId, `?offset=${WALK + 10}`);
    expect(past.json.points).toEqual([]);
  });

  it('refuses pages too large or not whole numbers, saying which option', async () => {
    const big = await get(pointsRoute.GET, walkId, '?limit=5000');
    expect(big.status).toBe(400);
    expect(big.json.error.fields.limit).toEqual(['limit must be at most 500']);
    const neg = await get(pointsRoute.GET, walkId, '?offset=-1');
    expect(neg.status).toBe(400);
    expect(neg.json.error.fields.offset).toEqual(['offset must be a whole number']);
    expect((await get(pointsRoute.GET, walkId, '?offset=1.5')).status).toBe(400);
  });
});

describe('clean-up proposed on request', () => {
  it('proposes smoothing over the stored route as the whole-route rule does, with each place', async () => {
    const whole = await readRoute(surveyor, walkId);
    const res = await get(proposalsRoute.GET, walkId, '?smoothingWindow=5');
    expect(res.status).toBe(200);
    const expected = smoothingProposals(whole.points, 5);
    expect(expected.length).toBeGreaterThan(0);
    expect(res.json.proposals).toEqual(expected);
    expect(res.json.places[0].chainageM).toBe(whole.points[expected[0].index].chainageM);
  });

  it('proposes a benchmark offset and refuses a bad request in words', async () => {
    const whole = await readRoute(surveyor, walkId);
    const res = await get(proposalsRoute.GET, walkId, '?benchmarkPoint=3&benchmarkElevationM=410.5');
    expect(res.status).toBe(200);
    const shift = 410.5 - whole.points[2].elevationM;
    expect(res.json.proposals[0].to - res.json.proposals[0].from).toBeCloseTo(shift, 9);
    const even = await get(proposalsRoute.GET, walkId, '?smoothingWindow=4');
    expect(even.status).toBe(400);
    const neither = await get(proposalsRoute.GET, walkId, '?benchmarkPoint=3');
    expect(neither.status).toBe(400);
    expect(neither.json.error.fields.benchmarkElevationM).toEqual(['Give benchmarkElevationM with benchmarkPoint']);
    const both = await get(proposalsRoute.GET, walkId, '?smoothingWindow=5&benchmarkPoint=3&benchmarkElevationM=400');
    expect(both.json.error.fields.smoothingWindow).toEqual(['Ask for smoothing or for a benchmark offset, not both']);
    // No option: the import's smoothing window.
    expect((await get(proposalsRoute.GET, walkId)).json.proposals).toEqual(smoothingProposals(whole.points, 5));
  });
});

describe('saving one page of rows', () => {
  it('replaces only the rows of the page: the rest of the route as stored, raw heights kept, the view of the new version', async () => {
    const made = await importFile(surveyor, f.projectId, 'paged.csv', gpsTrackCsv(300), {
      ...GPS_OPTIONS,
      name: 'Paged edit',
    });
    const id = made.json.route.id;
    const before = await readRoute(surveyor, id);
    const viewBefore = await get(viewRoute.GET, id);
    const page = await get(pointsRoute.GET, id, '?offset=100&limit=50');
    const rows = page.json.points.map(asInput);
    rows[10] = { ...rows[10], elevationM: 999, label: 'Trough' };
    rows.splice(20, 1); // delete seq 120
    const res = await putPoints(id, {
      points: rows,
      baseUpdatedAt: page.json.updatedAt,
      window: { fromSeq: 100, toSeq: 150 },
    });
    expect(res.status).toBe(200);
    expect(res.json.points).toBeUndefined();
    const after = await readRoute(surveyor, id);
    expect(after.points).toHaveLength(299);
    expect(after.points.slice(0, 100).map((p: any) => [p.elevationM, p.rawElevationM])).toEqual(
      before.points.slice(0, 100).map((p: any) => [p.elevationM, p.rawElevationM]),
    );
    expect(after.points[110]).toMatchObject({
      elevationM: 999,
      rawElevationM: before.points[110].rawElevationM,
      label: 'Trough',
    });
    expect(after.points[120].rawElevationM).toBe(before.points[121].rawElevationM);
    expect(after.points.slice(149).map((p: any) => p.rawElevationM)).toEqual(
      before.points.slice(150).map((p: any) => p.rawElevationM),
    );
    // The view answered (and any later read) is of the new version, not the one kept before.
    expect(res.json.route.updatedAt).toBe(after.route.updatedAt);
    expect(res.json.route.updatedAt).not.toBe(viewBefore.json.route.updatedAt);
    expect(res.json.heightRangeM.highM).toBe(999);
    expect((await get(viewRoute.GET, id)).json.heightRangeM.highM).toBe(999);
  });

  it('refuses a row from outside the page and a page past the end, writing nothing', async () => {
    const made = await importFile(surveyor, f.projectId, 'paged2.csv', gpsTrackCsv(60), {
      ...GPS_OPTIONS,
      name: 'Paged refusals',
    });
    const id = made.json.route.id;
    const before = await readRoute(surveyor, id);
    const rows = before.points.slice(0, 10).map(asInput);
    const outside = await putPoints(id, { points: rows, window: { fromSeq: 5, toSeq: 15 } });
    expect(outside.status).toBe(400);
    expect(outside.json.error.message).toMatch(/refers to a point outside the edited rows \(1\)/);
    const past = await putPoints(id, { points: rows, window: { fromSeq: 0, toSeq: 70 } });
    expect(past.status).toBe(400);
    expect(past.json.error.fields['window.toSeq']).toEqual(['must be at most 60']);
    const backwards = await putPoints(id, { points: rows, window: { fromSeq: 10, toSeq: 5 } });
    expect(backwards.status).toBe(400);
    expect((await readRoute(surveyor, id)).route.updatedAt).toBe(before.route.updatedAt);
  });
});

describe('the view kept per saved version', () => {
  it('answers a later read from the kept view, and a save is never answered with the older one', async () => {
    forgetRouteViews();
    const first = await getRouteView(walkId);
    expect(await getRouteView(walkId)).toBe(first);
    const made = await importFile(surveyor, f.projectId, 'kept.csv', gpsTrackCsv(80), {
      ...GPS_OPTIONS,
      name: 'Kept view',
    });
    const id = made.json.route.id;
    const before = await getRouteView(id);
    const page = await get(pointsRoute.GET, id, '?offset=0&limit=10');
    const rows = page.json.points.map(asInput);
    rows[3] = { ...rows[3], elevationM: 777 };
    expect(
      (await putPoints(id, { points: rows, baseUpdatedAt: page.json.updatedAt, window: { fromSeq: 0, toSeq: 10 } }))
        .status,
    ).toBe(200);
    const after = await getRouteView(id);
    expect(after).not.toBe(before);
    expect(after!.heightRangeM!.highM).toBe(777);
    expect(before!.heightRangeM!.highM).toBeLessThan(777);
  });

  it('works one version out once when two reads (the import warm-up and the first visit) ask at once', async () => {
    let computed = 0;
    const compute = async () => {
      computed += 1;
      await new Promise((resolve) => setTimeout(resolve, 20));
      return null;
    };
    await Promise.all([sharedRouteView('r-1', 'v1', compute), sharedRouteView('r-1', 'v1', compute)]);
    expect(computed).toBe(1);
    await sharedRouteView('r-1', 'v2', compute);
    expect(computed).toBe(2);
  });
});
