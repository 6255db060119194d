import { describe, expect, it } from 'vitest';
import { drainPointsOf, lineWinterPlan, winterWarnings, type WinterProfileInput } from '../../../lib/lines/winter';
import { lineAnswers } from '../../../lib/lines/answers';
import { warningText } from '../../../lib/lines/warning-words';
import { isOverdue, todayIn } from '../../../lib/lift/task-due';
import { analyzeLine } from '../../../hydraulics/index';
import { displayUnits } from '../../../lib/units';

/**
 * A pipe profile whose low points are known by construction: 0.8 m of cover everywhere; the pipe
 * starts low at ch. 0 (rises away), sags to 95.2 at ch. 40 and to 97.2 at ch. 100, and ends
 * falling to ch. 140. With a 1 m tolerance the sags at 40 and 100 count; the 0.3 m dip at ch. 70 does not.
 */
function profile(): WinterProfileInput {
  const chainageM = [0, 20, 40, 60, 70, 80, 100, 120, 140];
  const pipeM = [96.0, 98.0, 95.2, 99.0, 98.7, 99.0, 97.2, 100.0, 98.5];
  return {
    points: { chainageM, pipeElevationM: pipeM, groundElevationM: pipeM.map((z, i) => z + (i === 5 ? 0.6 : 0.8)) },
    airPointToleranceM: 1,
  };
}

describe('winter plan of a line', () => {
  it('drains a drained line at the low points of its pipe profile, with its low start and low end, by chainage', () => {
    const plan = lineWinterPlan(profile(), { treatment: 'drained-for-winter' }, 1.0, true);
    expect(plan.drainPoints.map((p) => p.chainageM)).toEqual([40, 100]);
    expect(drainPointsOf(plan)).toEqual([
      { chainageM: 0, elevationM: 96.0, place: 'low start' },
      { chainageM: 40, elevationM: 95.2, place: 'low point' },
      { chainageM: 100, elevationM: 97.2, place: 'low point' },
      { chainageM: 140, elevationM: 98.5, place: 'low end' },
    ]);
    expect(plan.warning).toBeNull();
  });

  it('finds the least cover and where', () => {
    const plan = lineWinterPlan(profile(), undefined, null, true);
    expect(plan.shallowestCoverM).toBeCloseTo(0.6, 9);
    expect(plan.shallowestCoverAtM).toBe(80);
    expect(plan.chosen).toBe(false);
    expect(plan.treatment).toBe('buried-below-frost');
  });

  it('warns about a line shallower than frost that is not drained, with the two fixes', () => {
    const plan = lineWinterPlan(profile(), { treatment: 'buried-below-frost' }, 1.0, true);
    expect(plan.warning?.message).toMatch(/freeze/);
    expect(plan.warning?.fixes).toEqual([{ kind: 'drain-for-winter' }, { kind: 'deeper-cover', coverM: 1.15 }]);
    // Cover set per station cannot be fixed by the line's cover setting: only draining is offered.
    expect(lineWinterPlan(profile(), undefined, 1.0, false).warning?.fixes).toEqual([{ kind: 'drain-for-winter' }]);
  });

  it('does not warn when the pipe is deeper than frost, or when the frost depth is not known', () => {
    expect(lineWinterPlan(profile(), undefined, 0.5, true).warning).toBeNull();
    expect(lineWinterPlan(profile(), undefined, null, true).warning).toBeNull();
  });

  it('takes cover equal to the frost depth as too shallow (the core buries only below it)', () => {
    expect(lineWinterPlan(profile(), undefined, 0.6, true).warning).not.toBeNull();
  });
});

describe("winter findings stand with the line's other items (common practice, no source)", () => {
  it('a line shallower than frost and not drained gives one winter item that counts in the answers', () => {
    const plan = lineWinterPlan(profile(), { treatment: 'buried-below-frost' }, 1.0, true);
    const items = winterWarnings(plan);
    expect(items.map((w) => w.code)).toEqual(['winter-frost']);
    expect(items[0].values).toMatchObject({ coverM: expect.closeTo(0.6, 9), frostDepthM: 1.0, chainageM: 80 });
    const analysis = analyzeLine({
      stations: [
        { chainageM: 0, groundElevationM: 100 },
        { chainageM: 100, groundElevationM: 90 },
      ],
      stretches: [{ fromM: 0, toM: 100, pipe: 'pe100-iso4427-sdr11-32mm' }],
      start: { kind: 'water-level', levelM: 101 },
      end: { kind: 'free-discharge' },
      flow: { kind: 'design', flowM3s: 0.0003 },
    });
    const before = lineAnswers(analysis).counts.warning;
    expect(lineAnswers({ ...analysis, warnings: [...analysis.warnings, ...items] }).counts.warning).toBe(before + 1);
  });

  it('a line "buried below frost" whose pipe lies on the surface is a contradiction, even without a frost depth', () => {
    const surface: WinterProfileInput = {
      points: { chainageM: [0, 50, 100], groundElevationM: [100, 95, 90], pipeElevationM: [100, 95, 90] },
      airPointToleranceM: 1,
    };
    const items = winterWarnings(lineWinterPlan(surface, undefined, null, true));
    expect(items.map((w) => w.code)).toEqual(['winter-cover-contradiction']);
    expect(warningText(items[0], displayUnits('us')).message).toMatch(/on the surface \(cover 0\.00 ft\)/);
    // Drained for winter: no contradiction.
    expect(winterWarnings(lineWinterPlan(surface, { treatment: 'drained-for-winter' }, null, true))).toEqual([]);
  });

  it('an open drain-down task past its date is flagged on a line that needs draining, not on one buried below frost', () => {
    const drained = lineWinterPlan(profile(), { treatment: 'drained-for-winter' }, 1.0, true);
    const [overdue] = winterWarnings(drained, '2026-10-01');
    expect(overdue.code).toBe('drain-down-overdue');
    expect(overdue.values.dueOn).toBe('2026-10-01');
    const deep = lineWinterPlan(profile(), { treatment: 'buried-below-frost' }, 0.3, true);
    expect(winterWarnings(deep, '2026-10-01')).toEqual([]);
    expect(isOverdue({ done: false, dueOn: '2026-10-01' }, '2026-10-02')).toBe(true);
    expect(isOverdue({ done: true, dueOn: '2026-10-01' }, '2026-10-02')).toBe(false);
    expect(isOverdue({ done: false, dueOn: '2026-10-02' }, '2026-10-02')).toBe(false);
  });

  it('today is taken in the given time zone', () => {
    const instant = new Date('2026-12-02T23:30:00Z');
    expect(todayIn('UTC', instant)).toBe('2026-12-02');
    expect(todayIn('Pacific/Auckland', instant)).toBe('2026-12-03');
    expect(todayIn('America/Denver', instant)).toBe('2026-12-02');
  });
});
