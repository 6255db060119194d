'use client';

import { NETWORK_WORDS } from '@/lib/validations/field-word-tables';
import Link from 'next/link';
import { useState } from 'react';
import { TankForm } from '@/components/lift/tank-form';
import { PipePicker } from '@/components/lines/pipe-picker';
import { UnitNumberInput } from '@/components/lines/unit-number-input';
import { Button } from '@/components/ui/button';
import { SelectField, TextField } from '@/components/ui/field';
import { FormMessage } from '@/components/ui/form-message';
import type { NetworkLinkRecord, NetworkNodeRecord } from '@/lib/network/records';
import type { NetworkView } from '@/lib/network/view';
import { useSaveNetworkLink, useSaveNetworkNode } from '@/lib/queries/network';
import {
  formatQuantity,
  fromDisplay,
  toDisplay,
  unitDefaults,
  unitOf,
  type Quantity,
  type UnitSystem,
} from '@/lib/units';
import { useForm } from '@/lib/forms/use-form';
import { NetworkLinkSchema, NetworkNodeSchema, VALVE_KINDS } from '@/lib/validations/network';

/** The figures of the part picked on the schematic or in a table, edited in place. */
export function EditPart({
  projectId,
  view,
  units,
  selectedId,
}: {
  projectId: string;
  view: NetworkView;
  units: UnitSystem;
  selectedId: string | null;
}) {
  const node = view.records.nodes.find((n) => n.id === selectedId);
  const link = view.records.links.find((l) => l.id === selectedId);
  if (!node && !link)
    return <p className="text-sm text-creek-700">Pick a part on the schematic or in a table to change its figures.</p>;
  if (node?.kind === 'tank') {
    const tank = view.tanks.find((t) => t.id === node.tankId);
    if (!tank)
      return (
        <p className="text-sm text-clay-700">
          This tank node has lost its tank record; remove it and add the tank again.
        </p>
      );
    return (
      <div className="space-y-2">
        <p className="text-sm text-creek-700">
          {node.name}: the tank record&apos;s size and levels (the same record as on Lift &amp; storage).
        </p>
        <TankForm
          key={`${tank.id}-${JSON.stringify(tank)}`}
          projectId={projectId}
          units={units}
          tank={tank}
          sources={view.waterSources}
        />
      </div>
    );
  }
  if (node?.kind === 'ram-outlet') {
    return (
      <p className="text-sm text-creek-700">
        {node.name} takes its flow and head from its ram plan: change them on{' '}
        <Link className="underline" href={`/projects/${projectId}/lift`}>
          Lift &amp; storage
        </Link>
        .
      </p>
    );
  }
  if (link?.kind === 'line') {
    return (
      <p className="text-sm text-creek-700">
        {link.name} follows its line: change its pipes on{' '}
        <Link className="underline" href={`/projects/${projectId}/lines/${link.lineId}`}>
          the line&apos;s page
        </Link>
        .
      </p>
    );
  }
  if (node)
    return <NodeFigures key={`${node.id}-${JSON.stringify(node)}`} projectId={projectId} record={node} units={units} />;
  return <LinkFigures key={`${link!.id}-${JSON.stringify(link)}`} projectId={projectId} record={link!} units={units} />;
}

/** A value shown in the project's units, kept in SI. */
function useSi(units: UnitSystem) {
  return {
    shown: (quantity: Quantity, valueSi: number | null | undefined) =>
      valueSi === null || valueSi === undefined ? undefined : toDisplay(quantity, valueSi, units),
    si: (quantity: Quantity, value: number | undefined) =>
      value === undefined ? null : fromDisplay(quantity, value, units),
  };
}

