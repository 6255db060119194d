import type { LineDeviceKind } from '../../hydraulics/index';
import { DEVICE_STYLE, PROFILE_COLOURS } from './profile-palette';
import { el, type SvgNode } from './svg-node';

const r2 = (v: number) => Math.round(v * 100) / 100;

/** A device symbol centred at (x, y): Runnel's own marks, drawn from plain shapes. */
export function deviceSymbol(kind: LineDeviceKind, x: number, y: number): SvgNode {
  const colour = DEVICE_STYLE[kind].colour;
  const at = (dx: number, dy: number) => `${r2(x + dx)},${r2(y + dy)}`;
  switch (kind) {
    case 'break-pressure-tank':
      // An open box with its water surface: the level the static line resets to.
      return el(
        'g',
        {},
        el('path', {
          d: `M${at(-7, -10)}L${at(-7, 2)}L${at(7, 2)}L${at(7, -10)}`,
          fill: '#ffffff',
          stroke: colour,
          'stroke-width': 2,
        }),
        el('line', {
          x1: r2(x - 5),
          y1: r2(y - 6),
          x2: r2(x + 5),
          y2: r2(y - 6),
          stroke: PROFILE_COLOURS.staticLine,
          'stroke-width': 2,
        }),
      );
    case 'air-release-valve':
      // A stem with an upward chevron: air leaves upwards.
      return el(
        'g',
        {},
        el('line', { x1: r2(x), y1: r2(y), x2: r2(x), y2: r2(y - 12), stroke: colour, 'stroke-width': 1.5 }),
        el('path', { d: `M${at(-5, -9)}L${at(0, -15)}L${at(5, -9)}`, fill: 'none', stroke: colour, 'stroke-width': 2 }),
      );
    case 'washout':
      // A stem with a downward chevron: water and silt leave downwards.
      return el(
        'g',
        {},
        el('line', { x1: r2(x), y1: r2(y), x2: r2(x), y2: r2(y + 12), stroke: colour, 'stroke-width': 1.5 }),
        el('path', { d: `M${at(-5, 9)}L${at(0, 15)}L${at(5, 9)}`, fill: 'none', stroke: colour, 'stroke-width': 2 }),
      );
    case 'isolation-valve':
      // Two touching triangles across the pipe.
      return el('path', {
        d: `M${at(-6, -5)}L${at(6, 5)}L${at(6, -5)}L${at(-6, 5)}Z`,
        fill: colour,
        stroke: colour,
        'stroke-width': 1,
      });
  }
}

/** The source at the start: a short water surface with ripples. */
export function sourceSymbol(x: number, y: number): SvgNode {
  return el(
    'g',
    {},
    el('line', {
      x1: r2(x - 8),
      y1: r2(y),
      x2: r2(x + 8),
      y2: r2(y),
      stroke: PROFILE_COLOURS.staticLine,
      'stroke-width': 2.5,
    }),
    el('line', {
      x1: r2(x - 5),
      y1: r2(y + 4),
      x2: r2(x + 5),
      y2: r2(y + 4),
      stroke: PROFILE_COLOURS.staticLine,
      'stroke-width': 1.5,
    }),
    el('line', {
      x1: r2(x - 2),
      y1: r2(y + 7),
      x2: r2(x + 2),
      y2: r2(y + 7),
      stroke: PROFILE_COLOURS.staticLine,
      'stroke-width': 1,
    }),
  );
}

/** The end of the line: a ring with a falling drop (outlet or tank inlet). */
export function outletSymbol(x: number, y: number): SvgNode {
  return el(
    'g',
    {},
    el('circle', { cx: r2(x), cy: r2(y), r: 5, fill: '#ffffff', stroke: PROFILE_COLOURS.gradeLine, 'stroke-width': 2 }),
    el('path', {
      d: `M${r2(x)},${r2(y + 7)}Q${r2(x + 3)},${r2(y + 12)} ${r2(x)},${r2(y + 13)}Q${r2(x - 3)},${r2(y + 12)} ${r2(x)},${r2(y + 7)}Z`,
      fill: PROFILE_COLOURS.staticLine,
    }),
  );
}
