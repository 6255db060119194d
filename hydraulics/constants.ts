/**
 * Physical constants and exact unit definitions used across the engineering core.
 * Exact values are exact by definition (SI brochure, international yard and pound agreement 1959).
 */

/** Standard acceleration of gravity, m/s² (exact, CGPM 1901). */
export const GRAVITY_MS2 = 9.80665;

/** One inch in metres (exact). */
export const INCH_M = 0.0254;
/** One foot in metres (exact). */
export const FOOT_M = 0.3048;
/** One pound-mass in kilograms (exact). */
export const POUND_KG = 0.45359237;
/** One pound-force per square inch in pascals: lbf = lb × g_n, in² exact. */
export const PSI_PA = (POUND_KG * GRAVITY_MS2) / (INCH_M * INCH_M);
/** One bar in pascals (exact). */
export const BAR_PA = 100_000;
/** One US gallon (231 in³) in cubic metres (exact). */
export const US_GALLON_M3 = 231 * INCH_M ** 3;
/** One imperial gallon in cubic metres (exact, 4.546 09 L). */
export const IMPERIAL_GALLON_M3 = 4.54609e-3;
/** Seconds in a day. */
export const SECONDS_PER_DAY = 86_400;
/** Standard sea-level atmospheric pressure, Pa (ISA). */
export const STANDARD_ATMOSPHERE_PA = 101_325;
/** Water temperature assumed when a caller gives none, °C (design default; the ISO rating temperature). */
export const DEFAULT_WATER_TEMPERATURE_C = 20;
/** Temperature range over which the water-property correlations are used, °C. */
export const WATER_TEMPERATURE_MIN_C = 0;
export const WATER_TEMPERATURE_MAX_C = 40;
