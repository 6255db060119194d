import { GRAVITY_MS2 } from '../constants';
import { HydraulicsInputError } from '../errors';
import { assertFiniteNumber, assertNonNegative, assertPositive } from '../input-guards';

/** One fitting's loss coefficient K (head loss = K · v²/2g, v the pipe velocity), with its source. */
export interface FittingLossCoefficient {
  k: number;
  description: string;
  source: string;
}

const MUNSON_TABLE_8_2 =
  'Munson, Young & Okiishi, Fundamentals of Fluid Mechanics (Wiley), Table 8.2 "Loss coefficients for pipe components" (stored copy p. 422)';
const MUNSON_FIG_8_25 =
  'Munson, Young & Okiishi, Fundamentals of Fluid Mechanics (Wiley), Fig. 8.25 exit loss (stored copy p. 419)';
const SHARP_ENTRANCE =
  'Munson, Young & Okiishi, Fundamentals of Fluid Mechanics (Wiley), Fig. 8.22 sharp-edged entrance (from memory)';

/** Loss coefficients for common fittings and valves, fully turbulent flow. K varies ±20-50 % with make and size. */
export const FITTING_LOSS_COEFFICIENTS = {
  'entrance-sharp': {
    k: 0.5,
    description: 'Pipe entrance, sharp-edged (flush with tank wall)',
    source: SHARP_ENTRANCE,
  },
  'entrance-projecting': {
    k: 0.8,
    description: 'Pipe entrance, re-entrant (projecting into tank)',
    source: 'Munson et al., Fig. 8.22 (from memory)',
  },
  'entrance-rounded': {
    k: 0.04,
    description: 'Pipe entrance, well rounded',
    source: 'Munson et al., Fig. 8.22 (from memory)',
  },
  exit: { k: 1.0, description: 'Pipe exit into a tank (any shape)', source: MUNSON_FIG_8_25 },
  'elbow-90-flanged': { k: 0.3, description: 'Elbow 90°, regular, flanged', source: MUNSON_TABLE_8_2 },
  'elbow-90-threaded': { k: 1.5, description: 'Elbow 90°, regular, threaded', source: MUNSON_TABLE_8_2 },
  'elbow-90-long-radius-flanged': { k: 0.2, description: 'Elbow 90°, long radius, flanged', source: MUNSON_TABLE_8_2 },
  'elbow-90-long-radius-threaded': {
    k: 0.7,
    description: 'Elbow 90°, long radius, threaded',
    source: MUNSON_TABLE_8_2,
  },
  'elbow-45-long-radius-flanged': { k: 0.2, description: 'Elbow 45°, long radius, flanged', source: MUNSON_TABLE_8_2 },
  'elbow-45-threaded': { k: 0.4, description: 'Elbow 45°, regular, threaded', source: MUNSON_TABLE_8_2 },
  'return-bend-flanged': { k: 0.2, description: 'Return bend 180°, flanged', source: MUNSON_TABLE_8_2 },
  'return-bend-threaded': { k: 1.5, description: 'Return bend 180°, threaded', source: MUNSON_TABLE_8_2 },
  'tee-line-flanged': { k: 0.2, description: 'Tee, flow through the run, flanged', source: MUNSON_TABLE_8_2 },
  'tee-line-threaded': { k: 0.9, description: 'Tee, flow through the run, threaded', source: MUNSON_TABLE_8_2 },
  'tee-branch-flanged': { k: 1.0, description: 'Tee, flow through the branch, flanged', source: MUNSON_TABLE_8_2 },
  'tee-branch-threaded': { k: 2.0, description: 'Tee, flow through the branch, threaded', source: MUNSON_TABLE_8_2 },
  'union-threaded': { k: 0.08, description: 'Union, threaded', source: MUNSON_TABLE_8_2 },
  'globe-valve-open': { k: 10, description: 'Globe valve, fully open', source: MUNSON_TABLE_8_2 },
  'angle-valve-open': { k: 2, description: 'Angle valve, fully open', source: MUNSON_TABLE_8_2 },
  'gate-valve-open': { k: 0.15, description: 'Gate valve, fully open', source: MUNSON_TABLE_8_2 },
  'gate-valve-quarter-closed': { k: 0.26, description: 'Gate valve, ¼ closed', source: MUNSON_TABLE_8_2 },
  'gate-valve-half-closed': { k: 2.1, description: 'Gate valve, ½ closed', source: MUNSON_TABLE_8_2 },
  'gate-valve-three-quarters-closed': { k: 17, description: 'Gate valve, ¾ closed', source: MUNSON_TABLE_8_2 },
  'swing-check-valve': { k: 2, description: 'Swing check valve, forward flow', source: MUNSON_TABLE_8_2 },
  'ball-valve-open': { k: 0.05, description: 'Ball valve, fully open', source: MUNSON_TABLE_8_2 },
  'ball-valve-third-closed': { k: 5.5, description: 'Ball valve, ⅓ closed', source: MUNSON_TABLE_8_2 },
  'ball-valve-two-thirds-closed': { k: 210, description: 'Ball valve, ⅔ closed', source: MUNSON_TABLE_8_2 },
} as const satisfies Record<string, FittingLossCoefficient>;

