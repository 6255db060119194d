import { HydraulicsInputError } from '../../errors';
import { assertFiniteNumber } from '../../input-guards';

/** One line of a level book. Staff readings in metres; a staff held inverted is booked negative. */
export interface LevelBookReading {
  label?: string;
  backsightM?: number;
  intermediateM?: number;
  foresightM?: number;
}

export type LevelBookMethod = 'rise-and-fall' | 'height-of-collimation';

export interface LevelBookInput {
  readings: readonly LevelBookReading[];
  /** Reduced level of the first station (a benchmark or assumed datum), metres. */
  startElevationM: number;
  method: LevelBookMethod;
  /** Known level of the last station when the run closes on a benchmark, metres. */
  closingElevationM?: number;
}

export interface ReducedLevel {
  label?: string;
  reducedLevelM: number;
  /** Height of collimation of the set-up the station was read from (collimation method only). */
  heightOfCollimationM?: number;
  riseM?: number;
  fallM?: number;
}

export interface LevelBookResult {
  stations: ReducedLevel[];
  sumBacksightM: number;
  sumForesightM: number;
  /** ΣBS − ΣFS; equals last RL − first RL when the arithmetic is right. */
  backsightMinusForesightM: number;
  /** ΣRise − ΣFall (rise-and-fall method only). */
  riseMinusFallM?: number;
  /** (last RL − first RL) − (ΣBS − ΣFS): zero up to rounding when the book is reduced correctly. */
  arithmeticCheckM: number;
  /** Computed last RL minus the known closing level, metres (present when one was given). */
  closureErrorM?: number;
}

const hasValue = (v: number | undefined): v is number => v !== undefined;

/** Checks the shape of the book: each line must be a sight the method can use, in a legal order. */
export function assertLevelBook(readings: readonly LevelBookReading[]): void {
  if (readings.length < 2) throw new HydraulicsInputError('readings', 'a level book needs at least two lines');
  readings.forEach((r, i) => {
    for (const key of ['backsightM', 'intermediateM', 'foresightM'] as const) {
      if (r[key] !== undefined) assertFiniteNumber(r[key], `readings.${key}`, i);
    }
    const first = i === 0;
    const last = i === readings.length - 1;
    if (first) {
      if (!hasValue(r.backsightM))
        throw new HydraulicsInputError(
          'readings.backsightM',
          'the first line must be a backsight to the starting mark',
          i,
        );
      if (hasValue(r.foresightM) || hasValue(r.intermediateM)) {
        throw new HydraulicsInputError('readings', 'the first line can only hold a backsight', i);
      }
      return;
    }
    if (hasValue(r.intermediateM) && (hasValue(r.foresightM) || hasValue(r.backsightM))) {
      throw new HydraulicsInputError(
        'readings.intermediateM',
        'an intermediate sight cannot share a line with a backsight or foresight',
        i,
      );
    }
    if (hasValue(r.backsightM) && !hasValue(r.foresightM)) {
      throw new HydraulicsInputError(
        'readings.foresightM',
        'missing foresight: a change point needs the foresight taken before the instrument moved',
        i,
      );
    }
    if (!hasValue(r.intermediateM) && !hasValue(r.foresightM)) {
      throw new HydraulicsInputError('readings', 'line has no staff reading', i);
    }
    if (last && !hasValue(r.foresightM)) {
      throw new HydraulicsInputError('readings.foresightM', 'missing foresight: the run must close on a foresight', i);
    }
    if (last && hasValue(r.backsightM)) {
      throw new HydraulicsInputError('readings.backsightM', 'the last line cannot open a new set-up', i);
    }
  });
}

function reduceByCollimation(readings: readonly LevelBookReading[], startElevationM: number): ReducedLevel[] {
  let collimationM = startElevationM + (readings[0].backsightM as number);
  const stations: ReducedLevel[] = [
    { label: readings[0].label, reducedLevelM: startElevationM, heightOfCollimationM: collimationM },
  ];
  for (const r of readings.slice(1)) {
    const sight = (r.intermediateM ?? r.foresightM) as number;
    const reducedLevelM = collimationM - sight;
    stations.push({ label: r.label, reducedLevelM, heightOfCollimationM: collimationM });
    if (hasValue(r.backsightM)) collimationM = reducedLevelM + r.backsightM;
  }
  return stations;
}

function reduceByRiseAndFall(readings: readonly LevelBookReading[], startElevationM: number): ReducedLevel[] {
  let previousReadingM = readings[0].backsightM as number;
  let levelM = startElevationM;
  const stations: ReducedLevel[] = [{ label: readings[0].label, reducedLevelM: startElevationM }];
  for (const r of readings.slice(1)) {
    const sight = (r.intermediateM ?? r.foresightM) as number;
    const change = previousReadingM - sight;
    levelM += change;
    stations.push({
      label: r.label,
      reducedLevelM: levelM,
      ...(change >= 0 ? { riseM: change } : { fallM: -change }),
    });
    previousReadingM = hasValue(r.backsightM) ? r.backsightM : sight;
  }
  return stations;
}

/**
 * Reduces a level book to reduced levels by either booking method, with the standard
 * arithmetic check (ΣBS − ΣFS = last RL − first RL) and, when the run closes on a known mark,
 * the closure error. Both methods give the same levels; rise-and-fall also checks intermediates.
 */
export function reduceLevelBook(input: LevelBookInput): LevelBookResult {
  assertFiniteNumber(input.startElevationM, 'startElevationM');
  if (input.closingElevationM !== undefined) assertFiniteNumber(input.closingElevationM, 'closingElevationM');
  if (input.method !== 'rise-and-fall' && input.method !== 'height-of-collimation') {
    throw new HydraulicsInputError(
      'method',
      `must be "rise-and-fall" or "height-of-collimation", got ${String(input.method)}`,
    );
  }
  assertLevelBook(input.readings);
  const stations =
    input.method === 'rise-and-fall'
      ? reduceByRiseAndFall(input.readings, input.startElevationM)
      : reduceByCollimation(input.readings, input.startElevationM);
  const sumBacksightM = input.readings.reduce((s, r) => s + (r.backsightM ?? 0), 0);
  const sumForesightM = input.readings.reduce((s, r) => s + (r.foresightM ?? 0), 0);
  const lastLevelM = stations[stations.length - 1].reducedLevelM;
  const backsightMinusForesightM = sumBacksightM - sumForesightM;
  const riseMinusFallM =
    input.method === 'rise-and-fall' ? stations.reduce((s, st) => s + (st.riseM ?? 0) - (st.fallM ?? 0), 0) : undefined;
  return {
    stations,
    sumBacksightM,
    sumForesightM,
    backsightMinusForesightM,
    riseMinusFallM,
    arithmeticCheckM: lastLevelM - input.startElevationM - backsightMinusForesightM,
    closureErrorM: input.closingElevationM === undefined ? undefined : lastLevelM - input.closingElevationM,
  };
}
