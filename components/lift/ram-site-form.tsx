'use client';

import { useMemo, useState, type FormEvent } from 'react';
import { RAM_EFFICIENCY_TABLES, RAM_SIZE_CLASSES } from '@/hydraulics/index';
import { Button } from '@/components/ui/button';
import { SelectField, TextAreaField, TextField } from '@/components/ui/field';
import { FormMessage } from '@/components/ui/form-message';
import { planRamSite } from '@/lib/lift/ram-plan';
import type { RamSiteRecord, RouteOption } from '@/lib/lift/records';
import { useSaveRamSite } from '@/lib/queries/lift';
import { formatDuration, formatQuantity, inputValue, unitOf, type UnitSystem } from '@/lib/units';
import { RamSiteSchema } from '@/lib/validations/ram-sites';
import { DeliveryPipeFields } from './delivery-pipe-fields';
import { NumberField } from './number-field';
import { RAM_SITE_WORDS } from '@/lib/validations/field-word-tables';
import { issueText } from '@/lib/validations/field-words';
import { emptyRamSiteForm, ramSiteFormFrom, ramSiteInputFrom, type RamSiteFormState } from './ram-site-form-state';
import { useForm } from '@/lib/forms/use-form';

export interface RamSiteFormProps {
  projectId: string;
  units: UnitSystem;
  site: RamSiteRecord | null;
  sources: readonly { id: string; name: string; designYieldM3s: number | null }[];
  tanks: readonly { id: string; name: string; volumeM3: number }[];
  routes: readonly RouteOption[];
  onDone?: () => void;
}

