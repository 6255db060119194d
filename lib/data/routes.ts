import 'server-only';
import { Transaction } from 'sequelize';
import { models } from '../../models';
import { teamOfProjectRow } from './projects';
import type { Attachment } from '../../models/attachment';
import type { Route } from '../../models/route';
import { routeGpsWarning } from '../routes/gps-warning';
import { benchmarkProposals, detectRouteProposals, smoothingProposals } from '../routes/proposals';
import { proposalPlacesOf, routeViewOf } from '../routes/route-view';
import type { RouteDetail, RoutePointsPage, RouteProposalsAnswer, RouteSummary, RouteView } from '../routes/types';
import type { RouteProposalsQuery } from '../validations/routes';
import { log } from '../log';
import { keepRouteView, routeViewVersion, sharedRouteView } from './route-view-cache';
import { loadCheckedPoints, loadRoutePoints, loadRoutePointsPage } from './route-points-store';

export function toRouteSummary(r: Route, file: Attachment | null | undefined): RouteSummary {
  return {
    id: r.id,
    projectId: r.projectId,
    name: r.name,
    notes: r.notes,
    sourceFormat: r.sourceFormat ?? null,
    pointCount: r.pointCount,
    lengthM: r.lengthM,
    slopeLengthM: r.slopeLengthM,
    sourceFile: file ? { fileName: file.fileName, contentType: file.contentType, sizeBytes: file.sizeBytes } : null,
    createdAt: r.createdAt.toISOString(),
    updatedAt: r.updatedAt.toISOString(),
  };
}

const withFile = () => [{ model: models().Attachment, as: 'sourceAttachment' }];
const fileOf = (r: Route) => (r as Route & { sourceAttachment?: Attachment | null }).sourceAttachment;

export async function listRoutes(projectId: string): Promise<RouteSummary[]> {
  const rows = await models().Route.findAll({
    where: { projectId },
    include: withFile(),
    order: [
      ['createdAt', 'ASC'],
      ['name', 'ASC'],
    ],
  });
  return rows.map((r) => toRouteSummary(r, fileOf(r)));
}

export async function getRouteSummary(routeId: string): Promise<RouteSummary | null> {
  const r = await models().Route.findByPk(routeId, { include: withFile() });
  return r ? toRouteSummary(r, fileOf(r)) : null;
}

/** A route with its points, what the clean-up checks propose, and the consumer-GPS warning. */
export async function getRouteDetail(routeId: string): Promise<RouteDetail | null> {
  const r = await models().Route.findByPk(routeId, { include: withFile() });
  if (!r) return null;
  const points = await loadRoutePoints(routeId);
  return {
    route: {
      ...toRouteSummary(r, fileOf(r)),
      features: r.features,
      importNotes: r.importNotes,
      closureErrorM: r.closureErrorM ?? null,
    },
    points,
    proposals: detectRouteProposals(points),
    gpsWarning: routeGpsWarning(points),
  };
}

/** One snapshot of the database for a read of several statements, so they all see the same save. */
const snapshot = <T>(read: (transaction: Transaction) => Promise<T>) =>
  models().sequelize.transaction(
    { isolationLevel: Transaction.ISOLATION_LEVELS.REPEATABLE_READ, readOnly: true },
    read,
  );

/**
 * What the route page draws above its table (header, thinned profile, plan, proposals): never the
 * points. Worked out from the points once per saved version and kept (`route-view-cache.ts`).
 */
export async function getRouteView(routeId: string, profilePoints?: number): Promise<RouteView | null> {
  const current = await models().Route.findByPk(routeId, { attributes: ['updatedAt'] });
  if (!current) return null;
  return sharedRouteView(routeId, routeViewVersion(current.updatedAt, profilePoints), async () => {
    const read = await snapshot(async (transaction) => {
      const r = await models().Route.findByPk(routeId, { include: withFile(), transaction });
      return r ? { r, points: await loadCheckedPoints(routeId, transaction) } : null;
    });
    if (!read) return null;
    const { r, points } = read;
    const route = {
      ...toRouteSummary(r, fileOf(r)),
      features: r.features,
      importNotes: r.importNotes,
      closureErrorM: r.closureErrorM ?? null,
    };
    const view = routeViewOf(
      { route, proposals: detectRouteProposals(points), gpsWarning: routeGpsWarning(points) },
      points,
      profilePoints,
    );
    keepRouteView(routeId, routeViewVersion(r.updatedAt, profilePoints), view);
    return view;
  });
}

/**
 * Works a new route's view out after its import has answered, so the route page the import leads
 * to opens warm on this instance; a failure only means that first visit works it out itself.
 */
export function warmRouteView(routeId: string): void {
  getRouteView(routeId).catch((err: unknown) =>
    log().warn({ err }, 'working out a new route view ahead of its first visit'),
  );
}

/** A page of the route's rows by seq (an offset past the end gives an empty page). */
export async function getRoutePointsPage(routeId: string, offset: number, limit: number): Promise<RoutePointsPage> {
  return snapshot(async (transaction) => {
    const route = await models().Route.findByPk(routeId, { attributes: ['pointCount', 'updatedAt'], transaction });
    const points = await loadRoutePointsPage(routeId, offset, limit, transaction);
    return { total: route?.pointCount ?? 0, offset, updatedAt: route?.updatedAt.toISOString() ?? '', points };
  });
}

/** Smoothing or a benchmark offset proposed over the stored route, with where each proposal sits. */
export async function routeProposals(routeId: string, query: RouteProposalsQuery): Promise<RouteProposalsAnswer> {
  const points = await loadCheckedPoints(routeId);
  const proposals =
    'smoothingWindow' in query
      ? smoothingProposals(points, query.smoothingWindow)
      : benchmarkProposals(points, query.benchmarkPoint - 1, query.benchmarkElevationM);
  return { proposals, places: proposalPlacesOf(points, proposals) };
}

export async function teamOfRoute(routeId: string): Promise<string | null> {
  return teamOfProjectRow('routes', routeId);
}

/** The original uploaded file of a route, for download. */
export async function sourceFileOf(routeId: string): Promise<Attachment | null> {
  const r = await models().Route.findByPk(routeId, { include: withFile() });
  return r ? (fileOf(r) ?? null) : null;
}
