import { pointIndexAt } from '../profile/grid';
import type { LineProfile } from '../profile/result-types';
import { planBreakPressureTanks, type PlannedTank, type TankPlan } from './break-pressure-tanks';

/**
 * Break-pressure tanks to add to an analysed line so no stretch's static pressure passes its
 * allowable head. Existing tanks stay: each reach between existing resets is planned on its own
 * (they reset the static line, so reaches are independent and the per-reach minimum is the
 * overall minimum for the line as it stands). New tanks stand on the ground.
 */
export function suggestBreakPressureTanks(profile: LineProfile, tankWaterAboveGroundM = 0): TankPlan {
  const { points } = profile;
  const n = points.chainageM.length;
  const allowableByPiece = new Float64Array(n - 1);
  for (let j = 0; j < n - 1; j++) allowableByPiece[j] = profile.stretches[points.stretchIndex[j]].allowableHeadM;
  const tanks: PlannedTank[] = [];
  for (const reach of profile.reaches) {
    const fromPoint = pointIndexAt(points.chainageM, reach.fromM);
    const toPoint = pointIndexAt(points.chainageM, reach.toM);
    if (toPoint <= fromPoint) continue;
    const plan = planBreakPressureTanks({
      chainageM: points.chainageM,
      groundElevationM: points.groundElevationM,
      pipeElevationM: points.pipeElevationM,
      allowableHeadM: allowableByPiece,
      startLevelM: points.staticHeadM[fromPoint],
      tankWaterAboveGroundM,
      fromPoint,
      toPoint,
    });
    tanks.push(...plan.tanks);
    if (!plan.feasible) return { tanks, feasible: false, problem: plan.problem };
  }
  return { tanks, feasible: true };
}
