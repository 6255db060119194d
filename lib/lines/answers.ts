import type { FrictionMethod, LineWarning, WarningSeverity } from '../../hydraulics/index';
import type { ProfileChartData } from '../chart/profile-types';

/** The one-screen answer: does the water get there, with what pressure, and where it is hardest on the pipe. */
export interface LineAnswers {
  flowM3s: number;
  flowSource: 'design' | 'found';
  /**
   * The most the line carries by gravity with the residual wanted at the end (the weakest reach),
   * m³/s; a design flow above it never arrives as asked.
   */
  capacityM3s: number;
  /** The design flow is more than the line can carry. */
  overCapacity: boolean;
  /**
   * The flow is a schedule per piece (the network's): `flowM3s` is the flow at the start, dropping at each take-off.
   */
  scheduled: boolean;
  /** The friction formula every figure was computed with. */
  frictionMethod: FrictionMethod | undefined;
  endResidualHeadM: number;
  endTargetHeadM: number;
  worstStatic: { headM: number; chainageM: number; allowableHeadM: number; pipeLabel: string };
  lowestFlowing: { headM: number; chainageM: number };
  counts: Record<WarningSeverity, number>;
}

type AnswerInput = ProfileChartData & {
  flowSource: 'design' | 'found';
  flowSchedule?: readonly unknown[];
  end: { residualHeadM: number; targetResidualHeadM: number };
  warnings: readonly LineWarning[];
};

/** Which formula every figure on the page was computed with (profile-and-checks.md §5). */
export const FRICTION_WORDS = {
  'darcy-weisbach':
    'Friction by Darcy-Weisbach with the Colebrook friction factor (roughness of each pipe); velocity head and entrance loss taken where water leaves a free surface.',
  'hazen-williams':
    'Friction by Hazen-Williams (C of each pipe); velocity head and entrance loss taken where water leaves a free surface.',
} as const;

/** Picks the headline figures out of an analysis. */
export function lineAnswers(a: AnswerInput): LineAnswers {
  const { staticPressureHeadM, pressureHeadM, chainageM, stretchIndex } = a.points;
  let worst = 0;
  let lowest = 0;
  for (let i = 1; i < chainageM.length; i++) {
    if (staticPressureHeadM[i] > staticPressureHeadM[worst]) worst = i;
    if (pressureHeadM[i] < pressureHeadM[lowest]) lowest = i;
  }
  const stretch = a.stretches[stretchIndex[worst]];
  const counts: Record<WarningSeverity, number> = { danger: 0, warning: 0, info: 0 };
  for (const w of a.warnings) counts[w.severity] += 1;
  const pieces = (a.flowSchedule ?? []) as readonly { flowM3s: number }[];
  // Pieces that all carry the same flow (the line's ends split at nodes that draw nothing) are one flow
  // through the whole line, which the reaches' capacity does answer.
  const oneFlow = pieces.every((piece) => Math.abs(piece.flowM3s - (pieces[0]?.flowM3s ?? 0)) <= 1e-12);
  const scheduled = pieces.length > 1 && !oneFlow;
  const capacityM3s = a.reaches.length > 0 ? Math.min(...a.reaches.map((reach) => reach.capacityM3s)) : a.flowM3s;
  return {
    flowM3s: a.flowM3s,
    flowSource: a.flowSource,
    capacityM3s,
    // A reach's capacity is for one flow through the whole line; with a schedule the flow drops at each
    // take-off, so whether the water gets there is the end residual's answer, not this comparison.
    overCapacity:
      !scheduled && (a.flowSource === 'design' || pieces.length > 0) && a.flowM3s > capacityM3s * (1 + 1e-6) + 1e-12,
    scheduled,
    frictionMethod: a.settings.frictionMethod,
    endResidualHeadM: a.end.residualHeadM,
    endTargetHeadM: a.end.targetResidualHeadM,
    worstStatic: {
      headM: staticPressureHeadM[worst],
      chainageM: chainageM[worst],
      allowableHeadM: stretch.allowableHeadM,
      pipeLabel: stretch.pipe.label,
    },
    lowestFlowing: { headM: pressureHeadM[lowest], chainageM: chainageM[lowest] },
    counts,
  };
}
