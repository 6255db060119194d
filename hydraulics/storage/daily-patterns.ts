import { patternFromPercentByHour } from '../demand/hourly-pattern';

const DCOM_TABLE_C1 =
  'United Republic of Tanzania, Ministry of Water, Design, Construction Supervision, Operation and Maintenance (DCOM) Manual, Vol. I, Appendix C, Table C.1 citing Jordan';

/** A published daily use pattern offered as a preset. */
export interface DailyUsePatternPreset {
  id: string;
  label: string;
  /** First hour of the published table (its hours run on from here). */
  startHour: number;
  /** Percent of the day's use in each hour, as printed. */
  percents: readonly number[];
  /** The same as 24 hourly fractions (index 0 = 00:00-01:00). */
  hourlyFractions: readonly number[];
  /** Sum of the printed percentages. */
  sumPercent: number;
  source: string;
  /** Set when the preset cannot be used as printed. */
  flag?: string;
}

function preset(id: string, label: string, percents: readonly number[], flag?: string): DailyUsePatternPreset {
  return {
    id,
    label,
    startHour: 5,
    percents,
    hourlyFractions: patternFromPercentByHour({ startHour: 5, percents }),
    sumPercent: percents.reduce((sum, percent) => sum + percent, 0),
    source: DCOM_TABLE_C1,
    ...(flag ? { flag } : {}),
  };
}

/** Taps used 5:00-18:00 with morning and evening peaks (Jordan, via DCOM Table C.1). */
export const JORDAN_MORNING_EVENING_PATTERN = preset(
  'jordan-morning-evening',
  'Village taps, morning and evening peaks',
  [0, 15, 15, 5, 5, 5, 5, 5, 5, 5, 5, 15, 15, 0],
);

/** Taps used 5:00-18:00 with a mid-day peak (Jordan, via DCOM Table C.1). */
export const JORDAN_MIDDAY_PATTERN = preset(
  'jordan-midday',
  'Village taps, mid-day peak',
  [5, 5, 10, 5, 5, 5, 20, 15, 5, 5, 5, 5, 5, 5],
);

/** The third column of the same table (three peaks): printed values sum to 95 %, so it is flagged. */
export const THREE_PEAKS_PATTERN_AS_PRINTED = preset(
  'three-peaks-as-printed',
  'Village taps, three peaks (as printed)',
  [5, 5, 10, 10, 5, 10, 5, 5, 5, 5, 10, 10, 5, 5],
  'The printed percentages sum to 95 %, not 100 %: one value is missing or misprinted. Not usable until corrected.',
);

/** All published presets, flagged ones included so the user sees why they are not offered as-is. */
export const DAILY_USE_PATTERN_PRESETS: readonly DailyUsePatternPreset[] = [
  JORDAN_MORNING_EVENING_PATTERN,
  JORDAN_MIDDAY_PATTERN,
  THREE_PEAKS_PATTERN_AS_PRINTED,
];
