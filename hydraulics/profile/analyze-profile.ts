import { seriesCriticalClosureTimeS } from '../surge/series-closure-time';
import { computeGradeLines, type PointEvents } from './grade-lines';
import type { PipeSpec } from '../catalogue/pipe-spec';
import { buildProfileGrid, type ProfileGrid } from './grid';
import { addKAtPoint, eventChainages, pointEvents, tanksOf } from './line-events';
import { pressureLimits } from './pressure-limits';
import { pumpShutoffGradeM } from './pump-shutoff';
import { findGravityFlow } from './find-flow';
import { buildReaches, type Reach } from './reaches';
import { resolveStretchPipes } from './resolve-pipes';
import type { LineProfile, ReachResult } from './result-types';
import { resolveLineSettings } from './settings';
import { stretchHydraulics } from './stretch-hydraulics';
import { flowAtChainage, scheduledHydraulics } from './flow-schedule';
import { stretchResults } from './stretch-results';
import type { LineEnd, LineInput, LineStart } from './types';
import { assertLineInput } from './validate-line';
import { computeZones, zoneCrossings } from './zones';

function startHeads(start: LineStart, pumpPipeElevationM: number): { flowingM: number; staticM: number } {
  if (start.kind === 'water-level') return { flowingM: start.levelM, staticM: start.levelM };
  return { flowingM: start.outletHeadM, staticM: pumpShutoffGradeM(start, pumpPipeElevationM) };
}

/**
 * Where water leaves a free surface (a source at a water level, each break-pressure tank) the
 * hydraulic grade in the pipe lies one velocity head below that surface, plus the entrance loss:
 * K = 1 + K_entrance on the pipe leaving the point. The grade at the far end then matches the
 * water level or the pipe outlet, so the velocity head lost in a free jet or in the receiving tank
 * (exit loss K = 1) is counted once. Energy equation between two free surfaces:
 * Δz = (K_entrance + f·L/D + ΣK + 1)·v²/2g (profile-and-checks.md §5.2).
 */
function addFreeSurfaceEntrances(
  events: PointEvents,
  start: LineStart,
  entranceLossK: number,
  pointCount: number,
): void {
  const k = 1 + entranceLossK;
  if (start.kind === 'water-level') addKAtPoint(events, 0, k);
  events.points.forEach((point, e) => {
    const tankLevel = events.tankLevelM[e];
    if (point > 0 && point < pointCount - 1 && tankLevel === tankLevel) events.kAt[e] += k;
  });
}

function endTarget(end: LineEnd, lastPipeElevationM: number, defaultResidualM: number) {
  if (end.kind === 'outlet') return { elevationM: end.elevationM, residualM: end.residualHeadM ?? defaultResidualM };
  if (end.kind === 'tank-inlet') return { elevationM: end.elevationM, residualM: 0 };
  return { elevationM: lastPipeElevationM, residualM: 0 };
}

/**
 * Line profile analysis: pipe elevation, static line, hydraulic grade, flowing and static
 * pressure, velocity and cumulative losses at every point, per stretch and per reach figures, and
 * the exact chainages where pressure passes zero, the siphon and vapour limits and the pipe
 * ratings. With `flow.kind = 'find'` the flow is the gravity flow between the fixed ends.
 * Friction is computed on the 3-D slope length of the pipe (chainage is horizontal).
 * Throws `HydraulicsInputError` for bad input (see `assertLineInput`).
 */
export function analyzeProfile(input: LineInput): LineProfile {
  return profileModel(input).profile;
}

/** The analysis plus the internal pieces the design helpers reuse (grid, reaches, resolved pipes). */
export interface ProfileModel {
  profile: LineProfile;
  grid: ProfileGrid;
  reaches: Reach[];
  pipes: PipeSpec[];
}

