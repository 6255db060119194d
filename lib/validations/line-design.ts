import { z } from 'zod';
import {
  assertPipeSpec,
  HydraulicsInputError,
  WATER_TEMPERATURE_MAX_C,
  WATER_TEMPERATURE_MIN_C,
} from '../../hydraulics/index';
import { safeText, uuid } from './common';
import { between, metres, positive } from './numbers';

/**
 * The design of a line as the API stores it (SI units, the engineering core's own shapes). zod
 * checks each part's shape and range here; the core's `assertLineInput` then checks the whole
 * against the route's stations (stretches cover the line, devices lie on it) in lib/data.
 */

const WaterLevelStartSchema = z.strictObject({ kind: z.literal('water-level'), levelM: metres('Start water level') });
const PumpStartSchema = z.strictObject({
  kind: z.literal('pump'),
  outletHeadM: metres('Pump outlet head'),
  shutoffHeadM: metres('Pump shut-off head').optional(),
});
/** A ram site of the project: its plan gives the outlet head at every analysis (lib/lines/ram-start.ts). */
const RamSiteStartSchema = z.strictObject({ kind: z.literal('ram-site'), ramSiteId: uuid('Ram site') });

export const LineStartSchema = z.discriminatedUnion(
  'kind',
  [WaterLevelStartSchema, PumpStartSchema, RamSiteStartSchema],
  {
    error: 'Start must be a water level ("water-level"), a pump outlet ("pump") or a ram site ("ram-site")',
  },
);
/** The starts a line given whole in a request can have: no project, so no ram site to read. */
export const StandaloneLineStartSchema = z.discriminatedUnion('kind', [WaterLevelStartSchema, PumpStartSchema], {
  error: 'Start must be a water level ("water-level") or a pump outlet ("pump")',
});

export const LineEndSchema = z.discriminatedUnion(
  'kind',
  [
    z.strictObject({
      kind: z.literal('outlet'),
      elevationM: metres('Outlet elevation'),
      residualHeadM: between('Residual pressure wanted', 0, 1000, 'm of head').optional(),
    }),
    z.strictObject({ kind: z.literal('tank-inlet'), elevationM: metres('Tank inlet elevation') }),
    z.strictObject({ kind: z.literal('free-discharge') }),
  ],
  { error: 'End must be an outlet, a tank inlet or free discharge' },
);

const DesignFlowSchema = z.strictObject({ kind: z.literal('design'), flowM3s: between('Design flow', 0, 10, 'm³/s') });
const FindFlowSchema = z.strictObject({ kind: z.literal('find') });
/** What the feeding ram delivers (only with a ram-site start). */
const PumpDeliveryFlowSchema = z.strictObject({ kind: z.literal('pump-delivery') });

export const LineFlowSchema = z.discriminatedUnion('kind', [DesignFlowSchema, FindFlowSchema, PumpDeliveryFlowSchema], {
  error: 'Flow must be a design flow ("design"), "find" or the ram\'s delivery ("pump-delivery")',
});
/** The flows of a line given whole in a request: no ram to deliver. */
export const StandaloneLineFlowSchema = z.discriminatedUnion('kind', [DesignFlowSchema, FindFlowSchema], {
  error: 'Flow must be a design flow ("design") or "find"',
});

const PipeMaterialSchema = z.enum(['pvc', 'pe', 'steel', 'custom'], {
  error: 'Material must be pvc, pe, steel or custom',
});

/** A user's own pipe: the shape here, the engineering limits from the core's `assertPipeSpec`. */
export const CustomPipeSchema = z
  .strictObject({
    id: safeText('Pipe id', 80).pipe(z.string().min(1, 'Pipe id is required')),
    label: safeText('Pipe label', 120).pipe(z.string().min(1, 'Pipe label is required')),
    material: PipeMaterialSchema,
    nominalSize: safeText('Nominal size', 40).pipe(z.string().min(1, 'Nominal size is required')),
    outsideDiameterM: positive('Outside diameter', 5, 'm'),
    insideDiameterM: positive('Inside diameter', 5, 'm'),
    wallM: positive('Wall thickness', 1, 'm'),
    pressureRatingPa: positive('Pressure rating', 1e9, 'Pa'),
    hazenWilliamsC: positive('Hazen-Williams C', 1000),
    roughnessM: between('Roughness', 0, 1, 'm'),
    waveSpeedMs: positive('Wave speed', 10000, 'm/s'),
    source: safeText('Pipe source', 300).pipe(z.string().min(1, 'Say where the pipe figures come from')),
    sdr: positive('SDR', 1000).optional(),
    sidr: positive('SIDR', 1000).optional(),
  })
  .superRefine((pipe, ctx) => {
    try {
      assertPipeSpec(pipe);
    } catch (error) {
      if (!(error instanceof HydraulicsInputError)) throw error;
      // The core's reason without its internal field path; the path puts it beside the field.
      ctx.addIssue({ code: 'custom', message: error.reason, path: error.field.split('.').slice(1) });
    }
  });

const pipeId = safeText('Pipe id', 80).pipe(z.string().min(1, 'Pick a pipe for the stretch'));