/** The ram site: fall, drive pipe, lift, delivery pipe, size class and pumps; the plan updates as you type. */
export function RamSiteForm({ projectId, units, site, sources, tanks, routes, onDone }: RamSiteFormProps) {
  const [state, setState] = useState<RamSiteFormState>(() =>
    site ? ramSiteFormFrom(site, units) : emptyRamSiteForm(units),
  );
  const set = <K extends keyof RamSiteFormState>(key: K, value: RamSiteFormState[K]) =>
    setState((previous) => ({ ...previous, [key]: value }));
  const save = useSaveRamSite(projectId);
  const form = useForm(
    {
      schema: RamSiteSchema,
      save: (input) => save.mutateAsync({ id: site?.id ?? null, input }),
      savedText: site ? 'Ram site saved.' : 'Ram site added.',
    },
    { table: RAM_SITE_WORDS, units },
  );
  const tankVolumeM3 = tanks.find((tank) => tank.id === state.tankId)?.volumeM3 ?? null;
  const preview = useMemo(() => {
    if (![state.driveFlow, state.fall, state.lift].some((text) => text.trim() !== '')) return null;
    // The name does not change the plan, so a site without one yet still gets its preview.
    const parsed = RamSiteSchema.safeParse({ ...ramSiteInputFrom(state, units), name: state.name.trim() || 'preview' });
    if (!parsed.success) {
      // The same words as the refusal beside the box (the screen's name, the project's units).
      const first = parsed.error.issues[0];
      return { ok: false as const, error: first ? issueText(first, units, RAM_SITE_WORDS) : 'check the fields' };
    }
    return planRamSite(parsed.data, { routes, tankVolumeM3 });
  }, [state, units, routes, tankVolumeM3]);
  const source = sources.find((candidate) => candidate.id === state.sourceId);
  const prefix = 'ram';

  async function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    if (!(await form.submit(ramSiteInputFrom(state, units)))) return;
    if (!site) setState(emptyRamSiteForm(units));
    onDone?.();
  }

  return (
    <form
      onSubmit={onSubmit}
      noValidate
      className="space-y-4"
      aria-label={site ? `Edit ${site.name}` : 'Add a ram site'}
    >
      <div className="grid gap-3 sm:grid-cols-3">
        <TextField
          id={`${prefix}-name`}
          label="Site name"
          value={state.name}
          onChange={(event) => set('name', event.target.value)}
          errors={form.fields.name}
        />
        <SelectField
          id={`${prefix}-sourceId`}
          label="Drive water from"
          value={state.sourceId}
          onChange={(event) => set('sourceId', event.target.value)}
          errors={form.fields.sourceId}
        >
          <option value="">Not linked to a source</option>
          {sources.map((candidate) => (
            <option key={candidate.id} value={candidate.id}>
              {candidate.name}
            </option>
          ))}
        </SelectField>
        <SelectField
          id={`${prefix}-tankId`}
          label="Delivers to tank"
          value={state.tankId}
          onChange={(event) => set('tankId', event.target.value)}
          errors={form.fields.tankId}
        >
          <option value="">No tank chosen</option>
          {tanks.map((tank) => (
            <option key={tank.id} value={tank.id}>
              {tank.name} ({formatQuantity('volume', tank.volumeM3, units)})
            </option>
          ))}
        </SelectField>
      </div>
      <fieldset className="grid gap-3 rounded-md border border-creek-100 p-3 sm:grid-cols-3">
        <legend className="px-1 text-sm font-semibold text-creek-900">Source and drive pipe</legend>
        <NumberField
          id={`${prefix}-driveFlow`}
          label="Drive flow available"
          unit={unitOf('flow', units)}
          value={state.driveFlow}
          onChange={(value) => set('driveFlow', value)}
          errors={form.fields.driveFlowM3s}
          hint={
            source?.designYieldM3s
              ? `Design yield of ${source.name}: ${formatQuantity('flow', source.designYieldM3s, units)}`
              : 'All pumps together'
          }
        />
        <NumberField
          id={`${prefix}-fall`}
          label="Fall, source water level to pump"
          unit={unitOf('head', units)}
          value={state.fall}
          onChange={(value) => set('fall', value)}
          errors={form.fields.fallM}
        />
        <NumberField
          id={`${prefix}-driveLength`}
          label="Drive pipe length"
          unit={unitOf('length', units)}
          value={state.driveLength}
          onChange={(value) => set('driveLength', value)}
          errors={form.fields['drivePipe.lengthM']}
        />
        <NumberField
          id={`${prefix}-driveBore`}
          label="Drive pipe bore"
          unit={unitOf('diameter', units)}
          value={state.driveBore}
          onChange={(value) => set('driveBore', value)}
          errors={form.fields['drivePipe.insideDiameterM']}
        />
        <SelectField
          id={`${prefix}-driveMaterial`}
          label="Drive pipe material"
          value={state.driveMaterial}
          onChange={(event) => set('driveMaterial', event.target.value)}
          errors={form.fields['drivePipe.material']}
        >
          <option value="steel">Galvanised steel</option>
          <option value="pvc">PVC</option>
          <option value="pe">PE (polyethylene)</option>
          <option value="custom">Other</option>
        </SelectField>
        <SelectField
          id={`${prefix}-driveRigid`}
          label="Drive pipe rigid?"
          value={state.driveRigid}
          onChange={(event) => set('driveRigid', event.target.value as RamSiteFormState['driveRigid'])}
        >
          <option value="auto">By material (steel is rigid)</option>
          <option value="yes">Yes, rigid</option>
          <option value="no">No, flexible</option>
        </SelectField>
        {source?.designYieldM3s ? (
          <div className="sm:col-span-3">
            <Button tone="quiet" onClick={() => set('driveFlow', inputValue('flow', source.designYieldM3s, units))}>
              Use the design yield as drive flow
            </Button>
          </div>
        ) : null}
      </fieldset>
      <fieldset className="grid gap-3 rounded-md border border-creek-100 p-3 sm:grid-cols-3">
        <legend className="px-1 text-sm font-semibold text-creek-900">Lift and pump</legend>
        <NumberField
          id={`${prefix}-lift`}
          label="Lift, pump to delivery outlet"
          unit={unitOf('head', units)}
          value={state.lift}
          onChange={(value) => set('lift', value)}
          errors={form.fields.liftM}
        />
        <NumberField
          id={`${prefix}-pumpElevation`}
          label="Pump elevation"
          unit={unitOf('elevation', units)}
          value={state.pumpElevation}
          onChange={(value) => set('pumpElevation', value)}
          errors={form.fields.pumpElevationM}
          hint="On the survey datum; a delivery line fed by this ram starts its head here"
        />
        <SelectField
          id={`${prefix}-sizeClassId`}
          label="Pump size class"
          value={state.sizeClassId}
          onChange={(event) => set('sizeClassId', event.target.value)}
          errors={form.fields.sizeClassId}
        >
          <option value="">Suggest one from the drive flow</option>
          {RAM_SIZE_CLASSES.map((sizeClass) => (
            <option key={sizeClass.id} value={sizeClass.id}>
              {sizeClass.drivePipeNominalMm} mm drive: {formatQuantity('flow', sizeClass.minDriveFlowM3s, units)} to{' '}
              {formatQuantity('flow', sizeClass.maxDriveFlowM3s, units)}
            </option>
          ))}
        </SelectField>
        <NumberField
          id={`${prefix}-pumpCount`}
          label="Pumps in parallel"
          value={state.pumpCount}
          onChange={(value) => set('pumpCount', value)}
          errors={form.fields.pumpCount}
        />
        <NumberField
          id={`${prefix}-efficiency`}
          label="Measured efficiency"
          unit="%"
          value={state.measuredEfficiencyPercent}
          onChange={(value) => set('measuredEfficiencyPercent', value)}
          errors={form.fields.measuredEfficiency}
          hint="Leave blank to use the published table"
        />
        <SelectField
          id={`${prefix}-efficiencyTable`}
          label="Efficiency table"
          value={state.efficiencyTableId}
          onChange={(event) => set('efficiencyTableId', event.target.value as RamSiteFormState['efficiencyTableId'])}
          errors={form.fields.efficiencyTableId}
        >
          {Object.values(RAM_EFFICIENCY_TABLES).map((table) => (
            <option key={table.id} value={table.id}>
              {table.label}
            </option>
          ))}
        </SelectField>
      </fieldset>
      <DeliveryPipeFields state={state} set={set} fields={form.fields} routes={routes} units={units} />
      <TextAreaField
        id={`${prefix}-notes`}
        label="Notes"
        rows={2}
        value={state.notes}
        onChange={(event) => set('notes', event.target.value)}
        errors={form.fields.notes}
      />
      <div className="flex flex-wrap items-center gap-3">
        <Button type="submit" disabled={save.isPending}>
          {save.isPending ? 'Saving…' : site ? 'Save ram site' : 'Add ram site'}
        </Button>
        {site && onDone && (
          <Button tone="quiet" onClick={onDone}>
            Cancel
          </Button>
        )}
        <p className="text-sm text-creek-700" aria-live="polite" data-testid="ram-preview">
          {preview === null
            ? 'Fill in the site to see what it delivers.'
            : preview.ok
              ? `As typed: ${formatQuantity('flowPerDay', preview.value.deliveredFlowM3s, units)}${preview.value.tankFill ? `, tank full in ${formatDuration(preview.value.tankFill.fillTimeS)}` : ''}.`
              : `Cannot plan yet: ${preview.error}`}
        </p>
      </div>
      <FormMessage message={form.note?.text} tone={form.note?.tone} />
    </form>
  );
}