function NodeFigures({
  projectId,
  record,
  units,
}: {
  projectId: string;
  record: NetworkNodeRecord;
  units: UnitSystem;
}) {
  const { id, ...initial } = record;
  const [draft, setDraft] = useState(initial);
  const form = useForm(undefined, { table: NETWORK_WORDS, units });
  const errors = form.fields;
  const save = useSaveNetworkNode(projectId);
  const { shown, si } = useSi(units);
  const setData = (patch: Partial<typeof draft.data>) => setDraft((d) => ({ ...d, data: { ...d.data, ...patch } }));
  const e = (field: string) => errors[field];

  function submit() {
    const input = form.check(NetworkNodeSchema, draft);
    if (input === null) return;
    save.mutate({ id, input }, { onError: (error) => form.fail(error) });
  }

  return (
    <form
      className="grid gap-3 sm:grid-cols-2"
      aria-label={`Edit ${record.name}`}
      onSubmit={(event) => {
        event.preventDefault();
        submit();
      }}
    >
      <TextField
        id="edit-node-name"
        label="Name"
        value={draft.name}
        onChange={(event) => setDraft((d) => ({ ...d, name: event.target.value }))}
        errors={e('name')}
      />
      <UnitNumberInput
        id="edit-node-elevation"
        label="Elevation"
        unit={unitOf('elevation', units)}
        optional
        value={shown('elevation', draft.elevationM)}
        errors={e('elevationM')}
        onCommit={(v) => {
          setDraft((d) => ({ ...d, elevationM: si('elevation', v) }));
          return null;
        }}
      />
      {(record.kind === 'source' || record.kind === 'break-pressure-tank') && (
        <UnitNumberInput
          id="edit-node-level"
          label="Water level"
          unit={unitOf('elevation', units)}
          optional
          value={shown('elevation', draft.data.waterLevelM)}
          errors={e('data.waterLevelM')}
          onCommit={(v) => {
            setData({ waterLevelM: si('elevation', v) });
            return null;
          }}
        />
      )}
      {record.kind === 'outlet' && (
        <>
          <UnitNumberInput
            id="edit-node-residual"
            label="Residual head wanted"
            unit={unitOf('head', units)}
            optional
            value={shown('head', draft.data.residualHeadM)}
            hint="Empty: the line's setting"
            errors={e('data.residualHeadM')}
            onCommit={(v) => {
              setData({ residualHeadM: si('head', v) });
              return null;
            }}
          />
          <UnitNumberInput
            id="edit-node-demand"
            label="Fixed peak draw"
            unit={unitOf('designFlow', units)}
            optional
            value={draft.data.demandFrom === 'fixed' ? shown('designFlow', draft.data.fixedDemandM3s) : undefined}
            hint="Empty: from the demand uses tied to it"
            errors={e('data.fixedDemandM3s')}
            onCommit={(v) => {
              setData(
                v === undefined
                  ? { demandFrom: 'uses', fixedDemandM3s: null }
                  : { demandFrom: 'fixed', fixedDemandM3s: si('designFlow', v) },
              );
              return null;
            }}
          />
        </>
      )}
      <div className="flex items-end gap-3 sm:col-span-2">
        <Button type="submit" disabled={save.isPending}>
          Save {record.name}
        </Button>
        <FormMessage
          message={save.error && !Object.keys(errors).length ? save.error.message : save.isSuccess ? 'Saved.' : null}
          tone={save.error ? 'error' : 'ok'}
        />
      </div>
      <p className="text-xs text-creek-600 sm:col-span-2" data-testid="part-as-saved">
        As saved:{' '}
        {[
          record.elevationM !== null ? `elevation ${formatQuantity('elevation', record.elevationM, units)}` : null,
          record.data.waterLevelM != null
            ? `water level ${formatQuantity('elevation', record.data.waterLevelM, units)}`
            : null,
          record.kind === 'outlet'
            ? record.data.residualHeadM != null
              ? `wants ${formatQuantity('head', record.data.residualHeadM, units)}`
              : "wants the line's residual"
            : null,
          record.kind === 'outlet' && record.data.demandFrom === 'fixed' && record.data.fixedDemandM3s != null
            ? `draws ${formatQuantity('designFlow', record.data.fixedDemandM3s, units)} at peak`
            : null,
        ]
          .filter(Boolean)
          .join(', ')}
        .
      </p>
    </form>
  );
}

