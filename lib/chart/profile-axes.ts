import { scaleLinear } from 'd3-scale';
import { formatNumber, pressureOfHead, toDisplay } from '../units/index';
import { FONT_FAMILY, PROFILE_COLOURS } from './profile-palette';
import type { ProfileFrame } from './profile-types';
import { el, type SvgNode } from './svg-node';

const r2 = (v: number) => Math.round(v * 100) / 100;
const text = (
  x: number,
  y: number,
  label: string,
  anchor: 'start' | 'middle' | 'end',
  extra: Record<string, string | number> = {},
) =>
  el(
    'text',
    { x: r2(x), y: r2(y), 'text-anchor': anchor, 'font-size': 11, fill: PROFILE_COLOURS.ink, ...extra },
    label,
  );

function tickDigits(ticks: number[]): number {
  const step = ticks.length > 1 ? Math.abs(ticks[1] - ticks[0]) : 1;
  return step >= 1 ? 0 : step >= 0.1 ? 1 : 2;
}

/** Chainage ticks under both panels, elevation and head on the left, pressure on the right. */
export function axesLayer(frame: ProfileFrame): SvgNode {
  const u = frame.units;
  const unit = (m: number) => toDisplay('length', m, u.system);
  const xs = scaleLinear()
    .domain([unit(frame.fromM), unit(frame.toM)])
    .range([frame.plotLeft, frame.plotRight]);
  const xTicks = xs.ticks(Math.max(Math.floor((frame.plotRight - frame.plotLeft) / 90), 2));
  const xd = tickDigits(xTicks);
  const ye = scaleLinear().domain(frame.elevationDomainM.map(unit)).range([frame.elevationBottom, frame.elevationTop]);
  const yp = scaleLinear().domain(frame.pressureDomainM.map(unit)).range([frame.pressureBottom, frame.pressureTop]);
  const pressureOf = (headM: number) => pressureOfHead(headM, u.system);
  const pp = scaleLinear()
    .domain(frame.pressureDomainM.map(pressureOf))
    .range([frame.pressureBottom, frame.pressureTop]);
  const eTicks = ye.ticks(6);
  const hTicks = yp.ticks(4);
  const pTicks = pp.ticks(4);
  const xAxis = (y: number, labels: boolean) => [
    el('path', {
      d: `M${frame.plotLeft},${y}L${frame.plotRight},${y}`,
      stroke: PROFILE_COLOURS.ink,
      'stroke-width': 1,
    }),
    ...xTicks
      .flatMap((t) => [
        el('path', { d: `M${r2(xs(t))},${y}L${r2(xs(t))},${y + 4}`, stroke: PROFILE_COLOURS.ink }),
        labels && text(xs(t), y + 15, formatNumber(t, xd), 'middle'),
      ])
      .filter((n): n is SvgNode => Boolean(n)),
  ];
  const grid = (ticks: number[], scale: (v: number) => number, role: string) =>
    ticks.map((t) =>
      el('path', {
        d: `M${frame.plotLeft},${r2(scale(t))}L${frame.plotRight},${r2(scale(t))}`,
        stroke: PROFILE_COLOURS.gridline,
        'stroke-width': 1,
        'data-role': role,
      }),
    );
  const side = (ticks: number[], scale: (v: number) => number, x: number, anchor: 'start' | 'end') =>
    ticks.map((t) => text(anchor === 'end' ? x - 6 : x + 6, scale(t) + 4, formatNumber(t, tickDigits(ticks)), anchor));
  const midE = (frame.elevationTop + frame.elevationBottom) / 2;
  const midP = (frame.pressureTop + frame.pressureBottom) / 2;
  return el(
    'g',
    { 'data-layer': 'axes', 'font-family': FONT_FAMILY },
    el('g', { 'data-role': 'grid' }, ...grid(eTicks, ye, 'elevation-grid'), ...grid(hTicks, yp, 'pressure-grid')),
    el(
      'g',
      { 'data-role': 'x-axis' },
      ...xAxis(frame.elevationBottom, true),
      ...xAxis(frame.pressureBottom, true),
      text((frame.plotLeft + frame.plotRight) / 2, frame.pressureBottom + 32, `Chainage (${u.length})`, 'middle', {
        'font-weight': 'bold',
      }),
    ),
    el(
      'g',
      { 'data-role': 'elevation-axis' },
      ...side(eTicks, ye, frame.plotLeft, 'end'),
      text(16, midE, `Elevation (${u.length})`, 'middle', {
        transform: `rotate(-90 16 ${r2(midE)})`,
        'font-weight': 'bold',
      }),
    ),
    el(
      'g',
      { 'data-role': 'head-axis' },
      ...side(hTicks, yp, frame.plotLeft, 'end'),
      text(16, midP, `Pressure head (${u.head})`, 'middle', {
        transform: `rotate(-90 16 ${r2(midP)})`,
        'font-weight': 'bold',
      }),
    ),
    el(
      'g',
      { 'data-role': 'pressure-axis' },
      ...side(pTicks, pp, frame.plotRight, 'start'),
      text(frame.width - 14, midP, `Pressure (${u.pressure})`, 'middle', {
        transform: `rotate(90 ${r2(frame.width - 14)} ${r2(midP)})`,
        'font-weight': 'bold',
      }),
    ),
    text(frame.plotLeft, frame.elevationTop - 8, 'Ground, pipe and grade lines', 'start', { 'font-weight': 'bold' }),
    text(
      frame.plotRight,
      frame.elevationTop - 8,
      `Vertical exaggeration \u00d7${formatNumber(frame.exaggeration, frame.exaggeration < 10 ? 1 : 0)}`,
      'end',
      { 'data-role': 'exaggeration' },
    ),
    text(frame.plotLeft, frame.pressureTop - 8, 'Pressure in the pipe', 'start', { 'font-weight': 'bold' }),
  );
}
