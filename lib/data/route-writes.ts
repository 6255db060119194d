import 'server-only';
import { recordActivity } from '../activity/record';
import type { Transaction } from 'sequelize';
import { models } from '../../models';
import type { Route, RouteSourceFormat } from '../../models/route';
import { AppError, notFound } from '../errors';
import { applyCleanupDecisions } from '../routes/apply-cleanup';
import { recordOf, type PointRecord } from '../routes/edit-ops';
import { RouteEditError } from '../routes/errors';
import { computeRouteGeometry } from '../routes/geometry';
import type { RoutePointView, RouteSummary, RouteView } from '../routes/types';
import { enqueueJob } from '../jobs/enqueue';
import { removeStoredFiles } from './project-files';
import type { CleanupDecision, CreateRouteInput, SavePointsInput, UpdateRouteInput } from '../validations/routes';
import { loadRoutePoints, replaceRoutePoints } from './route-points-store';
import { getRouteSummary, getRouteView, toRouteSummary } from './routes';

/** A point to write; chainage may be missing where positions will give it. */
export type PointDraftRecord = Omit<PointRecord, 'chainageM'> & { chainageM: number | null };

/**
 * Writes a route's points whole: chainage and lengths recomputed from the points, the old
 * points replaced and the route's totals updated, all inside the caller's transaction.
 */
export async function writeRoutePoints(
  route: Route,
  records: readonly PointDraftRecord[],
  transaction: Transaction,
): Promise<void> {
  const geometry = computeRouteGeometry(records);
  await replaceRoutePoints(route.id, geometry.points, transaction);
  route.set({ pointCount: records.length, lengthM: geometry.lengthM, slopeLengthM: geometry.slopeLengthM });
  route.changed('updatedAt', true);
  await route.save({ transaction });
}

/** Locks a route row for the length of a transaction (edits of one route queue, never interleave). */
export async function lockRoute(routeId: string, transaction: Transaction): Promise<Route> {
  const route = await models().Route.findByPk(routeId, { transaction, lock: transaction.LOCK.UPDATE });
  if (!route) throw notFound('Route not found');
  return route;
}

export async function createRoute(
  projectId: string,
  userId: string,
  input: CreateRouteInput,
  sourceFormat: RouteSourceFormat = 'sketch',
): Promise<RouteSummary> {
  const r = await models().Route.create({
    projectId,
    name: input.name,
    notes: input.notes ?? '',
    createdBy: userId,
    sourceFormat,
  });
  return toRouteSummary(r, null);
}

export async function updateRoute(routeId: string, input: UpdateRouteInput): Promise<RouteSummary> {
  await models().Route.update(input, { where: { id: routeId } });
  const summary = await getRouteSummary(routeId);
  if (!summary) throw notFound('Route not found');
  return summary;
}

/** Deletes a route; its original file goes too when no other route (a split part) still uses it. */
export async function deleteRoute(routeId: string): Promise<void> {
  const { Route: R, Attachment, sequelize } = models();
  const orphanKey = await sequelize.transaction(async (transaction) => {
    const route = await lockRoute(routeId, transaction);
    const attachmentId = route.sourceAttachmentId;
    await route.destroy({ transaction });
    if (!attachmentId) return null;
    const stillUsed = await R.count({ where: { sourceAttachmentId: attachmentId }, transaction });
    if (stillUsed > 0) return null;
    const file = await Attachment.findByPk(attachmentId, { transaction });
    await file?.destroy({ transaction });
    // Queued with the delete: the file goes once the rows are gone, even if the store is down now.
    if (file) await enqueueJob(transaction, 'delete-stored-files', { keys: [file.storageKey] });
    return file?.storageKey ?? null;
  });
  if (orphanKey) await removeStoredFiles([orphanKey], true);
}

/**
 * Saves an edited route: whole, or (with `window`) one stretch of its stored points replaced by the
 * edited ones, the rest kept as stored. Raw heights are taken from the stored points, never from the
 * client; chainage and lengths are worked out again for the whole route.
 */
export async function saveRoutePoints(routeId: string, input: SavePointsInput): Promise<RouteView> {
  await models().sequelize.transaction(async (transaction) => {
    const route = await lockRoute(routeId, transaction);
    if (input.baseUpdatedAt && route.updatedAt.toISOString() !== new Date(input.baseUpdatedAt).toISOString()) {
      throw new AppError(
        'conflict',
        'Someone saved this route after you opened it; reload it and make your changes again.',
      );
    }
    const stored = await loadRoutePoints(routeId, transaction);
    const fromSeq = input.window?.fromSeq ?? 0;
    const toSeq = input.window?.toSeq ?? stored.length;
    if (toSeq > stored.length) {
      throw new AppError('bad_request', `The edited rows end at point ${toSeq}, but the route has ${stored.length}`, {
        'window.toSeq': [`must be at most ${stored.length}`],
      });
    }
    const existing = new Map(stored.slice(fromSeq, toSeq).map((p) => [p.seq, p]));
    const used = new Set<number>();
    const edited: PointDraftRecord[] = input.points.map((p, i) => {
      const source = p.sourceSeq === null ? undefined : existing.get(p.sourceSeq);
      if (p.sourceSeq !== null && (!source || used.has(p.sourceSeq))) {
        const why = source
          ? 'a point already used'
          : input.window
            ? 'a point outside the edited rows'
            : 'a point this route does not have';
        throw new RouteEditError('sourceSeq', `refers to ${why} (${p.sourceSeq + 1})`, {
          pointNumber: fromSeq + i + 1,
        });
      }
      if (p.sourceSeq !== null) used.add(p.sourceSeq);
      return {
        latitude: p.latitude,
        longitude: p.longitude,
        chainageM: p.chainageM,
        slopeChainageM: null,
        elevationM: p.elevationM,
        rawElevationM: source ? source.rawElevationM : p.elevationM,
        label: p.label === null || p.label.trim() === '' ? null : p.label.trim(),
        heightSource: p.heightSource,
        confidenceM: p.confidenceM,
        recordedAt: source?.recordedAt ?? null,
        excluded: p.excluded,
        dismissedChecks: source?.dismissedChecks ?? [],
      };
    });
    const kept = (points: readonly RoutePointView[]): PointDraftRecord[] => points.map(recordOf);
    await writeRoutePoints(
      route,
      [...kept(stored.slice(0, fromSeq)), ...edited, ...kept(stored.slice(toSeq))],
      transaction,
    );
  });
  return (await getRouteView(routeId)) as RouteView;
}

/** Accepts and rejects clean-up proposals in one transaction. */
export async function decideCleanup(
  routeId: string,
  input: CleanupDecision,
  actorUserId: string | null = null,
): Promise<RouteView> {
  await models().sequelize.transaction(async (transaction) => {
    const route = await lockRoute(routeId, transaction);
    const points = await loadRoutePoints(routeId, transaction);
    const decided = applyCleanupDecisions(points, input);
    await writeRoutePoints(route, decided.map(recordOf), transaction);
    const accepted = input.accept?.length ?? 0;
    const rejected = input.reject?.length ?? 0;
    await recordActivity(transaction, {
      projectId: route.projectId,
      actorUserId,
      kind: 'route.cleaned',
      subjectType: 'route',
      subjectId: route.id,
      summary: `Clean-up of route "${route.name}": ${accepted} proposal${accepted === 1 ? '' : 's'} accepted, ${rejected} rejected`,
      data: { accepted, rejected },
    });
  });
  return (await getRouteView(routeId)) as RouteView;
}
