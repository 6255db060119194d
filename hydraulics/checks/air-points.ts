/** High and low points of a pipe profile (point indices), alternating along the line. */
export interface TurningPoints {
  /** Points where air collects (summits). */
  highs: number[];
  /** Points where sediment collects (sags). */
  lows: number[];
}

/**
 * Summits and sags of the pipe profile that stand out by at least `toleranceM`: a summit must
 * rise `toleranceM` above the sag before it and fall `toleranceM` to the sag after it (its
 * prominence), so survey noise smaller than the tolerance does not create points. The ends of the
 * line are never reported (they are the source and the outlet). One pass with hysteresis.
 */
export function findTurningPoints(elevationM: ArrayLike<number>, toleranceM: number): TurningPoints {
  const n = elevationM.length;
  const highs: number[] = [];
  const lows: number[] = [];
  let trend = 0; // +1 rising, -1 falling, 0 not yet known
  let high = 0;
  let low = 0;
  const tolerance = Math.max(toleranceM, 0);
  for (let i = 1; i < n; i++) {
    const z = elevationM[i];
    if (trend >= 0 && z > elevationM[high]) high = i;
    if (trend <= 0 && z < elevationM[low]) low = i;
    // A turn seen while the trend is still unknown follows a rise or fall smaller than the
    // tolerance from the start, so it is not prominent: it only sets the trend.
    if (trend >= 0 && elevationM[high] - z > tolerance) {
      if (trend === 1 && high < n - 1) highs.push(high);
      trend = -1;
      low = i;
    } else if (trend <= 0 && z - elevationM[low] > tolerance) {
      if (trend === -1 && low < n - 1) lows.push(low);
      trend = 1;
      high = i;
    }
  }
  return { highs, lows };
}
