import type { RevisionComparison } from '@/lib/review/compare';
import type { DesignCost } from '@/lib/review/cost';
import { DEVICE_STYLE } from '@/lib/chart/profile-palette';
import { formatQuantity, formatNumber, type UnitSystem } from '@/lib/units';

const dash = '—';
const money = (v: number) => formatNumber(v, 2);
const signed = (v: number) => (v > 0 ? `+${money(v)}` : money(v));

/** What a side's total leaves out, in words, or null when it counts every pipe. */
function costNote(name: string, cost: DesignCost | null, system: UnitSystem): string | null {
  if (!cost) return null;
  const parts = [
    cost.unpricedLengthM > 0
      ? `${formatQuantity('length', cost.unpricedLengthM, system)} of pipe has no price in the list and is not in the total`
      : null,
    cost.uncountedLines.length > 0
      ? `line(s) ${cost.uncountedLines.join(', ')} could not be analysed, so their pipe is not counted`
      : null,
  ].filter(Boolean);
  return parts.length ? `${name}: ${parts.join('; ')}.` : null;
}

/** Pipe material cost of the two revisions at the price lists they froze, pipe by pipe. */
function CostSection({
  before,
  after,
  difference,
  system,
  beforeLabel,
  afterLabel,
}: RevisionComparison['cost'] & { system: UnitSystem; beforeLabel: string; afterLabel: string }) {
  const pipes = [
    ...new Map([...(before?.rows ?? []), ...(after?.rows ?? [])].map((r) => [r.pipeId, r.label])).entries(),
  ].sort((a, b) => a[1].localeCompare(b[1]));
  const rowOf = (cost: DesignCost | null, pipeId: string) => cost?.rows.find((r) => r.pipeId === pipeId) ?? null;
  const cell = (cost: DesignCost | null, pipeId: string) => {
    const row = rowOf(cost, pipeId);
    if (!row) return dash;
    return `${formatQuantity('length', row.lengthM, system)} × ${row.costPerM === null ? 'no price' : money(row.costPerM)} = ${row.cost === null ? 'not priced' : money(row.cost)}`;
  };
  const total = (cost: DesignCost | null) => (cost ? money(cost.total) : 'no price list kept');
  return (
    <section className="rounded-md border border-creek-100 bg-white p-3 text-sm" data-testid="cost-compare">
      <h3 className="font-semibold text-creek-900">Pipe cost (team price list in force when each revision was made)</h3>
      <table className="mt-2 w-full text-left">
        <thead className="text-xs text-creek-600">
          <tr>
            <th className="py-1 pr-3 font-medium">Pipe</th>
            <th className="py-1 pr-3 font-medium">{beforeLabel}</th>
            <th className="py-1 pr-3 font-medium">{afterLabel}</th>
            <th className="py-1 font-medium">Difference</th>
          </tr>
        </thead>
        <tbody>
          {pipes.map(([pipeId, label]) => {
            const a = rowOf(before, pipeId)?.cost ?? null;
            const b = rowOf(after, pipeId)?.cost ?? null;
            return (
              <tr key={pipeId} className="border-t border-creek-50" data-testid="cost-row">
                <td className="py-1 pr-3">{label}</td>
                <td className="py-1 pr-3 tabular">{cell(before, pipeId)}</td>
                <td className="py-1 pr-3 tabular">{cell(after, pipeId)}</td>
                <td className="py-1 tabular">{a === null && b === null ? dash : signed((b ?? 0) - (a ?? 0))}</td>
              </tr>
            );
          })}
          <tr className="border-t-2 border-creek-100 font-semibold" data-testid="cost-total">
            <td className="py-1 pr-3">Total</td>
            <td className="py-1 pr-3 tabular">{total(before)}</td>
            <td className="py-1 pr-3 tabular">{total(after)}</td>
            <td className="py-1 tabular">{difference === null ? dash : signed(difference)}</td>
          </tr>
        </tbody>
      </table>
      {[costNote(beforeLabel, before, system), costNote(afterLabel, after, system)].filter(Boolean).map((note) => (
        <p key={note} className="mt-1 text-xs text-clay-700">
          {note}
        </p>
      ))}
      <p className="mt-1 text-xs text-creek-600">
        Pipe only, by slope length; fittings, valves, tanks and labour are not included.
      </p>
    </section>
  );
}

