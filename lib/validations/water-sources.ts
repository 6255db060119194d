import { z } from 'zod';
import { nameText, safeText, uuid } from './common';
import { isoDate, issueAt } from './lift-common';
import { nonNegative, positive } from './numbers';

export const SOURCE_KINDS = ['creek', 'spring', 'other'] as const;
export const DESIGN_YIELD_CHOICES = ['lowest-recent-dry', 'reading', 'entered'] as const;
export const READING_SEASONS = ['dry', 'wet', 'unspecified'] as const;

/**
 * A source and how its design yield is chosen (the lowest recent dry-season reading unless the user says otherwise).
 */
export const WaterSourceSchema = z
  .strictObject({
    name: nameText('Source name'),
    kind: z.enum(SOURCE_KINDS, { error: 'Kind must be creek, spring or other' }).default('creek'),
    notes: safeText('Notes', 4000).default(''),
    designYieldChoice: z
      .enum(DESIGN_YIELD_CHOICES, { error: 'Design yield must be lowest-recent-dry, reading or entered' })
      .default('lowest-recent-dry'),
    designReadingId: uuid('Design reading').nullable().default(null),
    enteredYieldM3s: positive('Entered design yield').nullable().default(null),
    otherDrawM3s: nonNegative('Other draw').default(0),
  })
  .superRefine((value, ctx) => {
    if (value.designYieldChoice === 'reading' && value.designReadingId === null) {
      issueAt(ctx, 'designReadingId', 'Choose the reading the design yield is taken from');
    }
    if (value.designYieldChoice === 'entered' && value.enteredYieldM3s === null) {
      issueAt(ctx, 'enteredYieldM3s', 'Enter the design yield');
    }
  });
export type WaterSourceInput = z.output<typeof WaterSourceSchema>;

/** A dated flow measurement: a timed bucket (volume and seconds) or a direct flow figure. */
export const YieldReadingSchema = z
  .strictObject({
    measuredOn: isoDate('Date'),
    season: z.enum(READING_SEASONS, { error: 'Season must be dry, wet or unspecified' }).default('unspecified'),
    bucketVolumeM3: positive('Bucket volume').nullable().default(null),
    bucketSeconds: positive('Seconds to fill').nullable().default(null),
    flowM3s: positive('Flow').nullable().default(null),
    note: safeText('Note', 2000).default(''),
  })
  .superRefine((value, ctx) => {
    const bucket = value.bucketVolumeM3 !== null || value.bucketSeconds !== null;
    if (bucket && value.flowM3s !== null) issueAt(ctx, 'flowM3s', 'Give either a timed bucket or a flow, not both');
    if (!bucket && value.flowM3s === null)
      issueAt(ctx, 'flowM3s', 'Give a timed bucket (volume and seconds) or a flow');
    if (bucket && value.bucketVolumeM3 === null) issueAt(ctx, 'bucketVolumeM3', 'Give the bucket volume');
    if (bucket && value.bucketSeconds === null)
      issueAt(ctx, 'bucketSeconds', 'Give the seconds the bucket took to fill');
  });
export type YieldReadingInput = z.output<typeof YieldReadingSchema>;
