import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { applyAcceptedChanges } from '../../../hydraulics/survey/cleanup/proposed-change';
import { movingMedian } from '../../../hydraulics/survey/cleanup/moving-median';
import { detectGradeSpikes, detectMedianOutliers } from '../../../hydraulics/survey/cleanup/spikes';
import { detectDuplicates } from '../../../hydraulics/survey/cleanup/duplicates';
import { detectOutOfOrder } from '../../../hydraulics/survey/cleanup/order';
import { proposeBenchmarkOffset, proposeSmoothing } from '../../../hydraulics/survey/cleanup/smoothing';
import type { RouteStation } from '../../../hydraulics/survey/types';

const profile = (zs: number[], step = 10): RouteStation[] => zs.map((z, i) => ({ chainageM: i * step, elevationM: z }));

describe('movingMedian', () => {
  it('window 3 removes a lone spike and keeps the ends', () => {
    expect(movingMedian([1, 2, 30, 4, 5], 3)).toEqual([1, 2, 4, 5, 5]);
  });
  it('window 5 shrinks symmetrically at the ends', () => {
    expect(movingMedian([5, 1, 9, 2, 8, 3], 5)).toEqual([5, 5, 5, 3, 3, 3]);
  });
  it('rejects an even or too small window', () => {
    expect(() => movingMedian([1, 2, 3], 4)).toThrow(
      'windowSize: must be an odd whole number of points, 3 or more, got 4',
    );
    expect(() => movingMedian([1, 2, 3], 1)).toThrow(/odd whole number/);
  });
});

describe('detectGradeSpikes', () => {
  it('flags a point steep up then steep down and proposes the straight-line height', () => {
    const pts = profile([100, 99, 110, 97, 96]);
    const changes = detectGradeSpikes(pts, { gradeThreshold: 0.5 });
    expect(changes).toEqual([
      {
        kind: 'grade-spike',
        index: 2,
        field: 'elevationM',
        from: 110,
        to: 98,
        reason: expect.stringContaining('spike: grade 110 % in and -130 % out'),
      },
    ]);
  });
  it('does not flag a steady steep slope (same sign both sides)', () => {
    expect(detectGradeSpikes(profile([100, 90, 80, 70]), { gradeThreshold: 0.5 })).toEqual([]);
  });
  it('skips zero-length legs rather than dividing by zero', () => {
    const pts = [
      { chainageM: 0, elevationM: 0 },
      { chainageM: 0, elevationM: 50 },
      { chainageM: 10, elevationM: 0 },
    ];
    expect(detectGradeSpikes(pts, { gradeThreshold: 0.5 })).toEqual([]);
  });
});

describe('detectMedianOutliers', () => {
  it('flags heights more than k metres from the moving median', () => {
    const changes = detectMedianOutliers(profile([100, 100.5, 101, 108, 102, 102.5, 103]), {
      windowSize: 5,
      toleranceM: 3,
    });
    expect(changes.map((c) => [c.index, c.from, c.to])).toEqual([[3, 108, 102]]);
    expect(changes[0].reason).toBe('outlier: 6.00 m from the median of 5 neighbouring points (limit 3 m)');
  });
});

describe('detectDuplicates and detectOutOfOrder', () => {
  it('flags the later copy of an exact duplicate for deletion', () => {
    const pts = [
      { chainageM: 0, elevationM: 5, latitudeDeg: 45.5, longitudeDeg: 11.8 },
      { chainageM: 10, elevationM: 6, latitudeDeg: 45.5001, longitudeDeg: 11.8 },
      { chainageM: 10, elevationM: 6, latitudeDeg: 45.5001, longitudeDeg: 11.8 },
    ];
    expect(detectDuplicates(pts)).toEqual([
      { kind: 'duplicate', index: 2, field: 'deleted', from: false, to: true, reason: 'exact duplicate of point 2' },
    ]);
  });
  it('same place, different height is not a duplicate', () => {
    expect(
      detectDuplicates([
        { chainageM: 0, elevationM: 1 },
        { chainageM: 0, elevationM: 2 },
      ]),
    ).toEqual([]);
  });
  it('flags chainage going backwards and GPS time going backwards', () => {
    const pts = [
      { chainageM: 0, elevationM: 1, timeS: 100 },
      { chainageM: 20, elevationM: 1, timeS: 160 },
      { chainageM: 15, elevationM: 1, timeS: 220 },
      { chainageM: 30, elevationM: 1, timeS: 130 },
    ];
    const c = detectOutOfOrder(pts);
    expect(c.map((x) => [x.kind, x.index])).toEqual([
      ['chainage-backwards', 2],
      ['time-backwards', 3],
    ]);
    expect(c[0].reason).toBe('chainage goes backwards: 15.00 m after 20.00 m');
  });
});