/** Residual pressure head at each network outlet in the two revisions' peak-hour solves. */
function OutletSection({
  outlets,
  missing,
  system,
  beforeLabel,
  afterLabel,
}: {
  outlets: RevisionComparison['outlets'];
  missing: RevisionComparison['outletsMissing'];
  system: UnitSystem;
  beforeLabel: string;
  afterLabel: string;
}) {
  const head = (v: number | null, why: string | null) =>
    v === null ? (why ?? dash) : formatQuantity('head', v, system);
  return (
    <section className="rounded-md border border-creek-100 bg-white p-3 text-sm" data-testid="outlet-compare">
      <h3 className="font-semibold text-creek-900">Network outlets: residual pressure at the peak hour</h3>
      {outlets.length === 0 ? (
        <p className="mt-1 text-creek-700">No network outlets in either revision.</p>
      ) : (
        <table className="mt-2 w-full text-left">
          <thead className="text-xs text-creek-600">
            <tr>
              <th className="py-1 pr-3 font-medium">Outlet</th>
              <th className="py-1 pr-3 font-medium">{beforeLabel}</th>
              <th className="py-1 pr-3 font-medium">{afterLabel}</th>
              <th className="py-1 pr-3 font-medium">Difference</th>
              <th className="py-1 font-medium">Wanted</th>
            </tr>
          </thead>
          <tbody>
            {outlets.map((o) => {
              const short = o.after !== null && o.minimumM !== null && o.after < o.minimumM - 1e-6;
              return (
                <tr
                  key={o.nodeId}
                  className="border-t border-creek-50"
                  data-testid="outlet-pressure"
                  data-outlet={o.name}
                  data-change={o.change}
                >
                  <td className="py-1 pr-3">{o.name}</td>
                  <td className="py-1 pr-3 tabular">
                    {head(o.before, o.change === 'added' ? 'not in this revision' : missing.before)}
                  </td>
                  <td className={`py-1 pr-3 tabular ${short ? 'font-semibold text-clay-700' : ''}`}>
                    {head(o.after, o.change === 'removed' ? 'not in this revision' : missing.after)}
                    {short ? ' (short)' : ''}
                  </td>
                  <td className="py-1 pr-3 tabular">
                    {o.before !== null && o.after !== null
                      ? `${o.after - o.before >= 0 ? '+' : ''}${formatQuantity('head', o.after - o.before, system)}`
                      : dash}
                  </td>
                  <td className="py-1 tabular">
                    {o.minimumM === null ? dash : formatQuantity('head', o.minimumM, system)}
                  </td>
                </tr>
              );
            })}
          </tbody>
        </table>
      )}
      <p className="mt-1 text-xs text-creek-600">
        Each revision&apos;s network as it was solved when the revision was made: every outlet drawing its peak, tanks
        at their lowest working level. Check pressures against the pipe&apos;s rating and local codes before building.
      </p>
    </section>
  );
}

