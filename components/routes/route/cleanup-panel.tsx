'use client';

import { useEffect, useRef, useState, type FormEvent } from 'react';
import { Button } from '@/components/ui/button';
import { FormMessage } from '@/components/ui/form-message';
import { Panel } from '@/components/ui/panel';
import { fromDisplay, unitOf } from '@/lib/units';
import { useCleanupDecision, useProposeCleanup } from '@/lib/queries/routes';
import type { RouteProposal, RouteProposalsAnswer, RouteView } from '@/lib/routes/types';
import type { UnitSystem } from '@/lib/units';
import { ProposalItem } from './proposal-item';
import { typedNumber } from '@/lib/units/decimal-mark-store';
import { useSearchParams } from 'next/navigation';
import { IMPORT_SMOOTHING_WINDOW } from '@/lib/import/protocol';

export interface CleanupPanelProps {
  view: RouteView;
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
export function CleanupPanel({ view, units, editable, blocked, onShowPoint }: CleanupPanelProps) {
  const decide = useCleanupDecision(view.route.projectId, view.route.id);
  // Smoothing and benchmark offsets are worked out by the server over the whole stored route.
  const propose$ = useProposeCleanup(view.route.id);
  // An import of a consumer-GPS walk may ask for smoothing to be proposed straight away.
  const proposedOnImport = useSearchParams().get('propose') === 'smoothing' && editable;
  const [requested, setRequestedAnswer] = useState<RouteProposalsAnswer>({ proposals: [], places: [] });
  const [message, setMessage] = useState<string | null>(null);
  const chainage = new Map<number, number>();
  view.proposals.forEach((p, i) => chainage.set(p.index, view.proposalPlaces[i].chainageM));
  requested.proposals.forEach((p, i) => chainage.set(p.index, requested.places[i].chainageM));
  const u = unitOf('length', units);
  const setRequested = (keep: (r: RouteProposal[]) => RouteProposal[]) =>
    setRequestedAnswer((answer) => {
      const kept = new Set(keep(answer.proposals));
      const at = answer.proposals.flatMap((p, i) => (kept.has(p) ? [i] : []));
      return { proposals: at.map((i) => answer.proposals[i]), places: at.map((i) => answer.places[i]) };
    });

  async function ask(request: Parameters<typeof propose$.mutateAsync>[0]) {
    try {
      setRequestedAnswer(await propose$.mutateAsync(request));
      setMessage(null);
    } catch (error) {
      setMessage(error instanceof Error ? error.message : 'Could not propose that.');
    }
  }
  const askedOnImport = useRef(false);
  useEffect(() => {
    if (!proposedOnImport || askedOnImport.current) return;
    askedOnImport.current = true;
    void ask({ smoothingWindow: IMPORT_SMOOTHING_WINDOW });
    // Asked once, when the page opens from an import.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [proposedOnImport]);

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
    const whole = (name: string, what: string) => {
      const n = typedNumber(String(form.get(name) ?? ''));
      if (!Number.isInteger(n) || n < 1) throw new Error(`${what} must be a whole number of 1 or more`);
      return n;
    };
    try {
      if (kind === 'smoothing') return void ask({ smoothingWindow: whole('window', 'The window') });
      const elevationM = fromDisplay('length', typedNumber(String(form.get('benchmark-elevation') ?? '')), units);
      if (!Number.isFinite(elevationM)) throw new Error('Give the known elevation');
      void ask({
        benchmarkPoint: whole('benchmark-point', 'The point'),
        benchmarkElevationM: Number(elevationM.toFixed(6)),
      });
    } catch (error) {
      setMessage(error instanceof Error ? error.message : 'Could not propose that.');
    }
  }

  const disabled = blocked || decide.isPending || propose$.isPending;
  const list = (items: RouteProposal[]) => (
    <ul>
      {items.slice(0, SHOWN).map((p) => (
        <ProposalItem
          key={`${p.kind}-${p.index}`}
          proposal={p}
          chainageM={chainage.get(p.index)}
          units={units}
          editable={editable}
          disabled={disabled}
          onDecide={(d) => send(d === 'accept' ? [p] : [], d === 'reject' ? [p] : [])}
          onShow={() => onShowPoint(p.index)}
        />
      ))}
    </ul>
  );

  return (
    <Panel
      title="Clean-up"
      aside={<span className="text-xs text-creek-600">The surveyed heights are always kept.</span>}
    >
      {blocked && editable && (
        <p className="mb-2 text-sm text-ochre-700">Save or discard your table edits before deciding on clean-ups.</p>
      )}
      {view.proposals.length === 0 ? (
        <p className="text-sm text-creek-700">
          The checks (spikes, outliers, duplicates, points out of order) found nothing to look at.
        </p>
      ) : (
        <>
          <h3 className="text-sm font-medium text-creek-900">Found by the checks ({view.proposals.length})</h3>
          {list(view.proposals)}
        </>
      )}
      {editable && (
        <div className="mt-4 flex flex-wrap gap-6 border-t border-creek-100 pt-3 text-sm">
          <form onSubmit={(e) => propose(e, 'smoothing')} className="flex items-end gap-2" aria-label="Smoothing">
            <label>
              Moving-median window (points)
              <input
                name="window"
                defaultValue={5}
                inputMode="numeric"
                className="mt-1 block w-24 rounded-md border border-creek-200 px-2 py-1"
              />
            </label>
            <Button type="submit" tone="quiet" disabled={disabled}>
              Propose smoothing
            </Button>
          </form>
          <form
            onSubmit={(e) => propose(e, 'benchmark')}
            className="flex items-end gap-2"
            aria-label="Benchmark offset"
          >
            <label>
              Point of known height
              <input
                name="benchmark-point"
                defaultValue={1}
                inputMode="numeric"
                className="mt-1 block w-20 rounded-md border border-creek-200 px-2 py-1"
              />
            </label>
            <label>
              Its known elevation ({u})
              <input
                name="benchmark-elevation"
                inputMode="decimal"
                className="mt-1 block w-28 rounded-md border border-creek-200 px-2 py-1"
              />
            </label>
            <Button type="submit" tone="quiet" disabled={disabled}>
              Propose offset
            </Button>
          </form>
        </div>
      )}
      {requested.proposals.length > 0 && (
        <div className="mt-3">
          {proposedOnImport && (
            <p className="mb-2 text-sm text-creek-700" data-testid="import-smoothing-note">
              Proposed on import: the heights come from a consumer GPS, so a moving median of {IMPORT_SMOOTHING_WINDOW}{' '}
              points is offered. Summits and lows that stand out of the survey&apos;s scatter keep their heights.
            </p>
          )}
          <div className="flex flex-wrap items-center gap-3">
            <h3 className="text-sm font-medium text-creek-900">Requested ({requested.proposals.length} changes)</h3>
            <Button className="px-2.5 py-1" disabled={disabled} onClick={() => send(requested.proposals, [])}>
              Accept all {requested.proposals.length}
            </Button>
            <Button tone="quiet" className="px-2.5 py-1" onClick={() => setRequested(() => [])}>
              Discard
            </Button>
          </div>
          {list(requested.proposals)}
        </div>
      )}
      <div className="mt-2">
        <FormMessage message={message} />
      </div>
    </Panel>
  );
}
