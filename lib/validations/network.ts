import { z } from 'zod';
import { nameText, safeText, uuid } from './common';
import { CustomPipeSchema } from './line-design';
import { issueAt } from './lift-common';
import { chainage, elevation, finite, nonNegative, positive } from './numbers';
import { ProjectParams } from './projects';

/**
 * The network's parts as the API takes them, SI. A node or link that names a line, tank, ram site
 * or node of another project is refused by lib/data (400 on that field), never here.
 */
export const NODE_KINDS = ['source', 'ram-outlet', 'tank', 'break-pressure-tank', 'junction', 'outlet'] as const;
export const OUTLET_KINDS = ['tap', 'trough', 'house', 'garden', 'tank-inlet', 'free'] as const;
export const LINK_KINDS = ['line', 'pipe', 'valve'] as const;
export const VALVE_KINDS = ['isolation', 'check', 'pressure-reducing', 'float'] as const;
export const DEMAND_FROM = ['uses', 'fixed', 'line'] as const;

const NodeDataSchema = z.strictObject({
  waterLevelM: finite('Water level').nullable().optional(),
  typedPumpHead: z
    .strictObject({ outletHeadM: finite('Pump outlet head'), shutoffHeadM: finite('Pump shut-off head').optional() })
    .optional(),
  inletFloatValve: z.boolean({ error: 'Float valve must be true or false' }).optional(),
  outletKind: z.enum(OUTLET_KINDS, { error: `Outlet must be one of ${OUTLET_KINDS.join(', ')}` }).optional(),
  residualHeadM: nonNegative('Residual head wanted', 200, 'm').nullable().optional(),
  demandFrom: z.enum(DEMAND_FROM, { error: 'Demand must come from its uses, a fixed flow or the line' }).optional(),
  fixedDemandM3s: nonNegative('Fixed demand', 10, 'm³/s').nullable().optional(),
});

export const NetworkNodeSchema = z
  .strictObject({
    kind: z.enum(NODE_KINDS, { error: `Kind must be one of ${NODE_KINDS.join(', ')}` }),
    name: nameText('Node name'),
    elevationM: elevation('Elevation').nullable().default(null),
    waterSourceId: uuid('Water source').nullable().default(null),
    ramSiteId: uuid('Ram site').nullable().default(null),
    tankId: uuid('Tank').nullable().default(null),
    lineId: uuid('Line').nullable().default(null),
    chainageM: chainage('Chainage').nullable().default(null),
    eastM: finite('East position').nullable().default(null),
    northM: finite('North position').nullable().default(null),
    data: NodeDataSchema.default({}),
    notes: safeText('Notes', 4000).default(''),
  })
  .superRefine((node, ctx) => {
    switch (node.kind) {
      case 'source':
        if (node.data.waterLevelM == null) issueAt(ctx, 'data.waterLevelM', 'Enter the water level of the source');
        break;
      case 'break-pressure-tank':
        if (node.data.waterLevelM == null && node.elevationM === null)
          issueAt(ctx, 'data.waterLevelM', 'Enter the water level of the break-pressure tank');
        break;
      case 'ram-outlet':
        if (node.ramSiteId === null) issueAt(ctx, 'ramSiteId', 'Pick the ram site whose plan gives the outlet');
        break;
      case 'tank':
        if (node.tankId === null)
          issueAt(ctx, 'tankId', 'Pick the tank (its size and levels are kept on the Lift & storage page)');
        break;
      case 'junction':
        if (node.lineId === null) issueAt(ctx, 'lineId', 'Pick the line the take-off is on');
        if (node.chainageM === null) issueAt(ctx, 'chainageM', 'Enter the chainage of the take-off');
        break;
      case 'outlet':
        if (!node.data.outletKind) issueAt(ctx, 'data.outletKind', 'Say what the outlet is');
        if (node.data.outletKind !== 'free' && node.elevationM === null)
          issueAt(ctx, 'elevationM', 'Enter the outlet elevation');
        if (node.data.demandFrom === 'fixed' && node.data.fixedDemandM3s == null)
          issueAt(ctx, 'data.fixedDemandM3s', 'Enter the fixed demand');
        break;
    }
    if (node.kind !== 'junction' && (node.lineId !== null || node.chainageM !== null))
      issueAt(ctx, 'lineId', 'Only a take-off sits on a line');
  });
