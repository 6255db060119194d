import { formatNumber, formatPlainNumber, toDisplay, type DisplayUnits } from '../units/index';

const NUMBER = String.raw`(-?\d+(?:\.\d+)?)`;

/**
 * The engineering core words its warnings in SI (`ch. 530.4–747.2 m`, `81.7 m`, `1.23 m/s`,
 * `1.20 L/s`, see hydraulics/checks/wording.ts). For a US project the same figures are restated in
 * feet and gallons per minute; metric text is returned as it is. Millimetre pipe sizes
 * (`40 mm PE80`) are part of the pipe's name and stay.
 */
export function localiseWarningText(text: string, u: DisplayUnits): string {
  if (u.system === 'metric') return text;
  const length = (m: string, digits: number) => formatPlainNumber(toDisplay('length', Number(m), u.system), digits);
  return text
    .replace(new RegExp(`${NUMBER} L/s`, 'g'), (_, v: string) => `${formatNumber(toDisplay('designFlow', Number(v) / 1000, u.system), 1)} ${u.flow}`)
    .replace(new RegExp(`${NUMBER} m/s`, 'g'), (_, v: string) => `${formatNumber(toDisplay('velocity', Number(v), u.system), 2)} ${u.velocity}`)
    .replace(new RegExp(`ch\\. ${NUMBER}\u2013${NUMBER} m\\b`, 'g'), (_, a: string, b: string) => `ch. ${length(a, 0)}\u2013${length(b, 0)} ${u.length}`)
    .replace(new RegExp(`ch\\. ${NUMBER} m\\b`, 'g'), (_, a: string) => `ch. ${length(a, 0)} ${u.length}`)
    .replace(new RegExp(`${NUMBER} m\\b(?!/)`, 'g'), (_, v: string) => `${length(v, 1)} ${u.length}`);
}
