import { z } from 'zod';
import { findPipe, RAM_EFFICIENCY_TABLES, RAM_SIZE_CLASSES, type RamEfficiencyTableId } from '../../hydraulics/index';
import { nameText, safeText, uuid } from './common';
import { isoDate, issueAt } from './lift-common';
import { elevation, fraction, nonNegative, positive, whole } from './numbers';

export const DRIVE_MATERIALS = ['steel', 'pvc', 'pe', 'custom'] as const;
const EFFICIENCY_TABLE_IDS = Object.keys(RAM_EFFICIENCY_TABLES) as [RamEfficiencyTableId, ...RamEfficiencyTableId[]];
const SIZE_CLASS_IDS = RAM_SIZE_CLASSES.map((sizeClass) => sizeClass.id) as [string, ...string[]];

const DrivePipeSchema = z.strictObject({
  lengthM: positive('Drive pipe length'),
  insideDiameterM: positive('Drive pipe bore'),
  material: z.enum(DRIVE_MATERIALS, { error: 'Drive pipe material must be steel, pvc, pe or custom' }),
  rigid: z.boolean({ error: 'Rigid must be true or false' }).nullable().default(null),
});

/** The delivery pipe: a catalogue pipe or bore + C (+ rating), and a length or a surveyed route. */
const DeliveryPipeSchema = z
  .strictObject({
    routeId: uuid('Delivery route').nullable().default(null),
    lengthM: nonNegative('Delivery pipe length').nullable().default(null),
    pipeId: z.string({ error: 'Delivery pipe must be a catalogue pipe id' }).max(80).nullable().default(null),
    insideDiameterM: positive('Delivery pipe bore').nullable().default(null),
    hazenWilliamsC: positive('Hazen-Williams C')
      .max(200, 'Hazen-Williams C above 200 is not a real pipe')
      .nullable()
      .default(null),
    pressureRatingPa: positive('Delivery pipe rating').nullable().default(null),
  })
  .superRefine((value, ctx) => {
    if (value.routeId === null && value.lengthM === null)
      issueAt(ctx, 'lengthM', 'Give the delivery pipe length or choose a surveyed route');
    if (value.pipeId !== null) {
      if (!findPipe(value.pipeId)) issueAt(ctx, 'pipeId', `"${value.pipeId}" is not a pipe in the catalogue`);
      return;
    }
    if (value.insideDiameterM === null) issueAt(ctx, 'insideDiameterM', 'Choose a catalogue pipe or give the bore');
    if (value.hazenWilliamsC === null)
      issueAt(ctx, 'hazenWilliamsC', 'Choose a catalogue pipe or give its Hazen-Williams C');
  });

/** A ram site as the form and the API give it (SI). */
export const RamSiteSchema = z
  .strictObject({
    name: nameText('Site name'),
    sourceId: uuid('Source').nullable().default(null),
    tankId: uuid('Tank').nullable().default(null),
    driveFlowM3s: positive('Drive flow'),
    fallM: positive('Fall'),
    drivePipe: DrivePipeSchema,
    liftM: positive('Lift'),
    /** Elevation of the pump, m above the survey datum: a delivery line fed by this ram measures its head from here. */
    pumpElevationM: elevation('Pump elevation').nullable().default(null),
    deliveryPipe: DeliveryPipeSchema,
    sizeClassId: z
      .enum(SIZE_CLASS_IDS, { error: `Size class must be one of ${SIZE_CLASS_IDS.join(', ')}` })
      .nullable()
      .default(null),
    pumpCount: whole('Pumps in parallel', 1, 20).default(1),
    measuredEfficiency: fraction('Measured efficiency').nullable().default(null),
    /** Published efficiency table the plan reads (shown with every plan). */
    efficiencyTableId: z
      .enum(EFFICIENCY_TABLE_IDS, { error: `Efficiency table must be one of ${EFFICIENCY_TABLE_IDS.join(', ')}` })
      .default('trade-pocketbook'),
    notes: safeText('Notes', 4000).default(''),
  })
  .superRefine((value, ctx) => {
    if (value.liftM <= value.fallM) {
      issueAt(
        ctx,
        'liftM',
        'Lift must be above the fall: water that only needs to go below the source can flow there by gravity',
      );
    }
  });
export type RamSiteInput = z.output<typeof RamSiteSchema>;

export const DRIVE_MEASURES = ['drive', 'waste', 'plan'] as const;

/** One day's readings at a running ram. */
export const CommissioningReadingSchema = z
  .strictObject({
    measuredOn: isoDate('Date'),
    beatsPerMinute: positive('Beats per minute').max(400, 'Beats per minute above 400 is not a ram'),
    deliveredBucketVolumeM3: positive('Delivered bucket volume').nullable().default(null),
    deliveredBucketSeconds: positive('Delivered bucket seconds').nullable().default(null),
    deliveredFlowM3s: positive('Delivered flow').nullable().default(null),
    driveMeasure: z.enum(DRIVE_MEASURES, { error: 'Drive measure must be drive, waste or plan' }).default('plan'),
    driveBucketVolumeM3: positive('Drive or waste bucket volume').nullable().default(null),
    driveBucketSeconds: positive('Drive or waste bucket seconds').nullable().default(null),
    driveFlowM3s: positive('Drive or waste flow').nullable().default(null),
    pressureAtPumpPa: positive('Pressure at the pump').nullable().default(null),
    supplyHeadM: positive('Supply head'),
    deliveryHeadM: positive('Delivery head').nullable().default(null),
    notes: safeText('Notes', 2000).default(''),
  })
  .superRefine((value, ctx) => {
    const deliveredBucket = value.deliveredBucketVolumeM3 !== null || value.deliveredBucketSeconds !== null;
    if (deliveredBucket === (value.deliveredFlowM3s !== null)) {
      issueAt(
        ctx,
        'deliveredFlowM3s',
        'Give the delivered flow as a timed bucket at the top or as a flow, one of the two',
      );
    } else if (deliveredBucket && (value.deliveredBucketVolumeM3 === null || value.deliveredBucketSeconds === null)) {
      issueAt(ctx, 'deliveredBucketSeconds', 'A timed bucket needs both its volume and its seconds');
    }
    const driveBucket = value.driveBucketVolumeM3 !== null || value.driveBucketSeconds !== null;
    if (value.driveMeasure === 'plan' && (driveBucket || value.driveFlowM3s !== null)) {
      issueAt(ctx, 'driveMeasure', 'Say whether the figure is the drive flow or the waste flow');
    }
    if (value.driveMeasure !== 'plan') {
      if (driveBucket === (value.driveFlowM3s !== null))
        issueAt(ctx, 'driveFlowM3s', 'Give the flow as a timed bucket or as a flow, one of the two');
      else if (driveBucket && (value.driveBucketVolumeM3 === null || value.driveBucketSeconds === null)) {
        issueAt(ctx, 'driveBucketSeconds', 'A timed bucket needs both its volume and its seconds');
      }
    }
    if (value.deliveryHeadM === null && value.pressureAtPumpPa === null) {
      issueAt(ctx, 'deliveryHeadM', 'Give the delivery head or the pressure at the pump');
    }
  });
export type CommissioningReadingInput = z.output<typeof CommissioningReadingSchema>;
