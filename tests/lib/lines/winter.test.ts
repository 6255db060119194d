import { describe, expect, it } from 'vitest';
import { drainPointsOf, lineWinterPlan, type WinterProfileInput } from '../../../lib/lines/winter';

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
