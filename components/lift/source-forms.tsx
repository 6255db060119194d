'use client';

import { useState, type FormEvent } from 'react';
import { Button } from '@/components/ui/button';
import { SelectField, TextField } from '@/components/ui/field';
import { FormMessage } from '@/components/ui/form-message';
import type { WaterSourceRecord, YieldReadingRecord } from '@/lib/lift/records';
import { useAddYieldReading, useSaveSource } from '@/lib/queries/lift';
import { formatQuantity, fromDisplay, inputValue, unitOf, type UnitSystem } from '@/lib/units';
import { WaterSourceSchema, YieldReadingSchema } from '@/lib/validations/water-sources';
import { NumberField } from './number-field';
import { useForm } from '@/lib/forms/use-form';
import { numberOrNull } from './typed-number';

const siOrNull = (quantity: 'flow' | 'volume', text: string, units: UnitSystem) => {
  const value = numberOrNull(text);
  return value === null ? null : fromDisplay(quantity, value, units);
};

/** A source and how its design yield is chosen. */
export function SourceForm({
  projectId,
  units,
  source,
  readings,
  onDone,
}: {
  projectId: string;
  units: UnitSystem;
  source: WaterSourceRecord | null;
  readings: readonly YieldReadingRecord[];
  onDone?: () => void;
}) {
  const [state, setState] = useState({
    name: source?.name ?? '',
    kind: source?.kind ?? 'creek',
    choice: source?.designYieldChoice ?? 'lowest-recent-dry',
    readingId: source?.designReadingId ?? '',
    entered: inputValue('flow', source?.enteredYieldM3s, units),
    otherDraw: inputValue('flow', source?.otherDrawM3s || null, units),
  });
  const set = (key: keyof typeof state, value: string) => setState((previous) => ({ ...previous, [key]: value }));
  const save = useSaveSource(projectId);
  const form = useForm({
    schema: WaterSourceSchema,
    save: (input) => save.mutateAsync({ id: source?.id ?? null, input }),
    savedText: source ? 'Source saved.' : 'Source added.',
  });
  const id = (name: string) => `source-${source?.id.slice(0, 8) ?? 'new'}-${name}`;

  async function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const ok = await form.submit({
      name: state.name,
      kind: state.kind,
      notes: source?.notes ?? '',
      designYieldChoice: state.choice,
      designReadingId: state.readingId || null,
      enteredYieldM3s: siOrNull('flow', state.entered, units),
      otherDrawM3s: siOrNull('flow', state.otherDraw, units) ?? 0,
    });
    if (ok) onDone?.();
  }

  return (
    <form
      onSubmit={onSubmit}
      noValidate
      className="grid gap-3 sm:grid-cols-3"
      aria-label={source ? `Edit ${source.name}` : 'Add a source'}
    >
      <TextField
        id={id('name')}
        label="Source name"
        value={state.name}
        onChange={(event) => set('name', event.target.value)}
        errors={form.fields.name}
      />
      <SelectField
        id={id('kind')}
        label="Kind"
        value={state.kind}
        onChange={(event) => set('kind', event.target.value)}
      >
        <option value="creek">Creek</option>
        <option value="spring">Spring</option>
        <option value="other">Other</option>
      </SelectField>
      <NumberField
        id={id('otherDraw')}
        label="Other draw on the source"
        unit={unitOf('flow', units)}
        value={state.otherDraw}
        onChange={(value) => set('otherDraw', value)}
        errors={form.fields.otherDrawM3s}
        hint="Besides the ram drive flow; blank for none"
      />
      {source && (
        <SelectField
          id={id('choice')}
          label="Design yield"
          value={state.choice}
          onChange={(event) => set('choice', event.target.value as typeof state.choice)}
          errors={form.fields.designYieldChoice}
        >
          <option value="lowest-recent-dry">Lowest recent dry-season reading</option>
          <option value="reading">A reading I choose</option>
          <option value="entered">A figure I enter</option>
        </SelectField>
      )}
      {state.choice === 'reading' && (
        <SelectField
          id={id('readingId')}
          label="Reading"
          value={state.readingId}
          onChange={(event) => set('readingId', event.target.value)}
          errors={form.fields.designReadingId}
        >
          <option value="">Choose a reading</option>
          {readings.map((reading) => (
            <option key={reading.id} value={reading.id}>
              {reading.measuredOn} ({reading.season})
            </option>
          ))}
        </SelectField>
      )}
      {state.choice === 'entered' && (
        <NumberField
          id={id('entered')}
          label="Design yield"
          unit={unitOf('flow', units)}
          value={state.entered}
          onChange={(value) => set('entered', value)}
          errors={form.fields.enteredYieldM3s}
        />
      )}
      <div className="flex items-end gap-3 sm:col-span-3">
        <Button type="submit" disabled={save.isPending}>
          {source ? 'Save source' : 'Add source'}
        </Button>
        {source && onDone && (
          <Button tone="quiet" onClick={onDone}>
            Cancel
          </Button>
        )}
        <FormMessage message={form.note?.text} tone={form.note?.tone} />
      </div>
    </form>
  );
}

