import 'server-only';
import { models } from '../../models';
import { teamOfProjectRow } from './projects';
import type { Attachment } from '../../models/attachment';
import type { Route } from '../../models/route';
import { routeGpsWarning } from '../routes/gps-warning';
import { detectRouteProposals } from '../routes/proposals';
import type { RouteDetail, RouteSummary } from '../routes/types';
import { loadRoutePoints } from './route-points-store';

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
  const rows = await models().Route.findAll({ where: { projectId }, include: withFile(), order: [['createdAt', 'ASC'], ['name', 'ASC']] });
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
    route: { ...toRouteSummary(r, fileOf(r)), features: r.features, importNotes: r.importNotes, closureErrorM: r.closureErrorM ?? null },
    points,
    proposals: detectRouteProposals(points),
    gpsWarning: routeGpsWarning(points),
  };
}

export async function teamOfRoute(routeId: string): Promise<string | null> {
  return teamOfProjectRow('routes', routeId);
}

/** The original uploaded file of a route, for download. */
export async function sourceFileOf(routeId: string): Promise<Attachment | null> {
  const r = await models().Route.findByPk(routeId, { include: withFile() });
  return r ? (fileOf(r) ?? null) : null;
}
