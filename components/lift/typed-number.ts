import { typedNumber } from '@/lib/units/decimal-mark-store';

/**
 * Text typed in a number box -> a number with the project's decimal mark; blank or not a number -> NaN (the schema then
 * names the field).
 */
export function numberFrom(text: string): number {
  return typedNumber(text);
}

/** Like numberFrom, but a blank box means "not given". */
export function numberOrNull(text: string): number | null {
  return text.trim() === '' ? null : numberFrom(text);
}
