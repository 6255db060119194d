import { HEIGHT_SOURCES, type HeightSource } from '@/hydraulics/index';
import { HEIGHT_SOURCE_LABELS } from '../format-labels';

export function HeightSourceSelect({
  id,
  value,
  onChange,
}: {
  id: string;
  value: HeightSource;
  onChange: (v: HeightSource) => void;
}) {
  return (
    <div className="text-sm">
      <label htmlFor={id} className="block font-medium text-creek-900">
        Heights came from
      </label>
      <select
        id={id}
        value={value}
        onChange={(e) => onChange(e.target.value as HeightSource)}
        className="mt-1 block w-full rounded-md border border-creek-200 bg-white px-2 py-1.5 text-sm"
      >
        {HEIGHT_SOURCES.map((s) => (
          <option key={s} value={s}>
            {HEIGHT_SOURCE_LABELS[s]}
          </option>
        ))}
      </select>
    </div>
  );
}
