'use client';

import { PROJECT_WORDS } from '@/lib/validations/field-word-tables';
import { useRouter } from 'next/navigation';
import { useState, type FormEvent } from 'react';
import { Button } from '@/components/ui/button';
import { SelectField, TextAreaField, TextField } from '@/components/ui/field';
import { FormMessage } from '@/components/ui/form-message';
import type { ProjectSummary } from '@/lib/data/projects';
import { useForm } from '@/lib/forms/use-form';
import { useUpdateProject } from '@/lib/queries/projects';
import { UpdateProjectSchema } from '@/lib/validations/projects';
import { displayUnits, formatPlainNumber, fromDisplay, toDisplay } from '@/lib/units';
import { typedNumber } from '@/lib/units/decimal-mark-store';

const TIME_ZONES: readonly string[] =
  typeof Intl.supportedValuesOf === 'function' ? Intl.supportedValuesOf('timeZone') : [];

/** The typed frost depth in SI: empty means not known; text that is not a number stays NaN for the schema to refuse. */
function frostDepthFrom(text: FormDataEntryValue | null, unitSystem: ProjectSummary['unitSystem']): number | null {
  const trimmed = String(text ?? '').trim();
  return trimmed === '' ? null : fromDisplay('length', typedNumber(trimmed), unitSystem);
}

export function ProjectDetailsForm({ project, editable }: { project: ProjectSummary; editable: boolean }) {
  const router = useRouter();
  const update = useUpdateProject(project.id);
  const { fields, message, check, fail } = useForm(undefined, { table: PROJECT_WORDS, units: project.unitSystem });
  const [saved, setSaved] = useState(false);
  const units = displayUnits(project.unitSystem);
  const frostShown =
    project.frostDepthM === null ? '' : formatPlainNumber(toDisplay('length', project.frostDepthM, units.system), 2);

  if (!editable) {
    return (
      <dl className="grid gap-3 text-sm sm:grid-cols-2">
        <div>
          <dt className="font-medium text-creek-800">Description</dt>
          <dd className="text-creek-700">{project.description || '—'}</dd>
        </div>
        <div>
          <dt className="font-medium text-creek-800">Units</dt>
          <dd className="text-creek-700">{project.unitSystem === 'us' ? 'US customary' : 'Metric'}</dd>
        </div>
        <div>
          <dt className="font-medium text-creek-800">Frost depth</dt>
          <dd className="text-creek-700">{frostShown ? `${frostShown} ${units.length}` : 'not set'}</dd>
        </div>
        <div className="sm:col-span-2">
          <dt className="font-medium text-creek-800">Site notes</dt>
          <dd className="whitespace-pre-line text-creek-700">{project.siteNotes || '—'}</dd>
        </div>
      </dl>
    );
  }

  async function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    setSaved(false);
    const input = check(UpdateProjectSchema, {
      name: form.get('name'),
      description: form.get('description'),
      unitSystem: form.get('unitSystem'),
      siteNotes: form.get('siteNotes'),
      frostDepthM: frostDepthFrom(form.get('frostDepthM'), project.unitSystem),
      decimalMark: form.get('decimalMark') || null,
      timeZone: form.get('timeZone') || null,
    });
    if (!input) return;
    try {
      await update.mutateAsync(input);
      setSaved(true);
      router.refresh();
    } catch (error) {
      fail(error);
    }
  }

  return (
    <form onSubmit={onSubmit} className="grid gap-4 sm:grid-cols-2" noValidate>
      <TextField id="name" label="Name" defaultValue={project.name} errors={fields.name} required />
      <SelectField id="unitSystem" label="Units" defaultValue={project.unitSystem} errors={fields.unitSystem}>
        <option value="metric">Metric (m, L/s, kPa and m of head)</option>
        <option value="us">US customary (ft, gpm, psi and ft of head)</option>
      </SelectField>
      <SelectField
        id="decimalMark"
        label="Decimal mark in number boxes"
        defaultValue={project.decimalMark ?? ''}
        errors={fields.decimalMark}
        hint="How people on this project type decimals: 1.5 or 1,5. Shown figures, the PDF and CSV files keep the point."
      >
        <option value="">As the browser&apos;s language writes it</option>
        <option value=".">Point (1.5; 1,500 groups thousands)</option>
        <option value=",">Comma (1,5; 1.500,5 groups thousands)</option>
      </SelectField>
      <SelectField
        id="timeZone"
        label="Time zone"
        defaultValue={project.timeZone ?? ''}
        errors={fields.timeZone}
        hint="Survey times written without an offset are read in this zone, in the import preview and the import alike."
      >
        <option value="">UTC (not set)</option>
        {TIME_ZONES.map((zone) => (
          <option key={zone} value={zone}>
            {zone}
          </option>
        ))}
      </SelectField>
      <TextField
        id="frostDepthM"
        label={`Frost depth (${units.length})`}
        inputMode="decimal"
        defaultValue={frostShown}
        errors={fields.frostDepthM}
        hint="How deep frost reaches at the site (local code or records); lines with less cover are drained for winter. Empty: not known."
      />
      <div className="sm:col-span-2">
        <TextField
          id="description"
          label="Description"
          defaultValue={project.description}
          errors={fields.description}
        />
      </div>
      <div className="sm:col-span-2">
        <TextAreaField
          id="siteNotes"
          label="Site notes"
          rows={4}
          defaultValue={project.siteNotes}
          errors={fields.siteNotes}
        />
      </div>
      <div className="flex items-center gap-3 sm:col-span-2">
        <Button type="submit" disabled={update.isPending}>
          {update.isPending ? 'Saving…' : 'Save details'}
        </Button>
        <FormMessage message={saved ? 'Saved.' : null} tone="ok" />
        <FormMessage message={message} />
      </div>
    </form>
  );
}
