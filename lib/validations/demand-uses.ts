import { z } from 'zod';
import {
  DAILY_USE_PATTERN_PRESETS,
  DEFAULT_DEMAND_FIGURES,
  HOURS_PER_DAY,
  PATTERN_SUM_TOLERANCE,
} from '../../hydraulics/index';
import { safeText } from './common';
import { issueAt } from './lift-common';
import { finite, hourOfDay, nonNegative, positive, whole } from './numbers';

export const USE_KINDS = ['people', 'livestock', 'garden', 'fixed'] as const;
export const DELIVERY_KINDS = ['pattern', 'peak-factor', 'delivery-hours'] as const;

const FIGURE_LISTS = {
  people: DEFAULT_DEMAND_FIGURES.perPerson,
  livestock: DEFAULT_DEMAND_FIGURES.livestock,
  garden: DEFAULT_DEMAND_FIGURES.garden,
  fixed: [],
} as const;

type Ctx = z.RefinementCtx;
type Value = {
  kind: (typeof USE_KINDS)[number];
  count: number | null;
  areaM2: number | null;
  figureId: string | null;
  ownFigure: number | null;
  season: 'winter' | 'summer' | null;
};

function checkAmounts(value: Value, ctx: Ctx): void {
  if ((value.kind === 'people' || value.kind === 'livestock') && value.count === null)
    issueAt(ctx, 'count', 'Give how many');
  if (value.kind === 'garden' && value.areaM2 === null) issueAt(ctx, 'areaM2', 'Give the garden area');
  if (value.kind === 'livestock' && value.season === null) issueAt(ctx, 'season', 'Choose winter or summer need');
  if (value.kind === 'fixed') {
    if (value.ownFigure === null) issueAt(ctx, 'ownFigure', 'Give the daily volume');
    return;
  }
  const list = FIGURE_LISTS[value.kind] as readonly { id: string }[];
  if (value.figureId !== null && !list.some((figure) => figure.id === value.figureId)) {
    issueAt(ctx, 'figureId', `"${value.figureId}" is not a published ${value.kind} figure`);
  }
  if (value.figureId === null && value.ownFigure === null)
    issueAt(ctx, 'figureId', 'Choose a published figure or give your own');
}

function checkDelivery(value: z.output<typeof DemandUseObject>, ctx: Ctx): void {
  if (value.deliveryKind === 'peak-factor' && value.peakFactor === null)
    issueAt(ctx, 'peakFactor', 'Give the peak factor');
  if (value.deliveryKind === 'delivery-hours' && value.deliveryHours === null)
    issueAt(ctx, 'deliveryHours', 'Give the hours of delivery');
  if (value.deliveryKind !== 'pattern') return;
  if (value.patternPresetId !== null) {
    const preset = DAILY_USE_PATTERN_PRESETS.find((candidate) => candidate.id === value.patternPresetId);
    if (!preset) issueAt(ctx, 'patternPresetId', `"${value.patternPresetId}" is not a published pattern`);
    else if (preset.flag) issueAt(ctx, 'patternPresetId', preset.flag);
    return;
  }
  const fractions = value.hourlyFractions;
  if (fractions === null)
    return issueAt(ctx, 'hourlyFractions', 'Choose a published pattern or give 24 hourly fractions');
  const sum = fractions.reduce((total, fraction) => total + fraction, 0);
  if (Math.abs(sum - 1) > PATTERN_SUM_TOLERANCE) {
    issueAt(ctx, 'hourlyFractions', `Hourly fractions sum to ${(sum * 100).toFixed(2)} %, not 100 %`);
  }
}

const DemandUseObject = z.strictObject({
  label: safeText('Label', 120).default(''),
  kind: z.enum(USE_KINDS, { error: 'Kind must be people, livestock, garden or fixed' }),
  count: whole('Count', 0, 1_000_000).nullable().default(null),
  areaM2: nonNegative('Garden area', undefined, 'm²').nullable().default(null),
  figureId: z.string({ error: 'Figure must be the id of a published figure' }).max(64).nullable().default(null),
  ownFigure: nonNegative('Own figure').nullable().default(null),
  season: z.enum(['winter', 'summer'], { error: 'Season must be winter or summer' }).nullable().default(null),
  deliveryKind: z
    .enum(DELIVERY_KINDS, { error: 'Delivery must be pattern, peak-factor or delivery-hours' })
    .default('peak-factor'),
  patternPresetId: z
    .string({ error: 'Pattern must be the id of a published pattern' })
    .max(64)
    .nullable()
    .default(null),
  hourlyFractions: z
    .array(nonNegative('Hourly fraction'), { error: 'Hourly fractions must be a list of numbers' })
    .length(HOURS_PER_DAY, `Give ${HOURS_PER_DAY} hourly fractions (index 0 = 00:00-01:00)`)
    .nullable()
    .default(null),
  peakFactor: finite('Peak factor')
    .min(1, 'A peak factor below 1 is not a peak')
    .max(20, 'A peak factor above 20 is not plausible')
    .nullable()
    .default(null),
  deliveryHours: positive('Hours of delivery', 24, 'h').nullable().default(null),
  startHour: hourOfDay('Start hour').nullable().default(null),
});

/** One daily use: people, livestock, garden or a fixed volume, and how it is spread over the day. */
export const DemandUseSchema = DemandUseObject.superRefine((value, ctx) => {
  checkAmounts(value, ctx);
  checkDelivery(value, ctx);
});
export type DemandUseInput = z.output<typeof DemandUseSchema>;
