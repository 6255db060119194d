import type { FrictionMethod, LineSettings } from './types';

/** Settings with every default filled in (see `LineSettings` for meanings and sources). */
export interface ResolvedLineSettings {
  frictionMethod: FrictionMethod;
  waterTemperatureC: number;
  safetyFactor: number;
  velocityMinMs: number;
  velocityMaxMs: number;
  minResidualHeadM: number;
  airPointToleranceM: number;
  heightScatterM: number;
  /** Undefined until the profile supplies its highest ground elevation. */
  siteAltitudeM: number | undefined;
  heightDatum: 'geodetic' | 'assumed';
  /** Undefined until the profile scales the sea-level default to the site (see `pressureLimits`). */
  siphonLimitHeadM: number | undefined;
  defaultCoverM: number;
  entranceLossK: number;
  checkSurge: boolean;
}

/**
 * Defaults. Velocity band: Jordan, *A Handbook of Gravity-Flow Water Systems*, p.53 (via ITACA) [R1].
 * Residual head at an outlet: ">= 3 m at each tapstand", Akvopedia gravity water supply [R2].
 * Siphon limit: "siphonage up to about 7.5 m negative head, where vaporisation may begin",
 * Taylor & Francis/CRC hydraulics textbook, ch. 42 [R7], at sea level (1 atm = 10.33 m); the
 * analysis scales it to the site's atmospheric head (see `practicalSiphonLimitHeadM`).
 * Friction: Darcy-Weisbach with the Colebrook friction factor by default; Hazen-Williams with
 * C = 150 gives less loss than a smooth pipe in 15-40 mm bores (profile-and-checks.md §5.1).
 * Entrance: K = 0.5 (sharp-edged) plus the velocity head where the water leaves a free surface
 * (profile-and-checks.md §5.2, core.md Munson Table 8.2 / Fig. 8.25 figures in minor-losses.ts).
 * Safety factor 1: published pressure classes already contain the standard's design factor
 * (ISO 4427 C >= 1.25, ASTM D2241 2.0) [R12][R13]; the user raises it for extra margin.
 * Air-point tolerance 1 m and 20 C water: common practice, no source.
 * Pipe cover 0.75 m where the survey gives none: common burial practice for water mains in
 * frost-mild ground (common practice, no source; from memory, UK water-fittings guidance asks
 * 750 mm); a pipe on the surface (0 m) is not a design default. Frost depth may ask for more.
 */
export const DEFAULT_LINE_SETTINGS: Readonly<
  Omit<ResolvedLineSettings, 'siteAltitudeM' | 'siphonLimitHeadM'> & { siphonLimitHeadM: number }
> = Object.freeze({
  frictionMethod: 'darcy-weisbach',
  waterTemperatureC: 20,
  safetyFactor: 1,
  velocityMinMs: 0.7,
  velocityMaxMs: 3.0,
  minResidualHeadM: 3,
  airPointToleranceM: 1,
  heightScatterM: 0,
  siphonLimitHeadM: 7.5,
  defaultCoverM: 0.75,
  entranceLossK: 0.5,
  heightDatum: 'geodetic',
  checkSurge: true,
});

/** Fills the defaults in; does not validate (see `assertLineInput`). */
export function resolveLineSettings(settings: LineSettings | undefined): ResolvedLineSettings {
  const s = settings ?? {};
  const d = DEFAULT_LINE_SETTINGS;
  return {
    frictionMethod: s.frictionMethod ?? d.frictionMethod,
    waterTemperatureC: s.waterTemperatureC ?? d.waterTemperatureC,
    safetyFactor: s.safetyFactor ?? d.safetyFactor,
    velocityMinMs: s.velocityMinMs ?? d.velocityMinMs,
    velocityMaxMs: s.velocityMaxMs ?? d.velocityMaxMs,
    minResidualHeadM: s.minResidualHeadM ?? d.minResidualHeadM,
    airPointToleranceM: s.airPointToleranceM ?? d.airPointToleranceM,
    heightScatterM: s.heightScatterM ?? d.heightScatterM,
    siteAltitudeM: s.siteAltitudeM,
    heightDatum: s.heightDatum ?? 'geodetic',
    siphonLimitHeadM: s.siphonLimitHeadM,
    defaultCoverM: s.defaultCoverM ?? d.defaultCoverM,
    entranceLossK: s.entranceLossK ?? d.entranceLossK,
    checkSurge: s.checkSurge ?? d.checkSurge,
  };
}

/**
 * The one rule for how far a high or low point of the pipe must stand out to count (air-release
 * valves, washouts, winter drain points): the line's tolerance, or the survey's height scatter
 * when that is larger, because a bump smaller than the scatter cannot be told from it.
 */
export function highLowToleranceM(
  settings: Pick<ResolvedLineSettings, 'airPointToleranceM' | 'heightScatterM'>,
): number {
  return Math.max(settings.airPointToleranceM, settings.heightScatterM);
}
