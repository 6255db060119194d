import 'server-only';
import { analyzeLine, highLowToleranceM, HydraulicsInputError, type WinterLine } from '../../hydraulics/index';
import { models } from '../../models';
import { AppError } from '../errors';
import { lineInputOf } from '../lines/line-input';
import { lineWinterPlan, type LineWinterPlan } from '../lines/winter';
import { lineSiteContext } from './line-context';
import { getLine, stationsOfLine } from './lines';

/** One line's winter plan with the core's view of it for the seasonal tasks. */
export interface ProjectLineWinter {
  lineId: string;
  name: string;
  plan: LineWinterPlan;
  /** Null when neither the frost depth nor the designer's choice says anything about winter. */
  winterLine: WinterLine | null;
}

/**
 * The winter plan of every line of a project that can be analysed now (a line whose route is gone
 * or whose design no longer fits is left out: its page says why).
 */
export async function lineWintersForProject(projectId: string): Promise<ProjectLineWinter[]> {
  const rows = await models().Line.findAll({ where: { projectId }, attributes: ['id'], order: [['name', 'ASC']] });
  const context = await lineSiteContext(projectId);
  const winters: ProjectLineWinter[] = [];
  for (const row of rows) {
    const line = await getLine(row.id);
    if (!line?.routeId) continue;
    try {
      const stations = await stationsOfLine(line.routeId, line);
      const analysis = analyzeLine(lineInputOf(line.design, stations, context));
      const plan = lineWinterPlan(
        { points: analysis.points, airPointToleranceM: highLowToleranceM(analysis.settings) },
        line.design.winter,
        context.frostDepthM,
        stations.every((s) => s.coverM === undefined),
      );
      const drainedByChoice = plan.treatment === 'drained-for-winter';
      const winterLine: WinterLine | null =
        context.frostDepthM === null && !drainedByChoice
          ? null
          : {
              label: line.name,
              profile: {
                chainageM: Array.from(analysis.points.chainageM),
                elevationM: Array.from(analysis.points.pipeElevationM),
              },
              coverDepthM: plan.shallowestCoverM,
              frostDepthM: context.frostDepthM ?? 0,
              prominenceM: highLowToleranceM(analysis.settings),
              drainForWinter: drainedByChoice,
            };
      winters.push({ lineId: line.id, name: line.name, plan, winterLine });
    } catch (error) {
      if (error instanceof HydraulicsInputError || error instanceof AppError) continue;
      throw error;
    }
  }
  return winters;
}
