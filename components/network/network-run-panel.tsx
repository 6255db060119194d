'use client';

import Link from 'next/link';
import { useEffect, useState } from 'react';
import { Button } from '@/components/ui/button';
import { FormMessage } from '@/components/ui/form-message';
import { Panel } from '@/components/ui/panel';
import { ProgressBar } from '@/components/ui/progress-bar';
import type { NetworkRunKind } from '@/lib/network/jobs';
import type { SizeRunResult, SolveRunResult } from '@/lib/network/run-result';
import type { NetworkView } from '@/lib/network/view';
import { useApplySizes, useNetworkRun, useStartNetworkRun } from '@/lib/queries/network';
import { formatNumber, type UnitSystem } from '@/lib/units';
import { networkFrictionWords } from '@/lib/network/friction-words';
import { NetworkFindings } from './network-findings';

/** Solve, size and day buttons, the running job's progress, and what the last runs found. */
export function NetworkRunPanel({
  projectId,
  view,
  units,
  showing,
  onShow,
  canEdit,
}: {
  projectId: string;
  view: NetworkView;
  units: UnitSystem;
  showing: 'solve' | 'size';
  onShow: (kind: 'solve' | 'size') => void;
  canEdit: boolean;
}) {
  const start = useStartNetworkRun(projectId);
  const apply = useApplySizes(projectId);
  const [runId, setRunId] = useState<string | null>(null);
  const run = useNetworkRun(projectId, runId);
  const working = start.isPending || run.data?.status === 'running' || run.data?.status === 'queued';
  useEffect(() => {
    if (run.data?.status === 'done' && (run.data.kind === 'solve' || run.data.kind === 'size')) onShow(run.data.kind);
  }, [run.data?.status, run.data?.kind, onShow]);

  const go = (kind: NetworkRunKind) => start.mutate({ kind }, { onSuccess: (started) => setRunId(started.id) });
  const solved = view.runs.solve?.status === 'done' ? (view.runs.solve.result as SolveRunResult) : null;
  const sized = view.runs.size?.status === 'done' ? (view.runs.size.result as SizeRunResult) : null;
  const warnings = (showing === 'size' ? sized?.warnings : solved?.warnings) ?? [];
  const failed = run.data?.status === 'failed' ? run.data.error?.message : null;

  return (
    <Panel
      title="Solve and size"
      aside={
        <span className="text-xs text-creek-600">Runs on the server beside other work; you can keep editing.</span>
      }
    >
      <div className="flex flex-wrap items-center gap-2">
        <Button onClick={() => go('solve')} disabled={working}>
          Solve at the peak hour
        </Button>
        <Button tone="quiet" onClick={() => go('size')} disabled={working}>
          Size for least cost
        </Button>
        <Button tone="quiet" onClick={() => go('day')} disabled={working}>
          Run a 24-hour day
        </Button>
        {solved && sized && (
          <span className="ml-2 text-sm text-creek-700">
            Show:{' '}
            <button
              type="button"
              className={`underline ${showing === 'solve' ? 'font-semibold' : ''}`}
              onClick={() => onShow('solve')}
            >
              the design as drawn
            </button>
            {' · '}
            <button
              type="button"
              className={`underline ${showing === 'size' ? 'font-semibold' : ''}`}
              onClick={() => onShow('size')}
            >
              the least-cost sizes
            </button>
          </span>
        )}
      </div>
      {working && run.data && (
        <div className="mt-3">
          <ProgressBar label="Network run" fraction={run.data.progress} detail={run.data.stage} />
        </div>
      )}
      {start.error && (
        <div className="mt-3">
          <FormMessage message={start.error.message} />
        </div>
      )}
      {failed && (
        <div className="mt-3">
          <FormMessage message={failed} />
        </div>
      )}
      <dl className="mt-3 grid gap-2 text-sm sm:grid-cols-3">
        <div>
          <dt className="text-creek-600">Peak-hour solve</dt>
          <dd data-testid="solve-summary">
            {solved
              ? `${solved.converged ? 'Converged' : 'Did not converge'} in ${solved.iterations} iterations`
              : 'Not run yet'}
          </dd>
          {solved && (
            <dd className="mt-1 text-xs text-creek-700" data-testid="solve-friction">
              {networkFrictionWords(solved.friction)}
            </dd>
          )}
        </div>
        <div>
          <dt className="text-creek-600">Least-cost sizes</dt>
          <dd data-testid="size-summary">
            {sized
              ? sized.feasible && sized.cost !== null
                ? `Material cost ${formatNumber(sized.cost, 0)} (team price list)`
                : 'No set of sizes in the price list meets every limit'
              : 'Not run yet'}
            {' · '}
            <Link className="underline" href="/team/prices">
              pipe prices
            </Link>
          </dd>
        </div>
        <div>
          <dt className="text-creek-600">One size everywhere</dt>
          <dd data-testid="uniform-summary">
            {sized?.uniform
              ? `${sized.uniform.pipeLabel}: ${formatNumber(sized.uniform.cost, 0)}${sized.uniform.feasible ? '' : ' (fails a limit)'}`
              : '—'}
          </dd>
        </div>
      </dl>
      {canEdit && sized?.feasible && view.runs.size && (
        <div className="mt-3 flex flex-wrap items-center gap-3 rounded-md border border-moss-100 bg-moss-50/50 p-2 text-sm">
          <span className="text-creek-800">
            Write the chosen pipes to the network&apos;s pipes and lines (each line&apos;s stretches follow the sizes;
            one change, all or nothing).
          </span>
          <Button onClick={() => apply.mutate(view.runs.size!.id)} disabled={apply.isPending || working}>
            Apply the chosen sizes
          </Button>
          {apply.data && (
            <span role="status" data-testid="applied-sizes">
              Applied to {apply.data.pipes} {apply.data.pipes === 1 ? 'pipe' : 'pipes'} and {apply.data.lines}{' '}
              {apply.data.lines === 1 ? 'line' : 'lines'}.
            </span>
          )}
        </div>
      )}
      {apply.error && (
        <div className="mt-3">
          <FormMessage message={apply.error.message} />
        </div>
      )}
      <NetworkFindings view={view} warnings={warnings} units={units} label="Network findings" />
      <p className="mt-3 text-sm">
        <a className="underline" href={`/api/projects/${projectId}/network/report`} download>
          Download the network report (PDF)
        </a>
        <span className="text-xs text-creek-600">
          {' '}
          — the schematic, heads and pressures, flows and velocities, the last sizes and cost, and the last day run.
        </span>
      </p>
      <p className="mt-3 text-xs text-creek-600">
        Caution: flows and pressures are estimates from published friction formulas. Pipe ratings, surge and
        drinking-water rules are for local codes and licensed practice to confirm before anything is built.
      </p>
    </Panel>
  );
}