describe('smoothing and benchmark offset', () => {
  it('proposes one change per height the median would move', () => {
    const changes = proposeSmoothing(profile([1, 2, 30, 4, 5]), { windowSize: 3 });
    expect(changes.map((c) => [c.index, c.from, c.to])).toEqual([
      [2, 30, 4],
      [3, 4, 5],
    ]);
  });
  it('offsets every height so the benchmark point takes its known level', () => {
    const changes = proposeBenchmarkOffset(profile([812.4, 809.9, 806.1]), {
      index: 0,
      knownElevationM: 815,
      benchmarkLabel: 'spring box',
    });
    expect(changes.map((c) => c.to)).toEqual([815, expect.closeTo(812.5, 9), expect.closeTo(808.7, 9)]);
    expect(changes[0].reason).toBe('offset +2.600 m to tie spring box to its known elevation 815 m');
    expect(() => proposeBenchmarkOffset(profile([1, 2]), { index: 5, knownElevationM: 1 })).toThrow(
      'index: point 5 does not exist',
    );
  });
});

describe('applyAcceptedChanges', () => {
  it('applies accepted changes to a copy; the raw points are untouched', () => {
    const raw = profile([100, 99, 110, 97, 96]);
    const before = structuredClone(raw);
    const spikes = detectGradeSpikes(raw, { gradeThreshold: 0.5 });
    const cleaned = applyAcceptedChanges(raw, [
      ...spikes,
      { kind: 'duplicate', index: 4, field: 'deleted', from: false, to: true, reason: 'test' },
    ]);
    expect(cleaned.map((p) => p.elevationM)).toEqual([100, 99, 98, 97]);
    expect(raw).toEqual(before);
  });
  it('rejects two elevation changes to one point', () => {
    const c = { kind: 'smoothing' as const, index: 0, field: 'elevationM' as const, from: 1, to: 2, reason: '' };
    expect(() => applyAcceptedChanges(profile([1, 2]), [c, c])).toThrow(/two elevation changes for point 0/);
  });
});

describe('properties (fast-check)', () => {
  const heights = fc.array(fc.double({ min: -500, max: 5000, noNaN: true }), { minLength: 3, maxLength: 60 });
  const oddWindow = fc.integer({ min: 1, max: 6 }).map((k) => 2 * k + 1);

  it('smoothing never mutates its input', () => {
    fc.assert(
      fc.property(heights, oddWindow, (zs, w) => {
        const pts = profile(zs);
        const copy = structuredClone(pts);
        const changes = proposeSmoothing(pts, { windowSize: w });
        applyAcceptedChanges(pts, changes);
        expect(pts).toEqual(copy);
      }),
    );
  });

  it('a moving median stays within the range of the data and keeps the ends', () => {
    fc.assert(
      fc.property(heights, oddWindow, (zs, w) => {
        const m = movingMedian(zs, w);
        const lo = Math.min(...zs);
        const hi = Math.max(...zs);
        expect(m.every((v) => v >= lo && v <= hi)).toBe(true);
        expect(m[0]).toBe(zs[0]);
        expect(m[m.length - 1]).toBe(zs[zs.length - 1]);
      }),
    );
  });

  it('every proposed change records the raw value it would replace', () => {
    fc.assert(
      fc.property(heights, (zs) => {
        const pts = profile(zs);
        for (const c of [
          ...detectGradeSpikes(pts, { gradeThreshold: 0.3 }),
          ...detectMedianOutliers(pts, { windowSize: 3, toleranceM: 1 }),
        ]) {
          expect(c.from).toBe(pts[c.index].elevationM);
        }
      }),
    );
  });
});

describe('smoothing keeps the real summits and sags (profile-and-checks.md §1.2)', () => {
  it('a narrow true summit keeps its height; the median alone would cut it by 3 m', () => {
    const heights = [0, 3, 6, 9, 6, 3, 0, -3, -6, -3, 0];
    expect(movingMedian(heights, 5)[3]).toBe(6);
    const changes = proposeSmoothing(profile(heights), { windowSize: 5 });
    expect(changes.find((c) => c.index === 3)).toBeUndefined();
    // The sag at index 8 keeps its height too.
    expect(changes.find((c) => c.index === 8)).toBeUndefined();
  });

  it('a lone spike is still smoothed away (it leaves no high in the smoothed profile)', () => {
    const changes = proposeSmoothing(profile([1, 2, 30, 4, 5]), { windowSize: 3 });
    expect(changes.find((c) => c.index === 2)?.to).toBe(4);
  });

  it('bumps within the survey scatter are smoothed; a summit standing out of it is kept', () => {
    // Ridge of 12 m with ±1.5 m wiggles on its flanks (invented); scatter 2 m.
    const heights = [100, 103, 101.5, 106, 104.5, 109, 112, 109, 104.5, 106, 101.5, 103, 100];
    const changes = proposeSmoothing(profile(heights), { windowSize: 3, keepTurningPointsM: 2 });
    expect(changes.find((c) => c.index === 6)).toBeUndefined();
    expect(changes.some((c) => c.index === 2 || c.index === 4)).toBe(true);
  });
});
