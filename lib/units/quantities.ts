import {
  FLOW_UNITS_M3S,
  FOOT_M,
  HEAD_UNITS_M,
  headMToPressurePa,
  INCH_M,
  LENGTH_UNITS_M,
  PRESSURE_UNITS_PA,
  SECONDS_PER_DAY,
  US_GALLON_M3,
} from '../../hydraulics/index';

/**
 * Project units at the edge: every figure is stored and computed in SI and shown (or typed) in the
 * project's unit system. One table, so every screen, the PDF and the CSV files show the same unit and
 * the same decimals for the same quantity (elevations, head losses and depths of cover to the
 * hundredth, as a level book and a friction table write them; heads to the tenth). Sizes come from the engineering
 * core's unit tables (hydraulics/units.ts,
 * hydraulics/constants.ts).
 */
export type UnitSystem = 'metric' | 'us';

export const UNIT_SYSTEMS: readonly UnitSystem[] = ['metric', 'us'];

export type Quantity =
  | 'length'
  | 'chainage'
  | 'elevation'
  | 'head'
  | 'headLoss'
  | 'depth'
  | 'diameter'
  | 'velocity'
  | 'designFlow'
  | 'flow'
  | 'flowPerHour'
  | 'flowPerDay'
  | 'volume'
  | 'pressure'
  | 'area'
  | 'depthPerDay'
  | 'volumePerDay'
  | 'temperature';

/** Fixed decimals, or 'auto': fewer decimals as the number grows (see formatNumber). */
export type Decimals = number | 'auto';

export interface UnitDef {
  symbol: string;
  /** Size of one display unit in SI. */
  si: number;
  decimals: Decimals;
  /** Display value of SI zero (temperature: 0 °C is 32 °F); none for the other quantities. */
  offset?: number;
}

const LITRE_M3 = 1e-3;
const LITRE_PER_HOUR_M3S = LITRE_M3 / 3600;

const UNITS: Record<UnitSystem, Record<Quantity, UnitDef>> = {
  metric: {
    length: { symbol: 'm', si: LENGTH_UNITS_M.m, decimals: 1 },
    chainage: { symbol: 'm', si: LENGTH_UNITS_M.m, decimals: 1 },
    elevation: { symbol: 'm', si: LENGTH_UNITS_M.m, decimals: 2 },
    head: { symbol: 'm', si: HEAD_UNITS_M.m, decimals: 1 },
    headLoss: { symbol: 'm', si: HEAD_UNITS_M.m, decimals: 2 },
    depth: { symbol: 'm', si: LENGTH_UNITS_M.m, decimals: 2 },
    diameter: { symbol: 'mm', si: LENGTH_UNITS_M.mm, decimals: 'auto' },
    velocity: { symbol: 'm/s', si: LENGTH_UNITS_M.m, decimals: 2 },
    designFlow: { symbol: 'L/s', si: FLOW_UNITS_M3S['L/s'], decimals: 2 },
    flow: { symbol: 'L/min', si: FLOW_UNITS_M3S['L/min'], decimals: 'auto' },
    flowPerHour: { symbol: 'L/h', si: LITRE_PER_HOUR_M3S, decimals: 'auto' },
    flowPerDay: { symbol: 'L/day', si: LITRE_M3 / SECONDS_PER_DAY, decimals: 'auto' },
    volume: { symbol: 'L', si: LITRE_M3, decimals: 'auto' },
    pressure: { symbol: 'kPa', si: PRESSURE_UNITS_PA.kPa, decimals: 0 },
    area: { symbol: 'm²', si: 1, decimals: 'auto' },
    depthPerDay: { symbol: 'mm/day', si: LENGTH_UNITS_M.mm, decimals: 'auto' },
    volumePerDay: { symbol: 'L/day', si: LITRE_M3, decimals: 'auto' },
    temperature: { symbol: '°C', si: 1, decimals: 0 },
  },
  us: {
    length: { symbol: 'ft', si: LENGTH_UNITS_M.ft, decimals: 1 },
    chainage: { symbol: 'ft', si: LENGTH_UNITS_M.ft, decimals: 0 },
    elevation: { symbol: 'ft', si: LENGTH_UNITS_M.ft, decimals: 2 },
    head: { symbol: 'ft', si: HEAD_UNITS_M.ft, decimals: 1 },
    headLoss: { symbol: 'ft', si: HEAD_UNITS_M.ft, decimals: 2 },
    depth: { symbol: 'ft', si: LENGTH_UNITS_M.ft, decimals: 2 },
    diameter: { symbol: 'in', si: LENGTH_UNITS_M.in, decimals: 'auto' },
    velocity: { symbol: 'ft/s', si: LENGTH_UNITS_M.ft, decimals: 2 },
    designFlow: { symbol: 'US gpm', si: FLOW_UNITS_M3S['US gpm'], decimals: 1 },
    flow: { symbol: 'US gpm', si: FLOW_UNITS_M3S['US gpm'], decimals: 'auto' },
    flowPerHour: { symbol: 'US gal/h', si: US_GALLON_M3 / 3600, decimals: 'auto' },
    flowPerDay: { symbol: 'US gal/day', si: FLOW_UNITS_M3S['US gal/day'], decimals: 'auto' },
    volume: { symbol: 'US gal', si: US_GALLON_M3, decimals: 'auto' },
    pressure: { symbol: 'psi', si: PRESSURE_UNITS_PA.psi, decimals: 1 },
    area: { symbol: 'ft²', si: FOOT_M * FOOT_M, decimals: 'auto' },
    // Irrigation depth: a week is how US growers read it.
    depthPerDay: { symbol: 'in/week', si: INCH_M / 7, decimals: 'auto' },
    volumePerDay: { symbol: 'US gal/day', si: US_GALLON_M3, decimals: 'auto' },
    // Water temperature is kept in °C (the core's unit); °F = °C × 9/5 + 32.
    temperature: { symbol: '°F', si: 5 / 9, decimals: 0, offset: 32 },
  },
};

/** The unit, its size in SI and the decimals a quantity is shown with in one unit system. */
export function unitDef(quantity: Quantity, system: UnitSystem): UnitDef {
  return UNITS[system][quantity];
}

export function unitOf(quantity: Quantity, system: UnitSystem): string {
  return UNITS[system][quantity].symbol;
}

/** SI -> the project's unit. */
export function toDisplay(quantity: Quantity, valueSi: number, system: UnitSystem): number {
  const def = UNITS[system][quantity];
  return valueSi / def.si + (def.offset ?? 0);
}

/** The project's unit -> SI (for forms). */
export function fromDisplay(quantity: Quantity, value: number, system: UnitSystem): number {
  const def = UNITS[system][quantity];
  return (value - (def.offset ?? 0)) * def.si;
}

/**
 * The gauge pressure of a head of water at `temperatureC` (the core's density; 20 °C by default), in the project's
 * unit.
 */
export function pressureOfHead(headM: number, system: UnitSystem, temperatureC?: number): number {
  return toDisplay('pressure', headMToPressurePa(headM, temperatureC), system);
}
