import { displayUnits } from './labels';
import { formatNumber, formatPlainNumber } from './number';
import { toDisplay, type UnitSystem } from './quantities';

const NUMBER = String.raw`(-?\d+(?:\.\d+)?)`;

/**
 * The engineering core words its messages in SI (`ch. 530.4–747.2 m`, `81.7 m`, `1.23 m/s`,
 * `1.20 L/s`, `2.5 L/min`, `3.20 m³`; see hydraulics/checks/wording.ts). For a US project the same
 * figures are restated in feet, US gallons and US gpm; metric text is returned as it is.
 * Millimetre pipe sizes (`40 mm PE80`) are part of the pipe's name and stay.
 */
export function localiseWarningText(text: string, system: UnitSystem): string {
  if (system === 'metric') return text;
  const u = displayUnits(system);
  const length = (m: string, digits: number) => formatPlainNumber(toDisplay('length', Number(m), u.system), digits);
  return text
    .replace(new RegExp(`${NUMBER} m³`, 'g'), (_, v: string) => `${formatNumber(toDisplay('volume', Number(v), u.system), 0)} US gal`)
    .replace(new RegExp(`${NUMBER} L/min`, 'g'), (_, v: string) => `${formatNumber(toDisplay('flow', Number(v) / 60_000, u.system), 2)} US gpm`)
    .replace(new RegExp(`${NUMBER} L/s`, 'g'), (_, v: string) => `${formatNumber(toDisplay('designFlow', Number(v) / 1000, u.system), 1)} ${u.flow}`)
    .replace(new RegExp(`${NUMBER} m/s`, 'g'), (_, v: string) => `${formatNumber(toDisplay('velocity', Number(v), u.system), 2)} ${u.velocity}`)
    .replace(new RegExp(`ch\\. ${NUMBER}\u2013${NUMBER} m\\b`, 'g'), (_, a: string, b: string) => `ch. ${length(a, 0)}\u2013${length(b, 0)} ${u.length}`)
    .replace(new RegExp(`ch\\. ${NUMBER} m\\b`, 'g'), (_, a: string) => `ch. ${length(a, 0)} ${u.length}`)
    .replace(new RegExp(`${NUMBER} m\\b(?!/)`, 'g'), (_, v: string) => `${length(v, 1)} ${u.length}`);
}
