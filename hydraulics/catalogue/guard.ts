import { HydraulicsInputError } from '../errors';
import { assertFiniteNumber, assertNonNegative, assertPositive } from '../input-guards';
import type { PipeMaterial, PipeSpec } from './pipe-spec';

const MATERIALS: readonly PipeMaterial[] = ['pvc', 'pe', 'steel', 'custom'];
/** No water pipe has a Hazen-Williams C above ~160; 200 leaves room without admitting typos like 1500. */
const MAX_HAZEN_WILLIAMS_C = 200;
/** Relative roughness above 0.1 is outside every friction chart. */
const MAX_RELATIVE_ROUGHNESS = 0.1;
/** A pressure wave cannot outrun sound in water (≈1480 m/s); margin for colder, stiffer water. */
const MAX_WAVE_SPEED_MS = 1600;
const DIAMETER_TOLERANCE = 1e-6;

/**
 * Checks that `value` is a usable pipe spec (catalogue entry or a user's custom pipe) and throws a
 * {@link HydraulicsInputError} naming the first bad field (`pipe.insideDiameterM`, …) otherwise.
 */
export function assertPipeSpec(value: unknown, field = 'pipe', index?: number): asserts value is PipeSpec {
  if (typeof value !== 'object' || value === null || Array.isArray(value)) {
    throw new HydraulicsInputError(field, 'must be a pipe spec object', index);
  }
  const spec = value as Record<string, unknown>;
  const at = (name: string): string => `${field}.${name}`;

  for (const name of ['id', 'label', 'nominalSize', 'source'] as const) {
    const text = spec[name];
    if (typeof text !== 'string' || text.trim() === '') {
      throw new HydraulicsInputError(at(name), 'must be a non-empty string', index);
    }
  }
  if (!MATERIALS.includes(spec.material as PipeMaterial)) {
    throw new HydraulicsInputError(at('material'), `must be one of ${MATERIALS.join(', ')}`, index);
  }
  for (const name of [
    'outsideDiameterM',
    'insideDiameterM',
    'wallM',
    'pressureRatingPa',
    'hazenWilliamsC',
    'waveSpeedMs',
  ] as const) {
    assertPositive(spec[name], at(name), index);
  }
  assertNonNegative(spec.roughnessM, at('roughnessM'), index);

  const outside = spec.outsideDiameterM as number;
  const inside = spec.insideDiameterM as number;
  const wall = spec.wallM as number;
  if (inside >= outside) {
    throw new HydraulicsInputError(at('insideDiameterM'), 'must be less than the outside diameter', index);
  }
  if (inside + 2 * wall > outside * (1 + DIAMETER_TOLERANCE)) {
    throw new HydraulicsInputError(
      at('wallM'),
      'must be at most half the outside diameter less the inside diameter',
      index,
    );
  }
  if ((spec.hazenWilliamsC as number) > MAX_HAZEN_WILLIAMS_C) {
    throw new HydraulicsInputError(at('hazenWilliamsC'), `must be at most ${MAX_HAZEN_WILLIAMS_C}`, index);
  }
  if ((spec.roughnessM as number) > MAX_RELATIVE_ROUGHNESS * inside) {
    throw new HydraulicsInputError(
      at('roughnessM'),
      `must be at most ${MAX_RELATIVE_ROUGHNESS} × the inside diameter`,
      index,
    );
  }
  if ((spec.waveSpeedMs as number) > MAX_WAVE_SPEED_MS) {
    throw new HydraulicsInputError(at('waveSpeedMs'), `must be at most ${MAX_WAVE_SPEED_MS} m/s`, index);
  }
  if (spec.sdr !== undefined) {
    assertFiniteNumber(spec.sdr, at('sdr'), index);
    if (spec.sdr <= 2) throw new HydraulicsInputError(at('sdr'), 'must be greater than 2', index);
  }
  if (spec.sidr !== undefined) assertPositive(spec.sidr, at('sidr'), index);
}
