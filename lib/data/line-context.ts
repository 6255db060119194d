import 'server-only';
import { Op } from 'sequelize';
import { models } from '../../models';
import { notInProject } from '../errors';
import type { LineSiteContext } from '../lines/ram-start';
import type { LineDesign } from '../validations/line-design';
import { networkFlowsOfLine } from './line-network-flows';
import { pumpOutletHeadForProject } from './ram-sites';

/**
 * What a line of this project reads from the rest of it at each analysis: ram sites that can feed
 * it, the frost depth, and an open drain-down task already past its date (`today`, ISO date).
 */
export async function lineSiteContext(
  projectId: string,
  today: string = new Date().toISOString().slice(0, 10),
): Promise<LineSiteContext> {
  const project = await models().Project.findByPk(projectId, { attributes: ['frostDepthM', 'unitSystem'] });
  const overdue = await models().SeasonalTask.findOne({
    where: { projectId, kind: 'drain-down', done: false, dueOn: { [Op.lt]: today } },
    attributes: ['dueOn'],
    order: [['dueOn', 'ASC']],
  });
  return {
    ramOutlets: await pumpOutletHeadForProject(projectId),
    frostDepthM: project?.frostDepthM ?? null,
    overdueDrainDownOn: overdue?.dueOn ?? null,
    unitSystem: project?.unitSystem ?? 'metric',
  };
}

/**
 * The site context of one line with the network's word on it (its feed and solved flow per piece),
 * solved now on the worker pool: what the line page, the line's analysis and its report read.
 */
export async function lineFeedContext(projectId: string, lineId: string): Promise<LineSiteContext> {
  const [site, network] = await Promise.all([lineSiteContext(projectId), networkFlowsOfLine(lineId)]);
  return { ...site, network };
}

/** A design that starts at a ram site must name one of this project's ram sites; otherwise a 404 on that field. */
export async function assertRamSiteInProject(design: LineDesign, projectId: string): Promise<void> {
  if (design.start.kind !== 'ram-site') return;
  const site = await models().RamSite.findOne({ where: { id: design.start.ramSiteId, projectId }, attributes: ['id'] });
  if (!site) {
    throw notInProject(
      { 'design.start.ramSiteId': ['Pick a ram site of this project'] },
      'That ram site is not part of this project',
    );
  }
}
