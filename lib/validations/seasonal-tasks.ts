import { z } from 'zod';
import { nameText, safeText } from './common';
import { isoDate, monthDay } from './lift-common';
import { whole } from './numbers';

export const TASK_KINDS = [
  'drain-down',
  'refill',
  'silt-cleaning',
  'intake-screen',
  'valve-exercise',
  'other',
] as const;

export const SeasonalTaskSchema = z.strictObject({
  kind: z.enum(TASK_KINDS, { error: `Kind must be one of ${TASK_KINDS.join(', ')}` }).default('other'),
  title: nameText('Task', 160),
  detail: safeText('Detail', 4000).default(''),
  dueOn: isoDate('Due date'),
  done: z.boolean({ error: 'Done must be true or false' }).default(false),
});
export type SeasonalTaskInput = z.output<typeof SeasonalTaskSchema>;

export const UpdateSeasonalTaskSchema = z
  .strictObject({
    title: nameText('Task', 160),
    detail: safeText('Detail', 4000),
    dueOn: isoDate('Due date'),
    done: z.boolean({ error: 'Done must be true or false' }),
  })
  .partial()
  .refine((value) => Object.keys(value).length > 0, 'Send at least one field to change');
export type UpdateSeasonalTaskInput = z.output<typeof UpdateSeasonalTaskSchema>;

/** A year's upkeep tasks from the site's frost dates. */
export const GenerateSeasonalTasksSchema = z.strictObject({
  year: whole('Year', 1900, 2200),
  hemisphere: z.enum(['north', 'south'], { error: 'Hemisphere must be north or south' }),
  firstFrost: monthDay('Usual first frost'),
  lastFrost: monthDay('Usual last frost').nullable().default(null),
  drainDownLeadDays: whole('Days before first frost', 1, 120, 'days').default(14),
  /** Replace the year's open tasks made earlier (done ones are kept). */
  replace: z.boolean({ error: 'Replace must be true or false' }).default(false),
});
export type GenerateSeasonalTasksInput = z.output<typeof GenerateSeasonalTasksSchema>;
