export interface ColumnSelectProps {
  id: string;
  label: string;
  headers: string[];
  value: number | null;
  required?: boolean;
  onChange: (value: number | null) => void;
}

/** Picks which column of the file holds a value; “not in the file” for optional ones. */
export function ColumnSelect({ id, label, headers, value, required, onChange }: ColumnSelectProps) {
  return (
    <div className="text-sm">
      <label htmlFor={id} className="block font-medium text-creek-900">
        {label}
        {required && <span className="text-clay-600"> *</span>}
      </label>
      <select
        id={id}
        value={value === null ? '' : String(value)}
        onChange={(e) => onChange(e.target.value === '' ? null : Number(e.target.value))}
        aria-invalid={required && value === null ? true : undefined}
        className="mt-1 block w-full rounded-md border border-creek-200 bg-white px-2 py-1.5 text-sm aria-[invalid=true]:border-clay-500"
      >
        <option value="">{required ? '— choose a column —' : '— not in the file —'}</option>
        {headers.map((h, i) => (
          <option key={i} value={i}>{`${i + 1} · ${h}`}</option>
        ))}
      </select>
    </div>
  );
}

export function UnitToggle({
  name,
  legend,
  value,
  onChange,
}: {
  name: string;
  legend: string;
  value: 'm' | 'ft';
  onChange: (v: 'm' | 'ft') => void;
}) {
  return (
    <fieldset className="text-sm">
      <legend className="font-medium text-creek-900">{legend}</legend>
      <div className="mt-1 flex gap-3">
        {(['m', 'ft'] as const).map((u) => (
          <label key={u} className="flex items-center gap-1.5">
            <input type="radio" name={name} value={u} checked={value === u} onChange={() => onChange(u)} />
            {u === 'm' ? 'metres' : 'feet'}
          </label>
        ))}
      </div>
    </fieldset>
  );
}
