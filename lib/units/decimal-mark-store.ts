import { localeDecimalMark, parseTypedNumber, type DecimalMark } from './typed-number';

/**
 * The decimal mark number boxes read with, in the browser: the project's setting, or the browser
 * language's when the project has none. Set by the project layout (DecimalMarkScope); read when a
 * box is committed, so forms and tables need not pass it along.
 */
let projectMark: DecimalMark | null = null;
const listeners = new Set<() => void>();

export function setProjectDecimalMark(mark: DecimalMark | null): void {
  if (mark === projectMark) return;
  projectMark = mark;
  listeners.forEach((listener) => listener());
}

export function currentDecimalMark(): DecimalMark {
  if (projectMark) return projectMark;
  return typeof navigator === 'undefined' ? '.' : localeDecimalMark(navigator.language);
}

export function subscribeDecimalMark(listener: () => void): () => void {
  listeners.add(listener);
  return () => listeners.delete(listener);
}

/** Typed text -> number with the current mark: blank or unreadable -> NaN (the schema then names the field). */
export function typedNumber(text: string): number {
  const read = parseTypedNumber(text, currentDecimalMark());
  return read.ok && read.value !== null ? read.value : Number.NaN;
}
