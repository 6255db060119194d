import { describe, expect, it } from 'vitest';
import { HydraulicsInputError } from '../../../hydraulics/errors';
import { seasonalTasks } from '../../../hydraulics/seasons/seasonal-tasks';

const troughLine = {
  label: 'Trough line',
  profile: { chainageM: [0, 50, 100, 150], elevationM: [100, 92, 97, 90] },
  coverDepthM: 0.3,
  frostDepthM: 0.9,
};
const buriedMain = { ...troughLine, label: 'Main', coverDepthM: 1.2 };

// The schedule is Runnel's (common practice, no source); the tests pin the date arithmetic.
describe('seasonalTasks', () => {
  it('northern year: drain-down two weeks before first frost, listing the lines above frost depth and their drain points', () => {
    const { tasks, winter } = seasonalTasks({
      year: 2025,
      hemisphere: 'north',
      firstFrost: '10-15',
      lastFrost: '04-20',
      lines: [troughLine, buriedMain],
    });
    const drain = tasks.find((task) => task.kind === 'drain-down')!;
    expect(drain.date).toBe('2025-10-01');
    expect(drain.lines!.map((line) => line.label)).toEqual(['Trough line']);
    expect(drain.lines![0].drainPoints.map((point) => point.chainageM)).toEqual([50]);
    expect(drain.detail).toMatch(/Trough line/);
    expect(winter.map((line) => line.treatment)).toEqual(['drain-for-winter', 'buried-below-frost']);
    expect(tasks.find((task) => task.kind === 'refill')!.date).toBe('2025-04-27');
  });

  it('lists silt cleaning, intake screen and valve exercise, sorted by date and all in the year', () => {
    const { tasks } = seasonalTasks({ year: 2025, hemisphere: 'north', firstFrost: '10-15' });
    expect(tasks.filter((task) => task.kind === 'intake-screen').map((task) => task.date)).toEqual([
      '2025-03-01',
      '2025-06-01',
      '2025-09-01',
      '2025-12-01',
    ]);
    expect(tasks.filter((task) => task.kind === 'valve-exercise').map((task) => task.date)).toEqual([
      '2025-03-15',
      '2025-09-15',
    ]);
    expect(tasks.filter((task) => task.kind === 'silt-cleaning').map((task) => task.date)).toEqual([
      '2025-06-15',
      '2025-09-24',
    ]);
    expect(tasks.some((task) => task.kind === 'refill')).toBe(false);
    const dates = tasks.map((task) => task.date);
    expect([...dates].sort()).toEqual(dates);
    expect(dates.every((date) => date.startsWith('2025-'))).toBe(true);
    expect(tasks.every((task) => task.source === 'common practice, no source')).toBe(true);
  });

  it('southern hemisphere shifts the seasons by six months', () => {
    const { tasks, checks } = seasonalTasks({ year: 2025, hemisphere: 'south', firstFrost: '05-20' });
    expect(tasks.find((task) => task.kind === 'drain-down')!.date).toBe('2025-05-06');
    expect(tasks.filter((task) => task.kind === 'valve-exercise').map((task) => task.date)).toEqual([
      '2025-03-15',
      '2025-09-15',
    ]);
    expect(tasks.filter((task) => task.kind === 'silt-cleaning').map((task) => task.date)).toEqual([
      '2025-04-29',
      '2025-12-15',
    ]);
    expect(checks).toEqual([]);
  });

  it('a drain-down that would fall in the year before is kept inside the year asked for', () => {
    const { tasks } = seasonalTasks({ year: 2025, hemisphere: 'north', firstFrost: '01-05' });
    expect(tasks.find((task) => task.kind === 'drain-down')!.date).toBe('2025-12-22');
  });

  it('notes a first frost that is unusual for the hemisphere', () => {
    expect(seasonalTasks({ year: 2025, hemisphere: 'south', firstFrost: '10-15' }).checks[0].code).toBe(
      'frost-date-unusual-for-hemisphere',
    );
  });

  it('29 February falls on the 28th in other years', () => {
    const { tasks } = seasonalTasks({ year: 2025, hemisphere: 'north', firstFrost: '10-15', lastFrost: '02-29' });
    expect(tasks.find((task) => task.kind === 'refill')!.date).toBe('2025-03-07');
  });

  it('bad input names the field', () => {
    const field = (fn: () => unknown) => {
      try {
        fn();
      } catch (error) {
        return (error as HydraulicsInputError).field;
      }
      return null;
    };
    expect(field(() => seasonalTasks({ year: 2025, hemisphere: 'north', firstFrost: '13-01' }))).toBe('firstFrost');
    expect(field(() => seasonalTasks({ year: 2025, hemisphere: 'east' as never, firstFrost: '10-01' }))).toBe(
      'hemisphere',
    );
    expect(field(() => seasonalTasks({ year: 2025.5, hemisphere: 'north', firstFrost: '10-01' }))).toBe('year');
    expect(
      field(() =>
        seasonalTasks({
          year: 2025,
          hemisphere: 'north',
          firstFrost: '10-01',
          lines: [{ ...troughLine, coverDepthM: -1 }],
        }),
      ),
    ).toBe('lines.coverDepthM');
  });
});
