'use client';

import { findPipe, type PipeSpec } from '@/hydraulics/index';
import { closestInSeries, PIPE_FAMILIES, pipeChoiceOf, pipeForFamily } from '@/lib/lines/pipe-choices';

const SELECT = 'block w-full rounded-md border border-creek-200 bg-white px-1.5 py-1 text-xs disabled:bg-creek-50';
const CUSTOM = 'custom';

/** Material and standard, then pressure class, then size; custom pipes of the line under their own heading. */
export function PipePicker({
  id,
  pipeId,
  custom,
  disabled,
  onPick,
}: {
  id: string;
  pipeId: string;
  custom: readonly PipeSpec[];
  disabled: boolean;
  onPick: (pipeId: string) => void;
}) {
  const choice = pipeChoiceOf(pipeId);
  const familyId = choice?.familyId ?? CUSTOM;
  const family = PIPE_FAMILIES.find((f) => f.id === familyId);
  const series = family?.classes.find((c) => c.seriesId === choice?.seriesId);
  const current = findPipe(pipeId) ?? custom.find((p) => p.id === pipeId);

  return (
    <div className="grid min-w-72 grid-cols-[1.4fr_1fr_0.8fr] gap-1">
      <select
        aria-label="Pipe material and standard"
        id={`${id}-family`}
        className={SELECT}
        disabled={disabled}
        value={familyId}
        onChange={(e) => {
          if (e.target.value === CUSTOM) return custom[0] && onPick(custom[0].id);
          onPick(pipeForFamily(e.target.value, current));
        }}
      >
        {PIPE_FAMILIES.map((f) => (
          <option key={f.id} value={f.id}>
            {f.label}
          </option>
        ))}
        {custom.length > 0 && <option value={CUSTOM}>Custom pipes of this line</option>}
      </select>
      {family && series ? (
        <>
          <select
            aria-label="Pressure class"
            className={SELECT}
            disabled={disabled}
            value={series.seriesId}
            onChange={(e) => onPick(closestInSeries(e.target.value, current))}
          >
            {family.classes.map((c) => (
              <option key={c.seriesId} value={c.seriesId}>
                {c.label}
              </option>
            ))}
          </select>
          <select
            aria-label="Size"
            className={SELECT}
            disabled={disabled}
            value={pipeId}
            onChange={(e) => onPick(e.target.value)}
          >
            {series.pipes.map((p) => (
              <option key={p.id} value={p.id}>
                {p.size}
              </option>
            ))}
          </select>
        </>
      ) : (
        <select
          aria-label="Custom pipe"
          className={`${SELECT} col-span-2`}
          disabled={disabled}
          value={pipeId}
          onChange={(e) => onPick(e.target.value)}
        >
          {custom.map((p) => (
            <option key={p.id} value={p.id}>
              {p.label}
            </option>
          ))}
        </select>
      )}
    </div>
  );
}
