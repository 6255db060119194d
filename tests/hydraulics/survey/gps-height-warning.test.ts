import { describe, expect, it } from 'vitest';
import { consumerGpsHeightWarning } from '../../../hydraulics/survey/gps-height-warning';
import {
  DEFAULT_VERTICAL_UNCERTAINTY,
  HEIGHT_SOURCES,
  defaultVerticalUncertaintyM,
} from '../../../hydraulics/survey/height-source';

describe('consumerGpsHeightWarning', () => {
  it('warns loudly, citing the GPS performance standard, when a decision rests on GPS heights', () => {
    const w = consumerGpsHeightWarning({
      heightSources: ['gps', 'gps', 'level'],
      decisions: [
        { label: 'break-pressure tank at the ridge', elevationDifferenceM: 12, pointIndices: [0, 1] },
        { label: 'pipe class at the trough', elevationDifferenceM: 60, pointIndices: [0, 2] },
      ],
    });
    expect(w?.severity).toBe('danger');
    expect(w?.verticalErrorM).toBe(15);
    expect(w?.reference).toMatch(
      /^U\.S\. DoD, GPS Standard Positioning Service Performance Standard \(2020 ed\., §3\.4\)/,
    );
    expect(w?.affected).toEqual([
      { label: 'break-pressure tank at the ridge', elevationDifferenceM: 12, withinGpsErrorBand: true },
      { label: 'pipe class at the trough', elevationDifferenceM: 60, withinGpsErrorBand: false },
    ]);
    expect(w?.message).toMatch(/wrong by 15 m or more/);
    expect(w?.message).toMatch(/break-pressure tank at the ridge \(12\.0 m, smaller than the GPS error itself\)/);
    expect(w?.message).toMatch(/local codes and licensed practice/);
  });

  it('returns null when the heights come from levelling', () => {
    expect(
      consumerGpsHeightWarning({
        heightSources: ['level', 'gnss'],
        decisions: [{ label: 'x', elevationDifferenceM: 5 }],
      }),
    ).toBeNull();
  });

  it('checks every point when a decision names none, and rejects a missing point', () => {
    expect(
      consumerGpsHeightWarning({
        heightSources: ['level', 'gps'],
        decisions: [{ label: 'x', elevationDifferenceM: 5 }],
      }),
    ).not.toBeNull();
    expect(() =>
      consumerGpsHeightWarning({
        heightSources: ['gps'],
        decisions: [{ label: 'x', elevationDifferenceM: 5, pointIndices: [3] }],
      }),
    ).toThrow('decisions.pointIndices[0]: point 3 does not exist');
  });
});

describe('default vertical uncertainty per height source', () => {
  it('GPS is 15 m (SPS PS 2020 §3.4, 95 %) and RTK GNSS 2 cm (core.md §6.4 [R28])', () => {
    expect(defaultVerticalUncertaintyM('gps')).toBe(15);
    expect(defaultVerticalUncertaintyM('gnss')).toBe(0.02);
    expect(DEFAULT_VERTICAL_UNCERTAINTY.gps.source).toMatch(/Performance Standard 2020 §3\.4/);
  });
  it('every source has an entry; unsourced ones say so', () => {
    for (const s of HEIGHT_SOURCES) {
      expect(DEFAULT_VERTICAL_UNCERTAINTY[s].source.length).toBeGreaterThan(0);
    }
    expect(DEFAULT_VERTICAL_UNCERTAINTY.altimeter.source).toMatch(/common practice, no source/);
    expect(defaultVerticalUncertaintyM('typed')).toBeUndefined();
  });
});
