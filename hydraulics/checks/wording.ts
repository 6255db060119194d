/**
 * Caution carried by every message about pressure or surge: the figures are estimates from
 * published formulas, not a licensed design.
 */
export const PRESSURE_CAUTION =
  'These are estimates: check them against local codes and the pipe maker\u2019s data, and have a qualified person review pressure and surge.';

/** A length or head for a message, in metres with one decimal. */
export function metres(valueM: number): string {
  return `${valueM.toFixed(1)} m`;
}

/** A chainage for a message, e.g. `ch. 1234.5 m`. */
export function chainage(valueM: number): string {
  return `ch. ${valueM.toFixed(1)} m`;
}

/** A chainage range for a message. */
export function chainageRange(fromM: number, toM: number): string {
  return `ch. ${fromM.toFixed(1)}\u2013${toM.toFixed(1)} m`;
}

/** A velocity for a message. */
export function speed(valueMs: number): string {
  return `${valueMs.toFixed(2)} m/s`;
}

/** A flow for a message, in L/s. */
export function litresPerSecond(flowM3s: number): string {
  return `${(flowM3s * 1000).toFixed(2)} L/s`;
}
