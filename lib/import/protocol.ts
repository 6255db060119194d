import type { GpsHeightWarning } from '../../hydraulics/index';
import type { RouteProposal } from '../routes/types';
import type { CsvDialect } from '../survey/csv-dialect';
import type { SurveyImportErrorCode } from '../survey/errors';
import type { SurveyInspection } from '../survey/inspect';
import type { ParsedSurvey, SurveyFeature, SurveyImportWarning } from '../survey/parsed-survey';
import type { SurveyImportOptions } from '../validations/survey-import';

/** Messages between the import screen and its parsing worker. */
export type WorkerRequest =
  | { type: 'inspect'; id: number; bytes: ArrayBuffer; fileName: string }
  | { type: 'reinspect'; id: number; dialect: Partial<CsvDialect> }
  | { type: 'parse'; id: number; options: SurveyImportOptions };

export interface ImportFailure {
  code: SurveyImportErrorCode | 'unexpected';
  message: string;
  line?: number;
  column?: string;
}

/** What the preview screen shows before anything is saved. */
export interface ImportPreview {
  stats: ParsedSurvey['stats'];
  warnings: SurveyImportWarning[];
  warningCount: number;
  features: SurveyFeature[];
  /** The profile thinned for drawing. */
  profile: { chainageM: number; elevationM: number }[];
  /** What the clean-up checks will propose on the route page. */
  proposals: RouteProposal[];
  gpsWarning: GpsHeightWarning | null;
}

export type WorkerResponse =
  | { type: 'inspected'; id: number; inspection: SurveyInspection; hadByteOrderMark: boolean }
  | { type: 'progress'; id: number; fraction: number }
  | { type: 'parsed'; id: number; preview: ImportPreview }
  | { type: 'failed'; id: number; error: ImportFailure };

/** Moving-median window offered on import for a consumer-GPS walk (points; common practice, no source). */
export const IMPORT_SMOOTHING_WINDOW = 5;
