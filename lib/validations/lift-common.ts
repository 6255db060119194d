import { z } from 'zod';
import { uuid } from './common';
import { ProjectParams } from './projects';

/**
 * Date pieces, path params and cross-field issues shared by the lift, storage, yield and demand
 * schemas (numbers: ./numbers.ts).
 */
function isCalendarDate(value: string): boolean {
  const [year, month, day] = value.split('-').map(Number);
  const date = new Date(Date.UTC(year, month - 1, day));
  return date.getUTCFullYear() === year && date.getUTCMonth() === month - 1 && date.getUTCDate() === day;
}

/** A calendar date written YYYY-MM-DD. */
export const isoDate = (label: string) =>
  z
    .string({ error: `${label} must be a date written YYYY-MM-DD` })
    .regex(/^\d{4}-\d{2}-\d{2}$/, `${label} must be a date written YYYY-MM-DD`)
    .refine(isCalendarDate, `${label} is not a calendar date`);

/** A day of the year that recurs, written MM-DD. */
export const monthDay = (label: string) =>
  z
    .string({ error: `${label} must be a month and day written MM-DD` })
    .regex(/^\d{2}-\d{2}$/, `${label} must be a month and day written MM-DD`)
    .refine((value) => isCalendarDate(`2024-${value}`), `${label} is not a day of the year`);

export const SourceParams = ProjectParams.extend({ sourceId: uuid('Source id') });
export const YieldReadingParams = SourceParams.extend({ readingId: uuid('Reading id') });
export const RamSiteParams = ProjectParams.extend({ siteId: uuid('Ram site id') });
export const CommissioningParams = RamSiteParams.extend({ readingId: uuid('Reading id') });
export const TankParams = ProjectParams.extend({ tankId: uuid('Tank id') });
export const DemandUseParams = ProjectParams.extend({ useId: uuid('Use id') });
export const SeasonalTaskParams = ProjectParams.extend({ taskId: uuid('Task id') });

/** Adds an issue at a field path (for the cross-field rules in superRefine). */
export function issueAt(ctx: z.RefinementCtx, path: string, message: string): void {
  ctx.addIssue({ code: 'custom', path: path.split('.'), message });
}
