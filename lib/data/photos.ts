import 'server-only';
import { randomUUID } from 'node:crypto';
import { Op, type Transaction } from 'sequelize';
import { locateOnRoute, type RouteLocation } from '../../hydraulics';
import { models } from '../../models';
import { teamOfProjectRow } from './projects';
import type { SitePhoto, PhotoPlacement } from '../../models/site-photo';
import { AppError, notInProject } from '../errors';
import { log } from '../log';
import { readPhoto } from '../photos/read-photo';
import { projectStoragePrefix, removeStoredFiles } from './project-files';
import { getObject, putObject } from '../storage';
import { enqueueJob } from '../jobs/enqueue';
import { numberPhotos } from '../chart/photo-marks';
import type { UnitSystem } from '../units/index';
import { unitSystemOfProject } from './projects';
import type { ReportPhoto } from '../report/photo-section';

export interface PhotoSummary {
  id: string;
  projectId: string;
  fileName: string;
  width: number;
  height: number;
  takenAt: string | null;
  latitude: number | null;
  longitude: number | null;
  routeId: string | null;
  chainageM: number | null;
  offsetM: number | null;
  placement: PhotoPlacement;
  caption: string;
  inReport: boolean;
  createdAt: string;
}

export const toPhotoSummary = (p: SitePhoto): PhotoSummary => ({
  id: p.id,
  projectId: p.projectId,
  fileName: p.fileName,
  width: p.width,
  height: p.height,
  takenAt: p.takenAt?.toISOString() ?? null,
  latitude: p.latitude,
  longitude: p.longitude,
  routeId: p.routeId,
  chainageM: p.chainageM,
  offsetM: p.offsetM,
  placement: p.placement,
  caption: p.caption,
  inReport: p.inReport,
  createdAt: p.createdAt.toISOString(),
});

export interface PhotoPlacementRequest {
  /** The route to place it on; with a position, the nearest of the project's routes when absent. */
  routeId?: string | null;
  /** A chainage the person picks: used when the photo carries no position. */
  chainageM?: number | null;
}

async function routeOfProject(projectId: string, routeId: string, transaction?: Transaction) {
  const route = await models().Route.findOne({
    where: { id: routeId, projectId },
    attributes: ['id', 'lengthM'],
    transaction,
  });
  if (!route)
    throw notInProject({ routeId: ['Pick a route of this project'] }, 'That route is not one of this project’s');
  return route;
}

/** The nearest point on the named route, or on whichever of the project's routes is nearest. */
async function nearestOnRoutes(
  projectId: string,
  routeId: string | null | undefined,
  position: { latitudeDeg: number; longitudeDeg: number },
) {
  const { Route, RoutePoint } = models();
  const routes = routeId
    ? [await routeOfProject(projectId, routeId)]
    : await Route.findAll({ where: { projectId }, attributes: ['id'] });
  let best: { routeId: string; at: RouteLocation } | null = null;
  for (const route of routes) {
    const points = await RoutePoint.findAll({
      where: { routeId: route.id, excluded: false, latitude: { [Op.ne]: null } },
      attributes: ['chainageM', 'latitude', 'longitude'],
      order: [['seq', 'ASC']],
      raw: true,
    });
    const at = locateOnRoute(
      points.map((p) => ({ chainageM: p.chainageM, latitudeDeg: p.latitude, longitudeDeg: p.longitude })),
      position,
    );
    if (at && (!best || at.offsetM < best.at.offsetM)) best = { routeId: route.id, at };
  }
  return best;
}

async function placementOf(
  projectId: string,
  position: { latitude: number | null; longitude: number | null },
  request: PhotoPlacementRequest,
) {
  // A named route is the project's whatever else is sent: never keep another team's route on a photo.
  if (request.routeId) await routeOfProject(projectId, request.routeId);
  if (position.latitude !== null && position.longitude !== null) {
    const found = await nearestOnRoutes(projectId, request.routeId, {
      latitudeDeg: position.latitude,
      longitudeDeg: position.longitude,
    });
    if (found)
      return {
        routeId: found.routeId,
        chainageM: found.at.chainageM,
        offsetM: found.at.offsetM,
        placement: 'position' as const,
      };
  }
  if (request.routeId && request.chainageM != null) {
    const route = await routeOfProject(projectId, request.routeId);
    if (request.chainageM < 0 || request.chainageM > route.lengthM + 1e-6) {
      throw new AppError('bad_request', `The chainage must lie on the route, 0 to ${route.lengthM.toFixed(1)} m`, {
        chainageM: ['Pick a chainage on the route'],
      });
    }
    return { routeId: request.routeId, chainageM: request.chainageM, offsetM: null, placement: 'picked' as const };
  }
  return { routeId: request.routeId ?? null, chainageM: null, offsetM: null, placement: 'unplaced' as const };
}

/**
 * Stores a site photo: refused before anything is stored when it is not a readable JPEG or PNG;
 * placed on a route from its position (nearest chainage and distance off the line) or at the
 * chainage picked. If the database write fails the stored objects are removed again.
 */
