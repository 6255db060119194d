/** Pipe material family; decides roughness, Hazen-Williams C, modulus and temperature derating. */
export type PipeMaterial = 'pvc' | 'pe' | 'steel' | 'custom';

/**
 * One pipe as plain data (catalogue entry or a user's custom pipe). SI units throughout.
 * A custom pipe is the same shape, checked by `assertPipeSpec` before use.
 */
export interface PipeSpec {
  /** Stable identifier, e.g. `pvc-d2241-sdr21-2in`. */
  id: string;
  /** Human label, e.g. `2 in PVC SDR 21 (200 psi)`. */
  label: string;
  material: PipeMaterial;
  /** Nominal size as printed by the standard, e.g. `2 in` or `63 mm`. */
  nominalSize: string;
  /** Outside diameter, m. */
  outsideDiameterM: number;
  /** Inside diameter used for flow, m. */
  insideDiameterM: number;
  /** Wall thickness, m. */
  wallM: number;
  /** Pressure rating at the standard's reference temperature (23 C for ASTM, 20 C for ISO), Pa. */
  pressureRatingPa: number;
  /** Hazen-Williams C for the material (dimensionless). */
  hazenWilliamsC: number;
  /** Absolute roughness for Darcy-Weisbach, m. */
  roughnessM: number;
  /** Pressure-wave speed for surge, m/s. */
  waveSpeedMs: number;
  /** Standard and table the dimensions and rating come from. */
  source: string;
  /** SDR (OD-based) or SIDR (ID-based) where the standard defines one. */
  sdr?: number;
  sidr?: number;
}