/** `analyzeProfile` keeping its internals, for the checks and design helpers. */
export function profileModel(input: LineInput): ProfileModel {
  assertLineInput(input);
  const settings = resolveLineSettings(input.settings);
  const temperatureC = settings.waterTemperatureC;
  const method = settings.frictionMethod;
  const pipes = resolveStretchPipes(input.stretches, input.pipes);
  const declaredTanks = tanksOf(input);
  const grid = buildProfileGrid(
    input.stations,
    input.stretches,
    eventChainages(input, declaredTanks),
    settings.defaultCoverM,
  );
  const n = grid.chainageM.length;
  const { events, tanks } = pointEvents(grid, input, declaredTanks);
  addFreeSurfaceEntrances(events, input.start, settings.entranceLossK, n);
  const heads = startHeads(input.start, grid.pipeElevationM[0]);
  const target = endTarget(input.end, grid.pipeElevationM[n - 1], settings.minResidualHeadM);
  const reaches = buildReaches(grid, events, pipes.length, heads.flowingM, target.elevationM + target.residualM);
  const gravity = findGravityFlow(reaches, pipes, method, temperatureC);
  const capacities = gravity.reachCapacityM3s;
  const schedule =
    input.flow.kind === 'schedule'
      ? scheduledHydraulics(grid, pipes, input.flow.pieces, method, temperatureC)
      : undefined;
  const flowM3s =
    input.flow.kind === 'design'
      ? input.flow.flowM3s
      : input.flow.kind === 'schedule'
        ? flowAtChainage(input.flow.pieces, grid.chainageM[0])
        : gravity.flowM3s;
  const anyFlowM3s = schedule ? schedule.maxFlowM3s : flowM3s;
  const hydraulics = schedule ? schedule.stretches : stretchHydraulics(pipes, flowM3s, method, temperatureC);
  // With a schedule the losses are per segment (a stretch within one piece of the schedule).
  const lossGrid = schedule ? { ...grid, pieceStretch: schedule.pieceSegment } : grid;
  const lossHydraulics = schedule ? schedule.segments : hydraulics;
  const lines = computeGradeLines(
    lossGrid,
    events,
    lossHydraulics.frictionGradient,
    lossHydraulics.velocityHeadM,
    anyFlowM3s === 0 ? heads.staticM : heads.flowingM,
    heads.staticM,
  );
  const pressureHeadM = new Float64Array(n);
  const staticPressureHeadM = new Float64Array(n);
  const velocityMs = new Float64Array(n);
  const stretchIndex = new Int32Array(n);
  // One sweep, its arrays and branches hoisted: the loop runs once per point of a long line.
  const { pieceStretch, pipeElevationM } = grid;
  const { hydraulicGradeM, staticHeadM } = lines;
  const velocityBy = schedule ? schedule.segments.velocityMs : hydraulics.velocityMs;
  const velocityIndex = schedule ? schedule.pieceSegment : pieceStretch;
  for (let j = 0; j < n; j++) {
    const piece = j < n - 1 ? j : n - 2;
    stretchIndex[j] = pieceStretch[piece];
    const pipeM = pipeElevationM[j];
    pressureHeadM[j] = hydraulicGradeM[j] - pipeM;
    staticPressureHeadM[j] = staticHeadM[j] - pipeM;
    velocityMs[j] = velocityBy[velocityIndex[piece]];
  }
  const stretches = stretchResults(
    input.stretches,
    pipes,
    grid,
    hydraulics,
    staticPressureHeadM,
    temperatureC,
    settings.safetyFactor,
    lines.drops,
  );
  const limits = pressureLimits(settings, grid.groundElevationM);
  const surgeOn = settings.checkSurge && anyFlowM3s > 0;
  const zones = computeZones({
    grid,
    lines,
    pressureHeadM,
    staticPressureHeadM,
    allowableHeadM: Float64Array.from(stretches, (s) => s.allowableHeadM),
    surgeHeadM: Float64Array.from(stretches, (s) => (surgeOn ? s.surgeHeadM : 0)),
    limits,
    heightScatterM: settings.heightScatterM,
  });
  const reachResults: ReachResult[] = reaches.map((reach, r) => ({
    fromM: grid.chainageM[reach.fromPoint],
    toM: grid.chainageM[reach.toPoint],
    startHeadM: reach.startHeadM,
    requiredEndHeadM: reach.requiredEndHeadM,
    arrivingHeadM:
      r < reaches.length - 1
        ? (lines.tankArrivals.find((arrival) => arrival.point === reach.toPoint)?.headM ??
          lines.hydraulicGradeM[reach.toPoint])
        : lines.hydraulicGradeM[n - 1],
    capacityM3s: capacities[r],
    criticalClosureTimeS: seriesCriticalClosureTimeS(
      pipes.map((pipe, s) => ({ lengthM: reach.lengthByStretchM[s], waveSpeedMs: pipe.waveSpeedMs })),
    ),
  }));
  const endGrade = lines.hydraulicGradeM[n - 1];
  const profile: LineProfile = {
    flowM3s,
    flowSource: input.flow.kind === 'find' ? 'found' : 'design',
    ...(input.flow.kind === 'schedule' ? { flowSchedule: input.flow.pieces.map((piece) => ({ ...piece })) } : {}),
    points: {
      chainageM: grid.chainageM,
      groundElevationM: grid.groundElevationM,
      pipeElevationM: grid.pipeElevationM,
      staticHeadM: lines.staticHeadM,
      hydraulicGradeM: lines.hydraulicGradeM,
      pressureHeadM,
      staticPressureHeadM,
      velocityMs,
      frictionLossM: lines.frictionLossM,
      minorLossM: lines.minorLossM,
      stationIndex: grid.stationIndex,
      stretchIndex,
    },
    stretches,
    reaches: reachResults,
    end: {
      elevationM: target.elevationM,
      hydraulicGradeM: endGrade,
      residualHeadM: endGrade - target.elevationM,
      targetResidualHeadM: target.residualM,
    },
    totals: {
      frictionLossM: lines.frictionLossM[n - 1],
      minorLossM: lines.minorLossM[n - 1],
      breakPressureDropM: lines.breakPressureDropM,
      horizontalLengthM: grid.chainageM[n - 1] - grid.chainageM[0],
      slopeLengthM: stretches.reduce((sum, s) => sum + s.slopeLengthM, 0),
    },
    limits,
    zones,
    crossings: zoneCrossings(zones, grid.chainageM[0], grid.chainageM[n - 1]),
    tanks,
    settings: { ...settings, siteAltitudeM: limits.siteAltitudeM, siphonLimitHeadM: limits.siphonLimitHeadM },
  };
  return { profile, grid, reaches, pipes };
}
