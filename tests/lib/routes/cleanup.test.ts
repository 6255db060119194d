import { describe, expect, it } from 'vitest';
import { applyCleanupDecisions } from '../../../lib/routes/apply-cleanup';
import { RouteEditError } from '../../../lib/routes/errors';
import { benchmarkProposals, detectRouteProposals, smoothingProposals } from '../../../lib/routes/proposals';
import type { RoutePointView } from '../../../lib/routes/types';

const pt = (seq: number, z: number, extra: Partial<RoutePointView> = {}): RoutePointView => ({
  seq,
  latitude: null,
  longitude: null,
  chainageM: seq * 10,
  slopeChainageM: null,
  elevationM: z,
  rawElevationM: z,
  label: null,
  heightSource: 'gps',
  confidenceM: 15,
  recordedAt: null,
  excluded: false,
  dismissedChecks: [],
  ...extra,
});
const walk = (zs: number[]) => zs.map((z, i) => pt(i, z));

describe('detectRouteProposals', () => {
  it('finds a spike once even though two checks flag it, keyed by seq', () => {
    const points = walk([100, 99, 98, 97, 125, 95, 94, 93, 92]);
    const found = detectRouteProposals(points);
    expect(found).toHaveLength(1);
    expect(found[0]).toMatchObject({ kind: 'grade-spike', index: 4, from: 125, to: 96 });
  });

  it('skips excluded points and maps positions back to seq', () => {
    const points = walk([100, 99, 400, 98, 97, 125, 95, 94]);
    points[2] = { ...points[2], excluded: true };
    expect(detectRouteProposals(points).map((c) => c.index)).toEqual([5]);
  });

  it('leaves dismissed checks alone', () => {
    const points = walk([100, 99, 98, 97, 125, 95, 94, 93, 92]);
    points[4] = { ...points[4], dismissedChecks: ['grade-spike', 'median-outlier'] };
    expect(detectRouteProposals(points)).toEqual([]);
  });

  it('does not second-guess levelled heights with the moving median', () => {
    // A real 8 m knoll on a level run: steeper than nothing, off the median by more than 6 m.
    const points = [0, 2, 4, 6, 8, 6, 4, 2, 0].map((z, i) =>
      pt(i, 100 + z, { heightSource: 'level', chainageM: i * 20 }),
    );
    expect(detectRouteProposals(points)).toEqual([]);
  });
});

describe('requested proposals', () => {
  it('smoothing and benchmark offsets are keyed by seq and skip excluded points', () => {
    const points = walk([10, 30, 10, 10, 10]);
    points[3] = { ...points[3], excluded: true };
    expect(smoothingProposals(points, 3).map((c) => [c.index, c.to])).toEqual([[1, 10]]);
    const offset = benchmarkProposals(points, 0, 12.5);
    expect(offset.map((c) => c.index)).toEqual([0, 1, 2, 4]);
    expect(offset.every((c) => c.field === 'elevationM' && c.to - c.from === 2.5)).toBe(true);
  });
});

describe('applyCleanupDecisions', () => {
  const spike = { kind: 'grade-spike' as const, index: 2, field: 'elevationM' as const, from: 30, to: 10, reason: '' };

  it('accepting sets the cleaned height and keeps the raw one; deleting excludes without removing', () => {
    const out = applyCleanupDecisions(walk([10, 10, 30, 10]), {
      accept: [spike, { kind: 'duplicate', index: 3, field: 'deleted', from: false, to: true, reason: '' }],
      reject: [],
    });
    expect(out[2]).toMatchObject({ elevationM: 10, rawElevationM: 30 });
    expect(out[3]).toMatchObject({ excluded: true, elevationM: 10 });
    expect(out).toHaveLength(4);
  });

  it('rejecting a height finding dismisses both height checks at that point; requested kinds are not remembered', () => {
    const out = applyCleanupDecisions(walk([10, 10, 30, 10]), {
      accept: [],
      reject: [spike, { ...spike, kind: 'smoothing', index: 1 }],
    });
    expect(out[2].dismissedChecks).toEqual(['grade-spike', 'median-outlier']);
    expect(out[1].dismissedChecks).toEqual([]);
  });

  it('refuses stale, contradictory, doubled and unknown decisions with the point named', () => {
    const points = walk([10, 10, 29, 10]);
    const expectRefusal = (fn: () => unknown, message: string, kind: 'invalid' | 'conflict') => {
      try {
        fn();
        expect.unreachable();
      } catch (e) {
        expect(e).toBeInstanceOf(RouteEditError);
        expect((e as RouteEditError).message).toBe(message);
        expect((e as RouteEditError).kind).toBe(kind);
      }
    };
    expectRefusal(
      () => applyCleanupDecisions(points, { accept: [spike], reject: [] }),
      'point 3: the height changed to 29.00 m since this was proposed (from 30.00 m); reload the route',
      'conflict',
    );
    expectRefusal(
      () => applyCleanupDecisions(points, { accept: [{ ...spike, from: 29 }], reject: [{ ...spike, from: 29 }] }),
      'point 3: a proposal for this point is both accepted and rejected',
      'invalid',
    );
    expectRefusal(
      () =>
        applyCleanupDecisions(points, {
          accept: [
            { ...spike, from: 29 },
            { ...spike, from: 29, kind: 'smoothing' },
          ],
          reject: [],
        }),
      'point 3: two height changes for one point; accept only one',
      'invalid',
    );
    expectRefusal(
      () => applyCleanupDecisions(points, { accept: [{ ...spike, index: 9 }], reject: [] }),
      'point 10: there is no point 10 on this route',
      'invalid',
    );
  });

  it('never changes its input', () => {
    const points = walk([10, 10, 30, 10]);
    const copy = structuredClone(points);
    applyCleanupDecisions(points, { accept: [spike], reject: [] });
    expect(points).toEqual(copy);
  });
});
