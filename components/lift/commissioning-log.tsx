'use client';

import { RAM_COMMISSIONING_CHECKLIST, RAM_TROUBLESHOOTING_NOTES } from '@/hydraulics/index';
import { Button } from '@/components/ui/button';
import { useConfirm } from '@/components/ui/confirm-dialog';
import { FormMessage } from '@/components/ui/form-message';
import type { RamSiteView } from '@/lib/lift/summary';
import { useDeleteCommissioningReading, useSaveRamSite } from '@/lib/queries/lift';
import { formatNumber, formatPercent, formatQuantity, type UnitSystem } from '@/lib/units';
import { CommissioningForm } from './commissioning-form';
import { PlanChecks } from './plan-checks';

const DRIVE_BASIS = {
  'measured-drive': 'measured',
  'measured-waste': 'waste + delivered',
  planned: 'planned, not measured',
} as const;

/** Dated readings at the ram with the measured efficiency beside the plan's, and the field notes. */
export function CommissioningLog({
  projectId,
  view,
  units,
  canEdit,
}: {
  projectId: string;
  view: RamSiteView;
  units: UnitSystem;
  canEdit: boolean;
}) {
  const remove = useDeleteCommissioningReading(projectId, view.site.id);
  const confirm = useConfirm();
  const saveSite = useSaveRamSite(projectId);
  const latest = view.commissioning[0];
  const latestEfficiency = latest?.result.ok ? latest.result.value.measuredEfficiency : null;

  function adoptEfficiency(efficiency: number) {
    const { id, ...input } = view.site;
    saveSite.mutate({ id, input: { ...input, measuredEfficiency: Math.min(1, Number(efficiency.toFixed(4))) } });
  }

  return (
    <div className="space-y-4">
      {confirm.dialog}
      {view.commissioning.length === 0 ? (
        <p className="text-sm text-creek-700">No readings yet. Log the first one once the ram runs by itself.</p>
      ) : (
        <div className="overflow-x-auto">
          <table className="tabular w-full text-left text-sm [&_td]:align-top">
            <caption className="sr-only">Commissioning readings of {view.site.name}</caption>
            <thead className="text-xs uppercase tracking-wide text-creek-600">
              <tr>
                <th className="py-1 pr-3">Date</th>
                <th className="pr-3">Beats/min</th>
                <th className="pr-3">Delivered</th>
                <th className="pr-3">Drive</th>
                <th className="pr-3">Heads (supply / delivery)</th>
                <th className="pr-3">Measured efficiency</th>
                <th className="pr-3">Against plan</th>
                <th className="pr-3">Notes</th>
                {canEdit && <th />}
              </tr>
            </thead>
            <tbody>
              {view.commissioning.map(({ reading, result }) => (
                <tr key={reading.id} className="border-t border-creek-100 align-top">
                  <td className="whitespace-nowrap py-1.5 pr-3">{reading.measuredOn}</td>
                  <td className="pr-3">{formatNumber(reading.beatsPerMinute, 0)}</td>
                  {result.ok ? (
                    <>
                      <td className="whitespace-nowrap pr-3">
                        {formatQuantity('flow', result.value.deliveredFlowM3s, units)}
                      </td>
                      <td className="pr-3">
                        <span className="whitespace-nowrap">
                          {formatQuantity('flow', result.value.driveFlowM3s, units)}
                        </span>{' '}
                        <span className="text-xs text-creek-600">({DRIVE_BASIS[result.value.driveBasis]})</span>
                      </td>
                      <td className="pr-3">
                        {formatQuantity('head', reading.supplyHeadM, units)} /{' '}
                        {formatQuantity('head', result.value.deliveryHeadM, units)}
                      </td>
                      <td className="pr-3 font-semibold" data-testid="measured-efficiency">
                        {formatPercent(result.value.measuredEfficiency)}
                      </td>
                      <td className="pr-3">
                        {result.value.plannedEfficiency === null
                          ? '—'
                          : `planned ${formatPercent(result.value.plannedEfficiency)} (${formatPercent(result.value.efficiencyRatioToPlan ?? 0)} of it)`}
                      </td>
                    </>
                  ) : (
                    <td colSpan={5} className="pr-3 text-clay-700">
                      {result.error}
                    </td>
                  )}
                  <td className="pr-3 text-creek-700">{reading.notes}</td>
                  {canEdit && (
                    <td>
                      <Button
                        tone="quiet"
                        className="px-2 py-1 text-xs"
                        onClick={() =>
                          confirm.ask({
                            title: `Delete the commissioning reading of ${reading.measuredOn}?`,
                            body: (
                              <p>
                                The reading goes from the log of {view.site.name}; the site and its other readings stay.
                                This cannot be undone.
                              </p>
                            ),
                            confirmLabel: 'Delete reading',
                            onConfirm: () => remove.mutateAsync(reading.id),
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
        </div>
      )}
      {latest?.result.ok && <PlanChecks units={units} checks={latest.result.value.checks} />}
      {canEdit && latestEfficiency !== null && latestEfficiency <= 1 && (
        <div className="flex flex-wrap items-center gap-3">
          <Button tone="quiet" onClick={() => adoptEfficiency(latestEfficiency)} disabled={saveSite.isPending}>
            Plan with the measured {formatPercent(latestEfficiency)}
          </Button>
          <FormMessage message={saveSite.error?.message} />
        </div>
      )}
      {canEdit && (
        <div className="space-y-2 rounded-md border border-dashed border-creek-200 p-3">
          <h4 className="text-sm font-semibold text-creek-900">Log a reading</h4>
          <CommissioningForm projectId={projectId} siteId={view.site.id} units={units} />
        </div>
      )}
      <FieldNotes />
    </div>
  );
}

function FieldNotes() {
  return (
    <div className="grid items-start gap-4 text-sm md:grid-cols-2">
      <details className="rounded-md border border-creek-100 p-3" open>
        <summary className="cursor-pointer font-semibold text-creek-900">Commissioning checklist</summary>
        <ol className="mt-2 list-decimal space-y-1 pl-5 text-creek-800">
          {RAM_COMMISSIONING_CHECKLIST.map((note) => (
            <li key={note.id}>
              {note.text} <span className="text-xs text-creek-600">({note.source})</span>
            </li>
          ))}
        </ol>
      </details>
      <details className="rounded-md border border-creek-100 p-3">
        <summary className="cursor-pointer font-semibold text-creek-900">When the ram stops or delivers less</summary>
        <ul className="mt-2 list-disc space-y-1 pl-5 text-creek-800">
          {RAM_TROUBLESHOOTING_NOTES.map((note) => (
            <li key={note.id}>
              {note.text} <span className="text-xs text-creek-600">({note.source})</span>
            </li>
          ))}
        </ul>
      </details>
    </div>
  );
}
