import { indexAtOrBefore } from './profile-frame';
import { polylinePath } from './polyline-path';
import { PIPE_CLASS_COLOURS, PROFILE_COLOURS } from './profile-palette';
import type { ProfileChartData, ProfileFrame } from './profile-types';
import { el, type SvgNode } from './svg-node';

const r2 = (v: number) => Math.round(v * 100) / 100;

/** First position in the ascending `indices` whose chainage is at least `c` (binary search). */
function lowerBound(indices: readonly number[], chainageM: ArrayLike<number>, c: number): number {
  let lo = 0;
  let hi = indices.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (chainageM[indices[mid]] < c) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

/** Thinned indices lying in [fromM, toM] (inclusive). */
function indicesIn(indices: readonly number[], chainageM: ArrayLike<number>, fromM: number, toM: number): number[] {
  return indices.slice(
    lowerBound(indices, chainageM, fromM - 1e-9),
    lowerBound(indices, chainageM, toM + 1e-9 + Number.EPSILON * Math.abs(toM)),
  );
}

/** Path through the points `idx`, x from chainage, y from `y(i)`. */
function seriesPath(
  idx: readonly number[],
  chainageM: ArrayLike<number>,
  x: (c: number) => number,
  y: (i: number) => number,
): string {
  const xs = new Float64Array(idx.length);
  const ys = new Float64Array(idx.length);
  for (let k = 0; k < idx.length; k++) {
    xs[k] = x(chainageM[idx[k]]);
    ys[k] = y(idx[k]);
  }
  return polylinePath(xs, ys);
}

/** Static level of a reach: the value just downstream of its first point. */
function reachLevel(data: ProfileChartData, fromM: number): number {
  return data.points.staticHeadM[indexAtOrBefore(data.points.chainageM, fromM)];
}

/**
 * The band of the ground's uncertainty, ± the survey's height scatter: on a walked GPS route the
 * real ground lies somewhere in it, so a line drawn close to a limit inside it is not a finding.
 */
function groundBand(data: ProfileChartData, frame: ProfileFrame, indices: readonly number[]): SvgNode | null {
  const scatterM = data.settings.heightScatterM ?? 0;
  if (!(scatterM > 0.1) || indices.length < 2) return null;
  const { chainageM, groundElevationM } = data.points;
  const upper = seriesPath(indices, chainageM, frame.x, (i) => frame.yElevation(groundElevationM[i] + scatterM));
  const back = [...indices].reverse();
  const lower = seriesPath(back, chainageM, frame.x, (i) => frame.yElevation(groundElevationM[i] - scatterM)).replace(
    /^M/,
    'L',
  );
  return el('path', {
    d: `${upper}${lower}Z`,
    fill: PROFILE_COLOURS.groundLine,
    'fill-opacity': 0.14,
    stroke: 'none',
    'data-role': 'ground-band',
    'data-scatter-m': r2(scatterM),
  });
}

/** The ground line and the earth below it, with its uncertainty band when the survey scatters. */
export function groundLayer(data: ProfileChartData, frame: ProfileFrame, indices: readonly number[]): SvgNode {
  const { chainageM, groundElevationM } = data.points;
  const lineD = seriesPath(indices, chainageM, frame.x, (i) => frame.yElevation(groundElevationM[i]));
  const firstX = r2(frame.x(chainageM[indices[0]]));
  const lastX = r2(frame.x(chainageM[indices[indices.length - 1]]));
  const area =
    indices.length >= 2 ? `${lineD}L${lastX},${frame.elevationBottom}L${firstX},${frame.elevationBottom}Z` : '';
  return el(
    'g',
    { 'data-layer': 'ground' },
    el('path', { d: area, fill: PROFILE_COLOURS.groundFill, stroke: 'none', 'data-role': 'earth' }),
    groundBand(data, frame, indices),
    el('path', {
      d: lineD,
      fill: 'none',
      stroke: PROFILE_COLOURS.groundLine,
      'stroke-width': 1.5,
      'data-role': 'ground-line',
    }),
  );
}

/** Colour and width of each stretch's pipe: colour by pressure class, width by bore. */
export function pipeStyles(data: ProfileChartData): { colour: string; width: number }[] {
  const ratings = [...new Set(data.stretches.map((s) => Math.round(s.pipe.pressureRatingPa / 1000)))].sort(
    (a, b) => a - b,
  );
  const bores = [...new Set(data.stretches.map((s) => s.pipe.insideDiameterM))].sort((a, b) => a - b);
  return data.stretches.map((s) => {
    const rank = ratings.indexOf(Math.round(s.pipe.pressureRatingPa / 1000));
    const bore = bores.indexOf(s.pipe.insideDiameterM);
    return {
      colour: PIPE_CLASS_COLOURS[rank % PIPE_CLASS_COLOURS.length],
      width: bores.length > 1 ? 2.5 + (2.5 * bore) / (bores.length - 1) : 3.5,
    };
  });
}

/** The pipe, one path per stretch so each carries its class colour. */
export function pipeLayer(data: ProfileChartData, frame: ProfileFrame, indices: readonly number[]): SvgNode {
  const { chainageM, pipeElevationM } = data.points;
  const styles = pipeStyles(data);
  return el(
    'g',
    { 'data-layer': 'pipe', fill: 'none', 'stroke-linecap': 'butt' },
    ...data.stretches.map((s, k) => {
      const d = seriesPath(indicesIn(indices, chainageM, s.fromM, s.toM), chainageM, frame.x, (i) =>
        frame.yElevation(pipeElevationM[i]),
      );
      return el('path', {
        d,
        stroke: styles[k].colour,
        'stroke-width': styles[k].width,
        'data-stretch': k,
        'data-pipe': s.pipe.id,
      });
    }),
  );
}

/**
 * The static line: level per reach (source level, then each break-pressure tank's), with the drop
 * at each tank drawn as a dotted step.
 */
export function staticLayer(data: ProfileChartData, frame: ProfileFrame): SvgNode {
  const parts: SvgNode[] = [];
  data.reaches.forEach((reach, r) => {
    const level = reachLevel(data, reach.fromM);
    const y = r2(frame.yElevation(level));
    parts.push(
      el('path', {
        d: `M${r2(frame.x(reach.fromM))},${y}L${r2(frame.x(reach.toM))},${y}`,
        'data-role': 'static',
        'data-reach': r,
        'data-level-m': r2(level),
      }),
    );
    if (r > 0) {
      const above = r2(frame.yElevation(reachLevel(data, data.reaches[r - 1].fromM)));
      parts.push(
        el('path', {
          d: `M${r2(frame.x(reach.fromM))},${above}L${r2(frame.x(reach.fromM))},${y}`,
          'stroke-dasharray': '1 3',
          'data-role': 'reset',
        }),
      );
    }
  });
  return el(
    'g',
    {
      'data-layer': 'static',
      fill: 'none',
      stroke: PROFILE_COLOURS.staticLine,
      'stroke-width': 1.5,
      'stroke-dasharray': '7 4',
    },
    ...parts,
  );
}

/**
 * Per-reach runs of a series. Each run's last point, at a tank, takes the value arriving from
 * upstream (`upstream`), because the analysis stores the value just downstream of a point.
 */
function reachPaths(
  data: ProfileChartData,
  indices: readonly number[],
  x: (c: number) => number,
  y: (v: number) => number,
  value: ArrayLike<number>,
  upstream: (r: number, i: number) => number,
): { reach: number; d: string }[] {
  const { chainageM } = data.points;
  return data.reaches.map((reach, r) => {
    const run = indicesIn(indices, chainageM, reach.fromM, reach.toM);
    const last = run[run.length - 1];
    const atTank = r < data.reaches.length - 1 && last !== undefined && Math.abs(chainageM[last] - reach.toM) < 1e-9;
    const d = seriesPath(run, chainageM, x, (i) => y(atTank && i === last ? upstream(r, i) : value[i]));
    return { reach: r, d };
  });
}

/** The hydraulic grade line while flowing, reset at each tank. */
export function gradeLayer(data: ProfileChartData, frame: ProfileFrame, indices: readonly number[]): SvgNode {
  const runs = reachPaths(
    data,
    indices,
    frame.x,
    frame.yElevation,
    data.points.hydraulicGradeM,
    (r) => data.reaches[r].arrivingHeadM,
  );
  return el(
    'g',
    { 'data-layer': 'grade', fill: 'none', stroke: PROFILE_COLOURS.gradeLine, 'stroke-width': 2 },
    ...runs.map((run) => el('path', { d: run.d, 'data-reach': run.reach })),
  );
}

/** Pressure panel: flowing and static pressure head per reach, allowable head per stretch, zero and siphon limit. */
export function pressureLayer(data: ProfileChartData, frame: ProfileFrame, indices: readonly number[]): SvgNode {
  const { pressureHeadM, staticPressureHeadM, pipeElevationM } = data.points;
  const flowing = reachPaths(
    data,
    indices,
    frame.x,
    frame.yPressure,
    pressureHeadM,
    (r, i) => data.reaches[r].arrivingHeadM - pipeElevationM[i],
  );
  const still = reachPaths(
    data,
    indices,
    frame.x,
    frame.yPressure,
    staticPressureHeadM,
    (r, i) => reachLevel(data, data.reaches[r].fromM) - pipeElevationM[i],
  );
  const [lo, hi] = frame.pressureDomainM;
  const flat = (headM: number) =>
    `M${frame.plotLeft},${r2(frame.yPressure(headM))}L${frame.plotRight},${r2(frame.yPressure(headM))}`;
  const siphon = -data.limits.siphonLimitHeadM;
  return el(
    'g',
    { 'data-layer': 'pressure', fill: 'none' },
    el('path', { d: flat(0), stroke: PROFILE_COLOURS.zero, 'stroke-width': 1, 'data-role': 'zero' }),
    siphon >= lo &&
      el('path', {
        d: flat(siphon),
        stroke: PROFILE_COLOURS.siphonLimit,
        'stroke-width': 1,
        'stroke-dasharray': '4 3',
        'data-role': 'siphon-limit',
      }),
    el(
      'g',
      { 'data-role': 'allowable', stroke: PROFILE_COLOURS.allowable, 'stroke-width': 1.5, 'stroke-dasharray': '2 3' },
      ...data.stretches
        .filter((s) => s.allowableHeadM <= hi)
        .map((s) => {
          const y = r2(frame.yPressure(s.allowableHeadM));
          return el('path', {
            d: `M${r2(frame.x(s.fromM))},${y}L${r2(frame.x(s.toM))},${y}`,
            'data-stretch': s.index,
            'data-allowable-m': r2(s.allowableHeadM),
          });
        }),
    ),
    el(
      'g',
      {
        'data-role': 'static-pressure',
        stroke: PROFILE_COLOURS.staticPressure,
        'stroke-width': 1.5,
        'stroke-dasharray': '7 4',
      },
      ...still.map((run) => el('path', { d: run.d, 'data-reach': run.reach })),
    ),
    el(
      'g',
      { 'data-role': 'flowing-pressure', stroke: PROFILE_COLOURS.flowingPressure, 'stroke-width': 2 },
      ...flowing.map((run) => el('path', { d: run.d, 'data-reach': run.reach })),
    ),
  );
}
