import { z } from 'zod';
import { DECIMAL_MARKS } from '../units/typed-number';
import { nameText, safeText, timeZone, uuid } from './common';
import { nonNegative } from './numbers';

export const UNIT_SYSTEMS = ['metric', 'us'] as const;
export const unitSystem = z.enum(UNIT_SYSTEMS, { error: 'Units must be "metric" or "us"' });

/** Depth frost reaches at the site, m (local code or records). */
export const frostDepth = nonNegative('Frost depth', 10, 'm').nullable();

export const ProjectParams = z.strictObject({ projectId: uuid('Project id') });

export const CreateProjectSchema = z.strictObject({
  name: nameText('Project name'),
  description: safeText('Description', 2000).default(''),
  unitSystem: unitSystem.default('metric'),
  siteNotes: safeText('Site notes', 10000).default(''),
});
export type CreateProjectInput = z.input<typeof CreateProjectSchema>;

export const UpdateProjectSchema = z
  .strictObject({
    name: nameText('Project name'),
    description: safeText('Description', 2000),
    unitSystem,
    siteNotes: safeText('Site notes', 10000),
    frostDepthM: frostDepth,
    decimalMark: z.enum(DECIMAL_MARKS, { error: 'Decimal mark must be "." or ","' }).nullable(),
    timeZone: timeZone.nullable(),
    archived: z.boolean({ error: 'Archived must be true or false' }),
  })
  .partial()
  .refine((v) => Object.keys(v).length > 0, 'Send at least one field to change');
export type UpdateProjectInput = z.infer<typeof UpdateProjectSchema>;
