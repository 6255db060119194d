import { z } from 'zod';
import { uuid } from './common';
import { ProjectParams } from './projects';

/**
 * Number and date pieces shared by the lift, storage, yield and demand schemas. Every figure the
 * API takes is SI (m, m³, m³/s, Pa) and named with its unit; forms convert from project units.
 */
export const finite = (label: string) => z.number({ error: `${label} must be a number` });
export const positive = (label: string) => finite(label).positive(`${label} must be greater than zero`);
export const nonNegative = (label: string) => finite(label).nonnegative(`${label} must not be negative`);
export const wholeNonNegative = (label: string) => finite(label).int(`${label} must be a whole number`).nonnegative(`${label} must not be negative`);
export const fraction = (label: string) => positive(label).max(1, `${label} must be a fraction no greater than 1`);
export const hourOfDay = (label: string) => finite(label).int(`${label} must be a whole hour`).min(0, `${label} must be 0-23`).max(23, `${label} must be 0-23`);

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
