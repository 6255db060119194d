import 'server-only';
import { Op } from 'sequelize';
import { assertNetworkInput } from '../../hydraulics/index';
import { models } from '../../models';
import { AppError, notFound } from '../errors';
import { log } from '../log';
import type { NetworkContext } from '../network/context';
import type { NetworkJobView, NetworkRunKind } from '../network/jobs';
import { buildNetworkInput } from '../network/network-input';
import { explainCoreError } from '../network/solve-result';
import type { NetworkRunInput } from '../validations/network';
import { runInWorker } from '../workers/pool';
import { loadNetworkContext } from './network-context';
import { networkJobView } from './network-view';

/** A run still "running" after this long was lost with its server process; it is reported as failed. */
const STALE_AFTER_MS = 10 * 60 * 1000;

const STAGE: Record<NetworkRunKind, string> = {
  solve: 'Solving the network on a worker thread',
  day: 'Running the 24-hour day on a worker thread',
  size: 'Choosing pipe sizes for least cost on a worker thread',
};

async function runTask(kind: NetworkRunKind, context: NetworkContext, input: NetworkRunInput) {
  switch (kind) {
    case 'solve':
      return runInWorker('network.solve', context, { timeLimitMs: 60_000 });
    case 'day':
      return runInWorker('network.day', context, { timeLimitMs: 120_000 });
    case 'size':
      // The optimiser's own limit, plus time to load it and to check the answer.
      return runInWorker(
        'network.size',
        { context, onePipePerLink: input.onePipePerLink, timeLimitS: input.timeLimitS },
        { timeLimitMs: (input.timeLimitS + 60) * 1000 },
      );
  }
}

/**
 * Sizing needs at least one pipe or line to choose a size for; a network of one node, or of valves
 * only, is a 400 that says so rather than an empty "least-cost" answer.
 */
function assertSomethingToSize(records: NetworkContext['records']): void {
  const sizable = records.links.filter((link) => link.kind !== 'valve');
  if (sizable.length > 0) return;
  const why =
    records.nodes.length < 2
      ? `the network has ${records.nodes.length === 0 ? 'no parts' : 'only one part'}, so there is no pipe to size`
      : 'no two parts are joined by a pipe or a line (valves keep their own size)';
  throw new AppError('bad_request', `Nothing to size: ${why}. Join parts with a pipe or a line first.`, {
    links: ['Join parts with a pipe or a line to size'],
  });
}

/**
 * Starts a run of the project's network. The network is built and checked here (linear in its size),
 * so a bad network is a 400 naming the node or link; the work itself runs on the worker pool and
 * its progress and result are kept in `network_jobs`, so any app instance can answer the poll. One
 * run of a kind at a time per project: asking again while one runs returns that run.
 */
export async function startNetworkRun(
  projectId: string,
  userId: string,
  input: NetworkRunInput,
): Promise<NetworkJobView> {
  const { NetworkJob } = models();
  const running = await NetworkJob.findOne({
    where: {
      projectId,
      kind: input.kind,
      status: { [Op.in]: ['queued', 'running'] },
      updatedAt: { [Op.gt]: new Date(Date.now() - STALE_AFTER_MS) },
    },
    order: [['createdAt', 'DESC']],
  });
  if (running) return networkJobView(running);
  const context = await loadNetworkContext(projectId);
  if (input.kind === 'size') assertSomethingToSize(context.records);
  const built = buildNetworkInput(context, input.kind === 'day' ? 'day' : 'peak');
  try {
    assertNetworkInput(built.input);
  } catch (error) {
    throw explainCoreError(built, context.records, error);
  }
  const job = await NetworkJob.create({
    projectId,
    kind: input.kind,
    status: 'running',
    progress: 0.1,
    stage: STAGE[input.kind],
    options: { ...input },
    createdBy: userId,
    startedAt: new Date(),
  });
  void runTask(input.kind, context, input)
    .then((result) =>
      job.update({
        status: 'done',
        progress: 1,
        stage: 'Done',
        result: result as unknown as object,
        finishedAt: new Date(),
      }),
    )
    .catch(async (error: unknown) => {
      const element =
        error instanceof Error && 'field' in error ? String((error as { field: unknown }).field) : undefined;
      const message = error instanceof Error ? error.message : 'The run failed';
      if (!element) log().error({ err: error }, 'network run failed');
      await job
        .update({
          status: 'failed',
          stage: 'Failed',
          error: { message, ...(element ? { element } : {}) },
          finishedAt: new Date(),
        })
        .catch(() => undefined);
    });
  return networkJobView(job);
}

/** One run of a project's network, as the page polls it. */
export async function getNetworkRun(projectId: string, jobId: string): Promise<NetworkJobView> {
  const row = await models().NetworkJob.findOne({ where: { id: jobId, projectId } });
  if (!row) throw notFound('No such run of this network');
  const view = networkJobView(row);
  if (
    (view.status === 'running' || view.status === 'queued') &&
    Date.now() - row.updatedAt.getTime() > STALE_AFTER_MS
  ) {
    return { ...view, status: 'failed', error: { message: 'The run was lost (the server restarted); start it again' } };
  }
  return view;
}
