import { z } from 'zod';
import { safeText, uuid } from './common';
import { chainage } from './numbers';

export const PhotoParams = z.strictObject({ photoId: uuid('Photo id') });
/** A project's photos, optionally those of one route only (`?routeId=`). */
export const PhotoListQuery = z.strictObject({ routeId: uuid('Route id').optional() });
export const PhotoImageQuery = z.strictObject({
  size: z.enum(['full', 'thumbnail'], { error: 'Size is full or thumbnail' }).default('full'),
});

const chainageM = chainage('Chainage');

/** The text fields sent with an upload (multipart strings, so numbers come as text). */
export const PhotoUploadFieldsSchema = z.strictObject({
  caption: safeText('Caption', 500).default(''),
  routeId: uuid('Route id').optional(),
  chainageM: z
    .string()
    .trim()
    // Metres as sent; refused, the screen words it in the project's unit ("Chainage must be a number (ft)").
    .regex(/^\d+(\.\d+)?$/, 'Chainage must be a number')
    .transform(Number)
    .pipe(chainageM)
    .optional(),
});

export const PhotoUpdateSchema = z
  .strictObject({
    caption: safeText('Caption', 500).optional(),
    inReport: z.boolean({ error: 'In the report: true or false' }).optional(),
    routeId: uuid('Route id').optional(),
    chainageM: chainageM.optional(),
  })
  .refine((v) => Object.keys(v).length > 0, 'Nothing to change');
