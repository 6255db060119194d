'use client';

import { removeKeepingFocus } from '@/components/ui/focus-return';
import { useState, type FormEvent } from 'react';
import { Button } from '@/components/ui/button';
import { SelectField, TextField } from '@/components/ui/field';
import { FormMessage } from '@/components/ui/form-message';
import type { TankRecord } from '@/lib/lift/records';
import { useSaveTank } from '@/lib/queries/lift';
import { fromDisplay, inputValue, unitOf, type Quantity, type UnitSystem } from '@/lib/units';
import { TANK_WORDS } from '@/lib/validations/field-word-tables';
import { TankSchema } from '@/lib/validations/tanks';
import { NumberField } from './number-field';
import { useForm } from '@/lib/forms/use-form';
import { numberFrom, numberOrNull } from './typed-number';

type Outlet = { label: string; elevation: string; residual: string; friction: string };

function initialState(tank: TankRecord | null, units: UnitSystem) {
  return {
    name: tank?.name ?? '',
    volume: inputValue('volume', tank?.volumeM3, units),
    base: inputValue('elevation', tank?.baseElevationM, units),
    low: inputValue('length', tank?.lowLevelM ?? 0, units),
    overflow: inputValue('length', tank?.overflowLevelM, units),
    supplyKind: tank?.supplyKind ?? 'ram-sites',
    supplySourceId: tank?.supplySourceId ?? '',
    supplyFlow: inputValue('flow', tank?.supplyFlowM3s, units),
    hours: String(tank?.supplyHoursPerDay ?? 24),
    startHour: String(tank?.supplyStartHour ?? 0),
    reserveDays: String(tank?.reserveDays ?? 2),
    outlets: (tank?.outlets ?? []).map((outlet): Outlet => ({
      label: outlet.label,
      elevation: inputValue('elevation', outlet.elevationM, units),
      residual: inputValue('head', outlet.residualHeadM, units),
      friction: inputValue('head', outlet.frictionLossM, units),
    })),
  };
}

