import { describe, expect, it } from 'vitest';
import { HydraulicsInputError } from '../../../hydraulics/errors';
import { bucketFlowM3s } from '../../../hydraulics/yield/bucket-flow';
import { designYield, yieldDrawChecks } from '../../../hydraulics/yield/design-yield';
import type { YieldReading } from '../../../hydraulics/yield/yield-reading';

const L_PER_MIN = 1e-3 / 60;
const bucket = (litres: number, seconds: number) => ({ bucket: { volumeM3: litres / 1000, seconds } });

const readings: YieldReading[] = [
  { date: '2021-08-20', season: 'dry', measurement: bucket(10, 60) }, // 10 L/min, too old by default
  { date: '2023-04-10', season: 'wet', measurement: bucket(20, 20) }, // 60 L/min
  { date: '2023-08-28', season: 'dry', measurement: bucket(20, 60) }, // 20 L/min
  { date: '2024-09-02', season: 'dry', measurement: { flowM3s: 25 * L_PER_MIN } },
  { date: '2024-11-15', season: 'unspecified', measurement: bucket(20, 40) }, // 30 L/min
];

describe('bucketFlowM3s', () => {
  it('volume over seconds', () => {
    expect(bucketFlowM3s({ volumeM3: 0.02, seconds: 40 })).toBeCloseTo(0.0005, 15);
  });
});

describe('designYield', () => {
  it('defaults to the lowest dry-season reading of the last three years', () => {
    const result = designYield({ readings });
    expect(result.basis).toBe('lowest-recent-dry');
    expect(result.readingIndex).toBe(2);
    expect(result.designYieldM3s).toBeCloseTo(20 * L_PER_MIN, 15);
    expect(result.checks).toEqual([]);
  });

  it('a longer "recent" window reaches the older, lower dry reading', () => {
    expect(designYield({ readings, recentDays: 1500 }).readingIndex).toBe(0);
  });

  it('without a recent dry reading, uses the lowest recent reading of any season and warns', () => {
    const result = designYield({ readings: readings.filter((reading) => reading.season !== 'dry') });
    expect(result.basis).toBe('lowest-recent-any-season');
    expect(result.designYieldM3s).toBeCloseTo(30 * L_PER_MIN, 15);
    expect(result.checks[0].code).toBe('no-dry-season-reading');
  });

  it('the user may choose otherwise, with a warning when above the dry-season figure (Jordan: never draw more than the minimum flow)', () => {
    const chosen = designYield({ readings, choice: { kind: 'reading', index: 3 } });
    expect(chosen.basis).toBe('chosen-reading');
    expect(chosen.designYieldM3s).toBeCloseTo(25 * L_PER_MIN, 15);
    expect(chosen.checks[0].code).toBe('design-yield-above-dry-season');
    expect(chosen.checks[0].source).toMatch(/Jordan/);
    const entered = designYield({ readings, choice: { kind: 'entered', flowM3s: 15 * L_PER_MIN } });
    expect(entered.basis).toBe('entered');
    expect(entered.checks).toEqual([]);
  });

  it('bad readings name the field and row', () => {
    const fieldAndIndex = (bad: YieldReading[]) => {
      try {
        designYield({ readings: bad });
      } catch (error) {
        return [(error as HydraulicsInputError).field, (error as HydraulicsInputError).index];
      }
      return null;
    };
    expect(fieldAndIndex([readings[0], { ...readings[1], date: '2023-02-30' }])).toEqual(['readings.date', 1]);
    expect(fieldAndIndex([readings[0], readings[1], { ...readings[2], measurement: bucket(10, 0) }])).toEqual([
      'readings.measurement.bucket.seconds',
      2,
    ]);
    expect(fieldAndIndex([{ ...readings[0], measurement: { flowM3s: 0 } }])).toEqual([
      'readings.measurement.flowM3s',
      0,
    ]);
    expect(fieldAndIndex([])).toEqual(['readings', undefined]);
  });
});

describe('yieldDrawChecks', () => {
  it('warns when the design draw exceeds the design yield', () => {
    expect(yieldDrawChecks({ designYieldM3s: 20 * L_PER_MIN, designDrawM3s: 18 * L_PER_MIN })).toEqual([]);
    const [check] = yieldDrawChecks({ designYieldM3s: 20 * L_PER_MIN, designDrawM3s: 24 * L_PER_MIN });
    expect(check.code).toBe('draw-exceeds-yield');
    expect(check.message).toMatch(/24\.0 L\/min.*20\.0 L\/min/);
  });
});
