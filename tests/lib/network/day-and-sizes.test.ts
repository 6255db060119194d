import { describe, expect, it } from 'vitest';
import { stretchesFromPieces } from '@/lib/network/chosen-stretches';
import { dayViewModel } from '@/lib/network/day-view';
import type { DayRunResult, LinkPieceResult } from '@/lib/network/run-result';
import type { NetworkView } from '@/lib/network/view';

const piece = (fromChainageM: number, toChainageM: number, pipeId: string): LinkPieceResult => ({
  fromChainageM,
  toChainageM,
  pipeId,
  pipeLabel: pipeId,
  insideDiameterM: 0.03,
  flowM3s: 0.001,
  velocityMs: 1,
  headLossM: 1,
});

describe("a line's stretches from its sized pieces", () => {
  it('joins neighbours with the same pipe and keeps the line window', () => {
    const stretches = stretchesFromPieces([piece(120, 300, 'b'), piece(0, 50, 'a'), piece(50, 120, 'a')], {
      fromM: 0,
      toM: 300,
    });
    expect(stretches).toEqual([
      { fromM: 0, toM: 120, pipe: 'a' },
      { fromM: 120, toM: 300, pipe: 'b' },
    ]);
  });
  it('refuses pieces that leave a gap or stop short (the line changed since sizing)', () => {
    expect(stretchesFromPieces([piece(0, 50, 'a'), piece(60, 300, 'b')], { fromM: 0, toM: 300 })).toBeNull();
    expect(stretchesFromPieces([piece(0, 250, 'a')], { fromM: 0, toM: 300 })).toBeNull();
  });
});

describe('the day view', () => {
  const view = {
    records: {
      nodes: [
        { id: 't', name: 'Hill tank' },
        { id: 'o', name: 'Tap' },
        { id: 's', name: 'Spring' },
      ],
    },
  } as unknown as NetworkView;
  const day: DayRunResult = {
    kind: 'day',
    hours: [0, 1, 2],
    warnings: [],
    tanks: [{ nodeId: 't', levelsM: [121, 120.5, 120, 120.4], floorM: 120, overflowM: 122, storageNeededM3: 3 }],
    sources: [{ nodeId: 's', drawM3s: [0.001, 0.0025, 0.001], yieldM3s: 0.002 }],
    outlets: [
      { nodeId: 'o', pressureHeadsM: [9, 2.5, 8], minPressureHeadM: 3, lowest: { pressureHeadM: 2.5, hour: 1 } },
    ],
  };
  it('shows tank depth above the floor, an empty tank, an outlet short at its worst hour and a source over its yield', () => {
    const model = dayViewModel(view, day);
    expect(model.tanks[0]).toMatchObject({ name: 'Hill tank', overflowDepthM: 2, lowestDepthM: 0, storageNeededM3: 3 });
    expect(model.tanks[0].highestDepthM).toBeCloseTo(1, 12);
    expect(model.outlets[0]).toMatchObject({ name: 'Tap', short: true, wantedM: 3 });
    expect(model.sources[0]).toMatchObject({ name: 'Spring', highestDrawM3s: 0.0025, overYield: true });
  });
  it('an outlet at exactly its residual is not short', () => {
    const model = dayViewModel(view, {
      ...day,
      outlets: [{ ...day.outlets[0], lowest: { pressureHeadM: 3, hour: 1 } }],
    });
    expect(model.outlets[0].short).toBe(false);
  });
});