/** A tank: size and levels, floor elevation, where its water comes from, reserve wanted and the outlets below. */
export function TankForm({
  projectId,
  units,
  tank,
  sources,
  onDone,
}: {
  projectId: string;
  units: UnitSystem;
  tank: TankRecord | null;
  sources: readonly { id: string; name: string }[];
  onDone?: () => void;
}) {
  const [state, setState] = useState(() => initialState(tank, units));
  const set = (key: Exclude<keyof typeof state, 'outlets'>, value: string) =>
    setState((previous) => ({ ...previous, [key]: value }));
  const setOutlet = (index: number, key: keyof Outlet, value: string) =>
    setState((previous) => ({
      ...previous,
      outlets: previous.outlets.map((outlet, i) => (i === index ? { ...outlet, [key]: value } : outlet)),
    }));
  const save = useSaveTank(projectId);
  const form = useForm(
    {
      schema: TankSchema,
      save: (input) => save.mutateAsync({ id: tank?.id ?? null, input }),
      savedText: tank ? 'Tank saved.' : 'Tank added.',
    },
    { table: TANK_WORDS, units },
  );
  const id = (name: string) => `tank-${tank?.id.slice(0, 8) ?? 'new'}-${name}`;
  const si = (quantity: Quantity, text: string) => fromDisplay(quantity, numberFrom(text), units);
  const siOrNull = (quantity: Quantity, text: string) => (numberOrNull(text) === null ? null : si(quantity, text));

  async function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const ok = await form.submit({
      name: state.name,
      volumeM3: si('volume', state.volume),
      baseElevationM: siOrNull('elevation', state.base),
      lowLevelM: siOrNull('length', state.low) ?? 0,
      overflowLevelM: siOrNull('length', state.overflow),
      supplyKind: state.supplyKind,
      supplySourceId: state.supplyKind === 'source' ? state.supplySourceId || null : null,
      supplyFlowM3s: state.supplyKind === 'entered' ? siOrNull('flow', state.supplyFlow) : null,
      supplyHoursPerDay: numberFrom(state.hours),
      supplyStartHour: numberFrom(state.startHour),
      reserveDays: numberFrom(state.reserveDays),
      notes: tank?.notes ?? '',
      outlets: state.outlets.map((outlet) => ({
        label: outlet.label,
        elevationM: si('elevation', outlet.elevation),
        residualHeadM: si('head', outlet.residual),
        frictionLossM: si('head', outlet.friction),
      })),
    });
    if (ok && tank) onDone?.();
    if (ok && !tank) setState(initialState(null, units));
  }

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-3" aria-label={tank ? `Edit ${tank.name}` : 'Add a tank'}>
      <div className="grid gap-3 sm:grid-cols-4">
        <TextField
          id={id('name')}
          label="Tank name"
          value={state.name}
          onChange={(event) => set('name', event.target.value)}
          errors={form.fields.name}
        />
        <NumberField
          id={id('volume')}
          label="Volume"
          unit={unitOf('volume', units)}
          value={state.volume}
          onChange={(value) => set('volume', value)}
          errors={form.fields.volumeM3}
        />
        <NumberField
          id={id('base')}
          label="Floor elevation"
          unit={unitOf('elevation', units)}
          value={state.base}
          onChange={(value) => set('base', value)}
          errors={form.fields.baseElevationM}
        />
        <NumberField
          id={id('reserveDays')}
          label="Reserve wanted"
          unit="days"
          value={state.reserveDays}
          onChange={(value) => set('reserveDays', value)}
          errors={form.fields.reserveDays}
        />
        <NumberField
          id={id('low')}
          label="Lowest working level above floor"
          unit={unitOf('length', units)}
          value={state.low}
          onChange={(value) => set('low', value)}
          errors={form.fields.lowLevelM}
        />
        <NumberField
          id={id('overflow')}
          label="Overflow level above floor"
          unit={unitOf('length', units)}
          value={state.overflow}
          onChange={(value) => set('overflow', value)}
          errors={form.fields.overflowLevelM}
        />
        <SelectField
          id={id('supplyKind')}
          label="Filled by"
          value={state.supplyKind}
          onChange={(event) => set('supplyKind', event.target.value)}
          errors={form.fields.supplyKind}
        >
          <option value="ram-sites">The ram sites that deliver here</option>
          <option value="source">A source by gravity (its design yield)</option>
          <option value="entered">A flow I enter</option>
        </SelectField>
        {state.supplyKind === 'source' && (
          <SelectField
            id={id('supplySourceId')}
            label="Source"
            value={state.supplySourceId}
            onChange={(event) => set('supplySourceId', event.target.value)}
            errors={form.fields.supplySourceId}
          >
            <option value="">Choose a source</option>
            {sources.map((source) => (
              <option key={source.id} value={source.id}>
                {source.name}
              </option>
            ))}
          </SelectField>
        )}
        {state.supplyKind === 'entered' && (
          <NumberField
            id={id('supplyFlow')}
            label="Supply flow"
            unit={unitOf('flow', units)}
            value={state.supplyFlow}
            onChange={(value) => set('supplyFlow', value)}
            errors={form.fields.supplyFlowM3s}
          />
        )}
        <NumberField
          id={id('hours')}
          label="Supply runs"
          unit="h a day"
          value={state.hours}
          onChange={(value) => set('hours', value)}
          errors={form.fields.supplyHoursPerDay}
        />
        <NumberField
          id={id('startHour')}
          label="Supply starts at hour"
          value={state.startHour}
          onChange={(value) => set('startHour', value)}
          errors={form.fields.supplyStartHour}
        />
      </div>
      <fieldset className="space-y-2 rounded-md border border-creek-100 p-3">
        <legend className="px-1 text-sm font-semibold text-creek-900">Outlets fed from this tank</legend>
        {state.outlets.map((outlet, index) => (
          <div key={index} className="grid items-end gap-2 sm:grid-cols-[2fr_1fr_1fr_1fr_auto]">
            <TextField
              id={id(`outlet-${index}-label`)}
              label="Outlet"
              value={outlet.label}
              onChange={(event) => setOutlet(index, 'label', event.target.value)}
              errors={form.fields[`outlets.${index}.label`]}
            />
            <NumberField
              id={id(`outlet-${index}-elevation`)}
              label="Elevation"
              unit={unitOf('elevation', units)}
              value={outlet.elevation}
              onChange={(value) => setOutlet(index, 'elevation', value)}
              errors={form.fields[`outlets.${index}.elevationM`]}
            />
            <NumberField
              id={id(`outlet-${index}-residual`)}
              label="Residual head wanted"
              unit={unitOf('head', units)}
              value={outlet.residual}
              onChange={(value) => setOutlet(index, 'residual', value)}
              errors={form.fields[`outlets.${index}.residualHeadM`]}
            />
            <NumberField
              id={id(`outlet-${index}-friction`)}
              label="Friction loss to it"
              unit={unitOf('head', units)}
              value={outlet.friction}
              onChange={(value) => setOutlet(index, 'friction', value)}
              errors={form.fields[`outlets.${index}.frictionLossM`]}
            />
            <Button
              tone="quiet"
              onClick={(e) =>
                removeKeepingFocus(e.currentTarget, () =>
                  setState((previous) => ({ ...previous, outlets: previous.outlets.filter((_, i) => i !== index) })),
                )
              }
            >
              Remove
            </Button>
          </div>
        ))}
        <Button
          tone="quiet"
          onClick={() =>
            setState((previous) => ({
              ...previous,
              outlets: [...previous.outlets, { label: '', elevation: '', residual: '', friction: '0' }],
            }))
          }
        >
          Add an outlet
        </Button>
      </fieldset>
      <div className="flex items-center gap-3">
        <Button type="submit" disabled={save.isPending}>
          {tank ? 'Save tank' : 'Add tank'}
        </Button>
        {tank && onDone && (
          <Button tone="quiet" onClick={onDone}>
            Cancel
          </Button>
        )}
        <FormMessage message={form.note?.text} tone={form.note?.tone} />
      </div>
    </form>
  );
}
