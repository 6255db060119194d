import { findPipe } from '../catalogue/index';
import type { ProfileModel } from '../profile/analyze-profile';
import type { LineProfile } from '../profile/result-types';
import { smallestUpsizeForResidual } from '../design/upsize';
import type { LineWarning } from './types';
import { chainage, chainageRange, litresPerSecond, metres, PRESSURE_CAUTION } from './wording';

const HEAD_TOLERANCE_M = 1e-6;

/** The outlet's residual pressure below its target at the design flow, with the smallest fix. */
function residualWarning(model: ProfileModel): LineWarning[] {
  const { profile } = model;
  const { end } = profile;
  if (profile.flowM3s === 0 || end.residualHeadM >= end.targetResidualHeadM - HEAD_TOLERANCE_M) return [];
  const capacity = Math.min(...profile.reaches.map((reach) => reach.capacityM3s));
  const upsize = smallestUpsizeForResidual(model);
  const lastChainageM = profile.points.chainageM[profile.points.chainageM.length - 1];
  const stretch = upsize ? profile.stretches[upsize.stretchIndex] : undefined;
  const toLabel = upsize ? (findPipe(upsize.toPipeId)?.label ?? upsize.toPipeId) : undefined;
  let suggestedFix =
    `No single pipe change is enough: use larger pipe over several stretches, lower the design flow ` +
    `(the line carries ${litresPerSecond(capacity)} by gravity to this outlet), or set the outlet lower.`;
  if (upsize && stretch) {
    suggestedFix =
      `Change stretch ${upsize.stretchIndex + 1} (${chainageRange(stretch.fromM, stretch.toM)}) from ` +
      `${stretch.pipe.label} to ${toLabel}: the outlet then has ${metres(upsize.residualHeadM)}.`;
  }
  return [
    {
      code: 'residual-below-target',
      severity: end.residualHeadM < 0 ? 'danger' : 'warning',
      at: { chainageM: lastChainageM },
      values: {
        chainageM: lastChainageM,
        flowM3s: profile.flowM3s,
        capacityM3s: capacity,
        headM: end.residualHeadM,
        limitHeadM: end.targetResidualHeadM,
        ...(upsize && stretch
          ? {
              stretchIndex: upsize.stretchIndex,
              fromM: stretch.fromM,
              toM: stretch.toM,
              pipeId: stretch.pipe.id,
              pipeLabel: stretch.pipe.label,
              toPipeId: upsize.toPipeId,
              toPipeLabel: toLabel,
              fixedHeadM: upsize.residualHeadM,
            }
          : {}),
      },
      message:
        `At the design flow of ${litresPerSecond(profile.flowM3s)} the outlet has ${metres(end.residualHeadM)} of ` +
        `pressure, below the ${metres(end.targetResidualHeadM)} it needs: friction and fittings use up too much ` +
        `of the available head. ${PRESSURE_CAUTION}`,
      suggestedFix,
      fixes: upsize ? [{ kind: 'change-pipe', stretchIndex: upsize.stretchIndex, pipeId: upsize.toPipeId }] : [],
    },
  ];
}

/** No gravity flow at all between the fixed ends ("find the flow" gave zero). */
function noFlowWarning(profile: LineProfile): LineWarning[] {
  if (profile.flowSource !== 'found' || profile.flowM3s > 0) return [];
  const reach = profile.reaches.find((r) => r.capacityM3s === 0) ?? profile.reaches[0];
  return [
    {
      code: 'no-gravity-flow',
      severity: 'danger',
      at: { fromM: reach.fromM, toM: reach.toM },
      values: { fromM: reach.fromM, toM: reach.toM, otherHeadM: reach.startHeadM, limitHeadM: reach.requiredEndHeadM },
      message:
        `From ${chainageRange(reach.fromM, reach.toM)} the water starts at ${metres(reach.startHeadM)} but must ` +
        `arrive at ${metres(reach.requiredEndHeadM)} or more: there is no head left to drive a flow by gravity.`,
      suggestedFix: 'Raise the source or tank, lower the outlet or tank, or ask for less residual pressure.',
      fixes: [],
    },
  ];
}

/** A break-pressure tank the design flow cannot fill: the grade arrives below its water level. */
function tankWarnings(profile: LineProfile): LineWarning[] {
  if (profile.flowM3s === 0) return [];
  return profile.reaches.slice(0, -1).flatMap((reach): LineWarning[] => {
    if (reach.arrivingHeadM >= reach.requiredEndHeadM - HEAD_TOLERANCE_M) return [];
    return [
      {
        code: 'tank-not-reached',
        severity: 'danger',
        at: { chainageM: reach.toM },
        values: {
          chainageM: reach.toM,
          flowM3s: profile.flowM3s,
          headM: reach.arrivingHeadM,
          limitHeadM: reach.requiredEndHeadM,
          capacityM3s: reach.capacityM3s,
        },
        message:
          `At ${litresPerSecond(profile.flowM3s)} the grade reaches the break-pressure tank at ${chainage(reach.toM)} ` +
          `at ${metres(reach.arrivingHeadM)}, below its water level of ${metres(reach.requiredEndHeadM)}: the tank ` +
          `cannot fill and will run dry (the line above it carries ${litresPerSecond(reach.capacityM3s)}).`,
        suggestedFix: 'Use larger pipe above the tank, set the tank lower, or lower the design flow.',
        fixes: [],
      },
    ];
  });
}

/** Outlet residual, no-flow and unreachable-tank warnings. */
export function deliveryWarnings(model: ProfileModel): LineWarning[] {
  return [...noFlowWarning(model.profile), ...tankWarnings(model.profile), ...residualWarning(model)];
}
