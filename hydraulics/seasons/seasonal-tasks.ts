import { assertPositiveInteger } from '../input-guards';
import { HydraulicsInputError } from '../errors';
import type { PlanCheck } from '../ram/plan-check';
import { addDays, formatIsoDate } from '../yield/iso-date';
import {
  dateInYear,
  isUsualFirstFrostMonth,
  parseMonthDay,
  seasonStart,
  type Hemisphere,
  type Season,
} from './calendar';
import { winterTreatment, type WinterLine, type WinterTreatment } from './winter-treatment';

export type SeasonalTaskKind = 'drain-down' | 'refill' | 'silt-cleaning' | 'intake-screen' | 'valve-exercise';

export interface SeasonalTask {
  kind: SeasonalTaskKind;
  /** `YYYY-MM-DD`. */
  date: string;
  title: string;
  detail: string;
  source: string;
  /** For drain-down and refill: the lines to drain and where. */
  lines?: WinterTreatment[];
}

export interface SeasonalTaskOptions {
  year: number;
  hemisphere: Hemisphere;
  /** Usual first frost, `MM-DD`. */
  firstFrost: string;
  /** Usual last frost, `MM-DD`; without it no refill date is set. */
  lastFrost?: string;
  /** Days before the first frost to drain the lines. @default 14 */
  drainDownLeadDays?: number;
  lines?: readonly WinterLine[];
}

export interface SeasonalTaskResult {
  tasks: SeasonalTask[];
  winter: WinterTreatment[];
  checks: PlanCheck[];
}

const NO_SOURCE = 'common practice, no source';

/** Keeps a yearly task inside the year asked for (a date that slid into a neighbour year is moved by a year). */
function withinYear(date: Date, year: number): Date {
  const shift = year - date.getUTCFullYear();
  return shift === 0 ? date : new Date(Date.UTC(date.getUTCFullYear() + shift, date.getUTCMonth(), date.getUTCDate()));
}

/** A year's upkeep tasks with dates, from the project's frost dates and hemisphere. */
export function seasonalTasks({
  year,
  hemisphere,
  firstFrost,
  lastFrost,
  drainDownLeadDays = 14,
  lines = [],
}: SeasonalTaskOptions): SeasonalTaskResult {
  assertPositiveInteger(year, 'year');
  if (year < 1000 || year > 9999) throw new HydraulicsInputError('year', `must be a four-digit year, got ${year}`);
  if (hemisphere !== 'north' && hemisphere !== 'south') {
    throw new HydraulicsInputError('hemisphere', `must be "north" or "south", got ${String(hemisphere)}`);
  }
  assertPositiveInteger(drainDownLeadDays, 'drainDownLeadDays');
  const frost = parseMonthDay(firstFrost, 'firstFrost');
  const winter = lines.map((line, index) => winterTreatment(line, index));
  const toDrain = winter.filter((line) => line.treatment === 'drain-for-winter');
  const checks: PlanCheck[] = [];
  if (!isUsualFirstFrostMonth(hemisphere, frost.month)) {
    checks.push({
      code: 'frost-date-unusual-for-hemisphere',
      severity: 'info',
      values: { monthDay: firstFrost, hemisphere },
      message: `A first frost on ${firstFrost} is unusual for the ${hemisphere}ern hemisphere; check the hemisphere and the date.`,
      source: NO_SOURCE,
    });
  }
  const drainDown = withinYear(addDays(dateInYear(year, frost), -drainDownLeadDays), year);
  const at = (date: Date): string => formatIsoDate(withinYear(date, year));
  const tasks: SeasonalTask[] = [
    {
      kind: 'drain-down',
      date: at(drainDown),
      title: 'Drain lines above frost depth',
      detail: toDrain.length
        ? `Open the drains at the low points of ${toDrain.map((line) => line.label).join(', ')} and leave them open until the last frost.`
        : 'No line is recorded as above frost depth; check exposed fittings, the ram and the tank outlet.',
      source: NO_SOURCE,
      lines: toDrain,
    },
    {
      kind: 'silt-cleaning',
      date: at(addDays(drainDown, -7)),
      title: 'Clean the settling box and tank before winter',
      detail: 'Flush silt from the settling box, washouts and tank floor while the lines still run.',
      source: NO_SOURCE,
    },
    {
      kind: 'silt-cleaning',
      date: at(addDays(seasonStart(year, hemisphere, 'summer'), 14)),
      title: 'Clean the settling box and tank after spring runoff',
      detail: 'Spring runoff carries the most silt: flush the settling box, washouts and tank floor.',
      source: NO_SOURCE,
    },
    ...(['spring', 'summer', 'autumn', 'winter'] as const).map((season: Season) => ({
      kind: 'intake-screen' as const,
      date: at(seasonStart(year, hemisphere, season)),
      title: `Check the intake screen (${season})`,
      detail: 'Clear leaves and debris from the intake screen; check the intake is still submerged so it draws no air.',
      source: NO_SOURCE,
    })),
    ...(['spring', 'autumn'] as const).map((season: Season) => ({
      kind: 'valve-exercise' as const,
      date: at(addDays(seasonStart(year, hemisphere, season), 14)),
      title: `Exercise the valves (${season})`,
      detail: 'Open and close every valve and washout through its full travel so none seizes; check air valves vent.',
      source: NO_SOURCE,
    })),
  ];
  if (lastFrost !== undefined) {
    tasks.push({
      kind: 'refill',
      date: at(addDays(dateInYear(year, parseMonthDay(lastFrost, 'lastFrost')), 7)),
      title: 'Close the drains and refill the lines',
      detail:
        'Close the low-point drains, refill slowly from the top with the air valves open, and recommission the ram.',
      source: NO_SOURCE,
      lines: toDrain,
    });
  }
  tasks.sort((a, b) => a.date.localeCompare(b.date));
  return { tasks, winter, checks };
}
