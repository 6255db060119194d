'use client';

import type { LineEnd, LineFlow, LineStart } from '@/hydraulics/index';
import { fromDisplay, toDisplay, type DisplayUnits } from '@/lib/units';
import type { LineDesign } from '@/lib/validations/line-design';
import { UnitNumberInput } from './unit-number-input';

type Change = (next: LineDesign, label: string) => string | null;

const SELECT = 'mt-1 block w-full rounded-md border border-creek-200 bg-white px-2 py-1 text-sm disabled:bg-creek-50';

/** Start, end and flow of the line, in the project's units. */
export function EndsForm({ design, units, change, canEdit, firstGroundM, lastGroundM }: {
  design: LineDesign;
  units: DisplayUnits;
  change: Change;
  canEdit: boolean;
  firstGroundM: number;
  lastGroundM: number;
}) {
  const L = (m: number) => toDisplay('length', m, units.system);
  const toM = (v: number) => fromDisplay('length', v, units.system);
  const setStart = (start: LineStart, label: string) => change({ ...design, start }, label);
  const setEnd = (end: LineEnd, label: string) => change({ ...design, end }, label);
  const setFlow = (flow: LineFlow, label: string) => change({ ...design, flow }, label);
  const { start, end, flow } = design;

  return (
    <div className="grid gap-4 md:grid-cols-3">
      <fieldset className="space-y-2 rounded-md border border-creek-100 p-3">
        <legend className="px-1 text-sm font-semibold text-creek-900">Start</legend>
        <label className="block text-xs font-medium text-creek-900" htmlFor="start-kind">Fed from</label>
        <select id="start-kind" className={SELECT} disabled={!canEdit} value={start.kind} onChange={(e) =>
          setStart(e.target.value === 'pump' ? { kind: 'pump', outletHeadM: firstGroundM + 30 } : { kind: 'water-level', levelM: firstGroundM }, 'change the start')}>
          <option value="water-level">Water surface (spring box, tank, break-pressure tank)</option>
          <option value="pump">Pump outlet</option>
        </select>
        {start.kind === 'water-level' ? (
          <UnitNumberInput id="start-level" label="Water level" unit={units.length} value={L(start.levelM)} disabled={!canEdit}
            onCommit={(v) => setStart({ kind: 'water-level', levelM: toM(v!) }, 'change the start water level')} />
        ) : (
          <>
            <UnitNumberInput id="start-outlet" label="Grade at the pump outlet, pumping" unit={units.length} value={L(start.outletHeadM)} disabled={!canEdit}
              onCommit={(v) => setStart({ ...start, outletHeadM: toM(v!) }, 'change the pump outlet head')} />
            <UnitNumberInput id="start-shutoff" label="Grade with the line shut" unit={units.length} optional value={start.shutoffHeadM === undefined ? undefined : L(start.shutoffHeadM)} disabled={!canEdit}
              hint="Empty: same as pumping"
              onCommit={(v) => setStart({ kind: 'pump', outletHeadM: start.outletHeadM, ...(v === undefined ? {} : { shutoffHeadM: toM(v) }) }, 'change the pump shut-off head')} />
          </>
        )}
      </fieldset>

      <fieldset className="space-y-2 rounded-md border border-creek-100 p-3">
        <legend className="px-1 text-sm font-semibold text-creek-900">End</legend>
        <label className="block text-xs font-medium text-creek-900" htmlFor="end-kind">Delivers into</label>
        <select id="end-kind" className={SELECT} disabled={!canEdit} value={end.kind} onChange={(e) => {
          const kind = e.target.value as LineEnd['kind'];
          const elevationM = end.kind === 'free-discharge' ? lastGroundM : end.elevationM;
          setEnd(kind === 'free-discharge' ? { kind } : kind === 'tank-inlet' ? { kind, elevationM } : { kind: 'outlet', elevationM }, 'change the end');
        }}>
          <option value="outlet">Outlet (tap, trough, garden)</option>
          <option value="tank-inlet">Tank inlet above the water</option>
          <option value="free-discharge">Pipe runs out at the last station</option>
        </select>
        {end.kind !== 'free-discharge' && (
          <UnitNumberInput id="end-elevation" label={end.kind === 'outlet' ? 'Outlet elevation' : 'Inlet elevation'} unit={units.length} value={L(end.elevationM)} disabled={!canEdit}
            onCommit={(v) => setEnd({ ...end, elevationM: toM(v!) }, 'change the end elevation')} />
        )}
        {end.kind === 'outlet' && (
          <UnitNumberInput id="end-residual" label="Residual pressure wanted" unit={`${units.head} of head`} optional
            value={end.residualHeadM === undefined ? undefined : toDisplay('head', end.residualHeadM, units.system)} disabled={!canEdit} hint="Empty: the settings' minimum"
            onCommit={(v) => setEnd({ kind: 'outlet', elevationM: end.elevationM, ...(v === undefined ? {} : { residualHeadM: fromDisplay('head', v, units.system) }) }, 'change the residual wanted')} />
        )}
      </fieldset>

      <fieldset className="space-y-2 rounded-md border border-creek-100 p-3">
        <legend className="px-1 text-sm font-semibold text-creek-900">Flow</legend>
        <div className="flex flex-col gap-1 text-sm">
          <label className="flex items-center gap-2"><input type="radio" name="flow-kind" disabled={!canEdit} checked={flow.kind === 'design'} onChange={() => setFlow({ kind: 'design', flowM3s: 0.001 }, 'use a design flow')} /> Design flow</label>
          <label className="flex items-center gap-2"><input type="radio" name="flow-kind" disabled={!canEdit} checked={flow.kind === 'find'} onChange={() => setFlow({ kind: 'find' }, 'find the flow')} /> Find the flow the line carries by gravity</label>
        </div>
        {flow.kind === 'design' && (
          <UnitNumberInput id="design-flow" label="Design flow" unit={units.flow} digits={3} value={toDisplay('designFlow', flow.flowM3s, units.system)} disabled={!canEdit}
            onCommit={(v) => (v! < 0 ? 'The flow cannot be negative' : setFlow({ kind: 'design', flowM3s: fromDisplay('designFlow', v!, units.system) }, 'change the design flow'))} />
        )}
      </fieldset>
    </div>
  );
}
