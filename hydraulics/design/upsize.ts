import { PIPE_SERIES } from '../catalogue/index';
import type { PipeSpec } from '../catalogue/pipe-spec';
import { profileModel, type ProfileModel } from '../profile/analyze-profile';
import type { LineInput } from '../profile/types';
import { reachHeadLossM } from '../profile/reaches';
import { stretchHydraulics } from '../profile/stretch-hydraulics';
import { allowableHeadM } from '../profile/stretch-results';

/** One suggested pipe change. */
export interface PipeUpsize {
  stretchIndex: number;
  fromPipeId: string;
  toPipeId: string;
  /** Residual head at the end of the line after the change, m. */
  residualHeadM: number;
  /** Length times the increase of outside diameter, m2: the ranking proxy for added cost. */
  costProxyM2: number;
}

/** The next larger pipe of the same catalogue series (same material, standard and SDR), if any. */
export function nextSizeInSeries(pipe: PipeSpec): PipeSpec | undefined {
  const series = PIPE_SERIES.find((candidate) => candidate.pipes.some((p) => p.id === pipe.id));
  if (!series) return undefined;
  return [...series.pipes]
    .filter((p) => p.insideDiameterM > pipe.insideDiameterM)
    .sort((a, b) => a.insideDiameterM - b.insideDiameterM)[0];
}

/**
 * End grade at the model's flow with `pipes`: each reach starts at the lower of its tank level
 * and the grade arriving there (as the profile does) and loses friction plus fitting head.
 */
function endGradeM(model: ProfileModel, pipes: readonly PipeSpec[]): number {
  const { profile, reaches } = model;
  const s = profile.settings;
  const hydraulics = stretchHydraulics(pipes, profile.flowM3s, s.frictionMethod, s.waterTemperatureC);
  let head = profile.flowM3s === 0 ? profile.points.staticHeadM[0] : reaches[0].startHeadM;
  let arriving = head;
  reaches.forEach((reach, r) => {
    if (r > 0) head = Math.min(arriving, reach.startHeadM);
    arriving = head - reachHeadLossM(reach, hydraulics);
  });
  return arriving;
}

/**
 * The smallest single change that gives the outlet its residual head: upsizing ONE stretch to the
 * next size of its own series. Candidates whose allowable head is below the stretch's static
 * pressure are skipped. Among the changes that meet the target, the one adding the least
 * length x diameter (a material-cost proxy: common practice, no source) wins. Returns null when
 * no single change is enough (or the line already meets its target).
 */
export function smallestUpsizeForResidual(model: ProfileModel): PipeUpsize | null {
  const { profile, pipes } = model;
  const target = profile.end.targetResidualHeadM;
  if (profile.end.residualHeadM >= target || profile.flowM3s === 0) return null;
  let best: PipeUpsize | null = null;
  pipes.forEach((pipe, s) => {
    const next = nextSizeInSeries(pipe);
    if (!next) return;
    const stretch = profile.stretches[s];
    const allowable = allowableHeadM(next, profile.settings.waterTemperatureC, profile.settings.safetyFactor);
    if (allowable < stretch.maxStaticPressureHeadM) return;
    const changed = pipes.map((p, i) => (i === s ? next : p));
    const residualHeadM = endGradeM(model, changed) - profile.end.elevationM;
    if (residualHeadM < target) return;
    const costProxyM2 = stretch.slopeLengthM * (next.outsideDiameterM - pipe.outsideDiameterM);
    if (best === null || costProxyM2 < best.costProxyM2) {
      best = { stretchIndex: s, fromPipeId: pipe.id, toPipeId: next.id, residualHeadM, costProxyM2 };
    }
  });
  return best;
}

/**
 * For a line whose outlet gets too little residual head at its design flow: the one-stretch
 * upsizing (next size of the same series) that meets the target at the least added
 * length x diameter, or null when none does or none is needed.
 */
export function suggestPipeUpsize(input: LineInput): PipeUpsize | null {
  return smallestUpsizeForResidual(profileModel(input));
}
