import 'server-only';
import { models } from '../../models';
import { AppError, notFound } from '../errors';
import { stretchesFromPieces, type ChosenStretch } from '../network/chosen-stretches';
import type { SizeRunResult } from '../network/run-result';
import { getLine, setLineStretches, stationsOfLine } from './lines';

export interface AppliedSizes {
  /** Typed pipes whose pipe changed. */
  pipes: number;
  /** Lines whose stretches were replaced. */
  lines: number;
}

const changed = () => new AppError('conflict', 'The network changed since it was sized; size it again, then apply');

/**
 * Writes the pipes a finished sizing run chose: each typed pipe link takes its chosen pipe, each
 * line takes stretches cut where its chosen pieces change pipe. One transaction: a line that no
 * longer fits, or a link that is gone, leaves every record as it was.
 */
export async function applyChosenSizes(projectId: string, userId: string, jobId: string): Promise<AppliedSizes> {
  const { NetworkJob, NetworkLink, sequelize } = models();
  const job = await NetworkJob.findOne({ where: { id: jobId, projectId } });
  if (!job) throw notFound('No such run of this network');
  if (job.kind !== 'size' || job.status !== 'done')
    throw new AppError('bad_request', 'Only a finished sizing run can be applied', {
      jobId: ['Pick a finished sizing run'],
    });
  const result = job.result as unknown as SizeRunResult;
  if (!result.feasible || !result.solution)
    throw new AppError(
      'bad_request',
      'This sizing found no set of sizes that meets every limit; there is nothing to apply',
      { jobId: ['Size again with more pipes priced'] },
    );
  const solution = result.solution;

  // Read each line's stations first (outside the transaction: they come from the survey, not the design).
  const linkRows = await NetworkLink.findAll({ where: { projectId } });
  const lineStretches = new Map<string, { lineId: string; name: string; stretches: ChosenStretch[] }>();
  for (const linkResult of solution.links) {
    const link = linkRows.find((row) => row.id === linkResult.linkId);
    if (!link) throw changed();
    if (link.kind !== 'line' || !link.lineId) continue;
    const line = await getLine(link.lineId);
    if (!line?.routeId) throw changed();
    const stations = await stationsOfLine(line.routeId, line);
    const stretches = stretchesFromPieces(linkResult.pieces, {
      fromM: stations[0].chainageM,
      toM: stations[stations.length - 1].chainageM,
    });
    if (!stretches) throw changed();
    lineStretches.set(link.id, { lineId: line.id, name: line.name, stretches });
  }

  return sequelize.transaction(async (transaction) => {
    let pipes = 0;
    let lines = 0;
    for (const linkResult of solution.links) {
      const row = await NetworkLink.findOne({
        where: { id: linkResult.linkId, projectId },
        transaction,
        lock: transaction.LOCK.UPDATE,
      });
      if (!row) throw changed();
      if (row.kind === 'pipe') {
        const pipeId = linkResult.pieces[0]?.pipeId;
        if (!pipeId || row.data.pipe === pipeId) continue;
        row.data = { ...row.data, pipe: pipeId };
        row.changed('data', true);
        await row.save({ transaction });
        pipes += 1;
      } else if (row.kind === 'line') {
        const chosen = lineStretches.get(row.id)!;
        await setLineStretches(
          transaction,
          chosen.lineId,
          userId,
          chosen.stretches,
          `Applied the least-cost sizes to line "${chosen.name}"`,
        );
        lines += 1;
      }
    }
    return { pipes, lines };
  });
}
