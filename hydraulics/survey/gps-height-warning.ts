import { DEFAULT_VERTICAL_UNCERTAINTY, type HeightSource } from './height-source';
import { assertFiniteNumber } from '../input-guards';
import { HydraulicsInputError } from '../errors';

/** A design choice that rests on a height difference read from the survey. */
export interface HeightDecision {
  /** What the decision is, in the user's words, e.g. "break-pressure tank at the ridge". */
  label: string;
  /** The static-head or elevation difference the decision depends on, metres. */
  elevationDifferenceM: number;
  /** Indices of the points whose heights it uses; every point of the route when omitted. */
  pointIndices?: readonly number[];
}

export interface GpsHeightWarning {
  severity: 'danger';
  message: string;
  /** Decisions using at least one consumer-GPS height, with whether the difference is within the GPS error. */
  affected: { label: string; elevationDifferenceM: number; withinGpsErrorBand: boolean }[];
  verticalErrorM: number;
  reference: string;
}

/** Sources whose heights are only as good as a handheld receiver's vertical fix. */
const CONSUMER_GPS: ReadonlySet<HeightSource> = new Set<HeightSource>(['gps']);

/**
 * Returns a loud warning when any decision hangs on consumer-GPS heights, or null. A handheld
 * or phone receiver's vertical error is several metres (≤ 15 m at 95 % by the GPS SPS
 * Performance Standard), so a static head read from it can be wrong by more than a pipe class.
 */
export function consumerGpsHeightWarning(input: {
  heightSources: readonly HeightSource[];
  decisions: readonly HeightDecision[];
}): GpsHeightWarning | null {
  const { heightSources, decisions } = input;
  const verticalErrorM = DEFAULT_VERTICAL_UNCERTAINTY.gps.uncertaintyM as number;
  const affected: GpsHeightWarning['affected'] = [];
  decisions.forEach((d, i) => {
    assertFiniteNumber(d.elevationDifferenceM, 'decisions.elevationDifferenceM', i);
    const indices = d.pointIndices ?? heightSources.map((_, k) => k);
    for (const k of indices) {
      if (!Number.isInteger(k) || k < 0 || k >= heightSources.length) {
        throw new HydraulicsInputError('decisions.pointIndices', `point ${k} does not exist`, i);
      }
    }
    if (indices.some((k) => CONSUMER_GPS.has(heightSources[k]))) {
      affected.push({
        label: d.label,
        elevationDifferenceM: d.elevationDifferenceM,
        withinGpsErrorBand: Math.abs(d.elevationDifferenceM) <= verticalErrorM,
      });
    }
  });
  if (affected.length === 0) return null;
  const list = affected
    .map(
      (a) =>
        `${a.label} (${a.elevationDifferenceM.toFixed(1)} m${a.withinGpsErrorBand ? ', smaller than the GPS error itself' : ''})`,
    )
    .join('; ');
  return {
    severity: 'danger',
    message:
      `Heights from a consumer GPS can be wrong by ${verticalErrorM} m or more, and these decisions depend on them: ${list}. ` +
      'Check the heights with a level, hose level, clinometer traverse or survey-grade GNSS before choosing pipe pressure class, ' +
      'break-pressure tanks or pump lift, and follow local codes and licensed practice.',
    affected,
    verticalErrorM,
    reference: 'U.S. DoD, GPS Standard Positioning Service Performance Standard (2020 ed., §3.4)',
  };
}
