import { NOT_FOR_CONSTRUCTION, type ReviewStamp } from '../review/stamp';
import { formatQuantity, type UnitSystem } from '../units/index';
import { polylinePath } from './polyline-path';
import { PROFILE_COLOURS } from './profile-palette';
import type { ProfileChartOptions, ProfileFrame, ProfilePin } from './profile-types';
import { el, type SvgNode } from './svg-node';

const r2 = (v: number) => Math.round(v * 100) / 100;
/** Comment pins: open, resolved, and the one picked in the list (profile and schematic alike). */
export const PIN_COLOURS = { open: '#b9462f', resolved: '#8a8f91', selected: '#122e3a' } as const;
const PIN = PIN_COLOURS;

/** A numbered flag whose tip is at (x, tipY): the mark a comment pin leaves on any drawing. */
export function pinFlag(x: number, tipY: number, label: string, colour: string): SvgNode[] {
  return [
    el('path', {
      d: `M${r2(x)},${r2(tipY)}L${r2(x - 7)},${r2(tipY - 9)}A8,8 0 1 1 ${r2(x + 7)},${r2(tipY - 9)}Z`,
      fill: colour,
    }),
    el(
      'text',
      { x: r2(x), y: r2(tipY - 8), 'font-size': 9, 'font-weight': 'bold', fill: '#fff', 'text-anchor': 'middle' },
      label,
    ),
  ];
}
const MARK = '#b9462f';

/**
 * Review words under the title, and a boxed "not for construction" mark plus a faint diagonal one when the drawing may
 * not be built from.
 */
export function stampLayer(frame: ProfileFrame, stamp: ReviewStamp | undefined): SvgNode | null {
  if (!stamp) return null;
  const words = [
    stamp.revisionLabel,
    stamp.statusLabel,
    `designer ${stamp.designer ?? '\u2014'}`,
    `reviewer ${stamp.reviewer ?? 'none yet'}`,
    stamp.approvedOn ? `approved ${stamp.approvedOn}` : 'not approved',
  ].join(' \u00b7 ');
  const markWidth = 190;
  const cx = (frame.plotLeft + frame.plotRight) / 2;
  const cy = (frame.elevationTop + frame.pressureBottom) / 2;
  return el(
    'g',
    { 'data-layer': 'review-stamp', 'data-for-construction': stamp.forConstruction ? 'yes' : 'no' },
    el('text', { x: frame.plotLeft, y: 40, 'font-size': 11, fill: PROFILE_COLOURS.ink }, words),
    !stamp.forConstruction &&
      el(
        'g',
        { 'data-role': 'not-for-construction' },
        el('rect', {
          x: frame.plotRight - markWidth,
          y: 6,
          width: markWidth,
          height: 24,
          fill: '#fff',
          stroke: MARK,
          'stroke-width': 2,
        }),
        el(
          'text',
          {
            x: frame.plotRight - markWidth / 2,
            y: 23,
            'font-size': 13,
            'font-weight': 'bold',
            fill: MARK,
            'text-anchor': 'middle',
          },
          NOT_FOR_CONSTRUCTION,
        ),
        el(
          'text',
          {
            x: r2(cx),
            y: r2(cy),
            'font-size': 44,
            'font-weight': 'bold',
            fill: MARK,
            'fill-opacity': 0.12,
            'text-anchor': 'middle',
            transform: `rotate(-18 ${r2(cx)} ${r2(cy)})`,
          },
          NOT_FOR_CONSTRUCTION,
        ),
      ),
  );
}

/**
 * One comment pinned at a chainage: a numbered flag at `top` and a thin line down to `bottom` (any chart with a
 * chainage axis).
 */
export function chainagePinMark(pin: ProfilePin, x: number, top: number, bottom: number, system: UnitSystem): SvgNode {
  const colour = pin.selected ? PIN.selected : pin.resolved ? PIN.resolved : PIN.open;
  return el(
    'g',
    { 'data-comment-id': pin.id, 'data-chainage-m': r2(pin.chainageM), 'data-resolved': pin.resolved ? 'yes' : 'no' },
    el(
      'title',
      {},
      `Comment ${pin.label} at ${formatQuantity('chainage', pin.chainageM, system)}${pin.resolved ? ' (resolved)' : ''}`,
    ),
    el('line', {
      x1: r2(x),
      y1: r2(top + 14),
      x2: r2(x),
      y2: r2(bottom),
      stroke: colour,
      'stroke-width': pin.selected ? 2 : 1,
      'stroke-dasharray': '1 3',
    }),
    ...pinFlag(x, top + 18, pin.label, colour),
  );
}

/** Comments pinned at chainages: a numbered flag above the elevation panel and a thin line down through both panels. */
export function commentPinsLayer(frame: ProfileFrame, options: ProfileChartOptions): SvgNode | null {
  const pins = options.pins ?? [];
  if (pins.length === 0) return null;
  const marks = pins
    .filter((p) => p.chainageM >= frame.fromM - 1e-9 && p.chainageM <= frame.toM + 1e-9)
    .map((p) =>
      chainagePinMark(p, frame.x(p.chainageM), frame.elevationTop + 1, frame.pressureBottom, options.units.system),
    );
  return el('g', { 'data-layer': 'comment-pins' }, ...marks);
}

/** The hydraulic grade line of an earlier revision, dashed beside the current one (revision compare). */
export function earlierGradeLayer(frame: ProfileFrame, options: ProfileChartOptions): SvgNode | null {
  const earlier = options.earlierGrade;
  if (!earlier || earlier.chainageM.length < 2) return null;
  const xs: number[] = [];
  const ys: number[] = [];
  for (let i = 0; i < earlier.chainageM.length; i++) {
    const c = earlier.chainageM[i];
    if (c < frame.fromM - 1e-9 && i + 1 < earlier.chainageM.length && earlier.chainageM[i + 1] < frame.fromM) continue;
    xs.push(frame.x(c));
    ys.push(frame.yElevation(earlier.gradeM[i]));
    if (c > frame.toM) break;
  }
  return el(
    'g',
    { 'data-layer': 'earlier-grade', 'data-label': earlier.label },
    el('path', {
      d: polylinePath(Float64Array.from(xs), Float64Array.from(ys)),
      fill: 'none',
      stroke: '#a5700c',
      'stroke-width': 1.6,
      'stroke-dasharray': '7 4',
    }),
  );
}
