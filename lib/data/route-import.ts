import 'server-only';
import { recordActivity } from '../activity/record';
import { randomUUID } from 'node:crypto';
import { models } from '../../models';
import type { RouteSummary } from '../routes/types';
import { projectStoragePrefix, removeStoredFiles } from './project-files';
import { putObject } from '../storage';
import { SurveyImportError, type SurveyImportErrorCode } from '../survey/errors';
import type { SurveyImportWarning } from '../survey/parsed-survey';
import type { SurveyImportOptions } from '../validations/survey-import';
import { runInWorker } from '../workers/pool';
import { insertRouteRows } from './route-points-store';
import { toRouteSummary } from './routes';

const SNIFF_CODES = new Set<SurveyImportErrorCode>(['file-too-large', 'empty-file', 'binary-content', 'not-text']);

/** Notes kept on the route; a file with thousands of duplicates gets a count, not thousands of lines. */
const MAX_STORED_NOTES = 200;

export interface SurveyUpload {
  projectId: string;
  userId: string;
  fileName: string;
  contentType: string;
  bytes: Uint8Array;
  options: SurveyImportOptions;
}

export interface SurveyImportResult {
  route: RouteSummary;
  warnings: SurveyImportWarning[];
}

function storedContentType(fileName: string, declared: string): string {
  if (/\.gpx$/i.test(fileName)) return 'application/gpx+xml';
  if (/\.(csv|txt|tsv)$/i.test(fileName)) return 'text/csv';
  return declared.startsWith('text/') ? declared : 'text/plain';
}

function notesOf(warnings: readonly SurveyImportWarning[]): SurveyImportWarning[] {
  if (warnings.length <= MAX_STORED_NOTES) return [...warnings];
  const rest = warnings.length - MAX_STORED_NOTES + 1;
  return [
    ...warnings.slice(0, MAX_STORED_NOTES - 1),
    { code: 'more-notes', message: `…and ${rest} more notes like these` },
  ];
}

/**
 * Imports an uploaded survey file, all or nothing: the file is checked and parsed before anything
 * is stored; then the original goes to object storage while the attachment, route and points are
 * written in one transaction, which commits only once the object is stored. If either fails, the
 * transaction rolls back and the stored object is removed again.
 */
export async function importSurvey(upload: SurveyUpload): Promise<SurveyImportResult> {
  // The route's id is chosen here so the worker can write the points as its rows.
  const routeId = randomUUID();
  // Sniffing, parsing and writing the rows run on the worker pool: a large or hostile file never holds the request
  // thread.
  const { survey, rows, sha256 } = await runInWorker('survey.parse', {
    bytes: upload.bytes,
    fileName: upload.fileName,
    options: upload.options,
    routeId,
  }).catch((error: unknown) => {
    // The sniff's refusals already name the file; the parsers' do not.
    throw error instanceof SurveyImportError && !SNIFF_CODES.has(error.code) ? error.inFile(upload.fileName) : error;
  });
  const safeName = upload.fileName.replace(/[^\w.-]+/g, '_').slice(-100) || 'survey';
  const storageKey = `${projectStoragePrefix(upload.projectId)}survey-files/${randomUUID()}/${safeName}`;
  const contentType = storedContentType(upload.fileName, upload.contentType);
  // Stored alongside the database work; awaited (and its failure rolled back) before the commit.
  const stored = putObject(storageKey, upload.bytes, contentType).then(
    () => ({ ok: true as const }),
    (error: unknown) => ({ ok: false as const, error }),
  );
  const { Attachment, Route, sequelize } = models();
  try {
    const route = await sequelize.transaction(async (transaction) => {
      const file = await Attachment.create(
        {
          projectId: upload.projectId,
          kind: 'survey-file',
          fileName: upload.fileName.slice(0, 255),
          contentType,
          sizeBytes: upload.bytes.byteLength,
          sha256,
          storageKey,
          uploadedBy: upload.userId,
        },
        { transaction },
      );
      const r = await Route.create(
        {
          id: routeId,
          projectId: upload.projectId,
          name: upload.options.name,
          sourceAttachmentId: file.id,
          sourceFormat: survey.stats.format,
          createdBy: upload.userId,
          pointCount: rows.count,
          lengthM: survey.stats.totalHorizontalLengthM,
          slopeLengthM: rows.slopeLengthM,
          features: survey.features ?? [],
          importNotes: notesOf(survey.warnings),
          closureErrorM: survey.stats.closureErrorM ?? null,
        },
        { transaction },
      );
      await insertRouteRows(rows, transaction);
      await recordActivity(transaction, {
        projectId: upload.projectId,
        actorUserId: upload.userId,
        kind: 'survey.imported',
        subjectType: 'route',
        subjectId: r.id,
        summary: `Imported ${upload.fileName.slice(0, 120)} as route "${r.name}" (${rows.count} points)`,
        data: { fileName: upload.fileName, points: rows.count },
      });
      const put = await stored;
      if (!put.ok) throw put.error;
      return toRouteSummary(r, file);
    });
    return { route, warnings: survey.warnings.slice(0, 50) };
  } catch (error) {
    // Wait for the upload to settle, so an object that lands after the failure is removed too.
    await stored;
    await removeStoredFiles([storageKey]);
    throw error;
  }
}
