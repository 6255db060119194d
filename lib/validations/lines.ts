import { z } from 'zod';
import { nameText, safeText, uuid } from './common';
import { LineDesignSchema } from './line-design';
import { chainage, positive, whole } from './numbers';

export const LineParams = z.strictObject({ lineId: uuid('Line id') });

/** Largest vertical exaggeration a drawing takes. */
const MAX_EXAGGERATION = 1000;

/**
 * `GET /api/lines/:id/report?exaggeration=auto|8`: the vertical exaggeration the screen shows (its
 * setting: `auto`, width-independent, or a number), so the PDF draws the same one. @default auto
 */
export const LineReportQuerySchema = z.strictObject({
  exaggeration: z
    .union(
      [
        z.literal('auto'),
        z
          .string()
          .regex(/^\d{1,4}(\.\d{1,4})?$/, 'exaggeration must be auto or a number')
          .transform(Number)
          .pipe(positive('exaggeration', MAX_EXAGGERATION)),
      ],
      {
        error: 'exaggeration must be auto or a number',
      },
    )
    .default('auto'),
});

/** A chainage window of the route: both ends or neither, the end after the start. */
const window = {
  fromChainageM: chainage('Window start').nullable().optional(),
  toChainageM: chainage('Window end').nullable().optional(),
};

function windowIsOrdered(v: { fromChainageM?: number | null; toChainageM?: number | null }): boolean {
  return v.fromChainageM == null || v.toChainageM == null || v.toChainageM > v.fromChainageM;
}
const windowMessage = { message: 'The window must end after it starts', path: ['toChainageM'] };

/** New line: a name and a route; without a design, a starting design is drawn up from the route. */
export const CreateLineSchema = z
  .strictObject({
    name: nameText('Line name'),
    routeId: uuid('Route id'),
    notes: safeText('Notes', 10000).default(''),
    ...window,
    design: LineDesignSchema.optional(),
  })
  .refine(windowIsOrdered, windowMessage);
export type CreateLineInput = z.input<typeof CreateLineSchema>;

export const UpdateLineSchema = z
  .strictObject({
    name: nameText('Line name'),
    notes: safeText('Notes', 10000),
    routeId: uuid('Route id'),
    ...window,
    design: LineDesignSchema,
    /** The revision the editor started from; a newer saved revision answers 409 instead of being overwritten. */
    baseRevision: whole('Base revision', 1),
  })
  .partial()
  .refine((v) => Object.keys(v).some((k) => k !== 'baseRevision'), 'Send at least one field to change')
  .refine(windowIsOrdered, windowMessage);
export type UpdateLineInput = z.input<typeof UpdateLineSchema>;

/** Copy of a line: optionally its new name (otherwise "… (copy)"). */
export const DuplicateLineSchema = z.strictObject({ name: nameText('Line name').optional() });
export type DuplicateLineInput = z.input<typeof DuplicateLineSchema>;
