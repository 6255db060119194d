import type { Decimals } from './quantities';

const MAX_DECIMALS = 6;
const formatters = new Map<number, Intl.NumberFormat>();

/** One fixed locale, so the server render and the browser print the same text for the same value. */
function formatterFor(decimals: number): Intl.NumberFormat {
  let formatter = formatters.get(decimals);
  if (!formatter) {
    formatter = new Intl.NumberFormat('en-US', { minimumFractionDigits: decimals, maximumFractionDigits: decimals });
    formatters.set(decimals, formatter);
  }
  return formatter;
}

/** Decimals for 'auto': three significant figures or so, never fewer than a whole number. */
export function autoDecimals(value: number): number {
  const magnitude = Math.abs(value);
  return magnitude >= 100 ? 0 : magnitude >= 10 ? 1 : magnitude >= 1 ? 2 : 3;
}

/**
 * The one way a number becomes text on screen, in the PDF and in files: thousands grouped with
 * commas, a point for decimals, `decimals` fixed (or 'auto' by size), "-0.0" shown as "0.0" and a
 * value that is not a finite number shown as "—".
 */
export function formatNumber(value: number, decimals: Decimals = 'auto'): string {
  if (!Number.isFinite(value)) return '—';
  const places = decimals === 'auto' ? autoDecimals(value) : Math.min(Math.max(Math.round(decimals), 0), MAX_DECIMALS);
  const text = formatterFor(places).format(value);
  return /^-0(\.0+)?$/.test(text) ? text.slice(1) : text;
}

/** formatNumber without the thousands commas, for text that is read back or sits inside a sentence of figures. */
export function formatPlainNumber(value: number, decimals: Decimals = 'auto'): string {
  return formatNumber(value, decimals).replace(/,/g, '');
}