/** What changed between two revisions, line by line, then storage, rams and demand. */
export function CompareTable({
  comparison,
  system,
  beforeLabel,
  afterLabel,
}: {
  comparison: RevisionComparison;
  system: UnitSystem;
  beforeLabel: string;
  afterLabel: string;
}) {
  const head = (v: number | null) => (v === null ? dash : formatQuantity('head', v, system));
  const flow = (v: number | null) => (v === null ? dash : formatQuantity('designFlow', v, system));
  return (
    <div className="space-y-4" data-testid="compare-table">
      <CostSection {...comparison.cost} system={system} beforeLabel={beforeLabel} afterLabel={afterLabel} />
      <OutletSection
        outlets={comparison.outlets}
        missing={comparison.outletsMissing}
        system={system}
        beforeLabel={beforeLabel}
        afterLabel={afterLabel}
      />
      {comparison.lines.map((l) => (
        <section
          key={l.lineId}
          className="rounded-md border border-creek-100 bg-white p-3 text-sm"
          data-line={l.name}
          data-change={l.change}
        >
          <h3 className="font-semibold text-creek-900">
            {l.name} <span className="ml-2 text-xs font-normal text-creek-700">{l.change}</span>
          </h3>
          <table className="mt-2 w-full text-left">
            <thead className="text-xs text-creek-600">
              <tr>
                <th className="py-1 pr-3 font-medium">What</th>
                <th className="py-1 pr-3 font-medium">{beforeLabel}</th>
                <th className="py-1 font-medium">{afterLabel}</th>
              </tr>
            </thead>
            <tbody>
              {l.pipes.map((p) => (
                <tr key={`pipe-${p.fromM}`} className="border-t border-creek-50" data-testid="pipe-change">
                  <td className="py-1 pr-3">
                    Pipe, ch. {formatQuantity('chainage', p.fromM, system)} to{' '}
                    {formatQuantity('chainage', p.toM, system)}
                  </td>
                  <td className="py-1 pr-3">{p.before ?? dash}</td>
                  <td className="py-1">{p.after ?? dash}</td>
                </tr>
              ))}
              {l.devices.map((d) => (
                <tr
                  key={`dev-${d.kind}-${d.chainageM}-${d.change}`}
                  className="border-t border-creek-50"
                  data-testid="device-change"
                >
                  <td className="py-1 pr-3">
                    {DEVICE_STYLE[d.kind].label}, ch. {formatQuantity('chainage', d.chainageM, system)}
                  </td>
                  <td className="py-1 pr-3">{d.change === 'removed' ? 'present' : dash}</td>
                  <td className="py-1">{d.change === 'added' ? 'added' : 'removed'}</td>
                </tr>
              ))}
              <tr className="border-t border-creek-50" data-testid="outlet-change">
                <td className="py-1 pr-3">Residual pressure at the end</td>
                <td className="py-1 pr-3">{head(l.outletHeadM.before)}</td>
                <td className="py-1">{head(l.outletHeadM.after)}</td>
              </tr>
              <tr className="border-t border-creek-50">
                <td className="py-1 pr-3">Flow</td>
                <td className="py-1 pr-3">{flow(l.flowM3s.before)}</td>
                <td className="py-1">{flow(l.flowM3s.after)}</td>
              </tr>
            </tbody>
          </table>
        </section>
      ))}
      <section className="rounded-md border border-creek-100 bg-white p-3 text-sm">
        <h3 className="font-semibold text-creek-900">Storage, rams, demand and the network</h3>
        <ul className="mt-1 list-inside list-disc text-creek-800">
          {(
            [
              ['Tanks', comparison.tanks],
              ['Ram sites', comparison.ramSites],
              ['Demand uses', comparison.demandUses],
              ['Network nodes (take-offs, outlets)', comparison.networkNodes],
              ['Network links', comparison.networkLinks],
            ] as const
          ).map(([name, c]) => (
            <li key={name}>
              {name}:{' '}
              {c.added.length + c.removed.length + c.changed.length === 0
                ? 'no change'
                : [
                    c.added.length ? `added ${c.added.join(', ')}` : '',
                    c.removed.length ? `removed ${c.removed.join(', ')}` : '',
                    c.changed.length ? `changed ${c.changed.join(', ')}` : '',
                  ]
                    .filter(Boolean)
                    .join('; ')}
            </li>
          ))}
        </ul>
        <p className="mt-2 text-xs text-creek-600">{formatNumber(comparison.lines.length, 0)} line(s) compared.</p>
      </section>
    </div>
  );
}
