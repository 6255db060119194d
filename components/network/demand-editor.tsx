'use client';

import { FormMessage } from '@/components/ui/form-message';
import { TableFrame, HeadCell } from '@/components/ui/table-frame';
import type { NetworkView } from '@/lib/network/view';
import { useSaveNetworkNode, useTieDemandUse } from '@/lib/queries/network';
import { formatQuantity, fromDisplay, toDisplay, unitOf, type UnitSystem } from '@/lib/units';

/**
 * Demand per outlet: which demand uses each outlet serves (the uses themselves are kept on the
 * Lift & storage page) and whether the outlet draws from its uses or a fixed peak flow.
 */
export function DemandEditor({
  projectId,
  view,
  units,
  canEdit,
}: {
  projectId: string;
  view: NetworkView;
  units: UnitSystem;
  canEdit: boolean;
}) {
  const tie = useTieDemandUse(projectId);
  const save = useSaveNetworkNode(projectId);
  const outlets = view.records.nodes.filter((n) => n.kind === 'outlet');
  if (outlets.length === 0)
    return (
      <p className="text-sm text-creek-700">
        No outlets yet. A line that ends at an outlet brings one; or add an outlet part to the network, then tie the
        uses of the Lift &amp; storage page to it here.
      </p>
    );

  return (
    <div className="space-y-4">
      <TableFrame
        head={
          <>
            <HeadCell>Outlet</HeadCell>
            <HeadCell>Draws from</HeadCell>
            <HeadCell>{`Fixed peak draw (${unitOf('designFlow', units)})`}</HeadCell>
            <HeadCell>Uses served</HeadCell>
          </>
        }
      >
        {outlets.map((outlet) => {
          const served = view.demandUses.filter((u) => u.outletNodeId === outlet.id);
          const from = outlet.data.demandFrom ?? (served.length ? 'uses' : 'fixed');
          const update = (data: Partial<typeof outlet.data>) => {
            const { id, ...input } = outlet;
            save.mutate({ id, input: { ...input, data: { ...outlet.data, ...data } } });
          };
          return (
            <tr key={outlet.id} className="border-t border-creek-50 align-top">
              <td className="px-4 py-2 font-medium">
                {outlet.name}
                {outlet.notes && <p className="mt-1 max-w-xs text-xs font-normal text-ochre-700">{outlet.notes}</p>}
              </td>
              <td className="px-4 py-2">
                <select
                  aria-label={`Demand of ${outlet.name}`}
                  disabled={!canEdit}
                  value={from}
                  className="rounded-md border border-creek-200 px-2 py-1 text-sm"
                  onChange={(e) => update({ demandFrom: e.target.value as 'uses' | 'fixed' | 'line' })}
                >
                  <option value="uses">Its demand uses</option>
                  <option value="fixed">A fixed peak flow</option>
                  <option value="line">The flow of the line ending here</option>
                </select>
              </td>
              <td className="px-4 py-2">
                <input
                  aria-label={`Fixed peak draw of ${outlet.name}`}
                  disabled={!canEdit || from !== 'fixed'}
                  inputMode="decimal"
                  className="w-28 rounded-md border border-creek-200 px-2 py-1 text-sm"
                  defaultValue={
                    outlet.data.fixedDemandM3s == null
                      ? ''
                      : String(Math.round(toDisplay('designFlow', outlet.data.fixedDemandM3s, units) * 1000) / 1000)
                  }
                  onBlur={(e) => {
                    const value = Number(e.target.value);
                    if (e.target.value.trim() !== '' && Number.isFinite(value) && value >= 0)
                      update({ fixedDemandM3s: fromDisplay('designFlow', value, units) });
                  }}
                />
              </td>
              <td className="px-4 py-2 text-xs">
                {served.length === 0
                  ? '—'
                  : served.map((u) => (
                      <div key={u.id}>
                        {u.label}
                        {u.peakM3s !== null ? ` · peak ${formatQuantity('designFlow', u.peakM3s, units)}` : ''}
                      </div>
                    ))}
              </td>
            </tr>
          );
        })}
      </TableFrame>
      {view.demandUses.length > 0 && (
        <div>
          <h3 className="text-sm font-semibold text-creek-900">Tie each demand use to its outlet</h3>
          <ul className="mt-2 grid gap-2 sm:grid-cols-2">
            {view.demandUses.map((use) => (
              <li key={use.id} className="flex items-center justify-between gap-2 text-sm">
                <span>
                  {use.label}
                  {use.dailyM3 !== null ? ` (${formatQuantity('volume', use.dailyM3, units)} a day)` : ''}
                </span>
                <select
                  aria-label={`Outlet of ${use.label}`}
                  disabled={!canEdit}
                  value={use.outletNodeId ?? ''}
                  className="rounded-md border border-creek-200 px-2 py-1 text-sm"
                  onChange={(e) => tie.mutate({ useId: use.id, outletNodeId: e.target.value || null })}
                >
                  <option value="">Not tied</option>
                  {outlets.map((o) => (
                    <option key={o.id} value={o.id}>
                      {o.name}
                    </option>
                  ))}
                </select>
              </li>
            ))}
          </ul>
        </div>
      )}
      <FormMessage message={(tie.error ?? save.error)?.message} />
    </div>
  );
}
