import { scaleLinear } from 'd3-scale';
import { area, line as d3line } from 'd3-shape';
import type { NetworkLineSummary } from '../network/view';
import { PROFILE_COLOURS } from './profile-palette';
import { el, type SvgNode } from './svg-node';

export const STRIP = { width: 900, height: 200, left: 48, right: 16, top: 16, bottom: 28 } as const;

/**
 * A line's ground profile for placing a take-off: chainage across, ground up, with the line's
 * take-offs marked and named. The panel carries its pixel range and chainage domain as data
 * attributes, so a click maps back to a chainage the same way on screen and in tests.
 */
export function buildTakeOffStrip(line: NetworkLineSummary, takeOffs: { name: string; chainageM: number }[]): SvgNode {
  const { width, height, left, right, top, bottom } = STRIP;
  const x = scaleLinear()
    .domain([line.fromChainageM, line.toChainageM])
    .range([left, width - right]);
  const grounds = line.plan.map((p) => p.groundM);
  const y = scaleLinear()
    .domain([Math.min(...grounds) - 2, Math.max(...grounds) + 2])
    .range([height - bottom, top]);
  const ground = d3line<NetworkLineSummary['plan'][number]>()
    .x((p) => x(p.chainageM))
    .y((p) => y(p.groundM));
  const fill = area<NetworkLineSummary['plan'][number]>()
    .x((p) => x(p.chainageM))
    .y0(height - bottom)
    .y1((p) => y(p.groundM));
  return el(
    'svg',
    {
      viewBox: `0 0 ${width} ${height}`,
      width: '100%',
      role: 'img',
      'aria-label': `Long profile of ${line.name}: click to place a take-off`,
      'data-scene': 'take-off-strip',
    },
    el(
      'g',
      {
        'data-layer': 'panel',
        'data-x-range': `${left},${width - right}`,
        'data-chainage-domain': `${line.fromChainageM},${line.toChainageM}`,
      },
      el('rect', {
        x: left,
        y: top,
        width: width - left - right,
        height: height - top - bottom,
        fill: PROFILE_COLOURS.paper,
        stroke: PROFILE_COLOURS.gridline,
      }),
      el('path', { d: fill(line.plan) ?? '', fill: PROFILE_COLOURS.groundFill }),
      el('path', { d: ground(line.plan) ?? '', fill: 'none', stroke: PROFILE_COLOURS.groundLine, 'stroke-width': 1.5 }),
    ),
    el(
      'g',
      { 'data-layer': 'take-offs' },
      ...takeOffs.map((t) =>
        el(
          'g',
          {},
          el('line', {
            x1: x(t.chainageM),
            x2: x(t.chainageM),
            y1: top,
            y2: height - bottom,
            stroke: PROFILE_COLOURS.ink,
            'stroke-dasharray': '4 3',
          }),
          el('text', { x: x(t.chainageM) + 4, y: top + 12, 'font-size': 11, fill: PROFILE_COLOURS.ink }, t.name),
        ),
      ),
    ),
    el('text', { x: left, y: height - 8, 'font-size': 10, fill: PROFILE_COLOURS.ink }, 'Chainage along the line →'),
  );
}

/** The chainage under a click at `xPixel` (in the strip's own pixel units). */
export function chainageAtPixel(line: NetworkLineSummary, xPixel: number): number {
  const x = scaleLinear()
    .domain([STRIP.left, STRIP.width - STRIP.right])
    .range([line.fromChainageM, line.toChainageM])
    .clamp(true);
  return x(xPixel);
}
