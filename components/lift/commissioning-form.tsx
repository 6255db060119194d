'use client';

import { useState, type FormEvent } from 'react';
import { Button } from '@/components/ui/button';
import { SelectField, TextField } from '@/components/ui/field';
import { FormMessage } from '@/components/ui/form-message';
import { useAddCommissioningReading } from '@/lib/queries/lift';
import { fromDisplay, unitOf, type Quantity, type UnitSystem } from '@/lib/units';
import { CommissioningReadingSchema } from '@/lib/validations/ram-sites';
import { NumberField } from './number-field';
import { useForm } from '@/lib/forms/use-form';
import { numberFrom, numberOrNull } from './typed-number';

const EMPTY = {
  measuredOn: '',
  beats: '',
  deliveredMode: 'bucket',
  deliveredVolume: '',
  deliveredSeconds: '',
  deliveredFlow: '',
  driveMeasure: 'waste',
  driveMode: 'bucket',
  driveVolume: '',
  driveSeconds: '',
  driveFlow: '',
  pressure: '',
  supplyHead: '',
  deliveryHead: '',
  notes: '',
};
type State = typeof EMPTY;

function inputFrom(state: State, units: UnitSystem) {
  const si = (quantity: Quantity, text: string) => {
    const value = numberOrNull(text);
    return value === null ? null : fromDisplay(quantity, value, units);
  };
  const bucket = (mode: string, volume: string, seconds: string, flow: string) =>
    mode === 'bucket'
      ? { volume: si('volume', volume), seconds: numberOrNull(seconds), flow: null }
      : { volume: null, seconds: null, flow: si('flow', flow) };
  const delivered = bucket(state.deliveredMode, state.deliveredVolume, state.deliveredSeconds, state.deliveredFlow);
  const drive =
    state.driveMeasure === 'plan'
      ? { volume: null, seconds: null, flow: null }
      : bucket(state.driveMode, state.driveVolume, state.driveSeconds, state.driveFlow);
  return {
    measuredOn: state.measuredOn,
    beatsPerMinute: numberFrom(state.beats),
    deliveredBucketVolumeM3: delivered.volume,
    deliveredBucketSeconds: delivered.seconds,
    deliveredFlowM3s: delivered.flow,
    driveMeasure: state.driveMeasure,
    driveBucketVolumeM3: drive.volume,
    driveBucketSeconds: drive.seconds,
    driveFlowM3s: drive.flow,
    pressureAtPumpPa: si('pressure', state.pressure),
    supplyHeadM: fromDisplay('head', numberFrom(state.supplyHead), units),
    deliveryHeadM: si('head', state.deliveryHead),
    notes: state.notes,
  };
}

