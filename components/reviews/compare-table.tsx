import type { RevisionComparison } from '@/lib/review/compare';
import { DEVICE_STYLE } from '@/lib/chart/profile-palette';
import { formatQuantity, formatNumber, type UnitSystem } from '@/lib/units';

const dash = '—';

/** What changed between two revisions, line by line, then storage, rams and demand. */
export function CompareTable({ comparison, system, beforeLabel, afterLabel }: { comparison: RevisionComparison; system: UnitSystem; beforeLabel: string; afterLabel: string }) {
  const head = (v: number | null) => (v === null ? dash : formatQuantity('head', v, system));
  const flow = (v: number | null) => (v === null ? dash : formatQuantity('designFlow', v, system));
  return (
    <div className="space-y-4" data-testid="compare-table">
      {comparison.lines.map((l) => (
        <section key={l.lineId} className="rounded-md border border-creek-100 bg-white p-3 text-sm" data-line={l.name} data-change={l.change}>
          <h3 className="font-semibold text-creek-900">{l.name} <span className="ml-2 text-xs font-normal text-creek-700">{l.change}</span></h3>
          <table className="mt-2 w-full text-left">
            <thead className="text-xs text-creek-600"><tr><th className="py-1 pr-3 font-medium">What</th><th className="py-1 pr-3 font-medium">{beforeLabel}</th><th className="py-1 font-medium">{afterLabel}</th></tr></thead>
            <tbody>
              {l.pipes.map((p) => (
                <tr key={`pipe-${p.fromM}`} className="border-t border-creek-50" data-testid="pipe-change">
                  <td className="py-1 pr-3">Pipe, ch. {formatQuantity('chainage', p.fromM, system)} to {formatQuantity('chainage', p.toM, system)}</td>
                  <td className="py-1 pr-3">{p.before ?? dash}</td><td className="py-1">{p.after ?? dash}</td>
                </tr>
              ))}
              {l.devices.map((d) => (
                <tr key={`dev-${d.kind}-${d.chainageM}-${d.change}`} className="border-t border-creek-50" data-testid="device-change">
                  <td className="py-1 pr-3">{DEVICE_STYLE[d.kind].label}, ch. {formatQuantity('chainage', d.chainageM, system)}</td>
                  <td className="py-1 pr-3">{d.change === 'removed' ? 'present' : dash}</td><td className="py-1">{d.change === 'added' ? 'added' : 'removed'}</td>
                </tr>
              ))}
              <tr className="border-t border-creek-50" data-testid="outlet-change"><td className="py-1 pr-3">Residual pressure at the end</td><td className="py-1 pr-3">{head(l.outletHeadM.before)}</td><td className="py-1">{head(l.outletHeadM.after)}</td></tr>
              <tr className="border-t border-creek-50"><td className="py-1 pr-3">Flow</td><td className="py-1 pr-3">{flow(l.flowM3s.before)}</td><td className="py-1">{flow(l.flowM3s.after)}</td></tr>
            </tbody>
          </table>
        </section>
      ))}
      <section className="rounded-md border border-creek-100 bg-white p-3 text-sm">
        <h3 className="font-semibold text-creek-900">Storage, rams, demand and the network</h3>
        <ul className="mt-1 list-inside list-disc text-creek-800">
          {([['Tanks', comparison.tanks], ['Ram sites', comparison.ramSites], ['Demand uses', comparison.demandUses], ['Network nodes (take-offs, outlets)', comparison.networkNodes], ['Network links', comparison.networkLinks]] as const).map(([name, c]) => (
            <li key={name}>{name}: {c.added.length + c.removed.length + c.changed.length === 0 ? 'no change' : [c.added.length ? `added ${c.added.join(', ')}` : '', c.removed.length ? `removed ${c.removed.join(', ')}` : '', c.changed.length ? `changed ${c.changed.join(', ')}` : ''].filter(Boolean).join('; ')}</li>
          ))}
        </ul>
        <p className="mt-2 text-xs text-creek-600">Cost is not compared yet: the team price list is not part of a revision. {formatNumber(comparison.lines.length, 0)} line(s) compared.</p>
      </section>
    </div>
  );
}
