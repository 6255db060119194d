'use client';

import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { useConfirm } from '@/components/ui/confirm-dialog';
import type { SourceYieldView } from '@/lib/lift/source-yield';
import { useDeleteSource, useDeleteYieldReading } from '@/lib/queries/lift';
import { formatQuantity, type UnitSystem } from '@/lib/units';
import { PlanChecks } from './plan-checks';
import { Readout } from './readout';
import { SourceForm, YieldReadingForm } from './source-forms';

const BASIS = {
  'lowest-recent-dry': 'lowest recent dry-season reading',
  'lowest-recent-any-season': 'lowest recent reading (no dry-season reading yet)',
  'chosen-reading': 'a reading chosen by the designer',
  entered: 'a figure entered by the designer',
} as const;

export interface SourceYieldProps {
  projectId: string;
  views: readonly SourceYieldView[];
  units: UnitSystem;
  canEdit: boolean;
  canLog: boolean;
}

/** Each source's dated readings, its design yield and the warning when the design draws more. */
export function SourceYield({ projectId, views, units, canEdit, canLog }: SourceYieldProps) {
  return (
    <div className="space-y-5">
      {views.length === 0 && (
        <p className="text-sm text-creek-700">
          No source yet. Add the creek or spring the ram draws on, then log its flow through the seasons.
        </p>
      )}
      {views.map((view) => (
        <SourceCard
          key={view.source.id}
          projectId={projectId}
          view={view}
          units={units}
          canEdit={canEdit}
          canLog={canLog}
        />
      ))}
      {canEdit && (
        <details className="rounded-md border border-dashed border-creek-200 p-3">
          <summary className="cursor-pointer text-sm font-semibold text-creek-900">Add a source</summary>
          <div className="mt-3">
            <SourceForm projectId={projectId} units={units} source={null} readings={[]} />
          </div>
        </details>
      )}
    </div>
  );
}

function SourceCard({
  projectId,
  view,
  units,
  canEdit,
  canLog,
}: {
  projectId: string;
  view: SourceYieldView;
  units: UnitSystem;
  canEdit: boolean;
  canLog: boolean;
}) {
  const [editing, setEditing] = useState(false);
  const removeSource = useDeleteSource(projectId);
  const removeReading = useDeleteYieldReading(projectId, view.source.id);
  const confirm = useConfirm();
  const { design } = view;
  return (
    <article className="space-y-3 rounded-md border border-creek-100 p-3" aria-label={view.source.name}>
      {confirm.dialog}
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h3 className="font-semibold text-creek-900">
          {view.source.name} <span className="text-sm font-normal text-creek-600">({view.source.kind})</span>
        </h3>
        {canEdit && !editing && (
          <div className="flex gap-2">
            <Button tone="quiet" onClick={() => setEditing(true)}>
              Edit source
            </Button>
            <Button
              tone="quiet"
              onClick={() =>
                confirm.ask({
                  title: `Delete the source “${view.source.name}”?`,
                  body: (
                    <>
                      <p>
                        The source goes with its {view.readings.length} yield{' '}
                        {view.readings.length === 1 ? 'reading' : 'readings'}. Ram sites and tanks it fed stay, with no
                        source named; its node in the network stays, no longer tied to a source record.
                      </p>
                      <p>This cannot be undone.</p>
                    </>
                  ),
                  confirmLabel: 'Delete source',
                  onConfirm: () => removeSource.mutateAsync(view.source.id),
                })
              }
            >
              Delete source
            </Button>
          </div>
        )}
      </div>
      {editing && (
        <SourceForm
          projectId={projectId}
          units={units}
          source={view.source}
          readings={view.readings}
          onDone={() => setEditing(false)}
        />
      )}
      <div className="grid gap-3 sm:grid-cols-3">
        <Readout
          emphasis
          label="Design yield"
          value={design.ok ? formatQuantity('flow', design.value.designYieldM3s, units) : '—'}
          detail={design.ok ? BASIS[design.value.basis] : design.error}
        />
        <Readout
          label="Design draw"
          value={formatQuantity('flow', view.drawM3s, units)}
          detail="ram drive flow plus other draw"
        />
        <Readout
          label="Lowest recent dry reading"
          value={
            design.ok && design.value.lowestRecentDryM3s !== null
              ? formatQuantity('flow', design.value.lowestRecentDryM3s, units)
              : '—'
          }
        />
      </div>
      <PlanChecks units={units} checks={[...(design.ok ? design.value.checks : []), ...view.drawChecks]} />
      {view.readings.length > 0 && (
        <table className="tabular w-full text-left text-sm">
          <caption className="sr-only">Yield readings of {view.source.name}</caption>
          <thead className="text-xs uppercase tracking-wide text-creek-600">
            <tr>
              <th className="py-1">Date</th>
              <th>Season</th>
              <th>Measured</th>
              <th>Flow</th>
              <th>Note</th>
              {canLog && <th />}
            </tr>
          </thead>
          <tbody>
            {view.readings.map((reading) => (
              <tr
                key={reading.id}
                className={`border-t border-creek-100 ${design.ok && design.value.readingId === reading.id ? 'bg-creek-50 font-medium' : ''}`}
              >
                <td className="whitespace-nowrap py-1.5 pr-2">{reading.measuredOn}</td>
                <td>{reading.season}</td>
                <td>
                  {reading.flowM3s !== null
                    ? 'flow figure'
                    : `${formatQuantity('volume', reading.bucketVolumeM3 ?? 0, units)} in ${reading.bucketSeconds} s`}
                </td>
                <td>
                  {formatQuantity('flow', reading.flowM3sMeasured, units)}
                  {design.ok && design.value.readingId === reading.id ? ' (design)' : ''}
                </td>
                <td className="text-creek-700">{reading.note}</td>
                {canLog && (
                  <td>
                    <Button
                      tone="quiet"
                      className="px-2 py-1 text-xs"
                      onClick={() =>
                        confirm.ask({
                          title: `Delete the yield reading of ${reading.measuredOn}?`,
                          body: (
                            <p>
                              The reading goes from {view.source.name}; the design yield is worked out again from the
                              readings left. This cannot be undone.
                            </p>
                          ),
                          confirmLabel: 'Delete reading',
                          onConfirm: () => removeReading.mutateAsync(reading.id),
                        })
                      }
                      aria-label={`Delete the reading of ${reading.measuredOn}`}
                    >
                      Delete
                    </Button>
                  </td>
                )}
              </tr>
            ))}
          </tbody>
        </table>
      )}
      {canLog && <YieldReadingForm projectId={projectId} sourceId={view.source.id} units={units} />}
    </article>
  );
}
