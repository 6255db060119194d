'use client';

import { NETWORK_WORDS } from '@/lib/validations/field-word-tables';
import { useState, type FormEvent } from 'react';
import { numberOrNull } from '@/components/lift/typed-number';
import { PipePicker } from '@/components/lines/pipe-picker';
import { Button } from '@/components/ui/button';
import { FormMessage } from '@/components/ui/form-message';
import { SelectField, TextField } from '@/components/ui/field';
import type { NetworkView } from '@/lib/network/view';
import { useSaveNetworkLink, useSaveNetworkNode } from '@/lib/queries/network';
import { fromDisplay, unitDefaults, unitOf, type UnitSystem } from '@/lib/units';
import { NetworkLinkSchema, NetworkNodeSchema, OUTLET_KINDS, VALVE_KINDS } from '@/lib/validations/network';
import { useForm } from '@/lib/forms/use-form';

// Typed numbers read with the project's decimal mark (the one parser); unreadable -> NaN, which the schema names.
const num = numberOrNull;

const NODE_KINDS = [
  ['outlet', 'Outlet (tap, trough, house, garden)'],
  ['source', 'Source (spring or intake)'],
  ['tank', 'Storage tank'],
  ['break-pressure-tank', 'Break-pressure tank'],
  ['ram-outlet', 'Ram pump outlet'],
] as const;

/** Adds a node; figures are typed in the project's units and stored in SI. */
export function AddNodeForm({ projectId, view, units }: { projectId: string; view: NetworkView; units: UnitSystem }) {
  const save = useSaveNetworkNode(projectId);
  const [kind, setKind] = useState<(typeof NODE_KINDS)[number][0]>('outlet');
  const checks = useForm(undefined, { table: NETWORK_WORDS, units });
  const errors = checks.fields;
  const [done, setDone] = useState<string | null>(null);
  const m = unitOf('elevation', units);

  function submit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    const text = (name: string) => String(form.get(name) ?? '');
    const elevation = num(text('elevation'));
    const level = num(text('waterLevel'));
    const demand = num(text('demand'));
    const residual = num(text('residual'));
    const candidate = {
      kind,
      name: text('name'),
      elevationM: elevation === null ? null : fromDisplay('elevation', elevation, units),
      tankId: kind === 'tank' ? text('tankId') || null : null,
      ramSiteId: kind === 'ram-outlet' ? text('ramSiteId') || null : null,
      data: {
        ...(kind === 'source' || kind === 'break-pressure-tank'
          ? { waterLevelM: level === null ? null : fromDisplay('elevation', level, units) }
          : {}),
        ...(kind === 'tank' ? { inletFloatValve: true } : {}),
        ...(kind === 'outlet'
          ? {
              outletKind: text('outletKind'),
              residualHeadM: residual === null ? null : fromDisplay('head', residual, units),
              demandFrom: demand === null ? 'uses' : 'fixed',
              fixedDemandM3s: demand === null ? null : fromDisplay('designFlow', demand, units),
            }
          : {}),
      },
    };
    const input = checks.check(NetworkNodeSchema, candidate);
    if (input === null) return;
    const target = event.currentTarget;
    save.mutate(
      { id: null, input },
      {
        onSuccess: () => {
          setDone(`Added ${input.name}`);
          target.reset();
        },
        onError: (error) => checks.fail(error),
      },
    );
  }

  const e = (field: string) => errors[field];
  return (
    <form onSubmit={submit} className="grid gap-3 sm:grid-cols-2" aria-label="Add a part">
      <SelectField
        id="node-kind"
        label="Part"
        value={kind}
        onChange={(event) => setKind(event.target.value as typeof kind)}
      >
        {NODE_KINDS.map(([value, label]) => (
          <option key={value} value={value}>
            {label}
          </option>
        ))}
      </SelectField>
      <TextField id="node-name" name="name" label="Name" required errors={e('name')} />
      <TextField
        id="node-elevation"
        name="elevation"
        label={`Elevation (${m})`}
        inputMode="decimal"
        errors={e('elevationM')}
        hint={kind === 'tank' ? 'Leave empty: the tank record gives its floor' : undefined}
      />
      {(kind === 'source' || kind === 'break-pressure-tank') && (
        <TextField
          id="node-level"
          name="waterLevel"
          label={`Water level (${m})`}
          inputMode="decimal"
          errors={e('data.waterLevelM')}
        />
      )}
      {kind === 'tank' && (
        <SelectField id="node-tank" name="tankId" label="Tank record" errors={e('tankId')}>
          <option value="">Pick a tank</option>
          {view.tanks.map((t) => (
            <option key={t.id} value={t.id}>
              {t.name}
            </option>
          ))}
        </SelectField>
      )}
      {kind === 'ram-outlet' && (
        <SelectField id="node-ram" name="ramSiteId" label="Ram site" errors={e('ramSiteId')}>
          <option value="">Pick a ram site</option>
          {view.ramSites.map((r) => (
            <option key={r.id} value={r.id}>
              {r.name}
            </option>
          ))}
        </SelectField>
      )}
      {kind === 'outlet' && (
        <>
          <SelectField
            id="node-outlet-kind"
            name="outletKind"
            label="Outlet"
            defaultValue="tap"
            errors={e('data.outletKind')}
          >
            {OUTLET_KINDS.map((k) => (
              <option key={k} value={k}>
                {k.replace('-', ' ')}
              </option>
            ))}
          </SelectField>
          <TextField
            id="node-residual"
            name="residual"
            label={`Residual head wanted (${unitOf('head', units)})`}
            inputMode="decimal"
            errors={e('data.residualHeadM')}
            hint="Empty: the line's setting (3 m)"
          />
          <TextField
            id="node-demand"
            name="demand"
            label={`Fixed peak draw (${unitOf('designFlow', units)})`}
            inputMode="decimal"
            errors={e('data.fixedDemandM3s')}
            hint="Empty: from the demand uses tied to it"
          />
        </>
      )}
      <div className="flex items-end gap-3 sm:col-span-2">
        <Button type="submit" disabled={save.isPending}>
          Add part
        </Button>
        <FormMessage
          message={save.error && !Object.keys(errors).length ? save.error.message : done}
          tone={save.error ? 'error' : 'ok'}
        />
      </div>
    </form>
  );
}

