import { describe, expect, it } from 'vitest';
import { draftFromPoints, draftReducer } from '../../../lib/routes/draft';
import { keepDraft, keptDraft } from '../../../lib/routes/kept-drafts';
import type { RoutePointView } from '../../../lib/routes/types';

const point = (seq: number, elevationM: number) =>
  ({
    seq,
    latitude: null,
    longitude: null,
    chainageM: seq * 10,
    elevationM,
    rawElevationM: elevationM,
    label: null,
    heightSource: 'gps',
    confidenceM: null,
    excluded: false,
  }) as unknown as RoutePointView;

describe('route-table edits kept across a section change', () => {
  const saved = draftFromPoints([point(0, 100), point(1, 98)]);
  const edited = draftReducer(saved, { type: 'edit', key: 's1', patch: { elevationM: 97.5 } });

  it('brings back unsaved edits made on the same saved version', () => {
    keepDraft('route-a', '2026-12-01T10:00:00.000Z', edited);
    expect(keptDraft('route-a', '2026-12-01T10:00:00.000Z')?.points[1]!.elevationM).toBe(97.5);
    expect(keptDraft('route-b', '2026-12-01T10:00:00.000Z')).toBeNull();
  });

  it('drops them once the route was saved again (they were made on an older version) or nothing is unsaved', () => {
    keepDraft('route-a', '2026-12-01T10:00:00.000Z', edited);
    expect(keptDraft('route-a', '2026-12-01T11:00:00.000Z')).toBeNull();
    expect(keptDraft('route-a', '2026-12-01T10:00:00.000Z')).toBeNull();
    keepDraft('route-c', 'v1', edited);
    keepDraft('route-c', 'v1', draftReducer(edited, { type: 'reset', points: [point(0, 100)] }));
    expect(keptDraft('route-c', 'v1')).toBeNull();
  });
});
