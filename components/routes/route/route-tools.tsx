'use client';

import { useQuery } from '@tanstack/react-query';
import { useRouter } from 'next/navigation';
import { useState, type FormEvent } from 'react';
import { Button } from '@/components/ui/button';
import { useConfirm } from '@/components/ui/confirm-dialog';
import { projectLinesQuery } from '@/lib/queries/lines';
import { FormMessage } from '@/components/ui/form-message';
import { Panel } from '@/components/ui/panel';
import { formatQuantity, fromDisplay, toDisplay, unitOf } from '@/lib/units';
import {
  projectRoutesQuery,
  useDeleteRoute,
  useJoinRoutes,
  useReverseRoute,
  useSplitRoute,
  useTrimRoute,
} from '@/lib/queries/routes';
import type { RouteView } from '@/lib/routes/types';
import type { UnitSystem } from '@/lib/units';
import { typedNumber } from '@/lib/units/decimal-mark-store';

export interface RouteToolsProps {
  view: RouteView;
  units: UnitSystem;
  blocked: boolean;
}

const field = 'mt-1 block w-28 rounded-md border border-creek-200 px-2 py-1';
const num = (form: FormData, name: string) => typedNumber(String(form.get(name) ?? ''));

/** Reverse, split, trim, join and delete: each one transaction on the server. */
export function RouteTools({ view, units, blocked }: RouteToolsProps) {
  const router = useRouter();
  const { id, projectId } = view.route;
  const routes = useQuery(projectRoutesQuery(projectId)).data ?? [];
  const reverse = useReverseRoute(projectId, id);
  const split = useSplitRoute(projectId, id);
  const trim = useTrimRoute(projectId, id);
  const join = useJoinRoutes(projectId, id);
  const remove = useDeleteRoute(projectId, id);
  const confirm = useConfirm();
  const [message, setMessage] = useState<{ text: string; tone: 'ok' | 'error' } | null>(null);
  const u = unitOf('length', units);
  const lengthShown = toDisplay('length', view.route.lengthM, units);
  const busy = blocked || reverse.isPending || split.isPending || trim.isPending || join.isPending || remove.isPending;

  async function run(work: () => Promise<unknown>, done: string) {
    setMessage(null);
    try {
      await work();
      setMessage({ text: done, tone: 'ok' });
    } catch (error) {
      setMessage({ text: error instanceof Error ? error.message : 'Not done.', tone: 'error' });
    }
  }

  const onSplit = (e: FormEvent<HTMLFormElement>) => {
    e.preventDefault();
    const c = num(new FormData(e.currentTarget), 'split-at');
    return run(async () => {
      const r = await split.mutateAsync({ chainageM: fromDisplay('length', c, units) });
      router.push(`/projects/${projectId}/routes/${r.second.id}`);
    }, 'Split. The second part is a new route.');
  };
  const onTrim = (e: FormEvent<HTMLFormElement>) => {
    e.preventDefault();
    const form = new FormData(e.currentTarget);
    return run(
      () =>
        trim.mutateAsync({
          fromChainageM: fromDisplay('length', num(form, 'trim-from'), units),
          toChainageM: fromDisplay('length', num(form, 'trim-to'), units),
        }),
      'Trimmed.',
    );
  };
  const onJoin = (e: FormEvent<HTMLFormElement>) => {
    e.preventDefault();
    const form = new FormData(e.currentTarget);
    const gap = String(form.get('join-gap') ?? '').trim();
    return run(async () => {
      const r = await join.mutateAsync({
        otherRouteId: String(form.get('join-other')),
        ...(gap ? { gapM: fromDisplay('length', Number(gap), units) } : {}),
      });
      router.push(`/projects/${projectId}/routes/${r.id}`);
    }, 'Joined into a new route.');
  };

  return (
    <Panel title="Route tools">
      {blocked && <p className="mb-2 text-sm text-ochre-700">Save or discard your table edits first.</p>}
      <div className="grid gap-4 text-sm md:grid-cols-2">
        <div className="space-y-1">
          <Button
            tone="quiet"
            disabled={busy || view.route.pointCount < 2}
            onClick={() => run(() => reverse.mutateAsync(), 'Reversed: the route now runs the other way.')}
          >
            Reverse the route
          </Button>
          <p className="text-xs text-creek-600">For a walk recorded from the tank up to the spring.</p>
        </div>
        <form onSubmit={onSplit} className="flex flex-wrap items-end gap-2" aria-label="Split">
          <label>
            Split at chainage ({u})
            <input name="split-at" inputMode="decimal" className={field} placeholder={(lengthShown / 2).toFixed(0)} />
          </label>
          <Button type="submit" tone="quiet" disabled={busy || view.route.pointCount < 2}>
            Split
          </Button>
        </form>
        <form onSubmit={onTrim} className="flex flex-wrap items-end gap-2" aria-label="Trim">
          <label>
            Keep from ({u})<input name="trim-from" inputMode="decimal" defaultValue="0" className={field} />
          </label>
          <label>
            to ({u})<input name="trim-to" inputMode="decimal" defaultValue={lengthShown.toFixed(1)} className={field} />
          </label>
          <Button type="submit" tone="quiet" disabled={busy || view.route.pointCount < 2}>
            Trim
          </Button>
        </form>
        <form onSubmit={onJoin} className="flex flex-wrap items-end gap-2" aria-label="Join">
          <label>
            Join onto the end
            <select name="join-other" className="mt-1 block w-48 rounded-md border border-creek-200 px-2 py-1">
              {routes
                .filter((r) => r.id !== id && r.pointCount >= 2)
                .map((r) => (
                  <option key={r.id} value={r.id}>
                    {r.name} ({formatQuantity('length', r.lengthM, units, 0)})
                  </option>
                ))}
            </select>
          </label>
          <label>
            Gap ({u}, optional)
            <input name="join-gap" inputMode="decimal" className={field} placeholder="measured" />
          </label>
          <Button type="submit" tone="quiet" disabled={busy || routes.length < 2 || view.route.pointCount < 2}>
            Join
          </Button>
        </form>
      </div>
      <div className="mt-4 flex flex-wrap items-center gap-3 border-t border-creek-100 pt-3">
        <Button
          tone="danger"
          disabled={busy}
          onClick={() =>
            confirm.ask({
              title: `Delete the route “${view.route.name}”?`,
              body: (
                <>
                  <p>
                    The route goes with its {view.route.pointCount} {view.route.pointCount === 1 ? 'point' : 'points'}{' '}
                    and their clean-up. Photos placed along it stay in the project, no longer placed on a route.
                  </p>
                  <LinesOnRoute projectId={projectId} routeId={id} />
                  <p>
                    A ram site whose delivery pipe follows this route loses that length; type it on the Lift &amp;
                    storage page. This cannot be undone.
                  </p>
                </>
              ),
              confirmLabel: 'Delete route',
              onConfirm: async () => {
                await remove.mutateAsync(undefined);
                router.push(`/projects/${projectId}/routes`);
              },
            })
          }
        >
          Delete route
        </Button>
        {confirm.dialog}
        <FormMessage message={message?.text} tone={message?.tone} />
      </div>
    </Panel>
  );
}