/** Joins two parts with a typed pipe or a valve. */
export function AddLinkForm({ projectId, view, units }: { projectId: string; view: NetworkView; units: UnitSystem }) {
  const save = useSaveNetworkLink(projectId);
  const [kind, setKind] = useState<'pipe' | 'valve'>('pipe');
  const [pipeId, setPipeId] = useState(() => unitDefaults(units).networkPipeId);
  const checks = useForm(undefined, { table: NETWORK_WORDS, units });
  const errors = checks.fields;
  const [done, setDone] = useState<string | null>(null);

  function submit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    const text = (name: string) => String(form.get(name) ?? '');
    const length = num(text('length'));
    const candidate = {
      kind,
      name: text('name'),
      fromNodeId: text('from'),
      toNodeId: text('to'),
      data: {
        pipe: pipeId,
        ...(length !== null ? { lengthM: fromDisplay('length', length, units) } : {}),
        ...(kind === 'valve'
          ? {
              valveKind: text('valveKind'),
              open: true,
              ...(num(text('setHead')) !== null ? { setHeadM: fromDisplay('head', num(text('setHead'))!, units) } : {}),
            }
          : {}),
      },
    };
    const input = checks.check(NetworkLinkSchema, candidate);
    if (input === null) return;
    const target = event.currentTarget;
    save.mutate(
      { id: null, input },
      {
        onSuccess: () => {
          setDone(`Joined with ${input.name}`);
          target.reset();
        },
        onError: (error) => checks.fail(error),
      },
    );
  }
  const e = (field: string) => errors[field];
  const nodes = view.records.nodes;
  return (
    <form onSubmit={submit} className="grid gap-3 sm:grid-cols-2" aria-label="Join two parts">
      <SelectField
        id="link-kind"
        label="Join with"
        value={kind}
        onChange={(event) => setKind(event.target.value as 'pipe' | 'valve')}
      >
        <option value="pipe">A pipe (length, no survey route)</option>
        <option value="valve">A valve</option>
      </SelectField>
      <TextField id="link-name" name="name" label="Name" required errors={e('name')} />
      <SelectField id="link-from" name="from" label="From" errors={e('fromNodeId')}>
        {nodes.map((n) => (
          <option key={n.id} value={n.id}>
            {n.name}
          </option>
        ))}
      </SelectField>
      <SelectField id="link-to" name="to" label="To" errors={e('toNodeId')} defaultValue={nodes[nodes.length - 1]?.id}>
        {nodes.map((n) => (
          <option key={n.id} value={n.id}>
            {n.name}
          </option>
        ))}
      </SelectField>
      <TextField
        id="link-length"
        name="length"
        label={`Length (${unitOf('length', units)})`}
        inputMode="decimal"
        errors={e('data.lengthM')}
      />
      <div>
        <span className="block text-sm font-medium text-creek-900">Pipe</span>
        <PipePicker id="link-pipe" pipeId={pipeId} custom={[]} disabled={false} onPick={setPipeId} />
        {e('data.pipe') && (
          <p role="alert" className="mt-1 text-xs text-clay-600">
            {e('data.pipe')!.join(' ')}
          </p>
        )}
      </div>
      {kind === 'valve' && (
        <>
          <SelectField id="link-valve" name="valveKind" label="Valve" errors={e('data.valveKind')}>
            {VALVE_KINDS.map((k) => (
              <option key={k} value={k}>
                {k.replace('-', ' ')}
              </option>
            ))}
          </SelectField>
          <TextField
            id="link-set"
            name="setHead"
            label={`Pressure it holds (${unitOf('head', units)}), pressure-reducing only`}
            inputMode="decimal"
            errors={e('data.setHeadM')}
          />
        </>
      )}
      <div className="flex items-end gap-3 sm:col-span-2">
        <Button type="submit" disabled={save.isPending || nodes.length < 2}>
          Join
        </Button>
        <FormMessage
          message={save.error && !Object.keys(errors).length ? save.error.message : done}
          tone={save.error ? 'error' : 'ok'}
        />
      </div>
    </form>
  );
}
