import 'server-only';
import { models } from '../../models';
import type { SurveyFeature } from '../survey/parsed-survey';
import { AppError, notInProject } from '../errors';
import { joinPoints, reversePoints, splitPoints, trimPoints } from '../routes/edit-ops';
import type { RouteSummary, RouteView } from '../routes/types';
import type { JoinRoutesInput, SplitRouteInput, TrimRouteInput } from '../validations/routes';
import { loadRoutePoints } from './route-points-store';
import { getRouteSummary, getRouteView } from './routes';
import { lockRoute, writeRoutePoints } from './route-writes';

/** Features follow their chainage through an edit; those that fall off the route are dropped. */
function moveFeatures(features: readonly SurveyFeature[], map: (chainageM: number) => number | null): SurveyFeature[] {
  return features.flatMap((f) => {
    const c = map(f.chainageM);
    return c === null ? [] : [{ ...f, chainageM: c }];
  });
}

const round = (m: number) => Math.round(m * 10) / 10;

/** The same route walked the other way. */
export async function reverseRouteById(routeId: string): Promise<RouteView> {
  await models().sequelize.transaction(async (transaction) => {
    const route = await lockRoute(routeId, transaction);
    const points = await loadRoutePoints(routeId, transaction);
    const kept = points.filter((p) => !p.excluded);
    const start = kept[0]?.chainageM ?? 0;
    const end = kept[kept.length - 1]?.chainageM ?? 0;
    route.features = moveFeatures(route.features, (c) => start + end - c).sort((a, b) => a.chainageM - b.chainageM);
    await writeRoutePoints(route, reversePoints(points), transaction);
  });
  return (await getRouteView(routeId)) as RouteView;
}

/** Keeps the part between two chainages. */
export async function trimRouteById(routeId: string, input: TrimRouteInput): Promise<RouteView> {
  await models().sequelize.transaction(async (transaction) => {
    const route = await lockRoute(routeId, transaction);
    const points = await loadRoutePoints(routeId, transaction);
    const { fromChainageM: from, toChainageM: to } = input;
    route.features = moveFeatures(route.features, (c) => (c >= from && c <= to ? c - from : null));
    await writeRoutePoints(route, trimPoints(points, from, to), transaction);
  });
  return (await getRouteView(routeId)) as RouteView;
}

/** Splits a route at a chainage: this route keeps the first part, a new route holds the second. */
export async function splitRouteById(
  routeId: string,
  userId: string,
  input: SplitRouteInput,
): Promise<{ first: RouteSummary; second: RouteSummary }> {
  const secondId = await models().sequelize.transaction(async (transaction) => {
    const route = await lockRoute(routeId, transaction);
    const points = await loadRoutePoints(routeId, transaction);
    const c = input.chainageM;
    const parts = splitPoints(points, c);
    const second = await models().Route.create(
      {
        projectId: route.projectId,
        name: input.secondName ?? `${route.name} (from ${round(c)} m)`.slice(0, 120),
        notes: route.notes,
        sourceAttachmentId: route.sourceAttachmentId,
        sourceFormat: 'split',
        createdBy: userId,
        features: moveFeatures(route.features, (f) => (f >= c ? f - c : null)),
      },
      { transaction },
    );
    route.features = moveFeatures(route.features, (f) => (f <= c ? f : null));
    await writeRoutePoints(route, parts.first, transaction);
    await writeRoutePoints(second, parts.second, transaction);
    return second.id;
  });
  return {
    first: (await getRouteSummary(routeId)) as RouteSummary,
    second: (await getRouteSummary(secondId)) as RouteSummary,
  };
}

/** A new route: this one, then the other joined onto its end. Both originals are left as they were. */
export async function joinRoutesById(routeId: string, userId: string, input: JoinRoutesInput): Promise<RouteSummary> {
  const joinedId = await models().sequelize.transaction(async (transaction) => {
    if (input.otherRouteId === routeId)
      throw new AppError('bad_request', 'A route cannot be joined to itself', {
        otherRouteId: ['Choose another route'],
      });
    const first = await lockRoute(routeId, transaction);
    const other = await models().Route.findByPk(input.otherRouteId, { transaction });
    if (!other || other.projectId !== first.projectId) {
      throw notInProject(
        { otherRouteId: ['Choose a route of this project'] },
        'There is no route with that id in this project',
      );
    }
    const a = await loadRoutePoints(first.id, transaction);
    const b = await loadRoutePoints(other.id, transaction);
    const joined = joinPoints(a, b, input.gapM);
    const aKept = a.filter((p) => !p.excluded);
    const bKept = b.filter((p) => !p.excluded);
    const shift = (aKept[aKept.length - 1]?.chainageM ?? 0) + joined.gapM - (bKept[0]?.chainageM ?? 0);
    const route = await models().Route.create(
      {
        projectId: first.projectId,
        name: input.name ?? `${first.name} + ${other.name}`.slice(0, 120),
        createdBy: userId,
        sourceFormat: 'joined',
        features: [...first.features, ...moveFeatures(other.features, (c) => c + shift)],
        importNotes:
          joined.heightStepM !== 0
            ? [
                {
                  code: 'join-height-step',
                  message: `where the routes meet, the second starts ${joined.heightStepM.toFixed(2)} m ${joined.heightStepM > 0 ? 'above' : 'below'} the end of the first; the first route's height was kept`,
                },
              ]
            : [],
      },
      { transaction },
    );
    await writeRoutePoints(route, joined.points, transaction);
    return route.id;
  });
  return (await getRouteSummary(joinedId)) as RouteSummary;
}
