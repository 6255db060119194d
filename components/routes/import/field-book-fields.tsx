import { TextField } from '@/components/ui/field';
import { unitOf } from '@/lib/units';
import type { FieldErrors } from '@/lib/errors';
import type { MappingDraft } from '@/lib/import/mapping-draft';
import type { UnitSystem } from '@/lib/units';
import { UnitToggle } from './column-select';

type Update = (change: (d: MappingDraft) => MappingDraft) => void;

/** What a field book needs beyond its rows: the height it starts from, units, method. */
export function FieldBookFields({
  draft,
  units,
  errors,
  update,
}: {
  draft: MappingDraft;
  units: UnitSystem;
  errors: FieldErrors;
  update: Update;
}) {
  const fb = draft.fieldBook;
  const set = (patch: Partial<MappingDraft['fieldBook']>) =>
    update((d) => ({ ...d, fieldBook: { ...d.fieldBook, ...patch } }));
  const u = unitOf('length', units);
  const level = draft.format === 'level-book-csv';
  return (
    <div className="grid gap-3 sm:grid-cols-3">
      <TextField
        id="start-elevation"
        label={`${level ? 'Reduced level of the first station' : 'Height of the first mark'} (${u})`}
        inputMode="decimal"
        value={fb.startElevation}
        onChange={(e) => set({ startElevation: e.target.value })}
        errors={errors.startElevationM ? ['Give the height the field book starts from'] : undefined}
        hint="A benchmark, or an assumed datum such as 100"
      />
      {level ? (
        <>
          <TextField
            id="closing-elevation"
            label={`Known level of the last station (${u}, optional)`}
            inputMode="decimal"
            value={fb.closingElevation}
            onChange={(e) => set({ closingElevation: e.target.value })}
            errors={errors.closingElevationM}
            hint="Shows the closure error when the run ends on a known mark"
          />
          <label className="block text-sm">
            <span className="font-medium text-creek-900">Booking method</span>
            <select
              value={fb.method}
              onChange={(e) => set({ method: e.target.value as MappingDraft['fieldBook']['method'] })}
              className="mt-1 block w-full rounded-md border border-creek-200 bg-white px-2 py-1.5 text-sm"
            >
              <option value="rise-and-fall">Rise and fall</option>
              <option value="height-of-collimation">Height of collimation</option>
            </select>
          </label>
          <label className="flex items-center gap-2 text-sm">
            <input type="checkbox" checked={fb.hoseLevel} onChange={(e) => set({ hoseLevel: e.target.checked })} /> Read
            with a hose level
          </label>
        </>
      ) : (
        <>
          <TextField
            id="start-label"
            label="Name of the first mark (optional)"
            value={fb.startLabel}
            onChange={(e) => set({ startLabel: e.target.value })}
          />
          <label className="block text-sm">
            <span className="font-medium text-creek-900">Vertical angles are in</span>
            <select
              value={fb.angleUnit}
              onChange={(e) => set({ angleUnit: e.target.value as MappingDraft['fieldBook']['angleUnit'] })}
              className="mt-1 block w-full rounded-md border border-creek-200 bg-white px-2 py-1.5 text-sm"
            >
              <option value="auto">As the column header says</option>
              <option value="degrees">Degrees</option>
              <option value="percent">Percent grade</option>
            </select>
          </label>
        </>
      )}
      <UnitToggle
        name="fieldbook-unit"
        legend={level ? 'Chainage and staff readings are in' : 'Tape distances are in'}
        value={fb.distanceUnit}
        onChange={(v) => set({ distanceUnit: v })}
      />
    </div>
  );
}
