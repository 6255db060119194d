import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { localExtremeIndices, turningIndices } from '../../../lib/chart/local-extremes';
import { thinProfile } from '../../../lib/chart/thin-profile';

/**
 * Every local high and low by the plainest reading of the definition, written apart from the code
 * under test: a run of equal values whose neighbours are both lower, or both higher.
 */
function extremesByBruteForce(y: ArrayLike<number>): number[] {
  const out: number[] = [];
  let a = 0;
  while (a < y.length) {
    let b = a;
    while (b + 1 < y.length && y[b + 1] === y[a]) b++;
    if (a > 0 && b < y.length - 1) {
      const left = y[a - 1];
      const right = y[b + 1];
      if ((left < y[a] && right < y[a]) || (left > y[a] && right > y[a])) out.push(...(a === b ? [a] : [a, b]));
    }
    a = b + 1;
  }
  return out;
}

/** A 100 000-point survey-like route: a random walk with flats, steps and noise, from a seed. */
function route(seed: number, noise: number, n = 100_000): { x: Float64Array; y: Float64Array } {
  let s = seed >>> 0;
  const rand = () => (s = (Math.imul(s, 1664525) + 1013904223) >>> 0) / 2 ** 32;
  const x = new Float64Array(n);
  const y = new Float64Array(n);
  let z = 400;
  let slope = 0;
  for (let i = 0; i < n; i++) {
    if (rand() < 0.002) slope = (rand() - 0.5) * 0.4;
    z += slope + (rand() - 0.5) * noise;
    x[i] = i * 0.5;
    y[i] = Math.round(z * 10) / 10; // level-book rounding makes plateaus
  }
  return { x, y };
}

describe('thinning a long profile', () => {
  it('the extreme finder agrees with the brute-force definition on small arrays', () => {
    fc.assert(
      fc.property(fc.array(fc.integer({ min: -3, max: 3 }), { minLength: 0, maxLength: 60 }), (values) => {
        expect(localExtremeIndices(values)).toEqual(extremesByBruteForce(values));
      }),
      { numRuns: 2000 },
    );
  });

  it('keeps every local high and low of a 100,000-point route, and both ends', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 2 ** 31 - 1 }),
        fc.constantFrom(0, 0.05, 0.6),
        fc.integer({ min: 200, max: 3000 }),
        (seed, noise, target) => {
          const { x, y } = route(seed, noise);
          const kept = thinProfile(x, y, { targetPoints: target });
          const set = new Set(kept);
          expect(kept[0]).toBe(0);
          expect(kept[kept.length - 1]).toBe(y.length - 1);
          for (let k = 1; k < kept.length; k++) expect(kept[k]).toBeGreaterThan(kept[k - 1]);
          for (const i of extremesByBruteForce(y))
            if (!set.has(i)) throw new Error(`extreme at index ${i} (${y[i]} m) was dropped`);
        },
      ),
      { numRuns: 12 },
    );
  });

  it('thins a smooth route to about the target, and keeps the guard series extremes and the indices asked for', () => {
    const n = 100_000;
    const x = Float64Array.from({ length: n }, (_, i) => i);
    const y = Float64Array.from({ length: n }, (_, i) => 300 + 40 * Math.sin(i / 9000));
    const guard = Float64Array.from({ length: n }, (_, i) => y[i] - (i === 5_000 ? 3 : 0.6));
    const kept = thinProfile(x, y, { targetPoints: 1500, guardSeries: [guard], keep: [12_345] });
    expect(kept.length).toBeLessThanOrEqual(
      1500 + extremesByBruteForce(y).length + extremesByBruteForce(guard).length + 1,
    );
    expect(kept.length).toBeGreaterThan(1000);
    expect(kept).toContain(12_345);
    for (const i of extremesByBruteForce(guard)) expect(kept).toContain(i);
    for (const i of extremesByBruteForce(y)) expect(kept).toContain(i);
  });

  it('returns every index when the series is already short, and only the window asked for', () => {
    const y = [1, 3, 2, 5, 4];
    expect(thinProfile([0, 1, 2, 3, 4], y, { targetPoints: 10 })).toEqual([0, 1, 2, 3, 4]);
    const x = Float64Array.from({ length: 1000 }, (_, i) => i);
    const wave = Float64Array.from({ length: 1000 }, (_, i) => Math.sin(i / 30));
    const kept = thinProfile(x, wave, { targetPoints: 20, from: 100, to: 300 });
    expect(kept[0]).toBe(100);
    expect(kept[kept.length - 1]).toBe(300);
    expect(kept.every((i) => i >= 100 && i <= 300)).toBe(true);
  });
});

