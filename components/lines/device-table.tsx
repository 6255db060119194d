'use client';

import { removeKeepingFocus } from '@/components/ui/focus-return';
import { useState } from 'react';
import type { LineDeviceKind } from '@/hydraulics/index';
import { DEVICE_STYLE } from '@/lib/chart/profile-palette';
import { addDevice, removeDevice } from '@/lib/lines/edit-design';
import { formatQuantity, fromDisplay, toDisplay, type DisplayUnits } from '@/lib/units';
import type { LineDesign } from '@/lib/validations/line-design';
import { DEVICE_KINDS } from '@/lib/validations/line-design';
import { Button } from '@/components/ui/button';
import { UnitNumberInput } from './unit-number-input';

type Change = (next: LineDesign, label: string) => string | null;

/** Devices by chainage: add by typing a chainage (or by clicking the profile), remove. */
export function DeviceTable({
  design,
  units,
  change,
  canEdit,
  tankLevels,
}: {
  design: LineDesign;
  units: DisplayUnits;
  change: Change;
  canEdit: boolean;
  /** Water level each tank works at (from the analysis), by chainage. */
  tankLevels: readonly { chainageM: number; waterLevelM: number }[];
}) {
  const [kind, setKind] = useState<LineDeviceKind>('air-release-valve');
  return (
    <div className="space-y-3">
      {canEdit && (
        <div className="flex flex-wrap items-end gap-3">
          <div>
            <label htmlFor="new-device-kind" className="block text-xs font-medium text-creek-900">
              Device
            </label>
            <select
              id="new-device-kind"
              value={kind}
              onChange={(e) => setKind(e.target.value as LineDeviceKind)}
              className="mt-1 block rounded-md border border-creek-200 bg-white px-2 py-1 text-sm"
            >
              {DEVICE_KINDS.map((k) => (
                <option key={k} value={k}>
                  {DEVICE_STYLE[k].label}
                </option>
              ))}
            </select>
          </div>
          <UnitNumberInput
            id="new-device-chainage"
            label="at chainage"
            unit={units.length}
            value={undefined}
            optional
            onCommit={(v) =>
              v === undefined
                ? null
                : change(
                    addDevice(design, { kind, chainageM: fromDisplay('length', v, units.system) }),
                    `add ${DEVICE_STYLE[kind].label.toLowerCase()}`,
                  )
            }
          />
          <p className="pb-1 text-xs text-creek-600">
            Type a chainage and press Enter, or use “Place on the profile” above the chart.
          </p>
        </div>
      )}
      {design.devices.length === 0 ? (
        <p className="text-sm text-creek-700">
          No devices yet. Place air-release valves, washouts and break-pressure tanks with “Place by clicking” on the
          profile, or take the one-click fixes the warnings offer.
        </p>
      ) : (
        <table className="w-full text-left text-xs" data-testid="device-table">
          <thead className="bg-creek-50 text-creek-800">
            <tr>
              <th scope="col" className="px-2 py-1.5">
                Chainage
              </th>
              <th scope="col" className="px-2 py-1.5">
                Device
              </th>
              <th scope="col" className="px-2 py-1.5">
                Tank water level
              </th>
              <th scope="col" className="px-2 py-1.5">
                Note
              </th>
              {canEdit && (
                <th scope="col">
                  <span className="sr-only">Remove</span>
                </th>
              )}
            </tr>
          </thead>
          <tbody>
            {design.devices.map((d, i) => {
              const tank = tankLevels.find((t) => Math.abs(t.chainageM - d.chainageM) < 1e-6);
              return (
                <tr key={`${d.kind}-${d.chainageM}-${i}`} className="border-t border-creek-50">
                  <td className="tabular px-2 py-1.5">{formatQuantity('chainage', d.chainageM, units.system)}</td>
                  <td className="px-2 py-1.5">{DEVICE_STYLE[d.kind].label}</td>
                  <td className="tabular px-2 py-1.5">
                    {d.kind !== 'break-pressure-tank' ? (
                      '—'
                    ) : canEdit ? (
                      <UnitNumberInput
                        id={`tank-level-${i}`}
                        label="Tank water level"
                        unit={units.length}
                        compact
                        optional
                        value={
                          d.waterLevelM === undefined ? undefined : toDisplay('length', d.waterLevelM, units.system)
                        }
                        onCommit={(v) =>
                          change(
                            {
                              ...design,
                              devices: design.devices.map((x, k) =>
                                k === i
                                  ? v === undefined
                                    ? { kind: x.kind, chainageM: x.chainageM, ...(x.label ? { label: x.label } : {}) }
                                    : { ...x, waterLevelM: fromDisplay('length', v, units.system) }
                                  : x,
                              ),
                            },
                            'change a tank level',
                          )
                        }
                      />
                    ) : tank ? (
                      formatQuantity('length', tank.waterLevelM, units.system)
                    ) : (
                      'ground level'
                    )}
                    {d.kind === 'break-pressure-tank' && d.waterLevelM === undefined && tank && (
                      <span className="ml-1 text-creek-600">
                        (ground: {formatQuantity('length', tank.waterLevelM, units.system)})
                      </span>
                    )}
                  </td>
                  <td className="px-2 py-1.5 text-creek-700">{d.label ?? ''}</td>
                  {canEdit && (
                    <td className="px-2 py-1.5">
                      <Button
                        tone="quiet"
                        className="px-2 py-0.5 text-xs"
                        onClick={(e) =>
                          removeKeepingFocus(e.currentTarget, () =>
                            change(removeDevice(design, i), `remove ${DEVICE_STYLE[d.kind].label.toLowerCase()}`),
                          )
                        }
                      >
                        Remove
                      </Button>
                    </td>
                  )}
                </tr>
              );
            })}
          </tbody>
        </table>
      )}
    </div>
  );
}
