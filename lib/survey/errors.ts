/** Why an import stopped. One code per kind of problem so the UI can explain and point at it. */
export type SurveyImportErrorCode =
  | 'file-too-large'
  | 'empty-file'
  | 'binary-content'
  | 'not-text'
  | 'no-data-rows'
  | 'no-delimiter'
  | 'wrong-delimiter'
  | 'missing-column'
  | 'missing-value'
  | 'not-a-number'
  | 'latitude-out-of-range'
  | 'longitude-out-of-range'
  | 'bad-time'
  | 'ambiguous-date-order'
  | 'too-few-points'
  | 'too-many-points'
  | 'negative-chainage'
  | 'chainage-not-increasing'
  | 'angle-out-of-range'
  | 'bad-reading'
  | 'level-book-missing-foresight'
  | 'level-book-order'
  | 'broken-xml'
  | 'not-gpx'
  | 'gpx-no-track'
  | 'gpx-only-waypoints'
  | 'format-mismatch'
  | 'invalid-result';

export interface SurveyImportErrorDetails {
  /** 1-based line in the file. */
  line?: number;
  /** Column as the file names it (header text), or "column 3" when there is no header. */
  column?: string;
  /** What the value was meant to be: latitude, elevation, chainage… */
  field?: string;
}

/**
 * The one error the survey parsers throw. `message` is plain words that say what is wrong and
 * where ("line 12, column “lat”: …"), so it can be shown to a surveyor unchanged.
 */
export class SurveyImportError extends Error {
  readonly code: SurveyImportErrorCode;
  readonly line?: number;
  readonly column?: string;
  readonly field?: string;

  constructor(code: SurveyImportErrorCode, message: string, details: SurveyImportErrorDetails = {}) {
    const where = [
      details.line !== undefined ? `line ${details.line}` : undefined,
      details.column !== undefined ? `column “${details.column}”` : undefined,
    ]
      .filter(Boolean)
      .join(', ');
    super(where ? `${where}: ${message}` : message);
    this.name = 'SurveyImportError';
    this.code = code;
    this.line = details.line;
    this.column = details.column;
    this.field = details.field;
  }

  /** The same refusal naming the file it was found in: "“walk.csv”, line 3: …". */
  inFile(fileName: string): SurveyImportError {
    return new SurveyImportError(this.code, `“${fileName}”, ${this.message}`, { field: this.field });
  }

  toJSON(): { code: SurveyImportErrorCode; message: string; line?: number; column?: string; field?: string } {
    return { code: this.code, message: this.message, line: this.line, column: this.column, field: this.field };
  }
}
