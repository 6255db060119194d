import { FOOT_M } from '../../hydraulics/index';
import { formatNumber } from './number';
import {
  pressureOfHead,
  toDisplay,
  unitDef,
  unitOf,
  type Decimals,
  type Quantity,
  type UnitSystem,
} from './quantities';

/** A stored SI value in the project's unit, with the unit and the quantity's decimals: "2.60 L/min", "1,234.5 m". */
export function formatQuantity(quantity: Quantity, valueSi: number, system: UnitSystem, decimals?: Decimals): string {
  const def = unitDef(quantity, system);
  return `${formatNumber(toDisplay(quantity, valueSi, system), decimals ?? def.decimals)} ${def.symbol}`;
}

/** A value for a form input in the project's unit (empty for null), rounded so it reads cleanly. */
export function inputValue(quantity: Quantity, valueSi: number | null | undefined, system: UnitSystem): string {
  if (valueSi === null || valueSi === undefined) return '';
  return String(Number(toDisplay(quantity, valueSi, system).toPrecision(6)));
}

/** A pressure from a head of water, e.g. `413 kPa` or `59.9 psi`. */
export function formatPressureOfHead(headM: number, system: UnitSystem, temperatureC?: number): string {
  return `${formatNumber(pressureOfHead(headM, system, temperatureC), unitDef('pressure', system).decimals)} ${unitOf('pressure', system)}`;
}

/** Head and pressure together, the way the trade reads them: `42.1 m (413 kPa)`. */
export function formatHeadPressure(headM: number, system: UnitSystem, temperatureC?: number): string {
  return `${formatQuantity('head', headM, system)} (${formatPressureOfHead(headM, system, temperatureC)})`;
}

const KILOMETRE_M = 1000;
/** The international mile, 5,280 ft of 0.3048 m. */
const MILE_M = 5280 * FOOT_M;

/** A length too long for metres on screen: "1.40 km" / "0.87 mi" from 1 km / 1 mi, else whole metres or feet. */
export function formatDistance(lengthM: number, system: UnitSystem): string {
  const [big, symbol] = system === 'us' ? [MILE_M, 'mi'] : [KILOMETRE_M, 'km'];
  return lengthM >= big ? `${formatNumber(lengthM / big, 2)} ${symbol}` : formatQuantity('length', lengthM, system, 0);
}

/** A water temperature in the project's unit: °F first in a US project, with °C alongside (the core's unit). */
export function formatTemperature(c: number, system: UnitSystem): string {
  return system === 'us'
    ? `${formatQuantity('temperature', c, system)} (${formatQuantity('temperature', c, 'metric')})`
    : formatQuantity('temperature', c, system);
}

/** A duration for people: minutes under 2 h, hours under 3 days, then hours and days. */
export function formatDuration(seconds: number): string {
  if (!Number.isFinite(seconds)) return '—';
  const hours = seconds / 3600;
  if (hours < 2) return `${formatNumber(seconds / 60, 0)} min`;
  if (hours < 72) return `${formatNumber(hours, 1)} h`;
  return `${formatNumber(hours, 0)} h (about ${formatNumber(hours / 24, 1)} days)`;
}

/** A fraction as a percentage: 0.384 -> "38 %". */
export function formatPercent(fraction: number, decimals: Decimals = 0): string {
  return `${formatNumber(fraction * 100, decimals)} %`;
}

/**
 * A chainage as a surveyor's station: hundreds of feet, a plus, then feet (1,250 ft = "12+50";
 * 1,234.6 ft = "12+35", whole feet). US practice, 100-ft stations (common practice, no source);
 * metric projects give none (their chainage in metres is the usual form).
 */
export function formatStation(chainageM: number, system: UnitSystem): string | null {
  if (system !== 'us') return null;
  const feet = Math.round(toDisplay('chainage', chainageM, system));
  const sign = feet < 0 ? '-' : '';
  const abs = Math.abs(feet);
  return `${sign}${Math.floor(abs / 100)}+${String(abs % 100).padStart(2, '0')}`;
}