function LinkFigures({
  projectId,
  record,
  units,
}: {
  projectId: string;
  record: NetworkLinkRecord;
  units: UnitSystem;
}) {
  const { id, ...initial } = record;
  const [draft, setDraft] = useState(initial);
  const form = useForm(undefined, { table: NETWORK_WORDS, units });
  const errors = form.fields;
  const save = useSaveNetworkLink(projectId);
  const { shown, si } = useSi(units);
  const setData = (patch: Partial<typeof draft.data>) => setDraft((d) => ({ ...d, data: { ...d.data, ...patch } }));
  const e = (field: string) => errors[field];
  const pipeId = typeof draft.data.pipe === 'string' ? draft.data.pipe : null;

  function submit() {
    const input = form.check(NetworkLinkSchema, draft);
    if (input === null) return;
    save.mutate({ id, input }, { onError: (error) => form.fail(error) });
  }

  return (
    <form
      className="grid gap-3 sm:grid-cols-2"
      aria-label={`Edit ${record.name}`}
      onSubmit={(event) => {
        event.preventDefault();
        submit();
      }}
    >
      <TextField
        id="edit-link-name"
        label="Name"
        value={draft.name}
        onChange={(event) => setDraft((d) => ({ ...d, name: event.target.value }))}
        errors={e('name')}
      />
      <UnitNumberInput
        id="edit-link-length"
        label="Length"
        unit={unitOf('length', units)}
        optional={record.kind === 'valve'}
        value={shown('length', draft.data.lengthM)}
        errors={e('data.lengthM')}
        onCommit={(v) => {
          setData({ lengthM: si('length', v) ?? undefined });
          return null;
        }}
      />
      {(record.kind === 'pipe' || pipeId) && (
        <div>
          <span className="block text-xs font-medium text-creek-900">Pipe (size and class)</span>
          <PipePicker
            id="edit-link-pipe"
            pipeId={pipeId ?? unitDefaults(units).networkPipeId}
            custom={[]}
            disabled={false}
            onPick={(pipe) => setData({ pipe })}
          />
          {e('data.pipe') && (
            <p role="alert" className="mt-1 text-xs text-clay-600">
              {e('data.pipe')!.join(' ')}
            </p>
          )}
        </div>
      )}
      {record.kind === 'valve' && (
        <>
          <SelectField
            id="edit-link-valve"
            label="Valve"
            value={draft.data.valveKind ?? ''}
            errors={e('data.valveKind')}
            onChange={(event) => setData({ valveKind: event.target.value as (typeof VALVE_KINDS)[number] })}
          >
            {VALVE_KINDS.map((k) => (
              <option key={k} value={k}>
                {k.replace('-', ' ')}
              </option>
            ))}
          </SelectField>
          {draft.data.valveKind === 'isolation' && (
            <SelectField
              id="edit-link-open"
              label="Setting"
              value={draft.data.open === false ? 'closed' : 'open'}
              onChange={(event) => setData({ open: event.target.value === 'open' })}
            >
              <option value="open">Open</option>
              <option value="closed">Closed</option>
            </SelectField>
          )}
          {draft.data.valveKind === 'pressure-reducing' && (
            <UnitNumberInput
              id="edit-link-set"
              label="Pressure it holds"
              unit={unitOf('head', units)}
              value={shown('head', draft.data.setHeadM)}
              errors={e('data.setHeadM')}
              onCommit={(v) => {
                setData({ setHeadM: si('head', v) ?? undefined });
                return null;
              }}
            />
          )}
        </>
      )}
      <div className="flex items-end gap-3 sm:col-span-2">
        <Button type="submit" disabled={save.isPending}>
          Save {record.name}
        </Button>
        <FormMessage
          message={save.error && !Object.keys(errors).length ? save.error.message : save.isSuccess ? 'Saved.' : null}
          tone={save.error ? 'error' : 'ok'}
        />
      </div>
    </form>
  );
}
