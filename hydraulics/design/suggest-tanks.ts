import { GRAVITY_MS2 } from '../constants';
import { pointIndexAt } from '../profile/grid';
import type { LineProfile } from '../profile/result-types';
import { planBreakPressureTanks, type PlannedTank, type TankPlan } from './break-pressure-tanks';

/**
 * Break-pressure tanks to add to an analysed line so no stretch's static pressure passes its
 * allowable head. Existing tanks stay: each reach between existing resets is planned on its own
 * (they reset the static line, so reaches are independent and the per-reach minimum is the
 * overall minimum for the line as it stands). New tanks stand on the ground, and high enough that
 * the analysed flow still passes every summit after them with the minimum residual head to spare
 * (never negative: Jordan p.52 via ITACA [R1]); when no such plan exists, the plan that only keeps
 * the static level above the summits is offered and the negative-pressure check will say so.
 */
export function suggestBreakPressureTanks(profile: LineProfile, tankWaterAboveGroundM = 0): TankPlan {
  const withFlow = planAllReaches(profile, tankWaterAboveGroundM, true);
  return withFlow.feasible ? withFlow : planAllReaches(profile, tankWaterAboveGroundM, false);
}

/**
 * A new tank's outlet loses the velocity head and the entrance loss (profile-and-checks.md §5.2):
 * keep that much more above the summits, at the fastest water of the reach (on the safe side).
 */
function entranceHeadM(profile: LineProfile, fromPoint: number, toPoint: number): number {
  const { velocityMs } = profile.points;
  let fastestMs = 0;
  for (let j = fromPoint; j < toPoint; j++) fastestMs = Math.max(fastestMs, velocityMs[j]);
  return ((1 + profile.settings.entranceLossK) * fastestMs * fastestMs) / (2 * GRAVITY_MS2);
}

function planAllReaches(profile: LineProfile, tankWaterAboveGroundM: number, keepFlowing: boolean): TankPlan {
  const { points } = profile;
  const n = points.chainageM.length;
  const allowableByStretch = Float64Array.from(profile.stretches, (s) => s.allowableHeadM);
  // Only the plan that keeps the flow going needs the losses.
  const lossToPoint = keepFlowing ? new Float64Array(n) : null;
  if (lossToPoint !== null) {
    const { frictionLossM, minorLossM } = points;
    for (let j = 0; j < n; j++) lossToPoint[j] = frictionLossM[j] + minorLossM[j];
  }
  const tanks: PlannedTank[] = [];
  for (const reach of profile.reaches) {
    const fromPoint = pointIndexAt(points.chainageM, reach.fromM);
    const toPoint = pointIndexAt(points.chainageM, reach.toM);
    if (toPoint <= fromPoint) continue;
    const plan = planBreakPressureTanks({
      chainageM: points.chainageM,
      groundElevationM: points.groundElevationM,
      pipeElevationM: points.pipeElevationM,
      // stretchIndex[j] is the stretch of the piece from point j to j+1.
      allowableHeadM: allowableByStretch,
      pieceStretch: points.stretchIndex,
      startLevelM: points.staticHeadM[fromPoint],
      tankWaterAboveGroundM,
      fromPoint,
      toPoint,
      ...(lossToPoint !== null
        ? {
            headLossToPointM: lossToPoint,
            summitClearanceM: profile.settings.minResidualHeadM + entranceHeadM(profile, fromPoint, toPoint),
          }
        : {}),
    });
    tanks.push(...plan.tanks);
    if (!plan.feasible) return { tanks, feasible: false, problem: plan.problem };
  }
  return { tanks, feasible: true };
}
