import {
  BAR_PA,
  DEFAULT_WATER_TEMPERATURE_C,
  FOOT_M,
  GRAVITY_MS2,
  IMPERIAL_GALLON_M3,
  INCH_M,
  PSI_PA,
  SECONDS_PER_DAY,
  US_GALLON_M3,
} from './constants';
import { HydraulicsInputError } from './errors';
import { assertFiniteNumber } from './input-guards';
import { waterDensityKgM3 } from './water';

/**
 * Conversions used at the edges (forms, imports, reports). Everything inside the core is SI:
 * m, m³/s, Pa, m of head. Each table maps a unit symbol to its size in the SI unit.
 */

export const LENGTH_UNITS_M = { m: 1, mm: 1e-3, ft: FOOT_M, in: INCH_M } as const;
export type LengthUnit = keyof typeof LENGTH_UNITS_M;

export const FLOW_UNITS_M3S = {
  'm3/s': 1,
  'L/s': 1e-3,
  'L/min': 1e-3 / 60,
  'US gpm': US_GALLON_M3 / 60,
  'imp gpm': IMPERIAL_GALLON_M3 / 60,
  'm3/day': 1 / SECONDS_PER_DAY,
  'US gal/day': US_GALLON_M3 / SECONDS_PER_DAY,
} as const;
export type FlowUnit = keyof typeof FLOW_UNITS_M3S;

export const PRESSURE_UNITS_PA = { Pa: 1, kPa: 1e3, bar: BAR_PA, psi: PSI_PA } as const;
export type PressureUnit = keyof typeof PRESSURE_UNITS_PA;

export const HEAD_UNITS_M = { m: 1, ft: FOOT_M } as const;
export type HeadUnit = keyof typeof HEAD_UNITS_M;

function factorOf<T extends Record<string, number>>(table: T, unit: string, field: string): number {
  const factor = (table as Record<string, number>)[unit];
  if (factor === undefined) {
    throw new HydraulicsInputError(field, `unknown unit "${unit}"; expected one of ${Object.keys(table).join(', ')}`);
  }
  return factor;
}

/** Converts a length in `unit` to metres. */
export function lengthToM(value: number, unit: LengthUnit): number {
  assertFiniteNumber(value, 'length');
  return value * factorOf(LENGTH_UNITS_M, unit, 'lengthUnit');
}

/** Converts metres to `unit`. */
export function lengthFromM(lengthM: number, unit: LengthUnit): number {
  assertFiniteNumber(lengthM, 'lengthM');
  return lengthM / factorOf(LENGTH_UNITS_M, unit, 'lengthUnit');
}

/** Converts a flow in `unit` to m³/s. */
export function flowToM3s(value: number, unit: FlowUnit): number {
  assertFiniteNumber(value, 'flow');
  return value * factorOf(FLOW_UNITS_M3S, unit, 'flowUnit');
}

/** Converts m³/s to `unit`. */
export function flowFromM3s(flowM3s: number, unit: FlowUnit): number {
  assertFiniteNumber(flowM3s, 'flowM3s');
  return flowM3s / factorOf(FLOW_UNITS_M3S, unit, 'flowUnit');
}

/** Converts a pressure in `unit` to pascals. */
export function pressureToPa(value: number, unit: PressureUnit): number {
  assertFiniteNumber(value, 'pressure');
  return value * factorOf(PRESSURE_UNITS_PA, unit, 'pressureUnit');
}

/** Converts pascals to `unit`. */
export function pressureFromPa(pressurePa: number, unit: PressureUnit): number {
  assertFiniteNumber(pressurePa, 'pressurePa');
  return pressurePa / factorOf(PRESSURE_UNITS_PA, unit, 'pressureUnit');
}

/** Converts a head in `unit` (m or ft of water) to metres of water. */
export function headToM(value: number, unit: HeadUnit): number {
  assertFiniteNumber(value, 'head');
  return value * factorOf(HEAD_UNITS_M, unit, 'headUnit');
}

/** Converts metres of water to `unit`. */
export function headFromM(headM: number, unit: HeadUnit): number {
  assertFiniteNumber(headM, 'headM');
  return headM / factorOf(HEAD_UNITS_M, unit, 'headUnit');
}

/**
 * Pressure (Pa, gauge or absolute) to metres of water column, using the density of water at
 * `temperatureC` (@default 20 °C). Negative pressures give negative heads (suction).
 */
export function pressurePaToHeadM(pa: number, temperatureC: number = DEFAULT_WATER_TEMPERATURE_C): number {
  assertFiniteNumber(pa, 'pressurePa');
  return pa / (waterDensityKgM3(temperatureC) * GRAVITY_MS2);
}

/** Metres of water column to pascals at `temperatureC` (@default 20 °C). */
export function headMToPressurePa(headM: number, temperatureC: number = DEFAULT_WATER_TEMPERATURE_C): number {
  assertFiniteNumber(headM, 'headM');
  return headM * waterDensityKgM3(temperatureC) * GRAVITY_MS2;
}