/** A dated bucket-and-stopwatch reading (or a flow figure) with its season. */
export function YieldReadingForm({
  projectId,
  sourceId,
  units,
}: {
  projectId: string;
  sourceId: string;
  units: UnitSystem;
}) {
  const empty = { date: '', season: 'dry', mode: 'bucket', volume: '', seconds: '', flow: '', note: '' };
  const [state, setState] = useState(empty);
  const set = (key: keyof typeof empty, value: string) => setState((previous) => ({ ...previous, [key]: value }));
  const add = useAddYieldReading(projectId, sourceId);
  const form = useForm({
    schema: YieldReadingSchema,
    save: (input) => add.mutateAsync(input),
    savedText: 'Reading logged.',
  });
  const id = (name: string) => `yield-${sourceId.slice(0, 8)}-${name}`;
  const exampleBucketM3 = fromDisplay('volume', units === 'us' ? 5 : 20, units);

  async function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const bucket = state.mode === 'bucket';
    const ok = await form.submit({
      measuredOn: state.date,
      season: state.season,
      note: state.note,
      bucketVolumeM3: bucket ? siOrNull('volume', state.volume, units) : null,
      bucketSeconds: bucket ? numberOrNull(state.seconds) : null,
      flowM3s: bucket ? null : siOrNull('flow', state.flow, units),
    });
    if (ok) setState(empty);
  }

  return (
    <form onSubmit={onSubmit} noValidate className="grid gap-3 sm:grid-cols-4" aria-label="Log a yield reading">
      <TextField
        id={id('date')}
        label="Date"
        type="date"
        value={state.date}
        onChange={(event) => set('date', event.target.value)}
        errors={form.fields.measuredOn}
      />
      <SelectField
        id={id('season')}
        label="Season"
        value={state.season}
        onChange={(event) => set('season', event.target.value)}
        errors={form.fields.season}
      >
        <option value="dry">Dry season</option>
        <option value="wet">Wet season</option>
        <option value="unspecified">Not said</option>
      </SelectField>
      <SelectField
        id={id('mode')}
        label="Measured as"
        value={state.mode}
        onChange={(event) => set('mode', event.target.value)}
      >
        <option value="bucket">Bucket and stopwatch</option>
        <option value="flow">A flow figure</option>
      </SelectField>
      {state.mode === 'bucket' ? (
        <div className="grid grid-cols-2 gap-2">
          <NumberField
            id={id('volume')}
            label="Bucket"
            unit={unitOf('volume', units)}
            value={state.volume}
            onChange={(value) => set('volume', value)}
            errors={form.fields.bucketVolumeM3}
          />
          <NumberField
            id={id('seconds')}
            label="Time to fill"
            unit="s"
            value={state.seconds}
            onChange={(value) => set('seconds', value)}
            errors={form.fields.bucketSeconds ?? form.fields.flowM3s}
          />
        </div>
      ) : (
        <NumberField
          id={id('flow')}
          label="Flow"
          unit={unitOf('flow', units)}
          value={state.flow}
          onChange={(value) => set('flow', value)}
          errors={form.fields.flowM3s}
        />
      )}
      <div className="sm:col-span-3">
        <TextField
          id={id('note')}
          label="Note"
          value={state.note}
          onChange={(event) => set('note', event.target.value)}
          errors={form.fields.note}
        />
      </div>
      <div className="flex items-end gap-3">
        <Button type="submit" disabled={add.isPending}>
          Log reading
        </Button>
      </div>
      <div className="sm:col-span-4">
        <FormMessage message={form.note?.text} tone={form.note?.tone} />
      </div>
      <p className="text-xs text-creek-600 sm:col-span-4">
        Time a bucket of known size at the intake, three times, and enter the average:{' '}
        {formatQuantity('volume', exampleBucketM3, units)} in 10 s is{' '}
        {formatQuantity('flow', exampleBucketM3 / 10, units)}.
      </p>
    </form>
  );
}
