import type { SurveyImportOptions } from '../validations/survey-import';
import { looksLikeGpx } from './detect-format';
import { SurveyImportError } from './errors';
import { parseGpsCsv } from './gps-csv';
import { parseGpx } from './gpx';
import { parseInclinometerCsv } from './inclinometer-csv';
import { parseLevelBookCsv } from './level-book-csv';
import type { ParsedSurvey } from './parsed-survey';
import { parseStationCsv } from './station-csv';

/**
 * Parses survey text with the options chosen on the import screens. The same function runs in
 * the browser's worker (for the preview) and in the upload handler (for the stored route).
 */
export function parseSurveyText(
  text: string,
  options: SurveyImportOptions,
  onProgress?: (fraction: number) => void,
): ParsedSurvey {
  const isGpx = looksLikeGpx(text);
  if (options.format === 'gpx' && !isGpx) {
    throw new SurveyImportError(
      'format-mismatch',
      'the file was chosen as GPX but has no <gpx> root element; pick a CSV format instead',
    );
  }
  if (options.format !== 'gpx' && isGpx) {
    throw new SurveyImportError('format-mismatch', 'the file is GPX (XML), not CSV; pick the GPX format instead');
  }
  switch (options.format) {
    case 'gpx':
      return parseGpx(text, {
        heightSource: options.heightSource,
        useWaypointsAsRoute: options.useWaypointsAsRoute,
        onProgress,
      });
    case 'gps-csv':
      return parseGpsCsv(text, {
        mapping: options.mapping,
        elevationUnit: options.elevationUnit,
        accuracyIsVertical: options.accuracyIsVertical,
        heightSource: options.heightSource,
        dialect: options.dialect,
        timeZone: options.timeZone,
        dateOrder: options.dateOrder,
        onProgress,
      });
    case 'station-csv':
      return parseStationCsv(text, {
        mapping: options.mapping,
        chainageUnit: options.chainageUnit,
        elevationUnit: options.elevationUnit,
        heightSource: options.heightSource,
        dialect: options.dialect,
        onProgress,
      });
    case 'inclinometer-csv':
      return parseInclinometerCsv(text, {
        startElevationM: options.startElevationM,
        startLabel: options.startLabel,
        angleUnit: options.angleUnit,
        distanceUnit: options.distanceUnit,
        onProgress,
      });
    case 'level-book-csv':
      return parseLevelBookCsv(text, {
        startElevationM: options.startElevationM,
        method: options.method,
        closingElevationM: options.closingElevationM,
        hoseLevel: options.hoseLevel,
        unit: options.unit,
        onProgress,
      });
  }
}
