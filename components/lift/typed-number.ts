/** Text typed in a number box -> a number; blank or not a number -> NaN (the schema then names the field). */
export function numberFrom(text: string): number {
  const trimmed = text.trim().replace(/,/g, '');
  return trimmed === '' ? Number.NaN : Number(trimmed);
}

/** Like numberFrom, but a blank box means "not given". */
export function numberOrNull(text: string): number | null {
  return text.trim() === '' ? null : numberFrom(text);
}
