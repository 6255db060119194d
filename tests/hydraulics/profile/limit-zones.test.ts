import { describe, expect, it } from 'vitest';
import { findLimitRanges } from '../../../hydraulics/index';
import { findProfileLimitRanges } from '../../../hydraulics/profile/limit-zones';

const f64 = (values: number[]) => Float64Array.from(values);

describe('findLimitRanges', () => {
  it('finds exact interpolated ends inside pieces', () => {
    const ranges = findLimitRanges({
      chainageM: f64([0, 10, 20]),
      valueM: f64([5, -5, 5]),
      dropAtPointM: null,
      limitM: 0,
      side: 'below',
    });
    expect(ranges).toEqual([{ fromM: 5, toM: 15, worstExcessM: 5, worstChainageM: 10 }]);
  });

  it('starts or ends a range at a point where the limit steps (per-stretch limits)', () => {
    const ranges = findLimitRanges({
      chainageM: f64([0, 10, 20]),
      valueM: f64([50, 60, 70]),
      dropAtPointM: null,
      limitM: f64([100, 55]),
      pieceStretch: Int32Array.from([0, 1]),
      side: 'above',
    });
    expect(ranges).toEqual([{ fromM: 10, toM: 20, worstExcessM: 15, worstChainageM: 20 }]);
  });

  it('ends a range at a point where the value drops (a tank reset)', () => {
    const ranges = findLimitRanges({
      chainageM: f64([0, 10, 20]),
      valueM: f64([80, 0, 30]),
      // Upstream of point 1 the value is 0 + 120 = 120 (before the reset).
      dropAtPointM: f64([0, 120, 0]),
      limitM: 100,
      side: 'above',
    });
    expect(ranges).toHaveLength(1);
    expect(ranges[0].fromM).toBeCloseTo(5, 12);
    expect(ranges[0].toM).toBe(10);
    expect(ranges[0].worstExcessM).toBe(20);
  });

  it('ignores an excess within the tolerance (a value placed exactly on the limit)', () => {
    const ranges = findLimitRanges({
      chainageM: f64([0, 10]),
      valueM: f64([100 + 1e-12, 90]),
      dropAtPointM: null,
      limitM: 100,
      side: 'above',
    });
    expect(ranges).toEqual([]);
  });
});

describe('findProfileLimitRanges', () => {
  /** Deterministic pseudo-random numbers in [0, 1) (a 32-bit LCG, Numerical Recipes constants). */
  function lcg(seed: number): () => number {
    let state = seed >>> 0;
    return () => {
      state = (Math.imul(state, 1664525) + 1013904223) >>> 0;
      return state / 2 ** 32;
    };
  }

  /** A rolling profile with steps at a few event points, three stretches and per-stretch limits. */
  function randomProfile(seed: number, withSurge: boolean) {
    const random = lcg(seed);
    const n = 400 + Math.floor(random() * 400);
    const chainageM = Float64Array.from({ length: n }, (_, j) => j * 2 + random());
    const flowingM = Float64Array.from({ length: n }, (_, j) => 4 * Math.sin(j / 17) - 3 + 6 * (random() - 0.5));
    const stillM = Float64Array.from({ length: n }, (_, j) => 90 + 30 * Math.sin(j / 40) + 4 * (random() - 0.5));
    const pieceStretch = Int32Array.from({ length: n - 1 }, (_, j) => Math.min(2, Math.floor((3 * j) / (n - 1))));
    const eventPoints = [0, ...Array.from({ length: 6 }, () => 1 + Math.floor(random() * (n - 2))), n - 1];
    const points = [...new Set(eventPoints)].sort((a, b) => a - b);
    const drops = {
      points,
      hydraulicM: points.map(() => (random() < 0.5 ? 0 : 10 * random())),
      staticM: points.map(() => (random() < 0.5 ? 0 : 40 * random())),
    };
    const allowable = f64([100, 95, 110]);
    const surgeLimit = f64([80, 70, 100]);
    return {
      chainageM,
      pieceStretch,
      flowingM,
      flowingLimitsM: [0, -2.5, -4] as const,
      stillM,
      stillLimitsByStretchM: withSurge ? [allowable, surgeLimit] : [allowable],
      drops,
      mergeWithinM: seed % 3 === 0 ? 0.5 : 0,
    };
  }

  /** The drops as one value per point, as `findLimitRanges` takes them. */
  function dense(n: number, points: readonly number[], values: readonly number[]): Float64Array {
    const out = new Float64Array(n);
    points.forEach((point, e) => (out[point] = values[e]));
    return out;
  }

  it('finds the same ranges as one findLimitRanges call per limit, on 60 rolling profiles with steps', () => {
    let ranges = 0;
    for (let seed = 1; seed <= 60; seed++) {
      const args = randomProfile(seed, seed % 2 === 0);
      const n = args.chainageM.length;
      const together = findProfileLimitRanges(args);
      const flowingDrops = dense(n, args.drops.points, args.drops.hydraulicM);
      const stillDrops = dense(n, args.drops.points, args.drops.staticM);
      const apart = {
        flowing: args.flowingLimitsM.map((limitM) =>
          findLimitRanges({
            chainageM: args.chainageM,
            valueM: args.flowingM,
            dropAtPointM: flowingDrops,
            limitM,
            side: 'below',
            mergeWithinM: args.mergeWithinM,
          }),
        ),
        still: args.stillLimitsByStretchM.map((limitM) =>
          findLimitRanges({
            chainageM: args.chainageM,
            valueM: args.stillM,
            dropAtPointM: stillDrops,
            limitM,
            pieceStretch: args.pieceStretch,
            side: 'above',
            mergeWithinM: args.mergeWithinM,
          }),
        ),
      };
      expect(together, `seed ${seed}`).toEqual(apart);
      ranges += [...together.flowing, ...together.still].reduce((sum, list) => sum + list.length, 0);
    }
    // The profiles cross their limits often, so agreement is not agreement on "no range".
    expect(ranges).toBeGreaterThan(500);
  });
});
