import { atmosphericHeadM, vapourHeadM } from '../water';
import { SITE_ALTITUDE_RANGE_M } from './validate/settings';
import type { PressureLimits } from './result-types';
import type { ResolvedLineSettings } from './settings';

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
    atmosphericHeadM: atmospheric,
    vapourHeadM: vapour,
    vapourLimitHeadM: atmospheric - vapour,
    siphonLimitHeadM: settings.siphonLimitHeadM,
  };
}
