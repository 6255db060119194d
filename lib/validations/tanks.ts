import { z } from 'zod';
import { nameText, safeText, uuid } from './common';
import { issueAt } from './lift-common';
import { finite, hourOfDay, nonNegative, positive } from './numbers';

export const TANK_SUPPLY_KINDS = ['ram-sites', 'source', 'entered'] as const;

const OutletSchema = z.strictObject({
  label: nameText('Outlet name', 120),
  elevationM: finite('Outlet elevation'),
  residualHeadM: nonNegative('Residual head wanted'),
  frictionLossM: nonNegative('Friction loss to the outlet'),
});

/** A tank: volume, levels, elevation, where its supply comes from, reserve wanted, outlets below. */
export const TankSchema = z
  .strictObject({
    name: nameText('Tank name'),
    volumeM3: positive('Tank volume'),
    baseElevationM: finite('Tank floor elevation').nullable().default(null),
    lowLevelM: nonNegative('Lowest working level').default(0),
    overflowLevelM: positive('Overflow level').nullable().default(null),
    supplyKind: z
      .enum(TANK_SUPPLY_KINDS, { error: 'Supply must be ram-sites, source or entered' })
      .default('ram-sites'),
    supplySourceId: uuid('Supply source').nullable().default(null),
    supplyFlowM3s: positive('Supply flow').nullable().default(null),
    supplyHoursPerDay: positive('Supply hours per day', 24, 'h').default(24),
    supplyStartHour: hourOfDay('Supply start hour').default(0),
    reserveDays: nonNegative('Reserve days', 365, 'days').default(0),
    outlets: z.array(OutletSchema, { error: 'Outlets must be a list' }).max(50, 'At most 50 outlets').default([]),
    notes: safeText('Notes', 4000).default(''),
  })
  .superRefine((value, ctx) => {
    if (value.overflowLevelM !== null && value.overflowLevelM <= value.lowLevelM) {
      issueAt(ctx, 'overflowLevelM', 'Overflow level must be above the lowest working level');
    }
    if (value.supplyKind === 'source' && value.supplySourceId === null)
      issueAt(ctx, 'supplySourceId', 'Choose the source that feeds the tank');
    if (value.supplyKind === 'entered' && value.supplyFlowM3s === null)
      issueAt(ctx, 'supplyFlowM3s', 'Enter the supply flow');
  });
export type TankInput = z.output<typeof TankSchema>;