describe('thinning with a height tolerance (reversalM)', () => {
  it('is every local high and low at 0, and with a tolerance hides nothing taller than it between two kept points', () => {
    fc.assert(
      fc.property(
        fc.array(fc.integer({ min: -20, max: 20 }), { minLength: 0, maxLength: 80 }),
        fc.constantFrom(0, 0.5, 2, 7),
        (values, reversal) => {
          if (reversal === 0) expect(turningIndices(values, 0)).toEqual(localExtremeIndices(values));
          if (values.length < 2) return;
          const kept = [0, ...turningIndices(values, reversal), values.length - 1];
          for (let k = 1; k < kept.length; k++) {
            const [a, b] = [kept[k - 1], kept[k]];
            expect(b).toBeGreaterThan(a);
            const lo = Math.min(values[a], values[b]);
            const hi = Math.max(values[a], values[b]);
            for (let j = a; j <= b; j++) {
              expect(values[j]).toBeLessThanOrEqual(hi + reversal);
              expect(values[j]).toBeGreaterThanOrEqual(lo - reversal);
            }
          }
        },
      ),
      { numRuns: 3000 },
    );
  });

  it('keeps a 100,000-point walked route with 0.6 m scatter near its budget when told the scatter, and every turn taller than it', () => {
    const { x, y } = route(7, 0.6);
    const all = thinProfile(x, y, { targetPoints: 1500 });
    const told = thinProfile(x, y, { targetPoints: 1500, reversalM: 0.6 });
    expect(all.length).toBeGreaterThan(20_000);
    expect(told.length).toBeLessThan(all.length / 4);
    const set = new Set(told);
    for (const i of turningIndices(y, 0.6)) expect(set.has(i)).toBe(true);
  });
});

describe('thinning to pixel columns (columns)', () => {
  /**
   * What a column of pixels shows, read apart from the code under test: the heights the whole series
   * reaches inside the column, and the heights the polyline through the kept points reaches there
   * (its vertices in the column plus the two segments that enter and leave it, cut at its edges).
   */
  function columnSpans(x: ArrayLike<number>, y: ArrayLike<number>, kept: readonly number[], columns: number) {
    const x0 = x[0];
    const width = (x[x.length - 1] - x0) / columns;
    const spans: { c: number; all: [number, number]; drawn: [number, number] }[] = [];
    const yOn = (a: number, b: number, at: number) =>
      x[b] === x[a] ? y[a] : y[a] + ((y[b] - y[a]) * (at - x[a])) / (x[b] - x[a]);
    for (let c = 0; c < columns; c++) {
      const left = x0 + c * width;
      const right = c === columns - 1 ? x[x.length - 1] : x0 + (c + 1) * width;
      let lo = Infinity;
      let hi = -Infinity;
      for (let i = 0; i < x.length; i++)
        if (x[i] >= left && x[i] <= right) [lo, hi] = [Math.min(lo, y[i]), Math.max(hi, y[i])];
      if (lo === Infinity) continue;
      let dlo = Infinity;
      let dhi = -Infinity;
      for (let k = 0; k + 1 < kept.length; k++) {
        const [a, b] = [kept[k], kept[k + 1]];
        if (x[b] < left || x[a] > right) continue;
        for (const at of [Math.max(x[a], left), Math.min(x[b], right)]) {
          const v = yOn(a, b, at);
          [dlo, dhi] = [Math.min(dlo, v), Math.max(dhi, v)];
        }
      }
      spans.push({ c, all: [lo, hi], drawn: [dlo, dhi] });
    }
    return spans;
  }

  it('every column still reaches the lowest and highest height of the series in it', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 2 ** 31 - 1 }),
        fc.constantFrom(0.05, 0.6, 3),
        fc.integer({ min: 20, max: 400 }),
        (seed, noise, columns) => {
          const { x, y } = route(seed, noise, 6_000);
          const kept = thinProfile(x, y, { targetPoints: 2 * columns, columns });
          expect(kept[0]).toBe(0);
          expect(kept[kept.length - 1]).toBe(y.length - 1);
          for (let k = 1; k < kept.length; k++) expect(kept[k]).toBeGreaterThan(kept[k - 1]);
          for (const { c, all, drawn } of columnSpans(x, y, kept, columns)) {
            if (drawn[0] > all[0] + 1e-9 || drawn[1] < all[1] - 1e-9)
              throw new Error(`column ${c}: series spans ${all}, the drawn line ${drawn}`);
          }
        },
      ),
      { numRuns: 30 },
    );
  });

  it('keeps each column’s highest and lowest high or low exactly, and a few points per column on a noisy line', () => {
    const { x, y } = route(11, 0.6);
    const columns = 900;
    const kept = new Set(thinProfile(x, y, { targetPoints: 2 * columns, columns }));
    expect(kept.size).toBeLessThan(9 * columns);
    expect(thinProfile(x, y, { targetPoints: 2 * columns }).length).toBeGreaterThan(20 * columns);
    const perColumn = new Map<number, number[]>();
    const width = (x[x.length - 1] - x[0]) / columns;
    for (const i of localExtremeIndices(y)) {
      const c = Math.min(Math.floor((x[i] - x[0]) / width), columns - 1);
      perColumn.set(c, [...(perColumn.get(c) ?? []), i]);
    }
    for (const [c, turns] of perColumn) {
      const hi = Math.max(...turns.map((i) => y[i]));
      const lo = Math.min(...turns.map((i) => y[i]));
      if (!turns.some((i) => kept.has(i) && y[i] === hi)) throw new Error(`column ${c} lost its highest point ${hi}`);
      if (!turns.some((i) => kept.has(i) && y[i] === lo)) throw new Error(`column ${c} lost its lowest point ${lo}`);
    }
  });
});
