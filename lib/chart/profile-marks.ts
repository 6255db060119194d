import type { LineWarning } from '../../hydraulics/index';
import { formatQuantity } from '../units/index';
import { indexAtOrBefore } from './profile-frame';
import { DEVICE_STYLE, PROFILE_COLOURS, ZONE_FILLS } from './profile-palette';
import { deviceSymbol, outletSymbol, sourceSymbol } from './profile-symbols';
import type { ProfileChartData, ProfileChartOptions, ProfileFrame } from './profile-types';
import { el, type SvgNode } from './svg-node';

const r2 = (v: number) => Math.round(v * 100) / 100;

/** Value of a column at a chainage, linear between points. */
export function valueAt(chainageM: ArrayLike<number>, values: ArrayLike<number>, c: number): number {
  const i = indexAtOrBefore(chainageM, c);
  if (i >= chainageM.length - 1 || chainageM[i] === c) return values[i];
  const t = (c - chainageM[i]) / (chainageM[i + 1] - chainageM[i]);
  return values[i] + t * (values[i + 1] - values[i]);
}

export function warningRange(w: LineWarning): { fromM: number; toM: number } {
  return 'chainageM' in w.at ? { fromM: w.at.chainageM, toM: w.at.chainageM } : w.at;
}

/**
 * Warning zones: ranges shaded through both panels (danger in clay, warning in ochre), single
 * places marked with a flagged post. Info findings are flagged, not shaded.
 */
const PAINT_ORDER = { info: 0, warning: 1, danger: 2 } as const;

export function zonesLayer(data: ProfileChartData, frame: ProfileFrame): SvgNode {
  // Dangers are painted last so they show through any warning over the same range.
  const ordered = data.warnings
    .map((w, index) => ({ w, index }))
    .sort((a, b) => PAINT_ORDER[a.w.severity] - PAINT_ORDER[b.w.severity]);
  const marks = ordered.flatMap(({ w, index }): SvgNode[] => {
    const { fromM, toM } = warningRange(w);
    if (toM < frame.fromM || fromM > frame.toM) return [];
    const style = ZONE_FILLS[w.severity] ?? { fill: 'none', edge: PROFILE_COLOURS.staticLine };
    const common = {
      'data-warning': index,
      'data-code': w.code,
      'data-severity': w.severity,
      'data-from-m': r2(fromM),
      'data-to-m': r2(toM),
    };
    if (toM > fromM && ZONE_FILLS[w.severity]) {
      const x1 = r2(frame.x(Math.max(fromM, frame.fromM)));
      const x2 = r2(frame.x(Math.min(toM, frame.toM)));
      return [
        el(
          'g',
          common,
          el('rect', {
            x: x1,
            y: frame.elevationTop,
            width: r2(Math.max(x2 - x1, 1)),
            height: frame.elevationBottom - frame.elevationTop,
            fill: style.fill,
            'fill-opacity': 0.7,
          }),
          el('rect', {
            x: x1,
            y: frame.pressureTop,
            width: r2(Math.max(x2 - x1, 1)),
            height: frame.pressureBottom - frame.pressureTop,
            fill: style.fill,
            'fill-opacity': 0.7,
          }),
          el('rect', {
            x: x1,
            y: frame.elevationTop + (w.severity === 'danger' ? 0 : 5),
            width: r2(Math.max(x2 - x1, 1)),
            height: 4,
            fill: style.edge,
          }),
        ),
      ];
    }
    const x = r2(frame.x(fromM));
    return [
      el(
        'g',
        common,
        el('line', {
          x1: x,
          y1: frame.elevationTop,
          x2: x,
          y2: frame.elevationBottom,
          stroke: style.edge,
          'stroke-width': 1,
          'stroke-dasharray': '3 3',
        }),
        el('path', {
          d: `M${x},${frame.elevationTop}L${r2(x + 9)},${frame.elevationTop + 4}L${x},${frame.elevationTop + 8}Z`,
          fill: style.edge,
        }),
      ),
    ];
  });
  return el('g', { 'data-layer': 'zones' }, ...marks);
}

/** Devices on the pipe, the source at the start and the outlet at the end. */
export function devicesLayer(data: ProfileChartData, frame: ProfileFrame, options: ProfileChartOptions): SvgNode {
  const { chainageM, pipeElevationM, staticHeadM } = data.points;
  const u = options.units;
  const inView = (c: number) => c >= frame.fromM - 1e-9 && c <= frame.toM + 1e-9;
  const symbols = options.devices
    .filter((d) => inView(d.chainageM))
    .map((d) => {
      const tank =
        d.kind === 'break-pressure-tank'
          ? data.tanks.find((t) => Math.abs(t.chainageM - d.chainageM) < 1e-6)
          : undefined;
      const y = frame.yElevation(tank ? tank.waterLevelM : valueAt(chainageM, pipeElevationM, d.chainageM));
      return el(
        'g',
        { 'data-kind': d.kind, 'data-chainage-m': r2(d.chainageM) },
        el('title', {}, `${DEVICE_STYLE[d.kind].label} at ${formatQuantity('chainage', d.chainageM, u.system)}`),
        deviceSymbol(d.kind, frame.x(d.chainageM), y),
      );
    });
  const n = chainageM.length;
  const ends: SvgNode[] = [];
  if (inView(chainageM[0])) {
    ends.push(
      el(
        'g',
        { 'data-kind': 'source', 'data-chainage-m': r2(chainageM[0]) },
        el('title', {}, 'Source'),
        sourceSymbol(frame.x(chainageM[0]), frame.yElevation(staticHeadM[0])),
      ),
    );
  }
  if (inView(chainageM[n - 1])) {
    ends.push(
      el(
        'g',
        { 'data-kind': 'outlet', 'data-chainage-m': r2(chainageM[n - 1]) },
        el('title', {}, 'End of the line'),
        outletSymbol(frame.x(chainageM[n - 1]), frame.yElevation(pipeElevationM[n - 1])),
      ),
    );
  }
  return el('g', { 'data-layer': 'devices' }, ...symbols, ...ends);
}

/** An outline round the range picked in the warnings list. */
export function highlightLayer(frame: ProfileFrame, options: ProfileChartOptions): SvgNode | null {
  const h = options.highlight;
  if (!h || h.toM < frame.fromM || h.fromM > frame.toM) return null;
  const x1 = r2(frame.x(Math.max(h.fromM, frame.fromM)));
  const x2 = r2(frame.x(Math.min(h.toM, frame.toM)));
  return el(
    'g',
    { 'data-layer': 'highlight', 'data-from-m': r2(h.fromM), 'data-to-m': r2(h.toM) },
    el('rect', {
      x: r2(x1 - 3),
      y: frame.elevationTop - 2,
      width: r2(Math.max(x2 - x1, 0) + 6),
      height: frame.pressureBottom - frame.elevationTop + 4,
      fill: 'none',
      stroke: PROFILE_COLOURS.highlight,
      'stroke-width': 2,
      'stroke-dasharray': '6 3',
    }),
  );
}
