'use client';

import type { LineEnd } from '@/hydraulics/index';
import type { PumpOutletHead } from '@/lib/lift/pump-outlet';
import { lineStartFromRam } from '@/lib/lines/ram-start';
import type { LineDesign } from '@/lib/validations/line-design';
import { useState } from 'react';
import { UnitNumberInput } from './unit-number-input';
import { useReportUnsaved } from './unsaved-values';
import {
  type DisplayUnits,
  formatPlainNumber,
  formatQuantity,
  fromDisplay,
  toDisplay,
  unitDefaults,
} from '@/lib/units';

type Change = (next: LineDesign, label: string) => string | null;

const SELECT = 'mt-1 block w-full rounded-md border border-creek-200 bg-white px-2 py-1 text-sm disabled:bg-creek-50';

/** Start, end and flow of the line, in the project's units. */
export function EndsForm({
  design,
  units,
  change,
  canEdit,
  firstGroundM,
  lastGroundM,
  ramOutlets,
  networkStart,
}: {
  design: LineDesign;
  units: DisplayUnits;
  change: Change;
  canEdit: boolean;
  firstGroundM: number;
  lastGroundM: number;
  /** Planned ram sites of the project that can feed this line. */
  ramOutlets: readonly PumpOutletHead[];
  /** Where the network says the line starts, when it does (it then sets the start the analysis uses). */
  networkStart?: string | null;
}) {
  const L = (m: number) => toDisplay('length', m, units.system);
  const toM = (v: number) => fromDisplay('length', v, units.system);
  // Leaving the ram: the ram's flow becomes an ordinary design flow the designer can change.
  const flowAwayFromRam = (): LineDesign['flow'] => {
    if (design.flow.kind !== 'pump-delivery') return design.flow;
    const fed =
      design.start.kind === 'ram-site'
        ? ramOutlets.find((o) => o.ramSiteId === (design.start as { ramSiteId: string }).ramSiteId)
        : undefined;
    // A ram that is gone gives no figure: the line then finds its flow rather than take a made-up one.
    return fed ? { kind: 'design', flowM3s: fed.deliveredFlowM3s } : { kind: 'find' };
  };
  const setStart = (start: LineDesign['start'], label: string) =>
    change({ ...design, start, flow: start.kind === 'ram-site' ? design.flow : flowAwayFromRam() }, label);
  const startAtRam = (ramSiteId: string, label: string) =>
    change({ ...design, start: { kind: 'ram-site', ramSiteId }, flow: { kind: 'pump-delivery' } }, label);
  const setEnd = (end: LineEnd, label: string) => change({ ...design, end }, label);
  const setFlow = (flow: LineDesign['flow'], label: string) => change({ ...design, flow }, label);
  const { start, end, flow } = design;
  // "Design flow" picked but no flow typed yet: the line keeps its saved flow until one is typed,
  // so no made-up figure is ever saved.
  const [choosingDesignFlow, setChoosingDesignFlow] = useState(false);
  const typingDesignFlow = choosingDesignFlow && flow.kind !== 'design';
  useReportUnsaved('design-flow-choice', typingDesignFlow ? 'Design flow, still to be typed' : null);
  const pickFlow = (next: LineDesign['flow'], label: string) => {
    setChoosingDesignFlow(false);
    return next.kind === flow.kind ? null : setFlow(next, label);
  };
  const ram = start.kind === 'ram-site' ? ramOutlets.find((o) => o.ramSiteId === start.ramSiteId) : undefined;
  const ramStart = ram ? lineStartFromRam(ram, firstGroundM) : null;

  function pickStartKind(kind: string) {
    if (kind === 'ram-site')
      return ramOutlets[0]
        ? startAtRam(ramOutlets[0].ramSiteId, 'start at the ram pump outlet')
        : 'No ram site with a workable plan in this project';
    return setStart(
      kind === 'pump'
        ? { kind: 'pump', outletHeadM: firstGroundM + 30 }
        : { kind: 'water-level', levelM: firstGroundM },
      'change the start',
    );
  }

  return (
    <div className="grid gap-4 md:grid-cols-3">
      <fieldset className="space-y-2 rounded-md border border-creek-100 p-3">
        <legend className="px-1 text-sm font-semibold text-creek-900">Start</legend>
        {networkStart && (
          <p className="rounded bg-creek-50 px-2 py-1 text-xs text-creek-800" data-testid="start-from-network">
            The network sets this line&apos;s start: {networkStart}. The start below is used only if the line leaves the
            network.
          </p>
        )}
        <label className="block text-xs font-medium text-creek-900" htmlFor="start-kind">
          Fed from
        </label>
        <select
          id="start-kind"
          className={SELECT}
          disabled={!canEdit}
          value={start.kind}
          onChange={(e) => pickStartKind(e.target.value)}
        >
          <option value="water-level">Water surface (spring box, tank, break-pressure tank)</option>
          <option value="pump">Pump outlet (heads typed in)</option>
          <option value="ram-site" disabled={ramOutlets.length === 0}>
            Ram pump outlet{ramOutlets.length === 0 ? ' (no planned ram site in this project)' : ''}
          </option>
        </select>
        {start.kind === 'ram-site' ? (
          <>
            <label className="block text-xs font-medium text-creek-900" htmlFor="start-ram-site">
              Ram site
            </label>
            <select
              id="start-ram-site"
              className={SELECT}
              disabled={!canEdit}
              value={start.ramSiteId}
              onChange={(e) => startAtRam(e.target.value, 'change the ram site')}
            >
              {!ram && <option value={start.ramSiteId}>(ram site gone or not planned)</option>}
              {ramOutlets.map((o) => (
                <option key={o.ramSiteId} value={o.ramSiteId}>
                  {o.name}
                </option>
              ))}
            </select>
            {ramStart ? (
              <dl className="space-y-0.5 text-xs text-creek-800" data-testid="ram-start-figures">
                <div className="flex justify-between gap-2">
                  <dt>Pump elevation</dt>
                  <dd className="tabular">{formatQuantity('length', ramStart.pumpElevationM, units.system)}</dd>
                </div>
                <div className="flex justify-between gap-2">
                  <dt>Grade at the outlet, pumping</dt>
                  <dd className="tabular">{formatQuantity('length', ramStart.start.outletHeadM, units.system)}</dd>
                </div>
                <div className="flex justify-between gap-2">
                  <dt>Grade with the line shut</dt>
                  <dd className="tabular">
                    {formatQuantity('length', ramStart.start.shutoffHeadM ?? ramStart.start.outletHeadM, units.system)}
                  </dd>
                </div>
                <p className="text-creek-600">
                  {ramStart.pumpElevationFrom === 'ram-site'
                    ? "From the ram site's plan; a change there reaches this line at the next analysis."
                    : "The ram site gives no pump elevation, so the ground at the line's first station is used: set the pump elevation on the Lift & storage page."}
                </p>
              </dl>
            ) : (
              <p role="alert" className="text-xs text-clay-700">
                This ram site is gone or has no workable plan. Fix it on the Lift & storage page or pick another start.
              </p>
            )}
          </>
        ) : start.kind === 'water-level' ? (
          <UnitNumberInput
            id="start-level"
            label="Water level"
            unit={units.length}
            value={L(start.levelM)}
            disabled={!canEdit}
            onCommit={(v) => setStart({ kind: 'water-level', levelM: toM(v!) }, 'change the start water level')}
          />
        ) : (
          <>
            <UnitNumberInput
              id="start-outlet"
              label="Grade at the pump outlet, pumping"
              unit={units.length}
              value={L(start.outletHeadM)}
              disabled={!canEdit}
              onCommit={(v) => setStart({ ...start, outletHeadM: toM(v!) }, 'change the pump outlet head')}
            />
            <UnitNumberInput
              id="start-shutoff"
              label="Grade with the line shut"
              unit={units.length}
              optional
              value={start.shutoffHeadM === undefined ? undefined : L(start.shutoffHeadM)}
              disabled={!canEdit}
              hint="Empty: 1.25 × the pump's head above the pipe (common practice); enter the shut-off head from the pump curve"
              onCommit={(v) =>
                setStart(
                  {
                    kind: 'pump',
                    outletHeadM: start.outletHeadM,
                    ...(v === undefined ? {} : { shutoffHeadM: toM(v) }),
                  },
                  'change the pump shut-off head',
                )
              }
            />
          </>
        )}
      </fieldset>

      <fieldset className="space-y-2 rounded-md border border-creek-100 p-3">
        <legend className="px-1 text-sm font-semibold text-creek-900">End</legend>
        <label className="block text-xs font-medium text-creek-900" htmlFor="end-kind">
          Delivers into
        </label>
        <select
          id="end-kind"
          className={SELECT}
          disabled={!canEdit}
          value={end.kind}
          onChange={(e) => {
            const kind = e.target.value as LineEnd['kind'];
            const elevationM = end.kind === 'free-discharge' ? lastGroundM : end.elevationM;
            setEnd(
              kind === 'free-discharge'
                ? { kind }
                : kind === 'tank-inlet'
                  ? { kind, elevationM }
                  : { kind: 'outlet', elevationM },
              'change the end',
            );
          }}
        >
          <option value="outlet">Outlet (tap, trough, garden)</option>
          <option value="tank-inlet">Tank inlet above the water</option>
          <option value="free-discharge">Pipe runs out at the last station</option>
        </select>
        {end.kind !== 'free-discharge' && (
          <UnitNumberInput
            id="end-elevation"
            label={end.kind === 'outlet' ? 'Outlet elevation' : 'Inlet elevation'}
            unit={units.length}
            value={L(end.elevationM)}
            disabled={!canEdit}
            onCommit={(v) => setEnd({ ...end, elevationM: toM(v!) }, 'change the end elevation')}
          />
        )}
        {end.kind === 'outlet' && (
          <UnitNumberInput
            id="end-residual"
            label="Residual pressure wanted"
            unit={`${units.head} of head`}
            optional
            value={end.residualHeadM === undefined ? undefined : toDisplay('head', end.residualHeadM, units.system)}
            disabled={!canEdit}
            hint="Empty: the settings' minimum"
            onCommit={(v) =>
              setEnd(
                {
                  kind: 'outlet',
                  elevationM: end.elevationM,
                  ...(v === undefined ? {} : { residualHeadM: fromDisplay('head', v, units.system) }),
                },
                'change the residual wanted',
              )
            }
          />
        )}
      </fieldset>

      <fieldset className="space-y-2 rounded-md border border-creek-100 p-3">
        <legend className="px-1 text-sm font-semibold text-creek-900">Flow</legend>
        <div className="flex flex-col gap-1 text-sm">
          {start.kind === 'ram-site' && (
            <label className="flex items-center gap-2">
              <input
                type="radio"
                name="flow-kind"
                disabled={!canEdit}
                checked={flow.kind === 'pump-delivery' && !typingDesignFlow}
                onChange={() => pickFlow({ kind: 'pump-delivery' }, 'use what the ram delivers')}
              />{' '}
              What the ram delivers{ram ? ` (${formatQuantity('designFlow', ram.deliveredFlowM3s, units.system)})` : ''}
            </label>
          )}
          <label className="flex items-center gap-2">
            <input
              type="radio"
              name="flow-kind"
              disabled={!canEdit}
              checked={flow.kind === 'design' || typingDesignFlow}
              onChange={() => setChoosingDesignFlow(true)}
            />{' '}
            Design flow
          </label>
          <label className="flex items-center gap-2">
            <input
              type="radio"
              name="flow-kind"
              disabled={!canEdit}
              checked={flow.kind === 'find' && !typingDesignFlow}
              onChange={() => pickFlow({ kind: 'find' }, 'find the flow')}
            />{' '}
            Find the flow the line carries by gravity
          </label>
        </div>
        {(flow.kind === 'design' || typingDesignFlow) && (
          <UnitNumberInput
            id="design-flow"
            label="Design flow"
            unit={units.flow}
            digits={3}
            value={flow.kind === 'design' ? toDisplay('designFlow', flow.flowM3s, units.system) : undefined}
            disabled={!canEdit}
            placeholder={`e.g. ${formatPlainNumber(toDisplay('designFlow', unitDefaults(units.system).designFlowM3s, units.system), 0)}`}
            hint={
              typingDesignFlow
                ? `Type the flow the line must carry; until then the line keeps ${flow.kind === 'find' ? 'finding its flow by gravity' : 'what the ram delivers'}`
                : undefined
            }
            onCommit={(v) => {
              if (v! < 0) return 'The flow cannot be negative';
              const problem = setFlow(
                { kind: 'design', flowM3s: fromDisplay('designFlow', v!, units.system) },
                typingDesignFlow ? 'use a design flow' : 'change the design flow',
              );
              if (!problem) setChoosingDesignFlow(false);
              return problem;
            }}
          />
        )}
      </fieldset>
    </div>
  );
}
