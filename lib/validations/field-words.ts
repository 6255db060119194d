import type { z } from 'zod';
import type { FieldErrors } from '../errors';
import { formatQuantity, type Quantity, type UnitSystem } from '../units/index';

/**
 * How a field of a form is named on screen, and the quantity its figures are, so a refusal reads
 * "Device 2: chainage must be at most 3,281 ft" in a US project, never `devices.1.chainageM` or
 * a bound in metres. Keys are schema paths with `#` for a list position ("devices.#.chainageM");
 * a `#` in the label is the position counted from 1.
 */
export interface FieldWord {
  label: string;
  quantity?: Quantity;
}
export type FieldWordTable = Readonly<Record<string, FieldWord>>;

type Issue = z.core.$ZodIssue;

const patternOf = (path: readonly PropertyKey[]) =>
  path.map((part) => (typeof part === 'number' ? '#' : String(part))).join('.');

/**
 * The screen's name of a path: the table's label with its list positions filled in, or null when the
 * table does not know it. `firstNumber` is the number the screen gives a list's first item (1, or
 * 51 for a page of a route's rows that starts at its 51st point).
 */
export function fieldLabel(
  path: readonly PropertyKey[],
  table: FieldWordTable,
  firstNumber = 1,
): { label: string; quantity?: Quantity } | null {
  const word = table[patternOf(path)];
  if (!word) return null;
  const positions = path.filter((part): part is number => typeof part === 'number');
  let k = 0;
  return {
    label: word.label.replace(/#/g, () => String((positions[k++] ?? 0) + firstNumber)),
    quantity: word.quantity,
  };
}

/**
 * One issue in the screen's words and the project's units. Range and type issues on a known field are
 * worded from the issue's own bound (zod keeps it as a number), converted to the project's unit; other
 * issues keep their message, prefixed with the field's screen name when the message does not start with it.
 */
export function issueText(issue: Issue, system: UnitSystem, table: FieldWordTable, firstNumber = 1): string {
  const named = fieldLabel(issue.path, table, firstNumber);
  if (!named) return issue.message;
  const { label, quantity } = named;
  // A bound of zero reads "0 ft", not "0.000 US gal": nothing to round.
  const figure = (value: number | bigint) => {
    if (!quantity) return String(value);
    const text = formatQuantity(quantity, Number(value), system);
    return Number(value) === 0 && quantity !== 'temperature' ? text.replace(/^-?0(\.0+)?/, '0') : text;
  };
  // Bounds are reworded only for a figure with a unit; a plain number's own words stay (under the screen's name).
  if (issue.code === 'too_small' && issue.origin === 'number' && quantity) {
    return `${label} must be ${issue.inclusive ? 'at least' : 'more than'} ${figure(issue.minimum)}`;
  }
  if (issue.code === 'too_big' && issue.origin === 'number' && quantity) {
    return `${label} must be ${issue.inclusive ? 'at most' : 'less than'} ${figure(issue.maximum)}`;
  }
  // A figure sent as text (a multipart upload's chainage) that is no number reads like a number refused by type.
  const textNotANumber = issue.code === 'invalid_format' && quantity !== undefined;
  if ((issue.code === 'invalid_type' && issue.expected === 'number') || textNotANumber) {
    return `${label} must be a number${quantity ? ` (${formatQuantity(quantity, 0, system).split(' ').slice(1).join(' ')})` : ''}`;
  }
  if (issue.message.startsWith(label)) return issue.message;
  // "Latitude must be …" under "Point 2: latitude" reads "Point 2: latitude must be …".
  const short = label.split(': ').pop() ?? label;
  if (issue.message.toLowerCase().startsWith(short.toLowerCase()))
    return `${label}${issue.message.slice(short.length)}`;
  // "Safety factor must be …" under "Safety factor on ratings", "The highest velocity must …" under "Highest velocity".
  const verb = issue.message.indexOf(' must ');
  const subject = verb > 0 ? issue.message.slice(0, verb).replace(/^the /i, '').toLowerCase() : '';
  if (subject !== '' && short.toLowerCase().startsWith(subject)) return `${label}${issue.message.slice(verb)}`;
  // A reason with no subject ("must be less than the outside diameter") takes the field's name as its own.
  if (issue.message.startsWith('must ')) return `${label} ${issue.message}`;
  return `${label}: ${lowerFirst(issue.message)}`;
}

/** "A stretch must …" -> "a stretch must …"; a name or an abbreviation ("PE", "I") keeps its capital. */
function lowerFirst(text: string): string {
  return /^([A-Z][a-z]|[A-HJ-Z] )/.test(text) ? text[0].toLowerCase() + text.slice(1) : text;
}

/**
 * zod issues -> `{ "field.path": [messages] }` (the keys fieldErrorsOf gives), worded for the screen in the project's
 * units.
 */
export function fieldErrorsIn(
  error: z.ZodError,
  system: UnitSystem,
  table: FieldWordTable,
  firstNumber = 1,
): FieldErrors {
  const fields = new Map<string, string[]>();
  const add = (key: string, message: string) => fields.set(key, [...(fields.get(key) ?? []), message]);
  // A field's own range or type refusal says it best: a whole-object check on the same field adds nothing.
  const ordered = [
    ...error.issues.filter((i) => i.code !== 'custom'),
    ...error.issues.filter((i) => i.code === 'custom'),
  ];
  for (const issue of ordered) {
    const key = issue.path.length > 0 ? issue.path.map(String).join('.') : '_';
    if (issue.code === 'custom' && fields.has(key)) continue;
    if (issue.code === 'unrecognized_keys') {
      for (const k of issue.keys) add(key === '_' ? k : `${key}.${k}`, `Unknown field "${k}"`);
      continue;
    }
    add(key, issueText(issue, system, table, firstNumber));
  }
  return Object.fromEntries(fields);
}

/** Every issue on one line, for a place that shows a single message (the line editor's note). */
export function issuesText(error: z.ZodError, system: UnitSystem, table: FieldWordTable): string {
  return [...new Set(error.issues.map((issue) => issueText(issue, system, table)))].join('; ');
}
