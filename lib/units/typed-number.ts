/**
 * The one reading of a number a person typed, for every form, table cell and dialog. It follows the
 * project's decimal mark: with a point, "1,500.5" is 1500.5 and "1,5" is refused (not silently 15);
 * with a comma, "1.500,5" is 1500.5 and "1,5" is 1.5. Spaces (also the narrow no-break space) may
 * group thousands either way. In a comma project a lone point is still a decimal point ("1.500" is
 * 1.5), so a value shown with a point is never read a thousand times too large.
 */

export type DecimalMark = '.' | ',';
export const DECIMAL_MARKS = ['.', ','] as const satisfies readonly DecimalMark[];

export type TypedNumber = { ok: true; value: number } | { ok: true; value: null } | { ok: false; error: string };

const GROUPED = (group: string, mark: string) => new RegExp(`^\\d{1,3}(?:\\${group}\\d{3})+(?:\\${mark}\\d*)?$`);
const PLAIN = (mark: string) => new RegExp(`^(?:\\d+(?:\\${mark}\\d*)?|\\${mark}\\d+)(?:[eE][+-]?\\d+)?$`);

/** Reads `text` with `mark` as the decimal separator; blank is `null`, anything else unreadable an error saying why. */
export function parseTypedNumber(text: string, mark: DecimalMark): TypedNumber {
  let body = text.trim().replace(/[\s\u00a0\u202f]/g, '');
  if (body === '') return { ok: true, value: null };
  let sign = 1;
  if (/^[-\u2212+]/.test(body)) {
    sign = body[0] === '+' ? 1 : -1;
    body = body.slice(1);
  }
  const group = mark === '.' ? ',' : '.';
  let normal: string | null = null;
  if (PLAIN(mark).test(body)) normal = body.replace(mark, '.');
  // In a comma project a lone point is still a decimal point: "1.234" m is never read as 1234 m.
  else if (mark === ',' && PLAIN('.').test(body)) normal = body;
  else if (GROUPED(group, mark).test(body)) normal = body.split(group).join('').replace(mark, '.');
  if (normal === null) {
    const hint =
      mark === '.' && /^\d+,\d+$/.test(body)
        ? ` (this project writes decimals with a point: ${body.replace(',', '.')})`
        : '';
    return { ok: false, error: `"${text.trim()}" is not a number${hint}` };
  }
  const value = sign * Number(normal);
  return Number.isFinite(value) ? { ok: true, value } : { ok: false, error: `"${text.trim()}" is not a number` };
}

/** A number for an input box, written with the project's decimal mark and no grouping. */
export function formatTypedNumber(value: number, mark: DecimalMark): string {
  const text = String(value);
  return mark === ',' ? text.replace('.', ',') : text;
}

/** The decimal mark of a locale (the browser's when none is given), from Intl. */
export function localeDecimalMark(locale?: string): DecimalMark {
  try {
    const part = new Intl.NumberFormat(locale).formatToParts(1.5).find((entry) => entry.type === 'decimal');
    return part?.value === ',' ? ',' : '.';
  } catch {
    return '.';
  }
}