export type FittingKind = keyof typeof FITTING_LOSS_COEFFICIENTS;

/** A count of one kind of fitting on a stretch. */
export interface FittingCount {
  kind: FittingKind;
  count: number;
}

/** Sum of K over a list of fittings. */
export function totalLossCoefficient(fittings: readonly FittingCount[]): number {
  let total = 0;
  fittings.forEach(({ kind, count }, index) => {
    const entry: FittingLossCoefficient | undefined = (
      FITTING_LOSS_COEFFICIENTS as Record<string, FittingLossCoefficient>
    )[kind];
    if (entry === undefined)
      throw new HydraulicsInputError('fittings.kind', `unknown fitting "${String(kind)}"`, index);
    assertNonNegative(count, 'fittings.count', index);
    if (!Number.isInteger(count))
      throw new HydraulicsInputError('fittings.count', `must be a whole number, got ${count}`, index);
    total += entry.k * count;
  });
  return total;
}

/** Options for {@link minorLossHeadM}. */
export interface MinorLossOptions {
  /** Sum of loss coefficients K along the stretch. */
  kTotal: number;
  /** Pipe velocity, m/s; negative velocity gives a negative loss. */
  velocityMs: number;
}

/** Minor (fitting) head loss, m: ΣK · v|v| / 2g. */
export function minorLossHeadM({ kTotal, velocityMs }: MinorLossOptions): number {
  assertNonNegative(kTotal, 'kTotal');
  assertFiniteNumber(velocityMs, 'velocityMs');
  return (kTotal * velocityMs * Math.abs(velocityMs)) / (2 * GRAVITY_MS2);
}

/** Options for {@link suddenExpansionLossCoefficient}. */
export interface SuddenExpansionOptions {
  smallDiameterM: number;
  largeDiameterM: number;
}

/**
 * K of a sudden enlargement, referred to the small-pipe velocity: (1 − (d₁/d₂)²)² (Borda-Carnot;
 * the curve of Munson et al. Fig. 8.27, stored copy p. 419).
 */
export function suddenExpansionLossCoefficient({ smallDiameterM, largeDiameterM }: SuddenExpansionOptions): number {
  assertPositive(smallDiameterM, 'smallDiameterM');
  assertPositive(largeDiameterM, 'largeDiameterM');
  if (largeDiameterM < smallDiameterM) {
    throw new HydraulicsInputError('largeDiameterM', `must not be smaller than smallDiameterM (${smallDiameterM} m)`);
  }
  const areaRatio = (smallDiameterM / largeDiameterM) ** 2;
  return (1 - areaRatio) ** 2;
}
