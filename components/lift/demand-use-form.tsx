'use client';

import { useState, type FormEvent } from 'react';
import { DAILY_USE_PATTERN_PRESETS, DEFAULT_DEMAND_FIGURES } from '@/hydraulics/index';
import { Button } from '@/components/ui/button';
import { SelectField, TextField } from '@/components/ui/field';
import { FormMessage } from '@/components/ui/form-message';
import { publishedFigureOf } from '@/lib/lift/demand';
import type { DemandUseRecord } from '@/lib/lift/records';
import { useSaveDemandUse } from '@/lib/queries/lift';
import { formatQuantity, fromDisplay, inputValue, unitDefaults, unitOf, type UnitSystem } from '@/lib/units';
import { DemandUseSchema, type DemandUseInput } from '@/lib/validations/demand-uses';
import { demandUseWords } from '@/lib/validations/field-word-tables';
import { figureQuantity } from './demand-format';
import { NumberField } from './number-field';
import { useForm } from '@/lib/forms/use-form';
import { numberFrom, numberOrNull } from './typed-number';

const FIGURES = {
  people: DEFAULT_DEMAND_FIGURES.perPerson,
  livestock: DEFAULT_DEMAND_FIGURES.livestock,
  garden: DEFAULT_DEMAND_FIGURES.garden,
  fixed: [],
};
/** The figure a new use starts with; a person's daily use follows the project's units (profile-and-checks.md §7.1). */
const defaultFigure = (kind: Kind, units: UnitSystem) =>
  ({
    people: unitDefaults(units).perPersonFigureId,
    livestock: 'cow-calf-pair',
    garden: 'vegetables-inch-per-week',
    fixed: '',
  })[kind];
type Kind = DemandUseInput['kind'];

function initialState(use: DemandUseRecord | null, units: UnitSystem) {
  const kind: Kind = use?.kind ?? 'people';
  return {
    kind,
    label: use?.label ?? '',
    count: use?.count === null || use?.count === undefined ? '' : String(use.count),
    area: inputValue('area', use?.areaM2, units),
    season: use?.season ?? 'summer',
    figureId: use?.figureId ?? defaultFigure(kind, units),
    own: inputValue(figureQuantity(kind), use?.ownFigure, units),
    deliveryKind: use?.deliveryKind ?? 'peak-factor',
    peakFactor: String(use?.peakFactor ?? 3),
    hours: String(use?.deliveryHours ?? 4),
    startHour: String(use?.startHour ?? 6),
    presetId: use?.patternPresetId ?? 'jordan-morning-evening',
  };
}

