import type { HydraulicsInputError } from '../../hydraulics/index';
import { formatQuantity, type UnitSystem } from '../units/index';
import { LINE_DESIGN_WORDS } from '../validations/field-word-tables';
import { fieldLabel } from '../validations/field-words';

/**
 * A core refusal in the words and units of the screen: "Device 1: chainage: ch. 4,593 ft lies outside the line (ch. 0
 * ft to 4,593 ft)".
 */
export function inputErrorText(
  error: Pick<HydraulicsInputError, 'field' | 'index' | 'reason' | 'values'>,
  system: UnitSystem,
): string {
  // The core names a list field "devices.chainageM" with its index apart; the screen's table keys it
  // "devices.#.chainageM".
  const [head, ...rest] = error.field.split('.');
  const path = error.index === undefined ? [head, ...rest] : [head, error.index, ...rest];
  const named =
    fieldLabel(path, LINE_DESIGN_WORDS) ??
    (error.index !== undefined && rest.length === 0 ? fieldLabel([head], LINE_DESIGN_WORDS) : null);
  const name =
    named?.label ?? (error.field.startsWith('settings.') ? `Setting “${error.field.slice(9)}”` : 'The design');
  const v = error.values;
  if (v?.chainageM !== undefined && v.fromM !== undefined && v.toM !== undefined) {
    const ch = (m: number) => formatQuantity('chainage', m, system);
    return `${name}: ch. ${ch(v.chainageM)} lies outside the line (ch. ${ch(v.fromM)} to ${ch(v.toM)})`;
  }
  return `${name}: ${error.reason}`;
}
