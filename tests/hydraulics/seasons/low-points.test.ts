import { describe, expect, it } from 'vitest';
import { HydraulicsInputError } from '../../../hydraulics/errors';
import { findLowPoints } from '../../../hydraulics/seasons/low-points';
import { winterTreatment } from '../../../hydraulics/seasons/winter-treatment';

const profile = {
  chainageM: [0, 50, 100, 150, 200, 250, 300, 350],
  elevationM: [120, 104, 110, 109.8, 111, 96, 101, 90],
};

describe('findLowPoints (drain points)', () => {
  it('finds sags that stand out by more than the prominence; ends and survey noise are not drain points', () => {
    const lows = findLowPoints({ ...profile, prominenceM: 0.5 });
    expect(lows).toEqual([
      { index: 1, chainageM: 50, elevationM: 104 },
      { index: 5, chainageM: 250, elevationM: 96 },
    ]);
  });

  it('a larger prominence drops the shallow sags', () => {
    expect(findLowPoints({ ...profile, prominenceM: 5.5 }).map((low) => low.index)).toEqual([1]);
  });

  it('a steadily falling line has no drain points', () => {
    expect(findLowPoints({ chainageM: [0, 10, 20], elevationM: [10, 8, 5] })).toEqual([]);
  });

  it('rejects chainage that does not increase, naming the index', () => {
    try {
      findLowPoints({ chainageM: [0, 10, 10], elevationM: [1, 2, 3] });
      expect.unreachable();
    } catch (error) {
      expect((error as HydraulicsInputError).field).toBe('chainageM');
      expect((error as HydraulicsInputError).index).toBe(2);
    }
    expect(() => findLowPoints({ chainageM: [0, 10], elevationM: [1] })).toThrow(/elevationM/);
  });
});

describe('winterTreatment', () => {
  it('a line buried below frost depth stays full; a shallow one is drained at its low points', () => {
    expect(winterTreatment({ label: 'Main', profile, coverDepthM: 1.2, frostDepthM: 0.9 })).toEqual({
      label: 'Main',
      treatment: 'buried-below-frost',
      drainPoints: [],
    });
    const shallow = winterTreatment({ label: 'Trough line', profile, coverDepthM: 0.3, frostDepthM: 0.9 });
    expect(shallow.treatment).toBe('drain-for-winter');
    expect(shallow.drainPoints.map((low) => low.chainageM)).toEqual([50, 250]);
  });

  it('a line the designer drains is drained at its low points even when it is buried deep enough', () => {
    const drained = winterTreatment({
      label: 'Main',
      profile,
      coverDepthM: 1.2,
      frostDepthM: 0.9,
      drainForWinter: true,
    });
    expect(drained.treatment).toBe('drain-for-winter');
    expect(drained.drainPoints.map((low) => low.chainageM)).toEqual([50, 250]);
  });

  it('a bad profile is reported against its line', () => {
    try {
      winterTreatment(
        { label: 'x', profile: { chainageM: [0, 5], elevationM: [1, Number.NaN] }, coverDepthM: 0, frostDepthM: 1 },
        3,
      );
      expect.unreachable();
    } catch (error) {
      expect((error as HydraulicsInputError).field).toBe('lines[3].profile.elevationM');
      expect((error as HydraulicsInputError).index).toBe(1);
    }
  });
});
