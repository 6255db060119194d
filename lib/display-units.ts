import { lengthFromM, lengthToM } from '../hydraulics/units';
import type { UnitSystem } from '../models/project';

/**
 * Lengths and heights shown in the project's unit system. Everything is stored in metres; these
 * convert at the edge of the screen only (metres ↔ international feet, hydraulics/units.ts).
 */
export function lengthUnitOf(system: UnitSystem): 'm' | 'ft' {
  return system === 'us' ? 'ft' : 'm';
}

/** Metres to the project's length unit (a number for inputs and charts). */
export function toDisplayLength(lengthM: number, system: UnitSystem): number {
  return lengthFromM(lengthM, lengthUnitOf(system));
}

/** A typed length in the project's unit back to metres. */
export function fromDisplayLength(value: number, system: UnitSystem): number {
  return lengthToM(value, lengthUnitOf(system));
}

/** “1,402.6 m” or “4,601.7 ft”. */
export function formatLength(lengthM: number, system: UnitSystem, digits = 1): string {
  const value = toDisplayLength(lengthM, system);
  return `${value.toLocaleString('en-GB', { minimumFractionDigits: digits, maximumFractionDigits: digits })} ${lengthUnitOf(system)}`;
}

/** A length too long for metres on screen: “1.40 km” / “0.87 mi” above 1 km, else as formatLength. */
export function formatDistance(lengthM: number, system: UnitSystem): string {
  if (system === 'us') return lengthM >= 1609.344 ? `${(lengthM / 1609.344).toFixed(2)} mi` : formatLength(lengthM, system, 0);
  return lengthM >= 1000 ? `${(lengthM / 1000).toFixed(2)} km` : formatLength(lengthM, system, 0);
}
