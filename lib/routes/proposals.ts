import {
  type CleanupKind,
  DEFAULT_LINE_SETTINGS,
  detectDuplicates,
  detectGradeSpikes,
  detectMedianOutliers,
  detectOutOfOrder,
  type HeightSource,
  proposeBenchmarkOffset,
  type ProposedChange,
  proposeSmoothing,
  type RouteStation,
  surveyHeightScatterM,
} from '../../hydraulics/index';
import type { CheckedPoint } from './types';

/**
 * Thresholds of the automatic checks. Common practice, no source: a ground grade steeper than
 * 1 in 1 both into and out of a point, in opposite directions, is almost never real on a pipe
 * route; 6 m off the median of 7 neighbours is about the scatter of a consumer GPS height.
 */
export const CHECK_SETTINGS = { gradeThreshold: 1.0, medianWindow: 7, medianToleranceM: 6 } as const;

/** Heights whose scatter the moving-median check is meant for; level runs are not second-guessed by it. */
const SCATTERED_SOURCES: ReadonlySet<HeightSource> = new Set<HeightSource>(['gps', 'altimeter', 'map']);

/** When two checks flag one point, the stronger finding is shown (a duplicate beats a spike). */
const PRIORITY: CleanupKind[] = ['duplicate', 'time-backwards', 'chainage-backwards', 'grade-spike', 'median-outlier'];

/** The checks run by themselves; smoothing and benchmark offsets are only proposed on request. */
export const DETECTED_KINDS: ReadonlySet<CleanupKind> = new Set(PRIORITY);

const timeOf = (p: CheckedPoint): number | undefined =>
  p.timeS !== undefined && p.timeS !== null ? p.timeS : p.recordedAt ? Date.parse(p.recordedAt) / 1000 : undefined;

function stationsOf(points: readonly CheckedPoint[]): RouteStation[] {
  return points.map((p) => ({
    chainageM: p.chainageM,
    elevationM: p.elevationM,
    latitudeDeg: p.latitude ?? undefined,
    longitudeDeg: p.longitude ?? undefined,
    timeS: timeOf(p),
  }));
}

/** Re-keys proposals made on a subset of points from subset positions to the points' seq. */
function toSeq(changes: readonly ProposedChange[], subset: readonly CheckedPoint[]): ProposedChange[] {
  return changes.map((c) => ({ ...c, index: subset[c.index].seq }));
}

/**
 * Runs the automatic clean-up checks on the cleaned profile (kept points, current heights) and
 * returns at most one proposal per point, leaving out checks the user already dismissed there.
 */
export function detectRouteProposals(points: readonly CheckedPoint[]): ProposedChange[] {
  const kept = points.filter((p) => !p.excluded);
  if (kept.length < 3) return [];
  const stations = stationsOf(kept);
  const scattered = kept.filter((p) => SCATTERED_SOURCES.has(p.heightSource));
  // A walked GPS route is scattered throughout: its stations are the kept ones already.
  const scatteredStations = scattered.length === kept.length ? stations : stationsOf(scattered);
  const all = [
    ...toSeq(detectDuplicates(stations), kept),
    ...toSeq(detectOutOfOrder(stations), kept),
    ...toSeq(detectGradeSpikes(stations, { gradeThreshold: CHECK_SETTINGS.gradeThreshold }), kept),
    ...(scattered.length >= 3
      ? toSeq(
          detectMedianOutliers(scatteredStations, {
            windowSize: CHECK_SETTINGS.medianWindow,
            toleranceM: CHECK_SETTINGS.medianToleranceM,
          }),
          scattered,
        )
      : []),
  ];
  // seq is the point's place along the route, so it indexes the ordered points.
  const pointOf = (seq: number) => (points[seq]?.seq === seq ? points[seq] : points.find((p) => p.seq === seq));
  const chosen = new Map<number, ProposedChange>();
  for (const c of all) {
    if (pointOf(c.index)?.dismissedChecks.includes(c.kind)) continue;
    const current = chosen.get(c.index);
    if (!current || PRIORITY.indexOf(c.kind) < PRIORITY.indexOf(current.kind)) chosen.set(c.index, c);
  }
  return [...chosen.values()].sort((a, b) => a.index - b.index);
}

/**
 * Moving-median smoothing of the kept points' heights, keyed by seq. The highs and lows that stand
 * out of the route's height scatter keep their heights (the same rule the line checks use).
 */
export function smoothingProposals(points: readonly CheckedPoint[], windowSize: number): ProposedChange[] {
  const kept = points.filter((p) => !p.excluded);
  if (kept.length === 0) return [];
  const keepTurningPointsM = Math.max(DEFAULT_LINE_SETTINGS.airPointToleranceM, surveyHeightScatterM(kept));
  return toSeq(proposeSmoothing(stationsOf(kept), { windowSize, keepTurningPointsM }), kept);
}

/** Shifts every kept height so the point `seq` takes the benchmark's known elevation. */
export function benchmarkProposals(
  points: readonly CheckedPoint[],
  seq: number,
  knownElevationM: number,
): ProposedChange[] {
  const kept = points.filter((p) => !p.excluded);
  const index = kept.findIndex((p) => p.seq === seq);
  const label = kept[index]?.label ?? `point ${seq + 1}`;
  return toSeq(proposeBenchmarkOffset(stationsOf(kept), { index, knownElevationM, benchmarkLabel: label }), kept);
}
