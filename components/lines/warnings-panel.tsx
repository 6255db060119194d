'use client';

import type { LineWarning } from '@/hydraulics/index';
import { downloadText } from '@/lib/lines/download';
import { fixWords, placeWords, SEVERITY_WORDS, warningText, warningsCsv } from '@/lib/lines/warning-words';
import { formatQuantity, type DisplayUnits } from '@/lib/units';
import { Button } from '@/components/ui/button';

const CHIP = {
  danger: 'bg-clay-600 text-white',
  warning: 'bg-ochre-700 text-white',
  info: 'bg-creek-100 text-creek-800',
} as const;

/** The small highs or lows an item groups, a click away. */
function Members({ warning, units }: { warning: LineWarning; units: DisplayUnits }) {
  const members = warning.memberChainagesM ?? [];
  if (members.length < 2) return null;
  return (
    <details className="mt-1 text-sm text-creek-700" data-testid="warning-members">
      <summary className="cursor-pointer select-none">
        Show the {members.length} small {warning.code === 'air-release-needed' ? 'highs' : 'lows'} this item stands for
      </summary>
      <p className="tabular mt-1">
        {members.map((c) => `ch. ${formatQuantity('chainage', c, units.system)}`).join(' · ')}
      </p>
    </details>
  );
}

/** Every finding with what, where, why and the fix; click to see it on the profile, apply a fix in one click. */
export function WarningsPanel({
  warnings,
  units,
  selected,
  onSelect,
  onApply,
  canEdit,
  csvFileName,
}: {
  warnings: readonly LineWarning[];
  /** File name for the warnings CSV download. */
  csvFileName: string;
  units: DisplayUnits;
  selected: number | null;
  onSelect: (index: number) => void;
  onApply: (warning: LineWarning) => void;
  canEdit: boolean;
}) {
  if (warnings.length === 0) {
    return (
      <p className="rounded-md border border-moss-100 bg-moss-50 p-3 text-sm text-moss-700">
        The checks found nothing to warn about on this line.
      </p>
    );
  }
  return (
    <div className="space-y-1">
      <div className="flex justify-end">
        <Button
          tone="quiet"
          className="py-1 text-xs"
          onClick={() => downloadText(warningsCsv(warnings, units), csvFileName, 'text/csv')}
          data-testid="warnings-csv"
        >
          Download warnings CSV
        </Button>
      </div>
      <ol
        className="divide-y divide-creek-50 rounded-lg border border-creek-100 bg-white"
        aria-label="Warnings"
        data-testid="warnings"
      >
        {warnings.map((w, i) => {
          const text = warningText(w, units);
          return (
            <li
              key={`${w.code}-${i}`}
              className={`p-3 ${selected === i ? 'bg-creek-50' : ''}`}
              data-code={w.code}
              data-severity={w.severity}
            >
              <div className="flex flex-wrap items-start justify-between gap-2">
                <button
                  type="button"
                  onClick={() => onSelect(i)}
                  className="flex flex-wrap items-center gap-2 text-left"
                  aria-pressed={selected === i}
                >
                  <span className={`rounded px-1.5 py-0.5 text-xs font-semibold ${CHIP[w.severity]}`}>
                    {SEVERITY_WORDS[w.severity]}
                  </span>
                  <span className="font-medium text-creek-900 underline-offset-2 hover:underline">{text.title}</span>
                  <span className="tabular text-sm text-creek-700">{placeWords(w.at, units)}</span>
                </button>
                {canEdit && w.fixes.length > 0 && (
                  <Button tone="quiet" className="py-1 text-xs" onClick={() => onApply(w)} data-testid="apply-fix">
                    {fixWords(w.fixes, units)}
                  </Button>
                )}
              </div>
              <p className="mt-1 text-sm text-creek-800">{text.message}</p>
              <p className="mt-1 text-sm text-creek-700">
                <span className="font-medium">Fix: </span>
                {text.fix}
              </p>
              <Members warning={w} units={units} />
            </li>
          );
        })}
      </ol>
    </div>
  );
}