/** The lines that follow the route, read when the dialog opens, and what becomes of them. */
function LinesOnRoute({ projectId, routeId }: { projectId: string; routeId: string }) {
  const query = useQuery(projectLinesQuery(projectId));
  if (query.isError)
    return (
      <p className="font-medium text-clay-700">
        Which lines follow this route could not be read; lines on it would stay without a route.
      </p>
    );
  if (!query.data) return <p>Looking for lines that follow this route…</p>;
  const lines = query.data.filter((line) => line.routeId === routeId);
  if (lines.length === 0) return <p data-testid="route-deletion-lines">No line follows this route.</p>;
  const one = lines.length === 1;
  return (
    <div data-testid="route-deletion-lines">
      <p className="font-medium text-clay-700">
        {one ? 'One line follows' : `${lines.length} lines follow`} this route:
      </p>
      <ul className="list-disc pl-5">
        {lines.map((line) => (
          <li key={line.id}>{line.name}</li>
        ))}
      </ul>
      <p>
        {one ? 'It stays' : 'They stay'} in the project with {one ? 'its design' : 'their designs'}, but without a route{' '}
        {one ? 'it' : 'they'} cannot be drawn, analysed, reported or duplicated. Keep the route if you still need{' '}
        {one ? 'that line' : 'those lines'}.
      </p>
    </div>
  );
}
