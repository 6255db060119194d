import 'server-only';
import { HydraulicsInputError } from '../../hydraulics/index';
import { notFound } from '../errors';
import type { DayRunResult, SizeRunResult, SolveRunResult } from '../network/run-result';
import { networkReportPdf } from '../report/network-report';
import { workingCopyStamp } from '../review/stamp';
import { runInWorker } from '../workers/pool';
import { loadNetworkContext } from './network-context';
import { networkView } from './network-view';
import { getProject } from './projects';

/** The working copy's network report: solved now on the worker pool, with the latest finished sizing and day runs. */
export async function networkReport(projectId: string, preparedBy: string | null): Promise<Buffer> {
  const project = await getProject(projectId);
  if (!project) throw notFound();
  const [view, context] = await Promise.all([networkView(projectId), loadNetworkContext(projectId)]);
  let solve: SolveRunResult | null = null;
  let solveProblem: string | null = null;
  if (view.records.nodes.length > 0) {
    try {
      solve = await runInWorker('network.solve', context, { timeLimitMs: 60_000 });
    } catch (error) {
      if (!(error instanceof HydraulicsInputError)) throw error;
      solveProblem = error.message;
    }
  } else {
    solveProblem = 'the project has no network yet';
  }
  const done = <T>(run: (typeof view.runs)['size']) =>
    run?.status === 'done' && run.result ? { result: run.result as T, finishedAt: run.finishedAt } : null;
  return networkReportPdf({
    project,
    view,
    solve,
    solveProblem,
    sized: done<SizeRunResult>(view.runs.size),
    day: done<DayRunResult>(view.runs.day),
    stamp: workingCopyStamp(preparedBy),
    generatedAt: new Date(),
  });
}
