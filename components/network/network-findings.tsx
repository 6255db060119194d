'use client';

import type { NetworkRunWarning } from '@/lib/network/run-result';
import type { NetworkView } from '@/lib/network/view';
import { formatQuantity, type UnitSystem } from '@/lib/units';

const SEVERITY_WORDS = { danger: 'Danger', warning: 'Warning', info: 'Note' } as const;

function nameOf(view: NetworkView, warning: NetworkRunWarning): string | null {
  if (warning.nodeId) return view.records.nodes.find((n) => n.id === warning.nodeId)?.name ?? null;
  if (warning.linkId) return view.records.links.find((l) => l.id === warning.linkId)?.name ?? null;
  return null;
}

/** What a run found, each on the part it is about, worded with the part's name and the project's units. */
export function NetworkFindings({
  view,
  warnings,
  units,
  label,
}: {
  view: NetworkView;
  warnings: readonly NetworkRunWarning[];
  units: UnitSystem;
  label: string;
}) {
  if (warnings.length === 0) return null;
  return (
    <ul className="mt-3 space-y-1 text-sm" aria-label={label}>
      {warnings.map((w, i) => (
        <li
          key={i}
          className={
            w.severity === 'danger' ? 'text-clay-700' : w.severity === 'warning' ? 'text-ochre-700' : 'text-creek-700'
          }
        >
          <strong>{SEVERITY_WORDS[w.severity]}</strong>
          {nameOf(view, w) ? ` — ${nameOf(view, w)}` : ''}
          {w.chainageM !== undefined ? ` at chainage ${formatQuantity('chainage', w.chainageM, units)}` : ''}:{' '}
          {w.message}
        </li>
      ))}
    </ul>
  );
}
