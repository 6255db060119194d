import { readFileSync } from 'node:fs';
import path from 'node:path';
import * as importRoute from '@/app/api/projects/[projectId]/routes/import/route';
import * as routeRoute from '@/app/api/routes/[routeId]/route';
import { models } from '@/models';
import { call } from './api';
import { surveyUpload } from './multipart';

export const fixtureText = (name: string) => readFileSync(path.join(__dirname, '../fixtures/survey', name), 'utf8');

/** Uploads a survey file through the import handler as `userId`. */
export async function importFile(
  userId: string,
  projectId: string,
  fileName: string,
  content: string | Uint8Array,
  options: Record<string, unknown>,
  headers: Record<string, string> = {},
) {
  const upload = surveyUpload(fileName, content, options);
  return call(importRoute.POST, {
    method: 'POST',
    path: `/api/projects/${projectId}/routes/import`,
    params: { projectId },
    rawBody: upload.body,
    headers: { 'content-type': upload.contentType, ...headers },
    userId,
  });
}

export async function readRoute(userId: string, routeId: string) {
  const res = await call(routeRoute.GET, {
    method: 'GET',
    path: `/api/routes/${routeId}`,
    params: { routeId },
    userId,
  });
  if (res.status !== 200) throw new Error(`reading route ${routeId} gave ${res.status}: ${JSON.stringify(res.json)}`);
  return res.json;
}

/** Row counts of the survey tables, to prove a refused import stored nothing. */
export async function surveyTableCounts(): Promise<{ attachments: number; routes: number; routePoints: number }> {
  const { Attachment, Route, RoutePoint } = models();
  return { attachments: await Attachment.count(), routes: await Route.count(), routePoints: await RoutePoint.count() };
}

/** A walked GPS track along a falling slope, 10 m between fixes, with spikes where asked. */
export function gpsTrackCsv(count: number, spikes: Record<number, number> = {}): string {
  const rows = ['lat,lon,ele,time'];
  for (let i = 0; i < count; i += 1) {
    const lat = 54.2 + i * 0.00009; // ≈ 10 m north per fix
    const ele = 400 - i * 0.8 + (spikes[i] ?? 0);
    rows.push(
      `${lat.toFixed(6)},-2.95,${ele.toFixed(2)},2025-06-01T08:${String(Math.floor(i / 60)).padStart(2, '0')}:${String(i % 60).padStart(2, '0')}Z`,
    );
  }
  return `${rows.join('\n')}\n`;
}

export const GPS_OPTIONS = {
  format: 'gps-csv',
  name: 'Walked track',
  elevationUnit: 'm',
  mapping: { latitude: 0, longitude: 1, elevation: 2, time: 3, name: null, accuracy: null },
};
