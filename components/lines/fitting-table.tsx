'use client';

import { removeKeepingFocus } from '@/components/ui/focus-return';
import { useState } from 'react';
import { FITTING_LOSS_COEFFICIENTS, type FittingKind } from '@/hydraulics/index';
import { addFitting, removeFitting } from '@/lib/lines/edit-design';
import { formatQuantity, fromDisplay, type DisplayUnits } from '@/lib/units';
import type { LineDesign } from '@/lib/validations/line-design';
import { Button } from '@/components/ui/button';
import { UnitNumberInput } from './unit-number-input';

type Change = (next: LineDesign, label: string) => string | null;
const KINDS = Object.keys(FITTING_LOSS_COEFFICIENTS) as FittingKind[];

/** Local losses (valves, bends, tees) with their K from the published table. */
export function FittingTable({
  design,
  units,
  change,
  canEdit,
}: {
  design: LineDesign;
  units: DisplayUnits;
  change: Change;
  canEdit: boolean;
}) {
  const [kind, setKind] = useState<FittingKind>('gate-valve-open');
  const entry = FITTING_LOSS_COEFFICIENTS[kind];
  return (
    <div className="space-y-3">
      {canEdit && (
        <div className="flex flex-wrap items-end gap-3">
          <div>
            <label htmlFor="new-fitting-kind" className="block text-xs font-medium text-creek-900">
              Fitting
            </label>
            <select
              id="new-fitting-kind"
              value={kind}
              onChange={(e) => setKind(e.target.value as FittingKind)}
              className="mt-1 block max-w-72 rounded-md border border-creek-200 bg-white px-2 py-1 text-sm"
            >
              {KINDS.map((k) => (
                <option key={k} value={k}>
                  {FITTING_LOSS_COEFFICIENTS[k].description} (K {FITTING_LOSS_COEFFICIENTS[k].k})
                </option>
              ))}
            </select>
          </div>
          <UnitNumberInput
            id="new-fitting-chainage"
            label="at chainage"
            unit={units.length}
            value={undefined}
            optional
            onCommit={(v) =>
              v === undefined
                ? null
                : change(
                    addFitting(design, {
                      chainageM: fromDisplay('length', v, units.system),
                      k: entry.k,
                      label: entry.description,
                    }),
                    'add a fitting',
                  )
            }
          />
          <p className="max-w-md pb-1 text-xs text-creek-600">K from {entry.source}. K varies with make and size.</p>
        </div>
      )}
      {design.fittings.length === 0 ? (
        <p className="text-sm text-creek-700">No fittings.</p>
      ) : (
        <table className="w-full text-left text-xs">
          <thead className="bg-creek-50 text-creek-800">
            <tr>
              <th scope="col" className="px-2 py-1.5">
                Chainage
              </th>
              <th scope="col" className="px-2 py-1.5">
                Fitting
              </th>
              <th scope="col" className="px-2 py-1.5">
                K
              </th>
              {canEdit && (
                <th scope="col">
                  <span className="sr-only">Remove</span>
                </th>
              )}
            </tr>
          </thead>
          <tbody>
            {design.fittings.map((f, i) => (
              <tr key={`${f.chainageM}-${i}`} className="border-t border-creek-50">
                <td className="tabular px-2 py-1.5">{formatQuantity('chainage', f.chainageM, units.system)}</td>
                <td className="px-2 py-1.5">{f.label ?? '—'}</td>
                <td className="tabular px-2 py-1.5">{f.k}</td>
                {canEdit && (
                  <td className="px-2 py-1.5">
                    <Button
                      tone="quiet"
                      className="px-2 py-0.5 text-xs"
                      onClick={(e) =>
                        removeKeepingFocus(e.currentTarget, () => change(removeFitting(design, i), 'remove a fitting'))
                      }
                    >
                      Remove
                    </Button>
                  </td>
                )}
              </tr>
            ))}
          </tbody>
        </table>
      )}
    </div>
  );
}
