import { projectToLocalPlan, type LineDevice, type LineWarning } from '../../hydraulics/index';
import { fromDisplay, toDisplay, type DisplayUnits } from '../units/index';
import { DEVICE_STYLE, FONT_FAMILY, PROFILE_COLOURS, ZONE_FILLS } from './profile-palette';
import { PHOTO_MARK_COLOUR, type ChartPhoto } from './photo-marks';
import { warningRange } from './profile-marks';
import { el, type SvgNode } from './svg-node';

export interface PlanStation {
  chainageM: number;
  latitudeDeg?: number;
  longitudeDeg?: number;
}

export interface PlanScene {
  root: SvgNode;
  /** Drawn position of each station that has coordinates (index into the stations given). */
  positions: { index: number; x: number; y: number }[];
  /** Metres per pixel of the drawing. */
  metresPerPx: number;
  /** Where each photo is drawn: at its own position when it has one, else on the line at its chainage. */
  photos: { photo: ChartPhoto; x: number; y: number; onLine: { x: number; y: number } }[];
}

const r2 = (v: number) => Math.round(v * 100) / 100;

/**
 * The route seen from above, from its surveyed positions in a local flat projection (hydraulics/
 * survey plan-projection), north up, equal scale both ways, with warning ranges in their colours,
 * devices as dots, site photos at their own positions (joined to the line at their chainage) and a
 * scale bar. Null when fewer than two stations have positions.
 */
