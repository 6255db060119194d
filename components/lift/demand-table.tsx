'use client';

import { Fragment, useState } from 'react';
import { Button } from '@/components/ui/button';
import { useConfirm } from '@/components/ui/confirm-dialog';
import type { DemandView } from '@/lib/lift/demand';
import { useDeleteDemandUse } from '@/lib/queries/lift';
import { formatQuantity, type UnitSystem } from '@/lib/units';
import { amountText, deliveryText, figureQuantity, PER_UNIT } from './demand-format';
import { DemandUseForm } from './demand-use-form';

/** Daily volume and peak flow per use and in total, with the published figure each one rests on. */
export function DemandTable({
  projectId,
  view,
  units,
  canEdit,
}: {
  projectId: string;
  view: DemandView;
  units: UnitSystem;
  canEdit: boolean;
}) {
  const [editing, setEditing] = useState<string | null>(null);
  const remove = useDeleteDemandUse(projectId);
  const confirm = useConfirm();
  const total = view.total.ok ? view.total.value : null;
  return (
    <div className="space-y-4">
      {confirm.dialog}
      {!view.total.ok && (
        <p role="alert" className="text-sm text-clay-700">
          {view.total.error}
        </p>
      )}
      <div className="overflow-x-auto">
        <table className="tabular w-full text-left text-sm">
          <caption className="sr-only">Daily demand per use</caption>
          <thead className="text-xs uppercase tracking-wide text-creek-600">
            <tr>
              <th className="py-1 pr-3">Use</th>
              <th className="pr-3">How many</th>
              <th className="pr-3">Figure</th>
              <th className="pr-3">Spread</th>
              <th className="pr-3 text-right">Daily volume</th>
              <th className="pr-3 text-right">Peak flow</th>
              {canEdit && <th />}
            </tr>
          </thead>
          <tbody>
            {view.uses.map((use, index) => {
              const result = total?.uses[index];
              const quantity = figureQuantity(use.kind);
              return (
                <Fragment key={use.id}>
                  <tr className="border-t border-creek-100 align-top">
                    <td className="py-1.5 pr-3 font-medium text-creek-900">{result?.label ?? use.label}</td>
                    <td className="pr-3">{amountText(use, units)}</td>
                    <td className="pr-3">
                      {result ? `${formatQuantity(quantity, result.unitFigure, units)} ${PER_UNIT[use.kind]}` : '—'}
                      <span className="block text-xs text-creek-600">
                        {use.ownFigure !== null
                          ? `own figure${use.published ? `; published ${formatQuantity(quantity, use.published.value, units)} (${use.published.source})` : ''}`
                          : use.published
                            ? `published: ${use.published.source}`
                            : ''}
                      </span>
                    </td>
                    <td className="pr-3">{deliveryText(use)}</td>
                    <td className="whitespace-nowrap pr-3 text-right">
                      {result ? formatQuantity('volume', result.dailyVolumeM3, units) : '—'}
                    </td>
                    <td className="whitespace-nowrap pr-3 text-right">
                      {result ? formatQuantity('flow', result.peakFlowM3s, units) : '—'}
                    </td>
                    {canEdit && (
                      <td className="whitespace-nowrap">
                        <Button
                          tone="quiet"
                          className="px-2 py-1 text-xs"
                          onClick={() => setEditing(editing === use.id ? null : use.id)}
                        >
                          Edit
                        </Button>{' '}
                        <Button
                          tone="quiet"
                          className="px-2 py-1 text-xs"
                          onClick={() =>
                            confirm.ask({
                              title: `Delete the use “${result?.label ?? use.label}”?`,
                              body: (
                                <p>
                                  Its draw leaves the daily demand and the storage sizing; tanks, outlets and the other
                                  uses stay. This cannot be undone.
                                </p>
                              ),
                              confirmLabel: 'Delete use',
                              onConfirm: () => remove.mutateAsync(use.id),
                            })
                          }
                          aria-label={`Delete ${result?.label ?? 'use'}`}
                        >
                          Delete
                        </Button>
                      </td>
                    )}
                  </tr>
                  {editing === use.id && (
                    <tr>
                      <td colSpan={7} className="pb-3">
                        <DemandUseForm projectId={projectId} units={units} use={use} onDone={() => setEditing(null)} />
                      </td>
                    </tr>
                  )}
                </Fragment>
              );
            })}
          </tbody>
          {total && (
            <tfoot>
              <tr className="border-t-2 border-creek-200 font-semibold text-creek-900">
                <td className="py-1.5 pr-3" colSpan={4}>
                  All uses
                  {total.peakMethod === 'sum-of-peaks'
                    ? ' (peaks added: some uses have only a peak factor)'
                    : ' (peak of the summed hourly profile)'}
                </td>
                <td className="whitespace-nowrap pr-3 text-right" data-testid="demand-total">
                  {formatQuantity('volume', total.dailyVolumeM3, units)}
                </td>
                <td className="whitespace-nowrap pr-3 text-right">
                  {formatQuantity('flow', total.peakFlowM3s, units)}
                </td>
                {canEdit && <td />}
              </tr>
            </tfoot>
          )}
        </table>
      </div>
      {view.uses.length === 0 && (
        <p className="text-sm text-creek-700">No uses yet: add the people, stock and garden the system serves.</p>
      )}
      {canEdit && (
        <details className="rounded-md border border-dashed border-creek-200 p-3">
          <summary className="cursor-pointer text-sm font-semibold text-creek-900">Add a use</summary>
          <div className="mt-3">
            <DemandUseForm projectId={projectId} units={units} use={null} />
          </div>
        </details>
      )}
    </div>
  );
}
