import { NOT_FOR_CONSTRUCTION, type ReviewStamp } from '../review/stamp';
import { formatQuantity } from '../units/index';
import { polylinePath } from './polyline-path';
import { PROFILE_COLOURS } from './profile-palette';
import type { ProfileChartOptions, ProfileFrame } from './profile-types';
import { el, type SvgNode } from './svg-node';

const r2 = (v: number) => Math.round(v * 100) / 100;
const PIN = { open: '#b9462f', resolved: '#8a8f91', selected: '#122e3a' } as const;
const MARK = '#b9462f';

/** Review words under the title, and a boxed "not for construction" mark plus a faint diagonal one when the drawing may not be built from. */
export function stampLayer(frame: ProfileFrame, stamp: ReviewStamp | undefined): SvgNode | null {
  if (!stamp) return null;
  const words = [stamp.revisionLabel, stamp.statusLabel, `designer ${stamp.designer ?? '\u2014'}`, `reviewer ${stamp.reviewer ?? 'none yet'}`, stamp.approvedOn ? `approved ${stamp.approvedOn}` : 'not approved'].join(' \u00b7 ');
  const markWidth = 190;
  const cx = (frame.plotLeft + frame.plotRight) / 2;
  const cy = (frame.elevationTop + frame.pressureBottom) / 2;
  return el('g', { 'data-layer': 'review-stamp', 'data-for-construction': stamp.forConstruction ? 'yes' : 'no' },
    el('text', { x: frame.plotLeft, y: 40, 'font-size': 11, fill: PROFILE_COLOURS.ink }, words),
    !stamp.forConstruction && el('g', { 'data-role': 'not-for-construction' },
      el('rect', { x: frame.plotRight - markWidth, y: 6, width: markWidth, height: 24, fill: '#fff', stroke: MARK, 'stroke-width': 2 }),
      el('text', { x: frame.plotRight - markWidth / 2, y: 23, 'font-size': 13, 'font-weight': 'bold', fill: MARK, 'text-anchor': 'middle' }, NOT_FOR_CONSTRUCTION),
      el('text', { x: r2(cx), y: r2(cy), 'font-size': 44, 'font-weight': 'bold', fill: MARK, 'fill-opacity': 0.12, 'text-anchor': 'middle', transform: `rotate(-18 ${r2(cx)} ${r2(cy)})` }, NOT_FOR_CONSTRUCTION)),
  );
}

/** A comment pinned at a chainage: a numbered flag above the elevation panel and a thin line down through both panels. */
export function commentPinsLayer(frame: ProfileFrame, options: ProfileChartOptions): SvgNode | null {
  const pins = options.pins ?? [];
  if (pins.length === 0) return null;
  const marks = pins.filter((p) => p.chainageM >= frame.fromM - 1e-9 && p.chainageM <= frame.toM + 1e-9).map((p) => {
    const x = r2(frame.x(p.chainageM));
    const colour = p.selected ? PIN.selected : p.resolved ? PIN.resolved : PIN.open;
    const top = frame.elevationTop + 1;
    return el('g', { 'data-comment-id': p.id, 'data-chainage-m': r2(p.chainageM), 'data-resolved': p.resolved ? 'yes' : 'no' },
      el('title', {}, `Comment ${p.label} at ${formatQuantity('chainage', p.chainageM, options.units.system)}${p.resolved ? ' (resolved)' : ''}`),
      el('line', { x1: x, y1: top + 14, x2: x, y2: frame.pressureBottom, stroke: colour, 'stroke-width': p.selected ? 2 : 1, 'stroke-dasharray': '1 3' }),
      el('path', { d: `M${x},${top + 18}L${r2(x - 7)},${top + 9}A8,8 0 1 1 ${r2(x + 7)},${top + 9}Z`, fill: colour }),
      el('text', { x, y: top + 10, 'font-size': 9, 'font-weight': 'bold', fill: '#fff', 'text-anchor': 'middle' }, p.label));
  });
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
  return el('g', { 'data-layer': 'earlier-grade', 'data-label': earlier.label },
    el('path', { d: polylinePath(Float64Array.from(xs), Float64Array.from(ys)), fill: 'none', stroke: '#a5700c', 'stroke-width': 1.6, 'stroke-dasharray': '7 4' }));
}
