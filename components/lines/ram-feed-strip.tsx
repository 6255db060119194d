import type { RamFeedAnswers } from '@/lib/lines/ram-feed';
import { type DisplayUnits, formatDuration, formatHeadPressure, formatPercent, formatQuantity } from '@/lib/units';

function Figure({
  label,
  value,
  note,
  tone = 'ok',
}: {
  label: string;
  value: string;
  note: string;
  tone?: 'ok' | 'bad';
}) {
  return (
    <div
      className={`rounded-lg border p-3 ${tone === 'ok' ? 'border-creek-100 bg-creek-50' : 'border-clay-100 bg-clay-50'}`}
    >
      <p className="text-xs uppercase tracking-wide text-creek-700">{label}</p>
      <p className="tabular text-lg font-semibold text-creek-950">{value}</p>
      <p className="text-xs text-creek-700">{note}</p>
    </div>
  );
}

/**
 * The ram that feeds this delivery line: which site, the head at the pump, what it delivers, and the peak head against
 * the pipe's rating.
 */
export function RamFeedStrip({
  feed,
  units,
  temperatureC,
}: {
  feed: RamFeedAnswers;
  units: DisplayUnits;
  temperatureC: number;
}) {
  const { outlet } = feed;
  const fill =
    outlet.tankFillTimeS !== null && outlet.tankName
      ? ` · fills ${outlet.tankName} in ${formatDuration(outlet.tankFillTimeS)}`
      : '';
  return (
    <section aria-label="Ram pump feeding this line" className="space-y-2" data-testid="ram-feed">
      <div className="grid gap-3 sm:grid-cols-2 xl:grid-cols-4">
        <Figure
          label="Fed by"
          value={outlet.name}
          note={`pump at ${formatQuantity('length', feed.pumpElevationM, units.system)}${feed.pumpElevationFrom === 'line-start' ? ' (ground at the line start; the ram site gives none)' : ''}`}
        />
        <Figure
          label="Head at the pump, delivering"
          value={formatHeadPressure(feed.workingHeadM, units.system, temperatureC)}
          note={`lift ${formatQuantity('length', outlet.liftM, units.system)} plus ${formatQuantity('headLoss', outlet.deliveryFrictionM, units.system)} friction in the ram's plan`}
        />
        <Figure
          label="Ram delivers"
          value={formatQuantity('flowPerDay', outlet.deliveredFlowM3s, units.system)}
          note={`${formatQuantity('flow', outlet.deliveredFlowM3s, units.system)}${fill}; ${feed.flowFromRam ? 'used as this line\u2019s flow' : 'this line uses the flow set below'}`}
        />
        <Figure
          label="Peak head at the pump, line shut"
          value={formatHeadPressure(feed.peakHeadAtPumpM, units.system, temperatureC)}
          note={`${feed.pipeAtPumpLabel} allows ${formatHeadPressure(feed.allowableHeadAtPumpM, units.system, temperatureC)}${feed.peakWithinRating ? '' : ': over its rating'}`}
          tone={feed.peakWithinRating ? 'ok' : 'bad'}
        />
      </div>
      <p className="text-xs text-creek-700">
        Efficiency {formatPercent(outlet.efficiency)} (
        {outlet.efficiencyBasis === 'measured' ? 'measured at commissioning' : outlet.efficiencySource}).{' '}
        {outlet.caution}
      </p>
    </section>
  );
}
