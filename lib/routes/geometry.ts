import { chainageAlongTrack } from '../../hydraulics/index';
import { RouteEditError } from './errors';

/** The fields chainage depends on; any other fields are carried through untouched. */
export interface GeometryInput {
  latitude: number | null;
  longitude: number | null;
  chainageM: number | null;
  elevationM: number;
  excluded: boolean;
}

export interface RouteGeometry<T> {
  points: (T & { chainageM: number; slopeChainageM: number })[];
  /** Horizontal length of the kept points, metres. */
  lengthM: number;
  /** 3-D length of the kept points, metres. */
  slopeLengthM: number;
  /** True when every point has a position, so chainage came from the WGS84 geodesic. */
  positioned: boolean;
}

/**
 * Chainage for a whole route after an edit. When every point has a position, chainage is
 * measured along the WGS84 geodesic through the kept points (positions win over typed chainage);
 * otherwise every point needs a chainage and the kept ones must not go backwards. Excluded points
 * sit at the chainage of the kept point before them, so the table stays in order.
 */
export function computeRouteGeometry<T extends GeometryInput>(points: readonly T[]): RouteGeometry<T> {
  const positioned = points.length > 0 && points.every((p) => p.latitude !== null && p.longitude !== null);
  const kept = points.map((p, i) => ({ p, i })).filter(({ p }) => !p.excluded);
  const chainage = new Array<number>(points.length);
  const slope = new Array<number>(points.length);
  if (positioned) {
    if (kept.length > 0) {
      const track = chainageAlongTrack(
        kept.map(({ p }) => ({
          latitudeDeg: p.latitude as number,
          longitudeDeg: p.longitude as number,
          elevationM: p.elevationM,
        })),
      );
      kept.forEach(({ i }, k) => {
        chainage[i] = track.horizontalChainageM[k];
        slope[i] = track.slopeChainageM[k];
      });
    }
  } else {
    points.forEach((p, i) => {
      if (p.chainageM === null) {
        throw new RouteEditError('chainageM', 'needs a chainage (or every point needs a latitude and longitude)', {
          pointNumber: i + 1,
        });
      }
    });
    let previous: { chainageM: number; elevationM: number; slopeM: number; n: number } | null = null;
    for (const { p, i } of kept) {
      const c = p.chainageM as number;
      if (previous && c < previous.chainageM) {
        throw new RouteEditError(
          'chainageM',
          `chainage ${c.toFixed(2)} m is less than ${previous.chainageM.toFixed(2)} m at point ${previous.n}; points must run in order along the route`,
          { pointNumber: i + 1 },
        );
      }
      const slopeM: number = previous
        ? previous.slopeM + Math.hypot(c - previous.chainageM, p.elevationM - previous.elevationM)
        : 0;
      chainage[i] = c;
      slope[i] = slopeM;
      previous = { chainageM: c, elevationM: p.elevationM, slopeM, n: i + 1 };
    }
  }
  let lastC = kept.length > 0 ? chainage[kept[0].i] : 0;
  let lastS = 0;
  const out = points.map((p, i) => {
    if (!p.excluded) {
      lastC = chainage[i];
      lastS = slope[i];
    }
    return {
      ...p,
      chainageM: p.excluded ? (positioned ? lastC : (p.chainageM as number)) : chainage[i],
      slopeChainageM: p.excluded ? lastS : slope[i],
    };
  });
  const first = kept[0];
  const last = kept[kept.length - 1];
  return {
    points: out,
    lengthM: first && last ? chainage[last.i] - chainage[first.i] : 0,
    slopeLengthM: first && last ? slope[last.i] - slope[first.i] : 0,
    positioned,
  };
}