export const LineStretchSchema = z
  .strictObject({
    fromM: metres('Stretch start chainage'),
    toM: metres('Stretch end chainage'),
    pipe: z.union([pipeId, CustomPipeSchema], { error: 'Pipe must be a catalogue id or a pipe spec' }),
  })
  .refine((s) => s.toM > s.fromM, { message: 'A stretch must end after it starts', path: ['toM'] });

export const LineFittingSchema = z.strictObject({
  chainageM: metres('Fitting chainage'),
  k: between('Loss coefficient K', 0, 1000),
  label: safeText('Fitting label', 80).optional(),
});

export const DEVICE_KINDS = ['break-pressure-tank', 'air-release-valve', 'washout', 'isolation-valve'] as const;

/** Each device kind as the screens, the report and refusals name it. */
export const DEVICE_KIND_NAMES: Record<(typeof DEVICE_KINDS)[number], string> = {
  'break-pressure-tank': 'Break-pressure tank',
  'air-release-valve': 'Air-release valve',
  washout: 'Washout',
  'isolation-valve': 'Isolation valve',
};

/** "break-pressure tank, air-release valve, washout or isolation valve": the choices a refusal offers. */
const deviceChoices = (() => {
  const names = DEVICE_KINDS.map((kind) => DEVICE_KIND_NAMES[kind].toLowerCase());
  return `${names.slice(0, -1).join(', ')} or ${names[names.length - 1]}`;
})();

export const LineDeviceSchema = z.strictObject({
  kind: z.enum(DEVICE_KINDS, { error: `Choose a kind: ${deviceChoices}` }),
  chainageM: metres('Device chainage'),
  waterLevelM: metres('Tank water level').optional(),
  label: safeText('Device label', 80).optional(),
});

export const LineSettingsSchema = z
  .strictObject({
    frictionMethod: z
      .enum(['hazen-williams', 'darcy-weisbach'], { error: 'Friction method must be hazen-williams or darcy-weisbach' })
      .optional(),
    waterTemperatureC: between('Water temperature', WATER_TEMPERATURE_MIN_C, WATER_TEMPERATURE_MAX_C, '°C').optional(),
    safetyFactor: between('Safety factor', 1, 10).optional(),
    velocityMinMs: between('Lowest velocity', 0, 10, 'm/s').optional(),
    velocityMaxMs: positive('Highest velocity', 20, 'm/s').optional(),
    minResidualHeadM: between('Minimum residual pressure', 0, 1000, 'm of head').optional(),
    airPointToleranceM: between('High/low point tolerance', 0, 100, 'm').optional(),
    siteAltitudeM: between('Site altitude', -500, 11000, 'm').optional(),
    siphonLimitHeadM: positive('Siphon limit', 10.3, 'm of head').optional(),
    defaultCoverM: between('Pipe cover', 0, 10, 'm').optional(),
    entranceLossK: between('Entrance loss coefficient', 0, 10).optional(),
    checkSurge: z.boolean({ error: 'Surge check must be true or false' }).optional(),
  })
  .refine((s) => (s.velocityMaxMs ?? 3) > (s.velocityMinMs ?? 0.7), {
    message: 'The highest velocity must exceed the lowest',
    path: ['velocityMaxMs'],
  });

export const WINTER_TREATMENTS = ['buried-below-frost', 'drained-for-winter'] as const;

/** How the line is kept through winter. */
export const LineWinterSchema = z.strictObject({
  treatment: z.enum(WINTER_TREATMENTS, { error: 'Winter treatment must be buried-below-frost or drained-for-winter' }),
});

/**
 * The parts of a design that need no project (ends, pipes, fittings, devices, settings): one
 * schema for a saved line and for a line given whole to the stateless analysis, so both accept
 * and refuse the same input with the same words.
 */
export const lineDesignParts = {
  end: LineEndSchema,
  stretches: z
    .array(LineStretchSchema, { error: 'Stretches must be a list' })
    .min(1, 'A line needs at least one stretch')
    .max(500, 'At most 500 stretches'),
  fittings: z
    .array(LineFittingSchema, { error: 'Fittings must be a list' })
    .max(1000, 'At most 1000 fittings')
    .default([]),
  devices: z.array(LineDeviceSchema, { error: 'Devices must be a list' }).max(1000, 'At most 1000 devices').default([]),
  pipes: z
    .array(CustomPipeSchema, { error: 'Custom pipes must be a list' })
    .max(100, 'At most 100 custom pipes')
    .default([]),
  settings: LineSettingsSchema.default({}),
};

const { end, ...restOfDesign } = lineDesignParts;

export const LineDesignSchema = z
  .strictObject({
    start: LineStartSchema,
    end,
    flow: LineFlowSchema,
    ...restOfDesign,
    winter: LineWinterSchema.optional(),
  })
  .refine((d) => d.flow.kind !== 'pump-delivery' || d.start.kind === 'ram-site', {
    message: 'The flow can come from the ram only when the line starts at a ram pump outlet',
    path: ['flow', 'kind'],
  });

export type LineDesign = z.output<typeof LineDesignSchema>;
export type LineDesignInput = z.input<typeof LineDesignSchema>;
