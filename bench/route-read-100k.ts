import { benchSite, walkCsv, WALK_OPTIONS } from './survey-import-100k';
import { medianMs, type Benchmark } from './harness';

const POINTS = 100_000;

/**
 * The first screenful of a 100 000-point route, as the route page's server render reads it: the
 * view (header, both profiles thinned by the one thinning, plan, what the checks propose) and the
 * first page of rows, read at once and written out as the JSON the browser receives. The route is
 * imported once beforehand (a phone walk with metre-level scatter). Target under 300 ms.
 *
 * `median_ms` is the cold read: the view worked out from the points, as the first visit after a
 * save on an instance gets it. `warm_ms` is a later visit (the view kept for that saved version).
 * `bytes` is the size of the two answers (the whole route as one JSON answer runs to tens of megabytes).
 */
export async function routeRead100k(): Promise<Benchmark> {
  const site = await benchSite('route-read-100k');
  const { importSurvey } = await import('../lib/data/route-import');
  const { getRoutePointsPage, getRouteView } = await import('../lib/data/routes');
  const { forgetRouteViews } = await import('../lib/data/route-view-cache');
  const { ROUTE_PAGE_SIZE } = await import('../lib/validations/routes');
  const imported = await importSurvey({
    projectId: site.project.id,
    userId: site.user.id,
    fileName: 'walk-100k.csv',
    contentType: 'text/csv',
    bytes: new TextEncoder().encode(walkCsv(POINTS)),
    options: WALK_OPTIONS,
  });
  const routeId = imported.route.id;
  let bytes = 0;
  const firstScreen = async () => {
    const [view, page] = await Promise.all([getRouteView(routeId), getRoutePointsPage(routeId, 0, ROUTE_PAGE_SIZE)]);
    if (!view || view.route.pointCount !== POINTS || page.points.length !== ROUTE_PAGE_SIZE)
      throw new Error('the route did not read back whole');
    bytes = JSON.stringify(view).length + JSON.stringify(page).length;
    return bytes;
  };
  return {
    name: 'route-read-100k',
    run: () => undefined, // timed by `measure`, cold and warm
    measure: async () => {
      const cold = await medianMs(
        () => {
          forgetRouteViews();
          return firstScreen();
        },
        9,
        2,
      );
      const warm = await medianMs(firstScreen, 9, 2);
      return { median_ms: cold, warm_ms: warm, bytes };
    },
    teardown: site.teardown,
  };
}
