import { HydraulicsInputError } from '../errors';
import { assertArray, assertFiniteNumber, assertNonNegativeInteger, assertPositive } from '../input-guards';

/** Hours in the day a pattern covers: index h is the hour from h:00 to h+1:00. */
export const HOURS_PER_DAY = 24;
/** How far a pattern's sum may stray from 1 (published tables are whole percentages). */
export const PATTERN_SUM_TOLERANCE = 1e-6;

/**
 * Checks that a daily use pattern is 24 non-negative hourly fractions summing to 1, and says what is
 * wrong when it is not (which hour, or how much is missing or extra).
 */
export function assertHourlyPattern(value: unknown, field = 'hourlyFractions'): asserts value is readonly number[] {
  assertArray(value, field);
  if (value.length !== HOURS_PER_DAY) {
    throw new HydraulicsInputError(
      field,
      `needs ${HOURS_PER_DAY} hourly fractions (index 0 = 00:00-01:00), got ${value.length}`,
    );
  }
  let sum = 0;
  value.forEach((fraction, hour) => {
    assertFiniteNumber(fraction, field, hour);
    if (fraction < 0) throw new HydraulicsInputError(field, `hour ${hour} is negative (${fraction})`, hour);
    sum += fraction;
  });
  if (Math.abs(sum - 1) > PATTERN_SUM_TOLERANCE) {
    const percent = (sum * 100).toFixed(2).replace(/\.?0+$/, '');
    const gap = ((1 - sum) * 100).toFixed(2).replace(/\.?0+$/, '');
    const what = sum < 1 ? `${gap} % is missing` : `${gap.replace('-', '')} % too much`;
    throw new HydraulicsInputError(field, `hourly fractions sum to ${percent} %, not 100 % (${what})`);
  }
}

export interface PercentByHourOptions {
  /** Hour of the first percentage (e.g. 5 for a table that starts at 5:00). */
  startHour: number;
  /** Percentages for consecutive hours; hours outside the table are 0. */
  percents: readonly number[];
}

/** Turns a published "percent per hour from h:00" table into 24 hourly fractions (not validated). */
export function patternFromPercentByHour({ startHour, percents }: PercentByHourOptions): number[] {
  assertHourOfDay(startHour, 'startHour');
  if (startHour + percents.length > HOURS_PER_DAY) {
    throw new HydraulicsInputError('percents', `${percents.length} hours from ${startHour}:00 run past midnight`);
  }
  const pattern = new Array<number>(HOURS_PER_DAY).fill(0);
  percents.forEach((percent, offset) => {
    assertFiniteNumber(percent, 'percents', offset);
    pattern[startHour + offset] = percent / 100;
  });
  return pattern;
}

export interface DeliveryWindowOptions {
  /** Hours of delivery per day (e.g. a trough filled over 4 h). */
  hours: number;
  /** Hour the delivery starts, 0-23. @default 6 */
  startHour?: number;
}

/**
 * Even delivery over a window of whole or part hours, wrapping past midnight: e.g. a trough line
 * sized to deliver the daily need in 4 h.
 */
export function deliveryWindowPattern({ hours, startHour = 6 }: DeliveryWindowOptions): number[] {
  assertPositive(hours, 'hours');
  if (hours > HOURS_PER_DAY) throw new HydraulicsInputError('hours', `must be at most ${HOURS_PER_DAY}, got ${hours}`);
  assertHourOfDay(startHour, 'startHour');
  const pattern = new Array<number>(HOURS_PER_DAY).fill(0);
  for (let offset = 0; offset < Math.ceil(hours); offset += 1) {
    const covered = Math.min(1, hours - offset);
    pattern[(startHour + offset) % HOURS_PER_DAY] += covered / hours;
  }
  return pattern;
}

/** The same flow every hour. */
export function uniformPattern(): number[] {
  return new Array<number>(HOURS_PER_DAY).fill(1 / HOURS_PER_DAY);
}

/** A whole hour of the day, 0-23. */
export function assertHourOfDay(value: unknown, field: string, index?: number): asserts value is number {
  assertNonNegativeInteger(value, field, index);
  if (value >= HOURS_PER_DAY)
    throw new HydraulicsInputError(field, `must be an hour from 0 to 23, got ${value}`, index);
}

/**
 * Multipliers of the mean flow for each hour (fraction × 24), so a steady draw `q` becomes
 * `q × multiplier[h]` in hour h and the day's volume is unchanged. Checks the pattern first.
 */
export function hourlyMultipliers(hourlyFractions: readonly number[], field = 'hourlyFractions'): number[] {
  assertHourlyPattern(hourlyFractions, field);
  return hourlyFractions.map((fraction) => fraction * HOURS_PER_DAY);
}

/** A day's draw as a mean flow and the share of it in each hour, e.g. for an outlet of a network. */
export interface DrawPattern {
  /** Mean flow over the day, m³/s. */
  meanFlowM3s: number;
  /** 24 hourly fractions summing to 1 (even when the day's volume is zero). */
  hourlyFractions: number[];
}

/** Mean flow and hourly shape of 24 hourly volumes (m³), as `dailyDemand` gives them. */
export function drawPatternOf(hourlyVolumeM3: readonly number[]): DrawPattern {
  if (hourlyVolumeM3.length !== HOURS_PER_DAY)
    throw new HydraulicsInputError(
      'hourlyVolumeM3',
      `needs ${HOURS_PER_DAY} hourly volumes, got ${hourlyVolumeM3.length}`,
    );
  hourlyVolumeM3.forEach((volume, hour) => {
    assertFiniteNumber(volume, 'hourlyVolumeM3', hour);
    if (volume < 0) throw new HydraulicsInputError('hourlyVolumeM3', `hour ${hour} is negative (${volume})`, hour);
  });
  const daily = hourlyVolumeM3.reduce((sum, volume) => sum + volume, 0);
  return {
    meanFlowM3s: daily / (HOURS_PER_DAY * 3600),
    hourlyFractions: daily > 0 ? hourlyVolumeM3.map((volume) => volume / daily) : uniformPattern(),
  };
}

/**
 * The draw of an outlet whose peak flow is fixed (a tap rated at so many L/s) shaped by the hours of
 * the uses it serves: the busiest hour draws `peakFlowM3s`, every other hour in proportion to its
 * share of the day's volume. A day run then draws the peak in the peak hour only, not all day.
 */
export function drawPatternWithPeak(peakFlowM3s: number, hourlyVolumeM3: readonly number[]): DrawPattern {
  assertFiniteNumber(peakFlowM3s, 'peakFlowM3s');
  if (peakFlowM3s < 0) throw new HydraulicsInputError('peakFlowM3s', `must not be negative, got ${peakFlowM3s}`);
  const { hourlyFractions } = drawPatternOf(hourlyVolumeM3);
  const busiest = Math.max(...hourlyFractions);
  return { meanFlowM3s: peakFlowM3s / (HOURS_PER_DAY * busiest), hourlyFractions };
}
