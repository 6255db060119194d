import type { HydraulicsInputError } from '../../hydraulics/index';
import { formatQuantity, type UnitSystem } from '../units/index';

/**
 * The names people see on the line page for the core's input fields, so a refusal never shows an
 * internal path such as `devices.chainageM[0]` or a chainage with thirteen decimals.
 */
const FIELD_WORDS: Record<string, (n: number) => string> = {
  'devices.chainageM': (n) => `Device ${n}: chainage`,
  'devices.waterLevelM': (n) => `Device ${n}: water level`,
  'devices.kind': (n) => `Device ${n}: kind`,
  'fittings.chainageM': (n) => `Fitting ${n}: chainage`,
  'fittings.k': (n) => `Fitting ${n}: loss coefficient K`,
  'stretches.fromM': (n) => `Pipe stretch ${n}: start`,
  'stretches.toM': (n) => `Pipe stretch ${n}: end`,
  'stretches.pipe': (n) => `Pipe stretch ${n}: pipe`,
  stretches: () => 'Pipe stretches',
  'stations.chainageM': (n) => `Survey point ${n}: chainage`,
  'stations.groundElevationM': (n) => `Survey point ${n}: ground elevation`,
  'stations.coverM': (n) => `Survey point ${n}: cover`,
  'start.levelM': () => 'Start: water level',
  'start.outletHeadM': () => 'Start: pump outlet head',
  'start.shutoffHeadM': () => 'Start: pump shut-off head',
  'end.elevationM': () => 'End: elevation',
  'end.residualHeadM': () => 'End: pressure wanted',
  'flow.flowM3s': () => 'Design flow',
};

/** A core refusal in the words and units of the screen: "Device 1: chainage: ch. 4,593 ft lies outside the line (ch. 0 ft to 4,593 ft)". */
export function inputErrorText(error: Pick<HydraulicsInputError, 'field' | 'index' | 'reason' | 'values'>, system: UnitSystem): string {
  const naming = FIELD_WORDS[error.field] ?? FIELD_WORDS[error.field.replace(/^settings\./, '')];
  const name = naming ? naming((error.index ?? 0) + 1) : error.field.startsWith('settings.') ? `Setting “${error.field.slice(9)}”` : 'The design';
  const v = error.values;
  if (v?.chainageM !== undefined && v.fromM !== undefined && v.toM !== undefined) {
    const ch = (m: number) => formatQuantity('chainage', m, system);
    return `${name}: ch. ${ch(v.chainageM)} lies outside the line (ch. ${ch(v.fromM)} to ${ch(v.toM)})`;
  }
  return `${name}: ${error.reason}`;
}
