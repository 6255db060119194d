'use client';

import { useState, type FormEvent } from 'react';
import { Button } from '@/components/ui/button';
import { FormMessage } from '@/components/ui/form-message';
import { Panel } from '@/components/ui/panel';
import { fromDisplay, unitOf } from '@/lib/units';
import { useCleanupDecision } from '@/lib/queries/routes';
import { benchmarkProposals, smoothingProposals } from '@/lib/routes/proposals';
import type { RouteDetail, RouteProposal } from '@/lib/routes/types';
import type { UnitSystem } from '@/lib/units';
import { ProposalItem } from './proposal-item';
import { typedNumber } from '@/lib/units/decimal-mark-store';
import { useSearchParams } from 'next/navigation';
import { IMPORT_SMOOTHING_WINDOW } from '@/lib/import/protocol';

export interface CleanupPanelProps {
  detail: RouteDetail;
  units: UnitSystem;
  editable: boolean;
  /** Unsaved table edits: decisions wait until they are saved or discarded. */
  blocked: boolean;
  onShowPoint: (seq: number) => void;
}

const SHOWN = 200;

/**
 * What the checks found, and smoothing or a benchmark offset on request, each change listed for
 * the user to accept or reject. Nothing changes a height without an accept.
 */
export function CleanupPanel({ detail, units, editable, blocked, onShowPoint }: CleanupPanelProps) {
  const decide = useCleanupDecision(detail.route.projectId, detail.route.id);
  // An import of a consumer-GPS walk may ask for smoothing to be proposed straight away.
  const proposedOnImport = useSearchParams().get('propose') === 'smoothing' && editable;
  const [requested, setRequested] = useState<RouteProposal[]>(() => (proposedOnImport ? smoothingProposals(detail.points, IMPORT_SMOOTHING_WINDOW) : []));
  const [message, setMessage] = useState<string | null>(null);
  const chainage = new Map(detail.points.map((p) => [p.seq, p.chainageM]));
  const u = unitOf('length', units);

  async function send(accept: RouteProposal[], reject: RouteProposal[]) {
    setMessage(null);
    try {
      await decide.mutateAsync({ accept, reject });
      const gone = new Set([...accept, ...reject]);
      setRequested((r) => r.filter((x) => !gone.has(x)));
    } catch (error) {
      setMessage(error instanceof Error ? error.message : 'Not saved.');
    }
  }

  function propose(e: FormEvent<HTMLFormElement>, kind: 'smoothing' | 'benchmark') {
    e.preventDefault();
    const form = new FormData(e.currentTarget);
    try {
      if (kind === 'smoothing') setRequested(smoothingProposals(detail.points, Number(form.get('window'))));
      else setRequested(benchmarkProposals(detail.points, Number(form.get('benchmark-point')) - 1, fromDisplay('length', typedNumber(String(form.get('benchmark-elevation'))), units)));
      setMessage(null);
    } catch (error) {
      setMessage(error instanceof Error ? error.message.replace(/^[\w.]+(\[\d+\])?: /, '') : 'Could not propose that.');
    }
  }

  const disabled = blocked || decide.isPending;
  const list = (items: RouteProposal[]) => (
    <ul>
      {items.slice(0, SHOWN).map((p) => (
        <ProposalItem key={`${p.kind}-${p.index}`} proposal={p} chainageM={chainage.get(p.index)} units={units} editable={editable} disabled={disabled} onDecide={(d) => send(d === 'accept' ? [p] : [], d === 'reject' ? [p] : [])} onShow={() => onShowPoint(p.index)} />
      ))}
    </ul>
  );

  return (
    <Panel title="Clean-up" aside={<span className="text-xs text-creek-600">The surveyed heights are always kept.</span>}>
      {blocked && editable && <p className="mb-2 text-sm text-ochre-700">Save or discard your table edits before deciding on clean-ups.</p>}
      {detail.proposals.length === 0 ? (
        <p className="text-sm text-creek-700">The checks (spikes, outliers, duplicates, points out of order) found nothing to look at.</p>
      ) : (
        <>
          <h3 className="text-sm font-medium text-creek-900">Found by the checks ({detail.proposals.length})</h3>
          {list(detail.proposals)}
        </>
      )}
      {editable && (
        <div className="mt-4 flex flex-wrap gap-6 border-t border-creek-100 pt-3 text-sm">
          <form onSubmit={(e) => propose(e, 'smoothing')} className="flex items-end gap-2" aria-label="Smoothing">
            <label>Moving-median window (points)<input name="window" defaultValue={5} inputMode="numeric" className="mt-1 block w-24 rounded-md border border-creek-200 px-2 py-1" /></label>
            <Button type="submit" tone="quiet" disabled={disabled}>Propose smoothing</Button>
          </form>
          <form onSubmit={(e) => propose(e, 'benchmark')} className="flex items-end gap-2" aria-label="Benchmark offset">
            <label>Point of known height<input name="benchmark-point" defaultValue={1} inputMode="numeric" className="mt-1 block w-20 rounded-md border border-creek-200 px-2 py-1" /></label>
            <label>Its known elevation ({u})<input name="benchmark-elevation" inputMode="decimal" className="mt-1 block w-28 rounded-md border border-creek-200 px-2 py-1" /></label>
            <Button type="submit" tone="quiet" disabled={disabled}>Propose offset</Button>
          </form>
        </div>
      )}
      {requested.length > 0 && (
        <div className="mt-3">
          {proposedOnImport && (
            <p className="mb-2 text-sm text-creek-700" data-testid="import-smoothing-note">
              Proposed on import: the heights come from a consumer GPS, so a moving median of {IMPORT_SMOOTHING_WINDOW} points is offered. Summits and lows that stand out of the survey&apos;s scatter keep their heights.
            </p>
          )}
          <div className="flex flex-wrap items-center gap-3">
            <h3 className="text-sm font-medium text-creek-900">Requested ({requested.length} changes)</h3>
            <Button className="px-2.5 py-1" disabled={disabled} onClick={() => send(requested, [])}>Accept all {requested.length}</Button>
            <Button tone="quiet" className="px-2.5 py-1" onClick={() => setRequested([])}>Discard</Button>
          </div>
          {list(requested)}
        </div>
      )}
      <div className="mt-2"><FormMessage message={message} /></div>
    </Panel>
  );
}
