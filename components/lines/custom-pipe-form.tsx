'use client';

import { CUSTOM_PIPE_WORDS } from '@/lib/validations/field-word-tables';
import { useState, type FormEvent } from 'react';
import { fromDisplay, type DisplayUnits } from '@/lib/units';
import { useForm } from '@/lib/forms/use-form';
import { CustomPipeSchema, type LineDesign } from '@/lib/validations/line-design';
import { Button } from '@/components/ui/button';

type Change = (next: LineDesign, label: string) => string | null;

const INPUT =
  'mt-1 block w-full rounded-md border border-creek-200 bg-white px-2 py-1 text-sm aria-[invalid=true]:border-clay-500';

/** A pipe not in the catalogue (old stock, another standard), checked by the catalogue's own guard. */
export function CustomPipeForm({ design, units, change }: { design: LineDesign; units: DisplayUnits; change: Change }) {
  const form = useForm(undefined, { table: CUSTOM_PIPE_WORDS, units: units.system });
  const fields = form.fields;
  const [message, setMessage] = useState<string | null>(null);

  function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const f = new FormData(event.currentTarget);
    const num = (name: string) => (String(f.get(name) ?? '').trim() === '' ? Number.NaN : Number(f.get(name)));
    // The unit converters refuse NaN; an empty or non-numeric field stays NaN for zod to name.
    const safe = (v: number, convert: (v: number) => number) => (Number.isFinite(v) ? convert(v) : Number.NaN);
    const dia = (name: string) => safe(num(name), (v) => fromDisplay('diameter', v, units.system));
    const label = String(f.get('label') ?? '').trim();
    const id = `custom-${
      label
        .toLowerCase()
        .replace(/[^a-z0-9]+/g, '-')
        .replace(/^-|-$/g, '') || 'pipe'
    }`;
    const candidate = {
      id,
      label,
      material: f.get('material'),
      nominalSize: String(f.get('nominalSize') ?? '').trim(),
      outsideDiameterM: dia('outside'),
      insideDiameterM: dia('inside'),
      wallM: (dia('outside') - dia('inside')) / 2,
      pressureRatingPa: safe(num('rating'), (v) => fromDisplay('pressure', v, units.system)),
      hazenWilliamsC: num('c'),
      roughnessM: dia('roughness'),
      waveSpeedMs: safe(num('waveSpeed'), (v) => fromDisplay('velocity', v, units.system)),
      source: String(f.get('source') ?? '').trim(),
    };
    const pipe = form.check(CustomPipeSchema, candidate);
    if (pipe === null) return;
    if (design.pipes.some((p) => p.id === id))
      return form.mark({ label: ['A custom pipe with this name exists already'] });
    const problem = change({ ...design, pipes: [...design.pipes, pipe] }, `add the custom pipe ${label}`);
    setMessage(problem ?? `Added. Pick “Custom pipes of this line” in a stretch's pipe to use it.`);
    if (!problem) event.currentTarget.reset();
  }

  const field = (name: string, label: string, keys: string[], unit?: string) => {
    const errors = keys.flatMap((k) => fields[k] ?? []);
    return (
      <div>
        <label htmlFor={`custom-${name}`} className="block text-xs font-medium text-creek-900">
          {label}
          {unit ? ` (${unit})` : ''}
        </label>
        <input id={`custom-${name}`} name={name} className={INPUT} aria-invalid={errors.length ? true : undefined} />
        {errors.length > 0 && (
          <p role="alert" className="mt-0.5 text-xs text-clay-600">
            {errors.join(' ')}
          </p>
        )}
      </div>
    );
  };

  return (
    <details className="rounded-md border border-creek-100 p-3">
      <summary className="cursor-pointer text-sm font-medium text-creek-800">
        Add a custom pipe ({design.pipes.length} on this line)
      </summary>
      <form onSubmit={onSubmit} className="mt-3 grid gap-3 sm:grid-cols-3 lg:grid-cols-5" noValidate>
        {field('label', 'Name', ['label', 'id'])}
        {field('nominalSize', 'Nominal size', ['nominalSize'])}
        <div>
          <label htmlFor="custom-material" className="block text-xs font-medium text-creek-900">
            Material
          </label>
          <select id="custom-material" name="material" className={INPUT} defaultValue="pe">
            <option value="pe">Polyethylene</option>
            <option value="pvc">PVC</option>
            <option value="steel">Steel</option>
            <option value="custom">Other</option>
          </select>
        </div>
        {field('outside', 'Outside diameter', ['outsideDiameterM'], units.diameter)}
        {field('inside', 'Inside diameter', ['insideDiameterM', 'wallM'], units.diameter)}
        {field('rating', 'Pressure rating', ['pressureRatingPa'], units.pressure)}
        {field('c', 'Hazen-Williams C', ['hazenWilliamsC'])}
        {field('roughness', 'Roughness', ['roughnessM'], units.diameter)}
        {field('waveSpeed', 'Wave speed', ['waveSpeedMs'], units.velocity)}
        {field('source', 'Where the figures come from', ['source'])}
        <div className="flex items-end gap-3 sm:col-span-3 lg:col-span-5">
          <Button type="submit" tone="quiet">
            Add custom pipe
          </Button>
          {message && (
            <p role="status" className="text-xs text-creek-700">
              {message}
            </p>
          )}
        </div>
      </form>
    </details>
  );
}
