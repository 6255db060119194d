import { describe, expect, it } from 'vitest';
import { analyzeLine, type LineWarning } from '../../../hydraulics/index';
import { CONTROL, ridgeWalk, SPIKE, STATED_ACCURACY_M, WALK_LINE } from '../../../lib/demo/ridge-walk.cjs';
import { lineFixItems } from '../../../lib/lines/fix-items';
import { lineInputOf } from '../../../lib/lines/line-input';
import { EMPTY_SITE_CONTEXT } from '../../../lib/lines/ram-start';
import type { LineDesign } from '../../../lib/validations/line-design';

/**
 * The demo's walked line as its page shows it: the stored route (phone heights, stated accuracy 4 m,
 * the spike excluded in clean-up) through lineInputOf and the one list of items (lineFixItems), under
 * the default friction formula (Darcy-Weisbach with Colebrook). The expected items are worked out from
 * the smooth ground the walk was made from: its turning points (CONTROL in lib/demo/ridge-walk.cjs).
 */
const design = { ...WALK_LINE, fittings: [], devices: [], pipes: [] } as unknown as LineDesign;
const kept = ridgeWalk().filter((p) => p.seq !== SPIKE.seq);

function pageItems(heights: 'walked' | 'smooth' | 'point-by-point'): LineWarning[] {
  const stations = kept.map((p) => ({
    chainageM: p.chainageM,
    groundElevationM: heights === 'smooth' ? p.groundM : p.elevationM,
    // Point by point: heights taken as exact (no stated accuracy), the reading before the scatter was used.
    ...(heights === 'walked' ? { heightSource: 'gps' as const, confidenceM: STATED_ACCURACY_M } : {}),
  }));
  const analysis = analyzeLine(lineInputOf(design, stations, EMPTY_SITE_CONTEXT));
  expect(analysis.settings.frictionMethod).toBe('darcy-weisbach');
  return lineFixItems(analysis, design.winter, EMPTY_SITE_CONTEXT, true).warnings;
}

const interior = CONTROL.slice(1, -1).map((point, i) => ({
  chainageM: point[0],
  high: point[1] > CONTROL[i][1] && point[1] > CONTROL[i + 2][1],
}));
const summits = interior.filter((p) => p.high).map((p) => p.chainageM); // 420, 1650, 2200
const sags = interior.filter((p) => !p.high).map((p) => p.chainageM); // 330, 1000, 2040
const placeOf = (w: LineWarning) => ('chainageM' in w.at ? w.at.chainageM : (w.at.fromM + w.at.toM) / 2);
const ofCode = (items: LineWarning[], code: LineWarning['code']) => items.filter((w) => w.code === code);

describe('the demo walk\'s "What to fix" under Darcy-Weisbach', () => {
  const walked = pageItems('walked');
  const smooth = pageItems('smooth');
  const pointByPoint = pageItems('point-by-point');

  it('the smooth ground has one air valve per summit and one washout per sag of its turning points', () => {
    expect(summits).toEqual([420, 1650, 2200]);
    expect(sags).toEqual([330, 1000, 2040]);
    expect(ofCode(smooth, 'air-release-needed').map(placeOf)).toEqual(summits);
    expect(ofCode(smooth, 'washout-needed').map(placeOf)).toEqual(sags);
  });

  it("the walk lists the smooth ground's air valves and washouts, each within 100 m of its turning point", () => {
    const air = ofCode(walked, 'air-release-needed').map(placeOf);
    const wash = ofCode(walked, 'washout-needed').map(placeOf);
    expect(air).toHaveLength(summits.length);
    expect(wash).toHaveLength(sags.length);
    air.forEach((c, i) => expect(Math.abs(c - summits[i])).toBeLessThan(100));
    wash.forEach((c, i) => expect(Math.abs(c - sags[i])).toBeLessThan(100));
  });

  it("every item of the smooth ground is on the walk's list, and the walk adds only items it names as within the scatter", () => {
    const unmatched = [...walked];
    for (const expected of smooth) {
      const k = unmatched.findIndex((w) => w.code === expected.code && Math.abs(placeOf(w) - placeOf(expected)) < 150);
      expect(k, `${expected.code} near ch. ${Math.round(placeOf(expected))} m`).toBeGreaterThanOrEqual(0);
      unmatched.splice(k, 1);
    }
    expect(unmatched.length).toBeGreaterThan(0);
    for (const extra of unmatched) expect(extra.values.withinScatter, extra.code).toBe(true);
  });

  it('counts: 12 items on the smooth ground, 13 on the walk (one doubtful suction at the spring), 83 read point by point', () => {
    // Measured with the default friction (Darcy-Weisbach); under Hazen-Williams C 150 the same walk gave 11 / 13 / 81.
    expect(smooth).toHaveLength(12);
    expect(walked).toHaveLength(13);
    expect(pointByPoint).toHaveLength(83);
  });
});