/** One day's readings at the running ram: beats, bucket at the top, waste or drive flow, gauge and heads. */
export function CommissioningForm({
  projectId,
  siteId,
  units,
}: {
  projectId: string;
  siteId: string;
  units: UnitSystem;
}) {
  const [state, setState] = useState<State>(EMPTY);
  const set = (key: keyof State, value: string) => setState((previous) => ({ ...previous, [key]: value }));
  const add = useAddCommissioningReading(projectId, siteId);
  const form = useForm({
    schema: CommissioningReadingSchema,
    save: (input) => add.mutateAsync(input),
    savedText: 'Reading logged.',
  });
  const f = form.fields;
  const id = (name: string) => `comm-${siteId.slice(0, 8)}-${name}`;

  async function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    if (await form.submit(inputFrom(state, units))) setState(EMPTY);
  }

  const pair = (
    mode: 'deliveredMode' | 'driveMode',
    volume: 'deliveredVolume' | 'driveVolume',
    seconds: 'deliveredSeconds' | 'driveSeconds',
    flow: 'deliveredFlow' | 'driveFlow',
    what: string,
    keys: [string, string, string],
  ) =>
    state[mode] === 'bucket' ? (
      <>
        <NumberField
          id={id(volume)}
          label={`${what} bucket`}
          unit={unitOf('volume', units)}
          value={state[volume]}
          onChange={(value) => set(volume, value)}
          errors={f[keys[0]]}
        />
        <NumberField
          id={id(seconds)}
          label={`${what} seconds to fill`}
          unit="s"
          value={state[seconds]}
          onChange={(value) => set(seconds, value)}
          errors={f[keys[1]]}
        />
      </>
    ) : (
      <NumberField
        id={id(flow)}
        label={`${what} flow`}
        unit={unitOf('flow', units)}
        value={state[flow]}
        onChange={(value) => set(flow, value)}
        errors={f[keys[2]]}
      />
    );

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-3" aria-label="Log a commissioning reading">
      <div className="grid gap-3 sm:grid-cols-4">
        <TextField
          id={id('date')}
          label="Date"
          type="date"
          value={state.measuredOn}
          onChange={(event) => set('measuredOn', event.target.value)}
          errors={f.measuredOn}
        />
        <NumberField
          id={id('beats')}
          label="Beats per minute"
          value={state.beats}
          onChange={(value) => set('beats', value)}
          errors={f.beatsPerMinute}
        />
        <NumberField
          id={id('supplyHead')}
          label="Supply head (fall)"
          unit={unitOf('head', units)}
          value={state.supplyHead}
          onChange={(value) => set('supplyHead', value)}
          errors={f.supplyHeadM}
        />
        <NumberField
          id={id('pressure')}
          label="Pressure at the pump"
          unit={unitOf('pressure', units)}
          value={state.pressure}
          onChange={(value) => set('pressure', value)}
          errors={f.pressureAtPumpPa}
        />
        <NumberField
          id={id('deliveryHead')}
          label="Delivery head"
          unit={unitOf('head', units)}
          value={state.deliveryHead}
          onChange={(value) => set('deliveryHead', value)}
          errors={f.deliveryHeadM}
          hint="Blank: taken from the gauge"
        />
        <SelectField
          id={id('deliveredMode')}
          label="Delivered water measured as"
          value={state.deliveredMode}
          onChange={(event) => set('deliveredMode', event.target.value)}
        >
          <option value="bucket">Bucket timed at the top</option>
          <option value="flow">A flow figure</option>
        </SelectField>
        {pair('deliveredMode', 'deliveredVolume', 'deliveredSeconds', 'deliveredFlow', 'Delivered', [
          'deliveredBucketVolumeM3',
          'deliveredBucketSeconds',
          'deliveredFlowM3s',
        ])}
      </div>
      <div className="grid gap-3 sm:grid-cols-4">
        <SelectField
          id={id('driveMeasure')}
          label="Drive water"
          value={state.driveMeasure}
          onChange={(event) => set('driveMeasure', event.target.value)}
          errors={f.driveMeasure}
        >
          <option value="waste">Waste valve flow measured</option>
          <option value="drive">Drive flow measured</option>
          <option value="plan">Not measured: use the planned drive flow</option>
        </SelectField>
        {state.driveMeasure !== 'plan' && (
          <>
            <SelectField
              id={id('driveMode')}
              label="Measured as"
              value={state.driveMode}
              onChange={(event) => set('driveMode', event.target.value)}
            >
              <option value="bucket">A timed bucket</option>
              <option value="flow">A flow figure</option>
            </SelectField>
            {pair(
              'driveMode',
              'driveVolume',
              'driveSeconds',
              'driveFlow',
              state.driveMeasure === 'waste' ? 'Waste' : 'Drive',
              ['driveBucketVolumeM3', 'driveBucketSeconds', 'driveFlowM3s'],
            )}
          </>
        )}
      </div>
      <TextField
        id={id('notes')}
        label="Notes"
        value={state.notes}
        onChange={(event) => set('notes', event.target.value)}
        errors={f.notes}
      />
      <div className="flex items-center gap-3">
        <Button type="submit" disabled={add.isPending}>
          {add.isPending ? 'Logging…' : 'Log reading'}
        </Button>
        <FormMessage message={form.note?.text} tone={form.note?.tone} />
      </div>
    </form>
  );
}
