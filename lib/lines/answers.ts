import type { LineWarning, WarningSeverity } from '../../hydraulics/index';
import type { ProfileChartData } from '../chart/profile-types';

/** The one-screen answer: does the water get there, with what pressure, and where it is hardest on the pipe. */
export interface LineAnswers {
  flowM3s: number;
  flowSource: 'design' | 'found';
  endResidualHeadM: number;
  endTargetHeadM: number;
  worstStatic: { headM: number; chainageM: number; allowableHeadM: number; pipeLabel: string };
  lowestFlowing: { headM: number; chainageM: number };
  counts: Record<WarningSeverity, number>;
}

type AnswerInput = ProfileChartData & {
  flowSource: 'design' | 'found';
  end: { residualHeadM: number; targetResidualHeadM: number };
  warnings: readonly LineWarning[];
};

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
  return {
    flowM3s: a.flowM3s,
    flowSource: a.flowSource,
    endResidualHeadM: a.end.residualHeadM,
    endTargetHeadM: a.end.targetResidualHeadM,
    worstStatic: { headM: staticPressureHeadM[worst], chainageM: chainageM[worst], allowableHeadM: stretch.allowableHeadM, pipeLabel: stretch.pipe.label },
    lowestFlowing: { headM: pressureHeadM[lowest], chainageM: chainageM[lowest] },
    counts,
  };
}
