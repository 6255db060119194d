import { atmosphericHeadM, vapourHeadM } from '../water';
import { SITE_ALTITUDE_RANGE_M } from './validate/settings';
import type { PressureLimits } from './result-types';
import { DEFAULT_LINE_SETTINGS, type ResolvedLineSettings } from './settings';

/**
 * The practical siphon limit at a site, m of suction: the textbook's 7.5 m at sea level (where the
 * atmosphere is 10.33 m of water, [R7]: "siphonage up to about 7.5 m negative head, where
 * vaporisation may begin"; the course note in [R7] gives -7.6 m against 1 atm = 10.33 m) kept as
 * the same share of the local atmospheric head (ISA, hydraulics/water.ts). Scaling by that share
 * is common practice, no source; it keeps a margin below the vapour limit at any altitude, where a
 * fixed 7.5 m passes the vapour limit above about 2,300 m.
 */
// Rule and check values: profile-and-checks.md §2.1.
export function practicalSiphonLimitHeadM(siteAtmosphericHeadM: number, temperatureC: number): number {
  const seaLevel = atmosphericHeadM({ altitudeM: 0, temperatureC });
  return DEFAULT_LINE_SETTINGS.siphonLimitHeadM * (siteAtmosphericHeadM / seaLevel);
}

/**
 * Suction limits at the site: atmospheric head (ISA, hydraulics/water.ts) minus the vapour head is
 * the deepest suction before the water column boils and breaks. Without a stated site altitude the
 * highest ground of the line is used (the lowest air pressure on the line: the cautious choice),
 * kept inside the range the atmosphere model accepts.
 */
export function pressureLimits(settings: ResolvedLineSettings, groundElevationM: Float64Array): PressureLimits {
  let highestM = -Infinity;
  for (let i = 0; i < groundElevationM.length; i++) if (groundElevationM[i] > highestM) highestM = groundElevationM[i];
  const siteAltitudeM =
    settings.siteAltitudeM ?? Math.min(SITE_ALTITUDE_RANGE_M.max, Math.max(SITE_ALTITUDE_RANGE_M.min, highestM));
  const atmospheric = atmosphericHeadM({ altitudeM: siteAltitudeM, temperatureC: settings.waterTemperatureC });
  const vapour = vapourHeadM(settings.waterTemperatureC);
  return {
    siteAltitudeM,
    siteAltitudeBasis: settings.siteAltitudeM === undefined ? 'highest-ground' : 'stated',
    atmosphericHeadM: atmospheric,
    vapourHeadM: vapour,
    vapourLimitHeadM: atmospheric - vapour,
    siphonLimitHeadM: settings.siphonLimitHeadM ?? practicalSiphonLimitHeadM(atmospheric, settings.waterTemperatureC),
  };
}
