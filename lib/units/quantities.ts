import { FOOT_M, INCH_M, PSI_PA, US_GALLON_M3 } from '../../hydraulics/constants';

/**
 * Project units at the edge: every figure is stored and computed in SI and shown (or typed) in the
 * project's unit system. One table, so each screen shows the same unit for the same quantity.
 */
export type UnitSystem = 'metric' | 'us';

export type Quantity =
  | 'length'
  | 'elevation'
  | 'head'
  | 'bore'
  | 'flow'
  | 'flowPerHour'
  | 'flowPerDay'
  | 'volume'
  | 'pressure'
  | 'area'
  | 'depthPerDay'
  | 'volumePerDay';

interface UnitDef {
  symbol: string;
  /** Size of one display unit in SI. */
  si: number;
}

const DAY_S = 86_400;
const L = 1e-3;

const UNITS: Record<UnitSystem, Record<Quantity, UnitDef>> = {
  metric: {
    length: { symbol: 'm', si: 1 },
    elevation: { symbol: 'm', si: 1 },
    head: { symbol: 'm', si: 1 },
    bore: { symbol: 'mm', si: 1e-3 },
    flow: { symbol: 'L/min', si: L / 60 },
    flowPerHour: { symbol: 'L/h', si: L / 3600 },
    flowPerDay: { symbol: 'L/day', si: L / DAY_S },
    volume: { symbol: 'L', si: L },
    pressure: { symbol: 'kPa', si: 1e3 },
    area: { symbol: 'm²', si: 1 },
    depthPerDay: { symbol: 'mm/day', si: 1e-3 },
    volumePerDay: { symbol: 'L/day', si: L },
  },
  us: {
    length: { symbol: 'ft', si: FOOT_M },
    elevation: { symbol: 'ft', si: FOOT_M },
    head: { symbol: 'ft', si: FOOT_M },
    bore: { symbol: 'in', si: INCH_M },
    flow: { symbol: 'US gpm', si: US_GALLON_M3 / 60 },
    flowPerHour: { symbol: 'US gal/h', si: US_GALLON_M3 / 3600 },
    flowPerDay: { symbol: 'US gal/day', si: US_GALLON_M3 / DAY_S },
    volume: { symbol: 'US gal', si: US_GALLON_M3 },
    pressure: { symbol: 'psi', si: PSI_PA },
    area: { symbol: 'ft²', si: FOOT_M * FOOT_M },
    depthPerDay: { symbol: 'in/week', si: INCH_M / 7 },
    volumePerDay: { symbol: 'US gal/day', si: US_GALLON_M3 },
  },
};

export function unitOf(quantity: Quantity, system: UnitSystem): string {
  return UNITS[system][quantity].symbol;
}

/** SI -> the project's unit. */
export function toDisplay(quantity: Quantity, valueSi: number, system: UnitSystem): number {
  return valueSi / UNITS[system][quantity].si;
}

/** The project's unit -> SI (for forms). */
export function fromDisplay(quantity: Quantity, value: number, system: UnitSystem): number {
  return value * UNITS[system][quantity].si;
}

/** A number for people: fewer decimals as it grows; fixed en-US grouping so server and browser agree. */
export function formatNumber(value: number, digits?: number): string {
  if (!Number.isFinite(value)) return '—';
  const magnitude = Math.abs(value);
  const decimals = digits ?? (magnitude >= 100 ? 0 : magnitude >= 10 ? 1 : magnitude >= 1 ? 2 : 3);
  return value.toLocaleString('en-US', { minimumFractionDigits: decimals, maximumFractionDigits: decimals });
}

/** A stored SI value shown in the project's unit, with the unit: "2.63 L/min". */
export function formatQuantity(quantity: Quantity, valueSi: number, system: UnitSystem, digits?: number): string {
  return `${formatNumber(toDisplay(quantity, valueSi, system), digits)} ${unitOf(quantity, system)}`;
}

/** A value for a form input in the project's unit (empty for null), rounded so it reads cleanly. */
export function inputValue(quantity: Quantity, valueSi: number | null | undefined, system: UnitSystem): string {
  if (valueSi === null || valueSi === undefined) return '';
  return String(Number(toDisplay(quantity, valueSi, system).toPrecision(6)));
}

/** A duration for people: minutes under 2 h, hours under 3 days, then days and hours. */
export function formatDuration(seconds: number): string {
  if (!Number.isFinite(seconds)) return '—';
  const hours = seconds / 3600;
  if (hours < 2) return `${formatNumber(seconds / 60, 0)} min`;
  if (hours < 72) return `${formatNumber(hours, 1)} h`;
  return `${formatNumber(hours, 0)} h (about ${formatNumber(hours / 24, 1)} days)`;
}

/** A fraction as a percentage: 0.384 -> "38 %". */
export function formatPercent(fraction: number, digits = 0): string {
  return `${formatNumber(fraction * 100, digits)} %`;
}
