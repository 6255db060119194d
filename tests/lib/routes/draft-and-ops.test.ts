import { describe, expect, it } from 'vitest';
import { draftFromPoints, draftReducer, draftToSaveInput, UNDO_LIMIT } from '../../../lib/routes/draft';
import { joinPoints, reversePoints, splitPoints, trimPoints } from '../../../lib/routes/edit-ops';
import type { RoutePointView } from '../../../lib/routes/types';

const pt = (seq: number, c: number, z: number, raw = z, extra: Partial<RoutePointView> = {}): RoutePointView => ({
  seq,
  latitude: null,
  longitude: null,
  chainageM: c,
  slopeChainageM: null,
  elevationM: z,
  rawElevationM: raw,
  label: null,
  heightSource: 'level',
  confidenceM: 0.01,
  recordedAt: null,
  excluded: false,
  dismissedChecks: [],
  ...extra,
});

describe('draftReducer: the points table edits', () => {
  const start = draftFromPoints([pt(0, 0, 100), pt(1, 50, 95), pt(2, 100, 92)]);

  it('edits, deletes, moves and inserts, each one undo step back to the saved route', () => {
    let s = draftReducer(start, { type: 'edit', key: 's1', patch: { elevationM: 96, label: 'Gate' } });
    s = draftReducer(s, { type: 'move', key: 's2', by: -1 });
    s = draftReducer(s, {
      type: 'insert',
      at: 1,
      point: {
        latitude: null,
        longitude: null,
        chainageM: 25,
        elevationM: 98,
        label: null,
        heightSource: 'typed',
        confidenceM: null,
        excluded: false,
      },
    });
    s = draftReducer(s, { type: 'delete', key: 's0' });
    expect(s.points.map((p) => p.key)).toEqual(['n0', 's2', 's1']);
    expect(s.points[2]).toMatchObject({ elevationM: 96, label: 'Gate', rawElevationM: 95, sourceSeq: 1 });
    expect(s.dirty).toBe(true);
    for (let i = 0; i < 4; i += 1) s = draftReducer(s, { type: 'undo' });
    expect(s.points).toEqual(start.points);
    expect(s.dirty).toBe(false);
    expect(draftReducer(s, { type: 'undo' })).toBe(s);
  });

  it('sketch clicks land in chainage order whatever order they come in', () => {
    let s = draftFromPoints([]);
    for (const [c, z] of [
      [300, 350],
      [0, 400],
      [150, 380],
    ])
      s = draftReducer(s, { type: 'sketch', chainageM: c, elevationM: z, heightSource: 'map' });
    expect(s.points.map((p) => p.chainageM)).toEqual([0, 150, 300]);
    expect(draftToSaveInput(s.points)[0]).toEqual({
      sourceSeq: null,
      latitude: null,
      longitude: null,
      chainageM: 0,
      elevationM: 400,
      label: null,
      heightSource: 'map',
      confidenceM: null,
      excluded: false,
    });
  });

  it('keeps at most UNDO_LIMIT steps and then stays dirty after undoing them all', () => {
    let s = start;
    for (let i = 0; i < UNDO_LIMIT + 5; i += 1)
      s = draftReducer(s, { type: 'edit', key: 's0', patch: { elevationM: 100 + i } });
    expect(s.past).toHaveLength(UNDO_LIMIT);
    for (let i = 0; i < UNDO_LIMIT; i += 1) s = draftReducer(s, { type: 'undo' });
    expect(s.dirty).toBe(true);
  });
});

describe('edit operations keep the surveyed heights', () => {
  const points = [pt(0, 0, 100, 101), pt(1, 50, 95), pt(2, 80, 400, 400, { excluded: true }), pt(3, 100, 92, 90)];

  it('reverse drops excluded points and carries raw heights', () => {
    const r = reversePoints(points);
    expect(r.map((p) => [p.chainageM, p.elevationM, p.rawElevationM])).toEqual([
      [0, 92, 90],
      [50, 95, 95],
      [100, 100, 101],
    ]);
  });

  it('split and trim interpolate new end stations, whose raw height is their own', () => {
    const s = splitPoints(points, 75);
    expect(s.first.map((p) => p.chainageM)).toEqual([0, 50, 75]);
    expect(s.second[0]).toMatchObject({
      chainageM: 0,
      elevationM: 93.5,
      rawElevationM: 93.5,
      heightSource: 'level',
      label: null,
    });
    const t = trimPoints(points, 25, 100);
    expect(t.map((p) => [p.chainageM, p.elevationM, p.rawElevationM])).toEqual([
      [0, 97.5, 97.5],
      [25, 95, 95],
      [75, 92, 90],
    ]);
  });

  it('join shifts the second route by the gap', () => {
    const j = joinPoints([pt(0, 0, 10), pt(1, 40, 8)], [pt(0, 0, 8), pt(1, 60, 5)], 5);
    expect(j.points.map((p) => p.chainageM)).toEqual([0, 40, 45, 105]);
    expect(j.gapM).toBe(5);
  });
});