export type NetworkNodeInput = z.output<typeof NetworkNodeSchema>;

const LinkDataSchema = z.strictObject({
  lengthM: positive('Pipe length', 100_000, 'm').optional(),
  pipe: z
    .union([safeText('Pipe id', 80).pipe(z.string().min(1, 'Pick a pipe')), CustomPipeSchema], {
      error: 'Pipe must be a catalogue id or a pipe spec',
    })
    .nullable()
    .optional(),
  insideDiameterM: positive('Inside diameter', 5, 'm').nullable().optional(),
  hazenC: positive('Hazen-Williams C', 200).nullable().optional(),
  minorK: nonNegative('Minor loss coefficient', 1000).optional(),
  valveKind: z.enum(VALVE_KINDS, { error: `Valve must be one of ${VALVE_KINDS.join(', ')}` }).optional(),
  open: z.boolean({ error: 'Open must be true or false' }).optional(),
  setHeadM: nonNegative('Set pressure head', 300, 'm').optional(),
});

export const NetworkLinkSchema = z
  .strictObject({
    kind: z.enum(LINK_KINDS, { error: `Kind must be one of ${LINK_KINDS.join(', ')}` }),
    name: nameText('Link name'),
    fromNodeId: uuid('From node'),
    toNodeId: uuid('To node'),
    lineId: uuid('Line').nullable().default(null),
    data: LinkDataSchema.default({}),
  })
  .superRefine((link, ctx) => {
    if (link.fromNodeId === link.toNodeId) issueAt(ctx, 'toNodeId', 'A link must join two different nodes');
    if (link.kind === 'line' && link.lineId === null) issueAt(ctx, 'lineId', 'Pick the line this link follows');
    if (link.kind !== 'line' && link.lineId !== null) issueAt(ctx, 'lineId', 'Only a line link follows a line');
    if (link.kind === 'pipe') {
      if (link.data.lengthM === undefined) issueAt(ctx, 'data.lengthM', 'Enter the pipe length');
      if (!link.data.pipe && !(link.data.insideDiameterM && link.data.hazenC)) issueAt(ctx, 'data.pipe', 'Pick a pipe');
    }
    if (link.kind === 'valve') {
      if (!link.data.valveKind) issueAt(ctx, 'data.valveKind', 'Say what the valve is');
      if (link.data.valveKind === 'pressure-reducing' && link.data.setHeadM === undefined)
        issueAt(ctx, 'data.setHeadM', 'Enter the pressure the valve holds');
    }
  });
export type NetworkLinkInput = z.output<typeof NetworkLinkSchema>;

export const NetworkNodeParams = ProjectParams.extend({ nodeId: uuid('Node id') });
export const NetworkLinkParams = ProjectParams.extend({ linkId: uuid('Link id') });
export const NetworkJobParams = ProjectParams.extend({ jobId: uuid('Job id') });

/** Ties a demand use to the outlet that serves it (or unties it with null). */
export const DemandUseOutletSchema = z.strictObject({ outletNodeId: uuid('Outlet').nullable() });

/** A take-off placed on a line's long profile: a new junction there, and the branch from it to a new outlet. */
export const TakeOffSchema = z.strictObject({
  lineId: uuid('Line'),
  chainageM: chainage('Chainage'),
  name: nameText('Take-off name'),
});

/** A run of the network: one solve at the peak hour, a 24-hour day, or least-cost sizing. */
export const NetworkRunSchema = z.strictObject({
  kind: z.enum(['solve', 'day', 'size'], { error: 'Run must be solve, day or size' }),
  /** Sizing: one pipe per link (no split sizes). */
  onePipePerLink: z.boolean().default(true),
  /** Sizing: seconds the optimiser may take. */
  timeLimitS: positive('Time limit', 120, 's').default(30),
});
export type NetworkRunInput = z.output<typeof NetworkRunSchema>;

export const PriceListItemSchema = z.strictObject({
  pipeId: safeText('Pipe id', 80).pipe(z.string().min(1, 'Pick a pipe')),
  costPerM: nonNegative('Cost per metre', 1_000_000),
  notes: safeText('Notes', 1000).default(''),
});
export const PriceListSchema = z.strictObject({
  items: z.array(PriceListItemSchema, { error: 'Items must be a list' }).max(500, 'At most 500 priced pipes'),
});
export type PriceListInput = z.output<typeof PriceListSchema>;
