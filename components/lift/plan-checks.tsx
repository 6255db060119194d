import type { PlanCheck } from '@/hydraulics/index';
import type { UnitSystem } from '@/lib/units';
import { planCheckText } from '@/lib/lift/check-words';

const SEVERITY = {
  error: { label: 'Will not work', className: 'border-clay-100 bg-clay-50 text-clay-700' },
  warning: { label: 'Check', className: 'border-ochre-100 bg-ochre-50 text-ochre-700' },
  info: { label: 'Note', className: 'border-creek-100 bg-creek-50 text-creek-800' },
} as const;

/** Findings with their reason, the fix, and the source of the rule. */
export function PlanChecks({
  checks,
  emptyText,
  units,
}: {
  checks: readonly PlanCheck[];
  emptyText?: string;
  units: UnitSystem;
}) {
  if (checks.length === 0) return emptyText ? <p className="text-sm text-moss-700">{emptyText}</p> : null;
  return (
    <ul className="space-y-2" aria-label="Checks">
      {checks.map((check) => {
        const text = planCheckText(check, units);
        return (
          <li
            key={`${check.code}-${check.message}`}
            data-code={check.code}
            className={`rounded-md border px-3 py-2 text-sm ${SEVERITY[check.severity].className}`}
          >
            <p>
              <span className="font-semibold">{SEVERITY[check.severity].label}:</span> {text.message}
            </p>
            {text.fix && (
              <p className="mt-1">
                <span className="font-medium">Fix:</span> {text.fix}
              </p>
            )}
            <p className="mt-1 text-xs opacity-80">Basis: {check.source}</p>
          </li>
        );
      })}
    </ul>
  );
}

/** The caution shown wherever a figure can hurt someone if trusted blindly. */
export function Caution({ text }: { text: string }) {
  return (
    <p role="note" className="rounded-md border border-ochre-100 bg-ochre-50 px-3 py-2 text-sm text-ochre-700">
      <span className="font-semibold">Caution.</span> {text}
    </p>
  );
}
