import { SurveyImportError } from './errors';

/** Largest survey file accepted, bytes (50 MiB). */
export const MAX_SURVEY_FILE_BYTES = 50 * 1024 * 1024;

const MAGIC: { name: string; bytes: number[] }[] = [
  { name: 'a PNG image', bytes: [0x89, 0x50, 0x4e, 0x47] },
  { name: 'a ZIP archive (or an office document)', bytes: [0x50, 0x4b, 0x03, 0x04] },
  { name: 'a PDF document', bytes: [0x25, 0x50, 0x44, 0x46] },
  { name: 'a JPEG image', bytes: [0xff, 0xd8, 0xff] },
  { name: 'a GZIP archive', bytes: [0x1f, 0x8b] },
];

export interface SniffOptions {
  /** @default MAX_SURVEY_FILE_BYTES */
  maxBytes?: number;
  fileName?: string;
}

export interface SniffedText {
  text: string;
  hadByteOrderMark: boolean;
}

/** UTF-16 by its byte-order mark (FF FE little-endian, FE FF big-endian), or null. */
function utf16Encoding(bytes: Uint8Array): 'utf-16le' | 'utf-16be' | null {
  if (bytes.byteLength < 2) return null;
  if (bytes[0] === 0xff && bytes[1] === 0xfe) return 'utf-16le';
  if (bytes[0] === 0xfe && bytes[1] === 0xff) return 'utf-16be';
  return null;
}

/**
 * Checks an uploaded file before any parsing: size first (so a huge file is never decoded),
 * then known binary signatures, UTF-16 with a byte-order mark (a spreadsheet's "Unicode text"
 * export), NUL bytes, then UTF-8 text (Windows-1252 as a fallback for older receivers' exports).
 * Returns the text with any byte-order mark removed.
 */
export function sniffSurveyFile(bytes: Uint8Array, options: SniffOptions = {}): SniffedText {
  const maxBytes = options.maxBytes ?? MAX_SURVEY_FILE_BYTES;
  const name = options.fileName ? `“${options.fileName}” ` : '';
  if (bytes.byteLength > maxBytes) {
    const mb = (n: number) => (n / (1024 * 1024)).toFixed(1);
    throw new SurveyImportError(
      'file-too-large',
      `the file ${name}is ${mb(bytes.byteLength)} MB; the limit is ${mb(maxBytes)} MB`,
    );
  }
  if (bytes.byteLength === 0) throw new SurveyImportError('empty-file', `the file ${name}is empty`);
  for (const m of MAGIC) {
    if (m.bytes.every((b, i) => bytes[i] === b)) {
      throw new SurveyImportError(
        'binary-content',
        `the file ${name}is ${m.name}, not a survey text file (CSV or GPX)`,
      );
    }
  }
  const utf16 = utf16Encoding(bytes);
  if (utf16) {
    // A spreadsheet's "Unicode text" export: UTF-16 with a byte-order mark, full of NUL bytes that are not binary.
    const text = new TextDecoder(utf16, { fatal: false }).decode(bytes);
    if (text.includes('\ufffd')) {
      throw new SurveyImportError(
        'binary-content',
        `the file ${name}starts like UTF-16 text but holds bytes that are not text`,
      );
    }
    if (text.trim() === '') throw new SurveyImportError('empty-file', `the file ${name}holds no text`);
    return { text, hadByteOrderMark: true };
  }
  const nul = bytes.indexOf(0);
  if (nul >= 0) {
    throw new SurveyImportError(
      'binary-content',
      `the file ${name}contains binary data (a NUL byte at byte ${nul + 1}); it is not a text file`,
    );
  }
  let text: string;
  try {
    // ignoreBOM keeps the mark in the text so we can report it; the default would drop it silently.
    text = new TextDecoder('utf-8', { fatal: true, ignoreBOM: true }).decode(bytes);
  } catch {
    text = new TextDecoder('windows-1252').decode(bytes);
  }
  const hadByteOrderMark = text.charCodeAt(0) === 0xfeff;
  if (hadByteOrderMark) text = text.slice(1);
  if (text.trim() === '') throw new SurveyImportError('empty-file', `the file ${name}holds no text`);
  return { text, hadByteOrderMark };
}
