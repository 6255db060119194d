import { STRETCH_JOIN_TOLERANCE_M } from './validate/stretches';
import type { LineStation, LineStretch } from './types';

/**
 * The points the profile is computed on: every survey station, plus a point at each stretch
 * boundary, fitting and break-pressure tank that falls between stations. With those extra points
 * every point-to-point piece lies in one pipe, so each quantity is exactly linear on a piece and
 * the limit crossings found by linear interpolation are exact for the model.
 */
export interface ProfileGrid {
  /** Horizontal chainage of each point, m (strictly increasing). */
  chainageM: Float64Array;
  /** Ground elevation, m. */
  groundElevationM: Float64Array;
  /** Pipe elevation = ground minus cover, m. */
  pipeElevationM: Float64Array;
  /** Index of the survey station at each point, or -1 for an inserted point. */
  stationIndex: Int32Array;
  /** Stretch index of the piece from point j to point j+1 (length n-1). */
  pieceStretch: Int32Array;
  /** 3-D slope length of the pipe from point j to point j+1 (length n-1), m. */
  pieceSlopeLengthM: Float64Array;
}

/** Index of the last station at or before `chainageM`, searching from `from` on (0 when it lies before them all). */
function lastStationAtOrBefore(stations: readonly LineStation[], chainageM: number, from: number): number {
  let lo = from;
  let hi = stations.length - 1;
  if (stations[hi].chainageM <= chainageM) return hi;
  // Invariant: stations[lo] is at or before the chainage (or lo is the start), stations[hi] after it.
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (stations[mid].chainageM <= chainageM) lo = mid;
    else hi = mid;
  }
  return lo;
}

/**
 * Sorted, de-duplicated extra chainages that do not already sit on a station. Each is found by
 * bisection: a handful of extras on a 100,000-station line should not walk the stations.
 */
function extraChainages(stations: readonly LineStation[], wanted: readonly number[]): number[] {
  const sorted = [...wanted].sort((a, b) => a - b);
  const out: number[] = [];
  let k = 0;
  for (const c of sorted) {
    k = lastStationAtOrBefore(stations, c, k);
    const nearStation =
      Math.abs(stations[k].chainageM - c) <= STRETCH_JOIN_TOLERANCE_M ||
      (k + 1 < stations.length && Math.abs(stations[k + 1].chainageM - c) <= STRETCH_JOIN_TOLERANCE_M);
    const nearPrevious = out.length > 0 && c - out[out.length - 1] <= STRETCH_JOIN_TOLERANCE_M;
    if (!nearStation && !nearPrevious) out.push(c);
  }
  return out;
}

/**
 * Builds the grid in one merge pass over the stations. `extraChainagesM` are the chainages that
 * must become points (stretch boundaries, fittings, tanks). Chainage is horizontal; friction uses
 * the slope length sqrt(dx^2 + dz^2) of the pipe, which is what is laid in the trench.
 */
export function buildProfileGrid(
  stations: readonly LineStation[],
  stretches: readonly LineStretch[],
  extraChainagesM: readonly number[],
  defaultCoverM: number,
): ProfileGrid {
  const extras = extraChainages(stations, extraChainagesM);
  const n = stations.length + extras.length;
  const chainageM = new Float64Array(n);
  const groundElevationM = new Float64Array(n);
  const pipeElevationM = new Float64Array(n);
  const stationIndex = new Int32Array(n);
  let e = 0;
  let p = 0;
  for (let i = 0; i < stations.length; i++) {
    const station = stations[i];
    const cover = station.coverM ?? defaultCoverM;
    if (i > 0) {
      const previous = stations[i - 1];
      const previousCover = previous.coverM ?? defaultCoverM;
      const span = station.chainageM - previous.chainageM;
      while (e < extras.length && extras[e] < station.chainageM) {
        const t = (extras[e] - previous.chainageM) / span;
        chainageM[p] = extras[e];
        groundElevationM[p] = previous.groundElevationM + t * (station.groundElevationM - previous.groundElevationM);
        pipeElevationM[p] = groundElevationM[p] - (previousCover + t * (cover - previousCover));
        stationIndex[p] = -1;
        p++;
        e++;
      }
    }
    chainageM[p] = station.chainageM;
    groundElevationM[p] = station.groundElevationM;
    pipeElevationM[p] = station.groundElevationM - cover;
    stationIndex[p] = i;
    p++;
  }
  const pieceStretch = new Int32Array(n - 1);
  const pieceSlopeLengthM = new Float64Array(n - 1);
  const lastStretch = stretches.length - 1;
  let s = 0;
  let stretchEndM = stretches[0].toM;
  for (let j = 0; j < n - 1; j++) {
    const dx = chainageM[j + 1] - chainageM[j];
    const dz = pipeElevationM[j + 1] - pipeElevationM[j];
    pieceSlopeLengthM[j] = Math.sqrt(dx * dx + dz * dz);
    const midM = chainageM[j] + 0.5 * dx;
    while (s < lastStretch && stretchEndM <= midM) stretchEndM = stretches[++s].toM;
    pieceStretch[j] = s;
  }
  return { chainageM, groundElevationM, pipeElevationM, stationIndex, pieceStretch, pieceSlopeLengthM };
}

/** Index of the grid point at `chainageM` (the nearest one; points exist at every requested chainage). */
export function pointIndexAt(chainage: Float64Array, chainageM: number): number {
  let lo = 0;
  let hi = chainage.length - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (chainage[mid] <= chainageM) lo = mid;
    else hi = mid;
  }
  return Math.abs(chainage[hi] - chainageM) < Math.abs(chainage[lo] - chainageM) ? hi : lo;
}

/** Linear interpolation of `values` at `chainageM` (clamped to the ends). */
export function valueAtChainage(chainage: Float64Array, values: Float64Array, chainageM: number): number {
  const n = chainage.length;
  if (chainageM <= chainage[0]) return values[0];
  if (chainageM >= chainage[n - 1]) return values[n - 1];
  let lo = 0;
  let hi = n - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (chainage[mid] <= chainageM) lo = mid;
    else hi = mid;
  }
  const t = (chainageM - chainage[lo]) / (chainage[hi] - chainage[lo]);
  return values[lo] + t * (values[hi] - values[lo]);
}