/** One daily use: who or what, how many, the published figure or your own, and how the day's water is spread. */
export function DemandUseForm({
  projectId,
  units,
  use,
  onDone,
}: {
  projectId: string;
  units: UnitSystem;
  use: DemandUseRecord | null;
  onDone?: () => void;
}) {
  const [state, setState] = useState(() => initialState(use, units));
  const set = (key: keyof typeof state, value: string) => setState((previous) => ({ ...previous, [key]: value }));
  const save = useSaveDemandUse(projectId);
  const kind = state.kind as Kind;
  // The own figure's name and unit follow the kind, on screen and in its refusals alike.
  const words = demandUseWords({ kind });
  const form = useForm(
    {
      schema: DemandUseSchema,
      save: (input) => save.mutateAsync({ id: use?.id ?? null, input }),
      savedText: use ? 'Use saved.' : 'Use added.',
    },
    { table: words, units },
  );
  const published = publishedFigureOf({
    kind,
    figureId: state.figureId || null,
    season: state.season as 'winter' | 'summer',
  });
  const id = (name: string) => `use-${use?.id.slice(0, 8) ?? 'new'}-${name}`;
  const own = numberOrNull(state.own);

  async function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const ok = await form.submit({
      label: state.label,
      kind,
      count: kind === 'people' || kind === 'livestock' ? numberFrom(state.count) : null,
      areaM2: kind === 'garden' ? fromDisplay('area', numberFrom(state.area), units) : null,
      season: kind === 'livestock' ? state.season : null,
      figureId: kind === 'fixed' ? null : state.figureId || null,
      ownFigure: own === null ? null : fromDisplay(figureQuantity(kind), own, units),
      deliveryKind: state.deliveryKind,
      peakFactor: state.deliveryKind === 'peak-factor' ? numberFrom(state.peakFactor) : null,
      deliveryHours: state.deliveryKind === 'delivery-hours' ? numberFrom(state.hours) : null,
      startHour: state.deliveryKind === 'delivery-hours' ? numberFrom(state.startHour) : null,
      patternPresetId: state.deliveryKind === 'pattern' ? state.presetId : null,
      hourlyFractions: null,
    });
    if (ok && use) onDone?.();
    if (ok && !use) setState(initialState(null, units));
  }

  return (
    <form
      onSubmit={onSubmit}
      noValidate
      className="grid gap-3 sm:grid-cols-4"
      aria-label={use ? 'Edit use' : 'Add a use'}
    >
      <SelectField
        id={id('kind')}
        label="Use"
        value={kind}
        onChange={(event) =>
          setState((previous) => ({
            ...previous,
            kind: event.target.value as Kind,
            figureId: defaultFigure(event.target.value as Kind, units),
            own: '',
          }))
        }
      >
        <option value="people">People</option>
        <option value="livestock">Livestock</option>
        <option value="garden">Garden</option>
        <option value="fixed">Other, a daily volume</option>
      </SelectField>
      <TextField
        id={id('label')}
        label="Label"
        value={state.label}
        onChange={(event) => set('label', event.target.value)}
        errors={form.fields.label}
        placeholder="e.g. Farmhouse"
      />
      {(kind === 'people' || kind === 'livestock') && (
        <NumberField
          id={id('count')}
          label={kind === 'people' ? 'People' : 'Head'}
          value={state.count}
          onChange={(value) => set('count', value)}
          errors={form.fields.count}
        />
      )}
      {kind === 'garden' && (
        <NumberField
          id={id('area')}
          label="Garden area"
          unit={unitOf('area', units)}
          value={state.area}
          onChange={(value) => set('area', value)}
          errors={form.fields.areaM2}
        />
      )}
      {kind === 'livestock' && (
        <SelectField
          id={id('season')}
          label="Need"
          value={state.season}
          onChange={(event) => set('season', event.target.value)}
          errors={form.fields.season}
        >
          <option value="summer">Summer</option>
          <option value="winter">Winter</option>
        </SelectField>
      )}
      {kind !== 'fixed' && (
        <SelectField
          id={id('figureId')}
          label="Published figure"
          value={state.figureId}
          onChange={(event) => set('figureId', event.target.value)}
          errors={form.fields.figureId}
        >
          {(FIGURES[kind] as readonly { id: string; label: string }[]).map((figure) => (
            <option key={figure.id} value={figure.id}>
              {figure.label}
            </option>
          ))}
        </SelectField>
      )}
      <NumberField
        id={id('own')}
        label={words.ownFigure?.label ?? 'Own figure'}
        unit={unitOf(figureQuantity(kind), units)}
        value={state.own}
        onChange={(value) => set('own', value)}
        errors={form.fields.ownFigure}
        hint={
          published
            ? `Blank uses ${formatQuantity(figureQuantity(kind), published.value, units)} (${published.source})`
            : undefined
        }
      />
      <SelectField
        id={id('deliveryKind')}
        label="Spread over the day"
        value={state.deliveryKind}
        onChange={(event) => set('deliveryKind', event.target.value)}
      >
        <option value="peak-factor">A peak factor</option>
        <option value="delivery-hours">Hours of delivery (troughs)</option>
        <option value="pattern">A published daily pattern</option>
      </SelectField>
      {state.deliveryKind === 'peak-factor' && (
        <NumberField
          id={id('peakFactor')}
          label="Peak factor"
          value={state.peakFactor}
          onChange={(value) => set('peakFactor', value)}
          errors={form.fields.peakFactor}
        />
      )}
      {state.deliveryKind === 'delivery-hours' && (
        <>
          <NumberField
            id={id('hours')}
            label="Hours of delivery"
            unit="h"
            value={state.hours}
            onChange={(value) => set('hours', value)}
            errors={form.fields.deliveryHours}
          />
          <NumberField
            id={id('startHour')}
            label="Starting at hour"
            value={state.startHour}
            onChange={(value) => set('startHour', value)}
            errors={form.fields.startHour}
          />
        </>
      )}
      {state.deliveryKind === 'pattern' && (
        <SelectField
          id={id('presetId')}
          label="Pattern"
          value={state.presetId}
          onChange={(event) => set('presetId', event.target.value)}
          errors={form.fields.patternPresetId}
        >
          {DAILY_USE_PATTERN_PRESETS.map((preset) => (
            <option key={preset.id} value={preset.id} disabled={Boolean(preset.flag)}>
              {preset.label}
              {preset.flag ? ' (not usable as printed)' : ''}
            </option>
          ))}
        </SelectField>
      )}
      <div className="flex items-end gap-3 sm:col-span-4">
        <Button type="submit" disabled={save.isPending}>
          {use ? 'Save use' : 'Add use'}
        </Button>
        {use && onDone && (
          <Button tone="quiet" onClick={onDone}>
            Cancel
          </Button>
        )}
        <FormMessage message={form.note?.text} tone={form.note?.tone} />
      </div>
    </form>
  );
}
