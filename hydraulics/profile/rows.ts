import type { LineProfile } from './result-types';

/** One profile point as a plain object (for tables, JSON and charts). */
export interface ProfileRow {
  chainageM: number;
  groundElevationM: number;
  pipeElevationM: number;
  staticHeadM: number;
  hydraulicGradeM: number;
  pressureHeadM: number;
  staticPressureHeadM: number;
  velocityMs: number;
  frictionLossM: number;
  minorLossM: number;
  /** Survey station index, or -1 for an inserted point. */
  stationIndex: number;
  stretchIndex: number;
}

/**
 * The profile's column arrays as one object per point. Built only on request: the analysis
 * itself keeps typed arrays so long lines stay fast. `surveyStationsOnly` drops inserted points.
 */
export function profileRows(profile: LineProfile, surveyStationsOnly = false): ProfileRow[] {
  const p = profile.points;
  const rows: ProfileRow[] = [];
  for (let i = 0; i < p.chainageM.length; i++) {
    if (surveyStationsOnly && p.stationIndex[i] < 0) continue;
    rows.push({
      chainageM: p.chainageM[i],
      groundElevationM: p.groundElevationM[i],
      pipeElevationM: p.pipeElevationM[i],
      staticHeadM: p.staticHeadM[i],
      hydraulicGradeM: p.hydraulicGradeM[i],
      pressureHeadM: p.pressureHeadM[i],
      staticPressureHeadM: p.staticPressureHeadM[i],
      velocityMs: p.velocityMs[i],
      frictionLossM: p.frictionLossM[i],
      minorLossM: p.minorLossM[i],
      stationIndex: p.stationIndex[i],
      stretchIndex: p.stretchIndex[i],
    });
  }
  return rows;
}
