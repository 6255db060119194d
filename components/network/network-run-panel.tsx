'use client';

import { useEffect, useState } from 'react';
import { Button } from '@/components/ui/button';
import { FormMessage } from '@/components/ui/form-message';
import { Panel } from '@/components/ui/panel';
import { ProgressBar } from '@/components/ui/progress-bar';
import type { NetworkRunKind } from '@/lib/network/jobs';
import type { NetworkRunWarning, SizeRunResult, SolveRunResult } from '@/lib/network/run-result';
import type { NetworkView } from '@/lib/network/view';
import { useNetworkRun, useStartNetworkRun } from '@/lib/queries/network';
import { formatNumber, formatQuantity, type UnitSystem } from '@/lib/units';

const SEVERITY_WORDS = { danger: 'Danger', warning: 'Warning', info: 'Note' } as const;

function nameOf(view: NetworkView, warning: NetworkRunWarning): string | null {
  if (warning.nodeId) return view.records.nodes.find((n) => n.id === warning.nodeId)?.name ?? null;
  if (warning.linkId) return view.records.links.find((l) => l.id === warning.linkId)?.name ?? null;
  return null;
}

/** Solve and size buttons, the running job's progress, and what the last runs found. */
export function NetworkRunPanel({ projectId, view, units, showing, onShow }: {
  projectId: string; view: NetworkView; units: UnitSystem; showing: 'solve' | 'size'; onShow: (kind: 'solve' | 'size') => void;
}) {
  const start = useStartNetworkRun(projectId);
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
    <Panel title="Solve and size" aside={<span className="text-xs text-creek-600">Runs on the server beside other work; you can keep editing.</span>}>
      <div className="flex flex-wrap items-center gap-2">
        <Button onClick={() => go('solve')} disabled={working}>Solve at the peak hour</Button>
        <Button tone="quiet" onClick={() => go('size')} disabled={working}>Size for least cost</Button>
        {solved && sized && (
          <span className="ml-2 text-sm text-creek-700">
            Show:{' '}
            <button type="button" className={`underline ${showing === 'solve' ? 'font-semibold' : ''}`} onClick={() => onShow('solve')}>the design as drawn</button>
            {' · '}
            <button type="button" className={`underline ${showing === 'size' ? 'font-semibold' : ''}`} onClick={() => onShow('size')}>the least-cost sizes</button>
          </span>
        )}
      </div>
      {working && run.data && <div className="mt-3"><ProgressBar label="Network run" fraction={run.data.progress} detail={run.data.stage} /></div>}
      {start.error && <div className="mt-3"><FormMessage message={start.error.message} /></div>}
      {failed && <div className="mt-3"><FormMessage message={failed} /></div>}
      <dl className="mt-3 grid gap-2 text-sm sm:grid-cols-3">
        <div>
          <dt className="text-creek-600">Peak-hour solve</dt>
          <dd data-testid="solve-summary">{solved ? `${solved.converged ? 'Converged' : 'Did not converge'} in ${solved.iterations} iterations` : 'Not run yet'}</dd>
        </div>
        <div>
          <dt className="text-creek-600">Least-cost sizes</dt>
          <dd data-testid="size-summary">
            {sized ? (sized.feasible && sized.cost !== null ? `Material cost ${formatNumber(sized.cost, 0)} (team price list)` : 'No set of sizes in the price list meets every limit') : 'Not run yet'}
          </dd>
        </div>
        <div>
          <dt className="text-creek-600">One size everywhere</dt>
          <dd data-testid="uniform-summary">
            {sized?.uniform ? `${sized.uniform.pipeLabel}: ${formatNumber(sized.uniform.cost, 0)}${sized.uniform.feasible ? '' : ' (fails a limit)'}` : '—'}
          </dd>
        </div>
      </dl>
      {warnings.length > 0 && (
        <ul className="mt-3 space-y-1 text-sm" aria-label="Network findings">
          {warnings.map((w, i) => (
            <li key={i} className={w.severity === 'danger' ? 'text-clay-700' : w.severity === 'warning' ? 'text-ochre-700' : 'text-creek-700'}>
              <strong>{SEVERITY_WORDS[w.severity]}</strong>
              {nameOf(view, w) ? ` — ${nameOf(view, w)}` : ''}
              {w.chainageM !== undefined ? ` at chainage ${formatQuantity('chainage', w.chainageM, units)}` : ''}: {w.message}
            </li>
          ))}
        </ul>
      )}
      <p className="mt-3 text-xs text-creek-600">
        Caution: flows and pressures are estimates from published friction formulas. Pipe ratings, surge and drinking-water rules are for
        local codes and licensed practice to confirm before anything is built.
      </p>
    </Panel>
  );
}
