export { SurveyImportError } from './errors';
export type { SurveyImportErrorCode, SurveyImportErrorDetails } from './errors';
export { sniffSurveyFile, MAX_SURVEY_FILE_BYTES } from './sniff';
export type { SniffOptions, SniffedText } from './sniff';
export { detectCsvDialect, detectLineEnding, normaliseLineEndings } from './csv-dialect';
export type { CsvDialect, CsvDelimiter, LineEnding } from './csv-dialect';
export { openCsvTable } from './csv-rows';
export type { CsvTable } from './csv-rows';
export {
  guessGpsColumnMapping,
  guessStationColumnMapping,
  guessElevationUnit,
  normaliseHeader,
} from './column-mapping';
export type { GpsColumnMapping, StationColumnMapping, ColumnGuess } from './column-mapping';
export { METRES_PER_FOOT, toMetres } from './cells';
export type { LengthUnit } from './cells';
export { parseGpsCsv, previewGpsCsv } from './gps-csv';
export type { GpsCsvOptions } from './gps-csv';
export { parseStationCsv } from './station-csv';
export type { StationCsvOptions } from './station-csv';
export { parseGpx } from './gpx';
export type { GpxOptions } from './gpx';
export { parseInclinometerCsv } from './inclinometer-csv';
export type { InclinometerCsvOptions } from './inclinometer-csv';
export { parseLevelBookCsv } from './level-book-csv';
export type { LevelBookCsvOptions } from './level-book-csv';
export { looksLikeGpx } from './detect-format';
export { snapToRoute } from './snap';
export {
  ParsedSurveySchema,
  SurveyPointSchema,
  SurveyFeatureSchema,
  SurveyImportWarningSchema,
  HeightSourceSchema,
  validateParsedSurvey,
} from './parsed-survey';
export type {
  ParsedSurvey,
  SurveyPoint,
  SurveyFeature,
  SurveyImportWarning,
  SurveyFormat,
  HeightSourceName,
} from './parsed-survey';
