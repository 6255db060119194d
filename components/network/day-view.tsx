'use client';

import { HourChart } from '@/components/ui/hour-chart';
import { Panel } from '@/components/ui/panel';
import { HeadCell, TableFrame } from '@/components/ui/table-frame';
import { dayViewModel } from '@/lib/network/day-view';
import { networkFrictionWords } from '@/lib/network/friction-words';
import type { DayRunResult } from '@/lib/network/run-result';
import type { NetworkView } from '@/lib/network/view';
import { formatQuantity, type UnitSystem } from '@/lib/units';
import { NetworkFindings } from './network-findings';

/** The 24-hour run: each tank's water through the day, outlet pressures, the source draw, and what the day flags. */
export function DayView({ view, units }: { view: NetworkView; units: UnitSystem }) {
  const run = view.runs.day;
  const day = run?.status === 'done' ? (run.result as DayRunResult) : null;
  if (!day) {
    return (
      <Panel title="A day of operation">
        <p className="text-sm text-creek-700" data-testid="day-summary">
          {run?.status === 'failed'
            ? `The last day run failed: ${run.error?.message ?? 'no reason given'}`
            : 'Not run yet: press "Run a 24-hour day" to see tank levels, outlet pressures and the source draw hour by hour.'}
        </p>
      </Panel>
    );
  }
  const model = dayViewModel(view, day);
  const short = model.outlets.filter((o) => o.short).length;
  return (
    <Panel
      title="A day of operation"
      aside={
        <span className="text-xs text-creek-600">
          Hourly steps; each outlet draws with the hourly pattern of its uses; tanks start half full.
        </span>
      }
    >
      <p className="text-sm text-creek-800" data-testid="day-summary">
        {model.tanks.length} {model.tanks.length === 1 ? 'tank' : 'tanks'}, {model.outlets.length} outlets over{' '}
        {model.hours} hours;{' '}
        {short === 0
          ? 'every outlet keeps its residual pressure all day'
          : `${short} ${short === 1 ? 'outlet is' : 'outlets are'} short of residual pressure at their worst hour`}
        .
      </p>
      <p className="mt-1 text-xs text-creek-700" data-testid="day-friction">
        {networkFrictionWords(day.friction)}
      </p>
      <NetworkFindings view={view} warnings={day.warnings} units={units} label="Day findings" />
      <div className="mt-4 grid gap-4 lg:grid-cols-2">
        {model.tanks.length > 0 && (
          <HourChart
            title="Water depth in each tank"
            quantity="length"
            units={units}
            hours={model.hours}
            lines={model.tanks.map((tank) => ({ key: tank.name, values: tank.depthsM }))}
            summary={model.tanks
              .map(
                (t) =>
                  `${t.name}: between ${formatQuantity('length', t.lowestDepthM, units)} and ${formatQuantity('length', t.highestDepthM, units)} deep; overflows at ${formatQuantity('length', t.overflowDepthM, units)}.`,
              )
              .join(' ')}
          />
        )}
        {model.outlets.length > 0 && (
          <HourChart
            title="Pressure head at each outlet"
            quantity="head"
            zero={false}
            units={units}
            hours={model.hours}
            lines={model.outlets.map((outlet) => ({ key: outlet.name, values: outlet.pressureHeadsM }))}
            summary={model.outlets
              .map(
                (o) => `${o.name}: lowest ${o.lowest ? formatQuantity('head', o.lowest.pressureHeadM, units) : '—'}.`,
              )
              .join(' ')}
          />
        )}
        {model.sources.length > 0 && (
          <HourChart
            title="Draw from each source"
            quantity="designFlow"
            units={units}
            hours={model.hours}
            lines={model.sources.map((source) => ({ key: source.name, values: source.drawM3s }))}
            summary={model.sources
              .map(
                (s) =>
                  `${s.name}: at most ${formatQuantity('designFlow', s.highestDrawM3s, units)}${s.yieldM3s !== null ? ` against a design yield of ${formatQuantity('designFlow', s.yieldM3s, units)}` : ''}.`,
              )
              .join(' ')}
          />
        )}
      </div>
      <div className="mt-4 grid gap-4 xl:grid-cols-2">
        <TableFrame
          head={
            <>
              <HeadCell>Tank</HeadCell>
              <HeadCell>Lowest</HeadCell>
              <HeadCell>Highest</HeadCell>
              <HeadCell>Overflows at</HeadCell>
              <HeadCell>Storage its outlets need</HeadCell>
            </>
          }
        >
          {model.tanks.map((tank) => (
            <tr key={tank.nodeId} className="border-t border-creek-50 tabular" aria-label={`Day tank ${tank.name}`}>
              <td className="px-4 py-1.5">{tank.name}</td>
              <td className={`px-4 py-1.5 ${tank.lowestDepthM <= 1e-6 ? 'font-semibold text-clay-700' : ''}`}>
                {formatQuantity('length', tank.lowestDepthM, units)}
                {tank.lowestDepthM <= 1e-6 ? ' (empty)' : ''}
              </td>
              <td
                className={`px-4 py-1.5 ${tank.highestDepthM >= tank.overflowDepthM - 1e-6 ? 'font-semibold text-ochre-700' : ''}`}
              >
                {formatQuantity('length', tank.highestDepthM, units)}
                {tank.highestDepthM >= tank.overflowDepthM - 1e-6 ? ' (full)' : ''}
              </td>
              <td className="px-4 py-1.5">{formatQuantity('length', tank.overflowDepthM, units)}</td>
              <td className="px-4 py-1.5">
                {tank.storageNeededM3 === null ? '—' : formatQuantity('volume', tank.storageNeededM3, units)}
              </td>
            </tr>
          ))}
        </TableFrame>
        <TableFrame
          head={
            <>
              <HeadCell>Outlet</HeadCell>
              <HeadCell>Wants</HeadCell>
              <HeadCell>Lowest in the day</HeadCell>
              <HeadCell>At hour</HeadCell>
            </>
          }
        >
          {model.outlets.map((outlet) => (
            <tr
              key={outlet.nodeId}
              className="border-t border-creek-50 tabular"
              aria-label={`Day outlet ${outlet.name}`}
            >
              <td className="px-4 py-1.5">{outlet.name}</td>
              <td className="px-4 py-1.5">
                {outlet.wantedM === null ? '—' : formatQuantity('head', outlet.wantedM, units)}
              </td>
              <td className={`px-4 py-1.5 ${outlet.short ? 'font-semibold text-clay-700' : ''}`}>
                {outlet.lowest ? formatQuantity('head', outlet.lowest.pressureHeadM, units) : '—'}
                {outlet.short ? ' short' : ''}
              </td>
              <td className="px-4 py-1.5">{outlet.lowest ? `${outlet.lowest.hour}:00` : '—'}</td>
            </tr>
          ))}
        </TableFrame>
      </div>
    </Panel>
  );
}
