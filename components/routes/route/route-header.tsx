'use client';

import { useState, type FormEvent } from 'react';
import { Button } from '@/components/ui/button';
import { FormMessage } from '@/components/ui/form-message';
import { formatNumber, formatQuantity } from '@/lib/units';
import { routeSourceUrl, useUpdateRoute } from '@/lib/queries/routes';
import type { RouteView } from '@/lib/routes/types';
import type { UnitSystem } from '@/lib/units';
import { FORMAT_LABELS } from '../format-labels';

const kb = (bytes: number) =>
  bytes < 1024 * 1024 ? `${formatNumber(bytes / 1024, 0)} kB` : `${formatNumber(bytes / (1024 * 1024), 1)} MB`;

/** Name, the route's numbers, and the original file to download again. */
export function RouteHeader({ view, units, editable }: { view: RouteView; units: UnitSystem; editable: boolean }) {
  const r = view.route;
  const rename = useUpdateRoute(r.projectId, r.id);
  const [editing, setEditing] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const heights = view.heightRangeM;

  async function onRename(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    try {
      await rename.mutateAsync({ name: String(new FormData(e.currentTarget).get('route-name') ?? '') });
      setEditing(false);
      setError(null);
    } catch (err) {
      setError(err instanceof Error ? err.message : 'Not renamed.');
    }
  }

  return (
    <div className="space-y-3">
      <div className="flex flex-wrap items-center gap-3">
        {editing ? (
          <form onSubmit={onRename} className="flex items-center gap-2">
            <input
              name="route-name"
              aria-label="Route name"
              defaultValue={r.name}
              className="rounded-md border border-creek-200 px-2 py-1 text-lg"
            />
            <Button type="submit" disabled={rename.isPending}>
              Save name
            </Button>
            <Button tone="quiet" onClick={() => setEditing(false)}>
              Cancel
            </Button>
          </form>
        ) : (
          <>
            <h1 className="text-2xl font-semibold text-creek-900">{r.name}</h1>
            {editable && (
              <button type="button" onClick={() => setEditing(true)} className="text-sm text-creek-600 underline">
                Rename
              </button>
            )}
          </>
        )}
      </div>
      <FormMessage message={error} />
      <dl className="grid gap-3 text-sm sm:grid-cols-5">
        <div>
          <dt className="text-creek-600">Points</dt>
          <dd className="tabular font-medium">{formatNumber(r.pointCount, 0)}</dd>
        </div>
        <div>
          <dt className="text-creek-600">Length</dt>
          <dd className="tabular font-medium">{formatQuantity('length', r.lengthM, units)}</dd>
        </div>
        <div>
          <dt className="text-creek-600">Along the ground</dt>
          <dd className="tabular font-medium">{formatQuantity('length', r.slopeLengthM, units)}</dd>
        </div>
        <div>
          <dt className="text-creek-600">Heights</dt>
          <dd className="tabular font-medium">
            {heights
              ? `${formatQuantity('elevation', heights.lowM, units)} – ${formatQuantity('elevation', heights.highM, units)}`
              : '—'}
          </dd>
        </div>
        <div>
          <dt className="text-creek-600">From</dt>
          <dd className="font-medium">
            {r.sourceFormat ? FORMAT_LABELS[r.sourceFormat] : '—'}
            {r.sourceFile && (
              <a
                href={routeSourceUrl(r.id)}
                download={r.sourceFile.fileName}
                className="block text-xs font-normal text-creek-600 underline"
              >
                Download original ({r.sourceFile.fileName}, {kb(r.sourceFile.sizeBytes)})
              </a>
            )}
          </dd>
        </div>
      </dl>
      {r.closureErrorM !== null && (
        <p className="text-sm text-creek-700">
          The level run closes {formatNumber(Math.abs(r.closureErrorM * 1000), 0)} mm{' '}
          {r.closureErrorM >= 0 ? 'above' : 'below'} the known closing level.
        </p>
      )}
    </div>
  );
}