export function planScene(
  stations: readonly PlanStation[],
  warnings: readonly LineWarning[],
  devices: readonly LineDevice[],
  size: { width: number; height: number },
  u: DisplayUnits,
  photos: readonly ChartPhoto[] = [],
): PlanScene | null {
  const located = stations
    .map((s, index) => ({ s, index }))
    .filter(({ s }) => s.latitudeDeg !== undefined && s.longitudeDeg !== undefined);
  if (located.length < 2) return null;
  const firstM = stations[0].chainageM;
  const lastM = stations[stations.length - 1].chainageM;
  const shownPhotos = photos.filter((p) => p.chainageM >= firstM - 1e-9 && p.chainageM <= lastM + 1e-9);
  const positioned = shownPhotos.filter((p) => p.latitudeDeg != null && p.longitudeDeg != null);
  // Photos' own positions are projected with the stations so they share the flat plan and its extent.
  const projected = projectToLocalPlan([
    ...located.map(({ s }) => ({ latitudeDeg: s.latitudeDeg!, longitudeDeg: s.longitudeDeg! })),
    ...positioned.map((p) => ({ latitudeDeg: p.latitudeDeg!, longitudeDeg: p.longitudeDeg! })),
  ]);
  const plan = { points: projected.points.slice(0, located.length) };
  const pad = 24;
  let minE = Infinity,
    maxE = -Infinity,
    minN = Infinity,
    maxN = -Infinity;
  for (const p of projected.points) {
    minE = Math.min(minE, p.eastM);
    maxE = Math.max(maxE, p.eastM);
    minN = Math.min(minN, p.northM);
    maxN = Math.max(maxN, p.northM);
  }
  const metresPerPx = Math.max((maxE - minE) / (size.width - 2 * pad), (maxN - minN) / (size.height - 2 * pad), 1e-6);
  const cx = (minE + maxE) / 2;
  const cy = (minN + maxN) / 2;
  const positions = plan.points.map((p, k) => ({
    index: located[k].index,
    x: r2(size.width / 2 + (p.eastM - cx) / metresPerPx),
    y: r2(size.height / 2 - (p.northM - cy) / metresPerPx),
  }));
  const chainages = positions.map((p) => stations[p.index].chainageM);
  const polyline = (from: number, to: number) =>
    positions
      .filter((_, k) => chainages[k] >= from && chainages[k] <= to)
      .map((p) => `${p.x},${p.y}`)
      .join(' ');
  const nearest = (c: number) =>
    positions[chainages.reduce((best, v, k) => (Math.abs(v - c) < Math.abs(chainages[best] - c) ? k : best), 0)];
  const drawn = (eastM: number, northM: number) => ({
    x: r2(size.width / 2 + (eastM - cx) / metresPerPx),
    y: r2(size.height / 2 - (northM - cy) / metresPerPx),
  });
  const photoPlaces = shownPhotos.map((photo) => {
    const k = positioned.indexOf(photo);
    const onLine = nearest(photo.chainageM);
    const own = k >= 0 ? projected.points[located.length + k] : null;
    return {
      photo,
      ...(own ? drawn(own.eastM, own.northM) : { x: onLine.x, y: onLine.y }),
      onLine: { x: onLine.x, y: onLine.y },
    };
  });

  const zones = warnings
    .filter((w) => ZONE_FILLS[w.severity] && !('chainageM' in w.at))
    .map((w) => {
      const { fromM, toM } = warningRange(w);
      return el('polyline', {
        points: polyline(fromM, toM),
        fill: 'none',
        stroke: ZONE_FILLS[w.severity]!.edge,
        'stroke-width': 7,
        'stroke-opacity': 0.45,
        'stroke-linecap': 'round',
        'data-code': w.code,
      });
    });
  const scaleUnits = niceLength(toDisplay('length', metresPerPx * 80, u.system));
  const scaleM = fromDisplay('length', scaleUnits, u.system);
  const root = el(
    'svg',
    {
      viewBox: `0 0 ${size.width} ${size.height}`,
      width: size.width,
      height: size.height,
      role: photoPlaces.length > 0 ? 'group' : 'img',
      'aria-label': 'Plan of the route',
      'font-family': FONT_FAMILY,
    },
    el('rect', { x: 0, y: 0, width: size.width, height: size.height, fill: PROFILE_COLOURS.paper }),
    el('g', { 'data-layer': 'plan-zones' }, ...zones),
    el('polyline', {
      points: polyline(-Infinity, Infinity),
      fill: 'none',
      stroke: PROFILE_COLOURS.gradeLine,
      'stroke-width': 2.5,
      'stroke-linejoin': 'round',
      'data-layer': 'plan-route',
    }),
    el(
      'g',
      { 'data-layer': 'plan-devices' },
      ...devices.map((d) => {
        const p = nearest(d.chainageM);
        return el('circle', {
          cx: p.x,
          cy: p.y,
          r: 4.5,
          fill: DEVICE_STYLE[d.kind].colour,
          stroke: '#ffffff',
          'stroke-width': 1.5,
          'data-kind': d.kind,
        });
      }),
    ),
    el(
      'g',
      { 'data-layer': 'plan-photos' },
      ...photoPlaces.map(({ photo, x, y, onLine }) =>
        el(
          'g',
          { 'data-photo-id': photo.id, 'data-chainage-m': r2(photo.chainageM) },
          el('title', {}, `Photo ${photo.number}: ${photo.label}`),
          (onLine.x !== x || onLine.y !== y) &&
            el('line', {
              x1: onLine.x,
              y1: onLine.y,
              x2: x,
              y2: y,
              stroke: PHOTO_MARK_COLOUR,
              'stroke-width': 1,
              'stroke-dasharray': '2 2',
            }),
          el('rect', {
            x: r2(x - 7),
            y: r2(y - 5.5),
            width: 14,
            height: 11,
            rx: 3,
            fill: PHOTO_MARK_COLOUR,
            stroke: '#ffffff',
            'stroke-width': 1,
          }),
          el(
            'text',
            { x, y: r2(y + 3), 'font-size': 7.5, 'font-weight': 'bold', fill: '#ffffff', 'text-anchor': 'middle' },
            String(photo.number),
          ),
        ),
      ),
    ),
    el('text', { x: positions[0].x + 6, y: positions[0].y - 6, 'font-size': 11, fill: PROFILE_COLOURS.ink }, 'Source'),
    el(
      'text',
      {
        x: positions[positions.length - 1].x + 6,
        y: positions[positions.length - 1].y + 14,
        'font-size': 11,
        fill: PROFILE_COLOURS.ink,
      },
      'End',
    ),
    el(
      'g',
      { 'data-layer': 'north' },
      el('path', {
        d: `M${size.width - 20},30L${size.width - 14},44L${size.width - 26},44Z`,
        fill: PROFILE_COLOURS.ink,
      }),
      el(
        'text',
        { x: size.width - 20, y: 24, 'text-anchor': 'middle', 'font-size': 11, fill: PROFILE_COLOURS.ink },
        'N',
      ),
    ),
    el(
      'g',
      { 'data-layer': 'scale-bar' },
      el('path', {
        d: `M12,${size.height - 14}L${r2(12 + scaleM / metresPerPx)},${size.height - 14}`,
        stroke: PROFILE_COLOURS.ink,
        'stroke-width': 2,
      }),
      el(
        'text',
        { x: 12, y: size.height - 20, 'font-size': 10, fill: PROFILE_COLOURS.ink },
        `${scaleUnits} ${u.length}`,
      ),
    ),
  );
  return { root, positions, metresPerPx, photos: photoPlaces };
}

/** A round length (1, 2 or 5 times a power of ten) near `m`. */
function niceLength(m: number): number {
  const power = 10 ** Math.floor(Math.log10(Math.max(m, 1e-9)));
  const f = m / power;
  return (f < 1.5 ? 1 : f < 3.5 ? 2 : 5) * power;
}
