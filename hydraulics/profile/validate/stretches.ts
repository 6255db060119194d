import { assertPipeSpec } from '../../catalogue/guard';
import { HydraulicsInputError } from '../../errors';
import { assertArray, assertFinite, assertRecord } from './numbers';

/** Gaps and overlaps smaller than this are survey rounding, not a mistake, m. */
export const STRETCH_JOIN_TOLERANCE_M = 1e-6;

/**
 * Checks the stretches: ordered along the line, each longer than zero, together covering the
 * stations' chainage range from first to last with no gap or overlap; inline pipes are checked
 * with the catalogue's guard (ids are checked when they are resolved).
 */
export function assertStretches(stretches: unknown, firstChainageM: number, lastChainageM: number): void {
  assertArray(stretches, 'stretches');
  if (stretches.length === 0) throw new HydraulicsInputError('stretches', 'a line needs at least one pipe stretch');
  let expectedFromM = firstChainageM;
  for (let i = 0; i < stretches.length; i++) {
    const stretch: unknown = stretches[i];
    assertRecord(stretch, 'stretches', i);
    assertFinite(stretch.fromM, 'stretches.fromM', i);
    assertFinite(stretch.toM, 'stretches.toM', i);
    if (stretch.toM <= stretch.fromM) {
      throw new HydraulicsInputError(
        'stretches.toM',
        `a stretch must have a positive length: ${stretch.fromM} m to ${stretch.toM} m`,
        i,
      );
    }
    const joinM = stretch.fromM - expectedFromM;
    if (joinM > STRETCH_JOIN_TOLERANCE_M) {
      throw new HydraulicsInputError(
        'stretches.fromM',
        `gap of ${joinM} m: no pipe between ${expectedFromM} m and ${stretch.fromM} m`,
        i,
      );
    }
    if (joinM < -STRETCH_JOIN_TOLERANCE_M) {
      const what = i === 0 ? 'starts before the first station' : 'overlaps the previous stretch';
      throw new HydraulicsInputError('stretches.fromM', `${what} by ${-joinM} m`, i);
    }
    if (typeof stretch.pipe !== 'string') assertPipeSpec(stretch.pipe, 'stretches.pipe', i);
    expectedFromM = stretch.toM;
  }
  const endGapM = lastChainageM - expectedFromM;
  if (Math.abs(endGapM) > STRETCH_JOIN_TOLERANCE_M) {
    const message =
      endGapM > 0
        ? `the stretches end at ${expectedFromM} m but the line runs to ${lastChainageM} m`
        : `the last stretch runs past the end of the line (${lastChainageM} m) to ${expectedFromM} m`;
    throw new HydraulicsInputError('stretches.toM', message, stretches.length - 1);
  }
}
