import type { DisplayUnits } from '../units/display';
import { toDisplay } from '../units/display';
import { fixed } from '../units/format';

const NUMBER = String.raw`(-?\d+(?:\.\d+)?)`;

/**
 * The engineering core words its warnings in SI (`ch. 530.4–747.2 m`, `81.7 m`, `1.23 m/s`,
 * `1.20 L/s`, see hydraulics/checks/wording.ts). For a US project the same figures are restated in
 * feet and gallons per minute; metric text is returned as it is. Millimetre pipe sizes
 * (`40 mm PE80`) are part of the pipe's name and stay.
 */
export function localiseWarningText(text: string, u: DisplayUnits): string {
  if (u.system === 'metric') return text;
  const length = (m: string, digits: number) => fixed(toDisplay.length(Number(m), u), digits).replace(/,/g, '');
  return text
    .replace(new RegExp(`${NUMBER} L/s`, 'g'), (_, v: string) => `${fixed(toDisplay.flow(Number(v) / 1000, u), 1)} ${u.flowLabel}`)
    .replace(new RegExp(`${NUMBER} m/s`, 'g'), (_, v: string) => `${fixed(toDisplay.velocity(Number(v), u), 2)} ${u.velocityLabel}`)
    .replace(new RegExp(`ch\\. ${NUMBER}\u2013${NUMBER} m\\b`, 'g'), (_, a: string, b: string) => `ch. ${length(a, 0)}\u2013${length(b, 0)} ${u.length}`)
    .replace(new RegExp(`ch\\. ${NUMBER} m\\b`, 'g'), (_, a: string) => `ch. ${length(a, 0)} ${u.length}`)
    .replace(new RegExp(`${NUMBER} m\\b(?!/)`, 'g'), (_, v: string) => `${length(v, 1)} ${u.length}`);
}
