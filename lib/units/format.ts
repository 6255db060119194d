import { toDisplay, type DisplayUnits } from './display';

const grouped = (digits: number) => new Intl.NumberFormat('en-GB', { minimumFractionDigits: digits, maximumFractionDigits: digits });
const FORMATTERS = [0, 1, 2, 3].map(grouped);

/** A number with a fixed count of decimals and thousands separators; "-0.0" shows as "0.0". */
export function fixed(value: number, digits: number): string {
  const text = FORMATTERS[Math.min(Math.max(digits, 0), 3)].format(value);
  return /^-0(\.0+)?$/.test(text) ? text.slice(1) : text;
}

/** Chainage along the line, e.g. `1,234.5 m` or `4,050 ft`. */
export function formatChainage(m: number, u: DisplayUnits): string {
  return `${fixed(toDisplay.length(m, u), u.system === 'us' ? 0 : 1)} ${u.length}`;
}

/** An elevation or other length, e.g. `316.5 m` or `1,038.4 ft`. */
export function formatLength(m: number, u: DisplayUnits, digits = 1): string {
  return `${fixed(toDisplay.length(m, u), digits)} ${u.length}`;
}

/** A head of water alone, e.g. `42.1 m` or `138.1 ft`. */
export function formatHead(m: number, u: DisplayUnits): string {
  return `${fixed(toDisplay.head(m, u), 1)} ${u.head}`;
}

/** A pressure from a head of water, e.g. `413 kPa` or `59.9 psi`. */
export function formatPressureOfHead(headM: number, u: DisplayUnits, temperatureC?: number): string {
  return `${fixed(toDisplay.pressureOfHead(headM, u, temperatureC), u.pressure === 'psi' ? 1 : 0)} ${u.pressure}`;
}

/** Head and pressure together, the way the trade reads them: `42.1 m (413 kPa)`. */
export function formatHeadPressure(headM: number, u: DisplayUnits, temperatureC?: number): string {
  return `${formatHead(headM, u)} (${formatPressureOfHead(headM, u, temperatureC)})`;
}

/** A flow, e.g. `1.00 L/s` or `15.9 gpm`. */
export function formatFlow(m3s: number, u: DisplayUnits): string {
  return `${fixed(toDisplay.flow(m3s, u), u.system === 'us' ? 1 : 2)} ${u.flowLabel}`;
}

/** A velocity, e.g. `0.77 m/s` or `2.51 ft/s`. */
export function formatVelocity(ms: number, u: DisplayUnits): string {
  return `${fixed(toDisplay.velocity(ms, u), 2)} ${u.velocityLabel}`;
}

/** A pressure in pascals, e.g. `800 kPa` or `116.0 psi`. */
export function formatPressure(pa: number, u: DisplayUnits): string {
  return `${fixed(toDisplay.pressure(pa, u), u.pressure === 'psi' ? 1 : 0)} ${u.pressure}`;
}

/** A water temperature in C, with F alongside for US projects. */
export function formatTemperature(c: number, u: DisplayUnits): string {
  return u.system === 'us' ? `${fixed(c, 0)} °C (${fixed((c * 9) / 5 + 32, 0)} °F)` : `${fixed(c, 0)} °C`;
}
