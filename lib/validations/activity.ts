import { z } from 'zod';
import { ACTIVITY_KINDS, type ActivityKind } from '../activity/kinds';
import { uuid } from './common';

/** Feed filters from the query string: kinds (comma-separated), one person, and paging by time. */
export const ActivityQuerySchema = z.strictObject({
  kinds: z
    .string()
    .optional()
    .transform((s, ctx) => {
      if (!s) return [] as ActivityKind[];
      const kinds = s.split(',').filter(Boolean);
      const unknown = kinds.filter((k) => !ACTIVITY_KINDS.includes(k as ActivityKind));
      if (unknown.length) ctx.addIssue({ code: 'custom', message: `Unknown activity kind: ${unknown.join(', ')}` });
      return kinds as ActivityKind[];
    }),
  actor: uuid('Person id').optional(),
  before: z.iso.datetime({ error: 'Before must be an ISO date and time' }).optional(),
});
export type ActivityQuery = z.output<typeof ActivityQuerySchema>;