export async function uploadPhoto(
  input: {
    projectId: string;
    userId: string;
    fileName: string;
    bytes: Uint8Array;
    caption: string;
  } & PhotoPlacementRequest,
): Promise<PhotoSummary> {
  const photo = await readPhoto(input.bytes, input.fileName);
  const place = await placementOf(input.projectId, photo, input);
  const folder = `${projectStoragePrefix(input.projectId)}photos/${randomUUID()}`;
  const imageKey = `${folder}/image.${photo.contentType === 'image/png' ? 'png' : 'jpg'}`;
  const thumbnailKey = `${folder}/thumbnail.jpg`;
  const stored: string[] = [];
  try {
    await putObject(imageKey, photo.image, photo.contentType);
    stored.push(imageKey);
    await putObject(thumbnailKey, photo.thumbnail, 'image/jpeg');
    stored.push(thumbnailKey);
    const row = await models().SitePhoto.create({
      projectId: input.projectId,
      fileName: input.fileName.slice(0, 255),
      contentType: photo.contentType,
      sizeBytes: photo.image.byteLength,
      width: photo.width,
      height: photo.height,
      imageKey,
      thumbnailKey,
      takenAt: photo.takenAt,
      latitude: photo.latitude,
      longitude: photo.longitude,
      ...place,
      caption: input.caption,
      uploadedBy: input.userId,
    });
    return toPhotoSummary(row);
  } catch (error) {
    await removeStoredFiles(stored);
    throw error;
  }
}

export async function listPhotos(projectId: string, routeId?: string): Promise<PhotoSummary[]> {
  const rows = await models().SitePhoto.findAll({
    where: { projectId, ...(routeId ? { routeId } : {}) },
    order: [
      ['routeId', 'ASC'],
      ['chainageM', 'ASC'],
      ['createdAt', 'ASC'],
    ],
  });
  return rows.map(toPhotoSummary);
}

export async function teamOfPhoto(photoId: string): Promise<string | null> {
  return teamOfProjectRow('site_photos', photoId);
}

/** The unit system of the photo's project (metric when it is gone), for wording refusals. */
export async function unitSystemOfPhoto(photoId: string): Promise<UnitSystem> {
  const photo = await models().SitePhoto.findByPk(photoId, { attributes: ['projectId'] });
  return photo ? unitSystemOfProject(photo.projectId) : 'metric';
}

export async function photoRow(photoId: string): Promise<SitePhoto> {
  const photo = await models().SitePhoto.findByPk(photoId);
  if (!photo) throw new AppError('not_found', 'No such photo');
  return photo;
}

/** Caption, report choice, or a new place (a route and, for a photo without position, a chainage). */
export async function updatePhoto(
  photoId: string,
  changes: { caption?: string; inReport?: boolean } & PhotoPlacementRequest,
): Promise<PhotoSummary> {
  const photo = await photoRow(photoId);
  if (changes.caption !== undefined) photo.caption = changes.caption;
  if (changes.inReport !== undefined) photo.inReport = changes.inReport;
  if (changes.routeId !== undefined || changes.chainageM !== undefined) {
    Object.assign(
      photo,
      await placementOf(photo.projectId, photo, {
        routeId: changes.routeId ?? photo.routeId,
        chainageM: changes.chainageM ?? null,
      }),
    );
  }
  await photo.save();
  return toPhotoSummary(photo);
}

/**
 * The row goes with its files' removal queued in one transaction; the files are removed now too when the store answers.
 */
export async function deletePhoto(photoId: string): Promise<void> {
  const photo = await photoRow(photoId);
  const keys = [photo.imageKey, photo.thumbnailKey];
  await models().sequelize.transaction(async (transaction) => {
    await photo.destroy({ transaction });
    await enqueueJob(transaction, 'delete-stored-files', { keys });
  });
  await removeStoredFiles(keys, true);
}

/**
 * The photos chosen for a line's report: those on its route inside its chainage window, numbered as
 * every drawing numbers the route's photos, with their stored thumbnails.
 */
export async function reportPhotosForLine(
  routeId: string | null,
  window: { fromM: number; toM: number },
): Promise<ReportPhoto[]> {
  if (!routeId) return [];
  const rows = await models().SitePhoto.findAll({ where: { routeId, chainageM: { [Op.ne]: null } } });
  const byId = new Map(rows.map((r) => [r.id, r]));
  const chosen = numberPhotos(rows.map(toPhotoSummary)).filter(
    (p) => p.source.inReport && p.chainageM >= window.fromM - 1e-6 && p.chainageM <= window.toM + 1e-6,
  );
  return Promise.all(
    chosen.map(async (p) => {
      const row = byId.get(p.id)!;
      const stored = await getObject(row.thumbnailKey).catch((err: unknown) => {
        log().error({ err, key: row.thumbnailKey }, 'could not read a photo thumbnail for a report');
        return null;
      });
      return {
        id: row.id,
        number: p.number,
        chainageM: p.chainageM,
        caption: row.caption,
        fileName: row.fileName,
        takenAt: row.takenAt,
        offsetM: row.offsetM,
        placement: row.placement,
        latitude: row.latitude,
        longitude: row.longitude,
        thumbnail: stored?.bytes ?? null,
      };
    }),
  );
}
