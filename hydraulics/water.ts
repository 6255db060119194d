import { GRAVITY_MS2, STANDARD_ATMOSPHERE_PA, WATER_TEMPERATURE_MAX_C, WATER_TEMPERATURE_MIN_C } from './constants';
import { assertInRange } from './input-guards';

/**
 * Properties of liquid water between 0 and 40 °C, and the atmosphere a siphon works against.
 *
 * - Density: Tanaka et al., "Recommended table for the density of water between 0 °C and 40 °C",
 *   Metrologia 38:301-309 (2001), Eq. 1 (air-free water; coefficients from memory), checked in the
 *   tests against the published density column (ICT / Tupper Table 5.1 / EngineersEdge).
 * - Dynamic viscosity: Landolt-Börnstein New Series V/3a (1986) correlation as published by
 *   kayakdesign.org, μ(20 °C) = 1.002 mPa·s.
 * - Vapour pressure: Buck-type form 611.21·exp((18.678 − T/234.5)·T/(257.14 + T)) Pa.
 * - Atmosphere: International Standard Atmosphere troposphere, p = 101325 (1 − 2.25577e-5 h)^5.25588.
 */

const TANAKA_A1 = -3.983035; // °C
const TANAKA_A2 = 301.797; // °C
const TANAKA_A3 = 522528.9; // °C²
const TANAKA_A4 = 69.34881; // °C
const TANAKA_A5 = 999.97495; // kg/m³

/** The ISA troposphere formula holds to 11 km; below −500 m there is no land to lay pipe on. */
const ALTITUDE_MIN_M = -500;
const ALTITUDE_MAX_M = 11_000;

function assertWaterTemperature(temperatureC: number, field: string): void {
  assertInRange(temperatureC, field, WATER_TEMPERATURE_MIN_C, WATER_TEMPERATURE_MAX_C, '°C');
}

/** Density of water, kg/m³, at `temperatureC` (0-40 °C). */
export function waterDensityKgM3(temperatureC: number): number {
  assertWaterTemperature(temperatureC, 'temperatureC');
  const t = temperatureC;
  return TANAKA_A5 * (1 - ((t + TANAKA_A1) ** 2 * (t + TANAKA_A2)) / (TANAKA_A3 * (t + TANAKA_A4)));
}

/** Dynamic viscosity of water, Pa·s, at `temperatureC` (0-40 °C). */
export function waterDynamicViscosityPaS(temperatureC: number): number {
  assertWaterTemperature(temperatureC, 'temperatureC');
  const t = temperatureC;
  const exponent = (1.1709 * (20 - t) - 1.827e-3 * (t - 20) ** 2) / (t + 89.93);
  return 1.002e-3 * 10 ** exponent;
}

/** Kinematic viscosity of water, m²/s, at `temperatureC` (0-40 °C). */
export function waterKinematicViscosityM2s(temperatureC: number): number {
  return waterDynamicViscosityPaS(temperatureC) / waterDensityKgM3(temperatureC);
}

/** Saturation vapour pressure of water, Pa, at `temperatureC` (0-40 °C). */
export function waterVapourPressurePa(temperatureC: number): number {
  assertWaterTemperature(temperatureC, 'temperatureC');
  const t = temperatureC;
  return 611.21 * Math.exp((18.678 - t / 234.5) * (t / (257.14 + t)));
}

/** Atmospheric pressure, Pa, at `altitudeM` above sea level (ISA troposphere). */
export function atmosphericPressurePa(altitudeM: number): number {
  assertInRange(altitudeM, 'altitudeM', ALTITUDE_MIN_M, ALTITUDE_MAX_M, 'm');
  return STANDARD_ATMOSPHERE_PA * (1 - 2.25577e-5 * altitudeM) ** 5.25588;
}

/** Options for {@link atmosphericHeadM}. */
export interface AtmosphericHeadOptions {
  /** Site altitude above sea level, m. */
  altitudeM: number;
  /** Water temperature, °C (sets the density the pressure is divided by). */
  temperatureC: number;
}

/** Atmospheric pressure expressed as metres of water column at the given altitude and water temperature. */
export function atmosphericHeadM({ altitudeM, temperatureC }: AtmosphericHeadOptions): number {
  return atmosphericPressurePa(altitudeM) / (waterDensityKgM3(temperatureC) * GRAVITY_MS2);
}

/** Vapour pressure of water expressed as metres of water column at `temperatureC`. */
export function vapourHeadM(temperatureC: number): number {
  return waterVapourPressurePa(temperatureC) / (waterDensityKgM3(temperatureC) * GRAVITY_MS2);
}
