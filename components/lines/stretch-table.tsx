'use client';

import { useState } from 'react';
import type { StretchResult } from '@/hydraulics/index';
import { DesignEditError, mergeWithNext, moveJoint, setStretchPipe, splitStretch } from '@/lib/lines/edit-design';
import { formatHeadPressure, formatQuantity, fromDisplay, toDisplay, type DisplayUnits } from '@/lib/units';
import type { LineDesign } from '@/lib/validations/line-design';
import { Button } from '@/components/ui/button';
import { CustomPipeForm } from './custom-pipe-form';
import { PipePicker } from './pipe-picker';
import { UnitNumberInput } from './unit-number-input';
import { ScrollFrame } from '@/components/ui/table-frame';

type Change = (next: LineDesign, label: string) => string | null;

function attempt(edit: () => LineDesign, change: Change, label: string): string | null {
  try {
    return change(edit(), label);
  } catch (error) {
    if (error instanceof DesignEditError) return error.message;
    throw error;
  }
}

/** The pipe stretches: split at a chainage, move a joint, pick the pipe, join with the next. */
export function StretchTable({
  design,
  results,
  units,
  change,
  canEdit,
  temperatureC,
}: {
  design: LineDesign;
  results: readonly StretchResult[];
  units: DisplayUnits;
  change: Change;
  canEdit: boolean;
  temperatureC: number;
}) {
  const [message, setMessage] = useState<string | null>(null);
  const L = (m: number) => toDisplay('length', m, units.system);
  const toM = (v: number) => fromDisplay('length', v, units.system);
  return (
    <div className="space-y-3">
      {canEdit && (
        <div className="flex flex-wrap items-end gap-3">
          <UnitNumberInput
            id="split-at"
            label="Split a stretch at chainage"
            unit={units.length}
            value={undefined}
            optional
            onCommit={(v) =>
              v === undefined
                ? null
                : attempt(
                    () => splitStretch(design, toM(v)),
                    change,
                    `split at ch. ${formatQuantity('chainage', toM(v), units.system)}`,
                  )
            }
          />
          <p className="pb-1 text-xs text-creek-600">
            Type a chainage and press Enter; each half keeps the pipe, then pick a new one.
          </p>
        </div>
      )}
      {message && (
        <p role="alert" className="text-xs font-medium text-clay-600">
          {message}
        </p>
      )}
      <ScrollFrame label="Stretches of the line" dense>
        <table className="w-full text-left text-xs">
          <thead className="bg-creek-50 text-creek-800">
            <tr>
              <th scope="col" className="px-2 py-1.5">
                No.
              </th>
              <th scope="col" className="px-2 py-1.5">
                From
              </th>
              <th scope="col" className="px-2 py-1.5">
                To
              </th>
              <th scope="col" className="px-2 py-1.5">
                Pipe (material, class, size)
              </th>
              <th scope="col" className="px-2 py-1.5">
                Velocity
              </th>
              <th scope="col" className="px-2 py-1.5">
                Highest static / allowed
              </th>
              {canEdit && (
                <th scope="col" className="px-2 py-1.5">
                  <span className="sr-only">Actions</span>
                </th>
              )}
            </tr>
          </thead>
          <tbody>
            {design.stretches.map((s, i) => {
              const r = results[i];
              const over = r && r.maxStaticPressureHeadM > r.allowableHeadM;
              const pipeId = typeof s.pipe === 'string' ? s.pipe : s.pipe.id;
              return (
                <tr key={`${s.fromM}-${i}`} className="border-t border-creek-50 align-top" data-testid="stretch-row">
                  <td className="px-2 py-1.5">{i + 1}</td>
                  <td className="tabular px-2 py-1.5">{formatQuantity('chainage', s.fromM, units.system)}</td>
                  <td className="tabular px-2 py-1.5">
                    {canEdit && i < design.stretches.length - 1 ? (
                      <UnitNumberInput
                        id={`joint-${i}`}
                        label={`End of stretch ${i + 1}`}
                        unit={units.length}
                        compact
                        value={L(s.toM)}
                        digits={1}
                        onCommit={(v) =>
                          attempt(() => moveJoint(design, i, toM(v!)), change, `move the joint after stretch ${i + 1}`)
                        }
                      />
                    ) : (
                      formatQuantity('chainage', s.toM, units.system)
                    )}
                  </td>
                  <td className="px-2 py-1.5">
                    <PipePicker
                      id={`stretch-${i}`}
                      pipeId={pipeId}
                      custom={design.pipes}
                      disabled={!canEdit}
                      onPick={(id) =>
                        setMessage(
                          attempt(() => setStretchPipe(design, i, id), change, `change the pipe of stretch ${i + 1}`),
                        )
                      }
                    />
                  </td>
                  <td className="tabular px-2 py-1.5">
                    {r ? formatQuantity('velocity', r.velocityMs, units.system) : '—'}
                  </td>
                  <td className={`tabular px-2 py-1.5 ${over ? 'font-semibold text-clay-700' : ''}`}>
                    {r
                      ? `${formatHeadPressure(r.maxStaticPressureHeadM, units.system, temperatureC)} / ${formatQuantity('head', r.allowableHeadM, units.system)}`
                      : '—'}
                  </td>
                  {canEdit && (
                    <td className="px-2 py-1.5">
                      {i < design.stretches.length - 1 && (
                        <Button
                          tone="quiet"
                          className="px-2 py-1 text-xs"
                          onClick={() =>
                            setMessage(
                              attempt(() => mergeWithNext(design, i), change, `join stretches ${i + 1} and ${i + 2}`),
                            )
                          }
                        >
                          Join with next
                        </Button>
                      )}
                    </td>
                  )}
                </tr>
              );
            })}
          </tbody>
        </table>
      </ScrollFrame>
      {canEdit && <CustomPipeForm design={design} units={units} change={change} />}
    </div>
  );
}
