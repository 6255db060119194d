import { WATER_TEMPERATURE_MAX_C, WATER_TEMPERATURE_MIN_C } from '../../constants';
import { HydraulicsInputError } from '../../errors';
import { assertInRange } from '../../input-guards';
import { assertNonNegative, assertOneOf, assertPositive, assertRecord } from './numbers';

/** Altitudes the atmosphere model (ISA troposphere, hydraulics/water.ts) accepts, m. */
export const SITE_ALTITUDE_RANGE_M = { min: -500, max: 11_000 } as const;

function optional(value: unknown, check: (v: unknown, field: string) => void, field: string): void {
  if (value !== undefined) check(value, field);
}

/** Settings: every number finite and in its physical range; the velocity band the right way up. */
export function assertSettings(settings: unknown): void {
  if (settings === undefined) return;
  assertRecord(settings, 'settings');
  const s = settings;
  if (s.frictionMethod !== undefined) {
    assertOneOf(s.frictionMethod, ['hazen-williams', 'darcy-weisbach'] as const, 'settings.frictionMethod');
  }
  if (s.waterTemperatureC !== undefined) {
    assertInRange(
      s.waterTemperatureC,
      'settings.waterTemperatureC',
      WATER_TEMPERATURE_MIN_C,
      WATER_TEMPERATURE_MAX_C,
      'C',
    );
  }
  optional(s.safetyFactor, assertPositive, 'settings.safetyFactor');
  optional(s.velocityMinMs, assertNonNegative, 'settings.velocityMinMs');
  optional(s.velocityMaxMs, assertPositive, 'settings.velocityMaxMs');
  optional(s.minResidualHeadM, assertNonNegative, 'settings.minResidualHeadM');
  optional(s.airPointToleranceM, assertNonNegative, 'settings.airPointToleranceM');
  optional(s.heightScatterM, assertNonNegative, 'settings.heightScatterM');
  if (s.siteAltitudeM !== undefined) {
    const { min, max } = SITE_ALTITUDE_RANGE_M;
    assertInRange(s.siteAltitudeM, 'settings.siteAltitudeM', min, max, 'm');
  }
  optional(s.siphonLimitHeadM, assertPositive, 'settings.siphonLimitHeadM');
  optional(s.defaultCoverM, assertNonNegative, 'settings.defaultCoverM');
  optional(s.entranceLossK, assertNonNegative, 'settings.entranceLossK');
  if (s.heightDatum !== undefined) assertOneOf(s.heightDatum, ['geodetic', 'assumed'] as const, 'settings.heightDatum');
  if (s.checkSurge !== undefined && typeof s.checkSurge !== 'boolean') {
    throw new HydraulicsInputError('settings.checkSurge', 'must be true or false');
  }
  const min = typeof s.velocityMinMs === 'number' ? s.velocityMinMs : 0.7;
  const max = typeof s.velocityMaxMs === 'number' ? s.velocityMaxMs : 3.0;
  if (max <= min) {
    throw new HydraulicsInputError('settings.velocityMaxMs', `must exceed the minimum velocity (${min} m/s)`);
  }
}
