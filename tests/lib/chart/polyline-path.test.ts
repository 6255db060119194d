import { line } from 'd3-shape';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { polylinePath } from '../../../lib/chart/polyline-path';

describe('polyline path data', () => {
  it('writes exactly what d3-shape line().digits(2) writes', () => {
    const d3 = line<[number, number]>().digits(2);
    fc.assert(
      fc.property(
        fc.array(
          fc.tuple(
            fc.double({ min: -5000, max: 5000, noNaN: true }),
            fc.double({ min: -5000, max: 5000, noNaN: true }),
          ),
          { minLength: 2, maxLength: 50 },
        ),
        (pts) => {
          expect(
            polylinePath(
              pts.map((p) => p[0]),
              pts.map((p) => p[1]),
            ),
          ).toBe(d3(pts));
        },
      ),
      { numRuns: 500 },
    );
  });

  it('draws nothing for fewer than two points', () => {
    expect(polylinePath([1], [2])).toBe('');
  });
});
