import type { ReactNode } from 'react';

/** One headline figure: what it is, the figure with its unit, and a line of context. */
export function Readout({
  label,
  value,
  detail,
  emphasis = false,
}: {
  label: string;
  value: ReactNode;
  detail?: ReactNode;
  emphasis?: boolean;
}) {
  return (
    <div className={`rounded-lg border p-3 ${emphasis ? 'border-creek-300 bg-creek-50' : 'border-creek-100 bg-white'}`}>
      <p className="text-xs font-medium uppercase tracking-wide text-creek-600">{label}</p>
      <p className={`tabular mt-1 font-semibold text-creek-900 ${emphasis ? 'text-2xl' : 'text-lg'}`}>{value}</p>
      {detail && <p className="mt-0.5 text-xs text-creek-700">{detail}</p>}
    </div>
  );
}
