'use client';

import { useQuery } from '@tanstack/react-query';
import Link from 'next/link';
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { useConfirm } from '@/components/ui/confirm-dialog';
import { HourChart } from '@/components/ui/hour-chart';
import type { TankView } from '@/lib/lift/summary';
import type { ProjectTankStorage } from '@/lib/data/network-tank-storage';
import type { TankStorageView } from '@/lib/network/run-result';
import { useDeleteTank } from '@/lib/queries/lift';
import { tankStorageQuery } from '@/lib/queries/network';
import { formatDuration, formatNumber, formatQuantity, type UnitSystem } from '@/lib/units';
import { PlanChecks } from './plan-checks';
import { Readout } from './readout';
import { TankForm } from './tank-form';

export interface StoragePanelProps {
  projectId: string;
  tanks: readonly TankView[];
  sources: readonly { id: string; name: string }[];
  units: UnitSystem;
  canEdit: boolean;
}

/** Per tank: the size that never runs dry, reserve, fill time, overflow, and the elevation the outlets need. */
export function StoragePanel({ projectId, tanks, sources, units, canEdit }: StoragePanelProps) {
  // Each tank sized from the outlets it serves in the network; a tank outside the network keeps the project-wide
  // figure.
  const network = useQuery({ ...tankStorageQuery(projectId), enabled: tanks.length > 0 });
  return (
    <div className="space-y-5">
      {tanks.length === 0 && (
        <p className="text-sm text-creek-700">
          No tank yet. Add the tank the ram fills to size it against the daily demand.
        </p>
      )}
      {network.data?.reason && tanks.length > 0 && (
        <p className="text-sm text-ochre-700" data-testid="tank-storage-reason">
          Storage per tank from the{' '}
          <Link className="underline" href={`/projects/${projectId}/network`}>
            network
          </Link>{' '}
          is not available: {network.data.reason}. Tanks below are sized against the whole project&apos;s demand.
        </p>
      )}
      {tanks.map((view) => (
        <TankCard
          key={view.tank.id}
          projectId={projectId}
          view={view}
          sources={sources}
          units={units}
          canEdit={canEdit}
          network={network.data}
          fromNetwork={network.data?.tanks.find((t) => t.tankId === view.tank.id) ?? null}
        />
      ))}
      {canEdit && (
        <details className="rounded-md border border-dashed border-creek-200 p-3">
          <summary className="cursor-pointer text-sm font-semibold text-creek-900">Add a tank</summary>
          <div className="mt-3">
            <TankForm projectId={projectId} units={units} tank={null} sources={sources} />
          </div>
        </details>
      )}
    </div>
  );
}

function TankCard({
  projectId,
  view,
  sources,
  units,
  canEdit,
  network,
  fromNetwork,
}: {
  projectId: string;
  view: TankView;
  sources: StoragePanelProps['sources'];
  units: UnitSystem;
  canEdit: boolean;
  network: ProjectTankStorage | undefined;
  fromNetwork: TankStorageView | null;
}) {
  const [editing, setEditing] = useState(false);
  const remove = useDeleteTank(projectId);
  const confirm = useConfirm();
  const { tank, supply, sizing } = view;
  return (
    <article className="space-y-3 rounded-md border border-creek-100 p-3" aria-label={tank.name}>
      {confirm.dialog}
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h3 className="font-semibold text-creek-900">
          {tank.name}{' '}
          <span className="text-sm font-normal text-creek-600">{formatQuantity('volume', tank.volumeM3, units)}</span>
        </h3>
        {canEdit && !editing && (
          <div className="flex gap-2">
            <Button tone="quiet" onClick={() => setEditing(true)}>
              Edit tank
            </Button>
            <Button
              tone="quiet"
              onClick={() =>
                confirm.ask({
                  title: `Delete the tank “${tank.name}”?`,
                  body: (
                    <>
                      <p>
                        The tank goes, and with it its tank in the network and the pipes joined to it there. Ram sites
                        that deliver into it stay, with no tank named.
                      </p>
                      <p>This cannot be undone.</p>
                    </>
                  ),
                  confirmLabel: 'Delete tank',
                  onConfirm: () => remove.mutateAsync(tank.id),
                })
              }
            >
              Delete tank
            </Button>
          </div>
        )}
      </div>
      {editing && (
        <TankForm projectId={projectId} units={units} tank={tank} sources={sources} onDone={() => setEditing(false)} />
      )}
      <p className="text-sm text-creek-700">
        Supply:{' '}
        {supply.flowM3s !== null
          ? `${formatQuantity('flow', supply.flowM3s, units)} for ${formatNumber(tank.supplyHoursPerDay, 1)} h a day. `
          : ''}
        {supply.note}
      </p>
      {fromNetwork ? (
        <>
          <NetworkStorage
            projectId={projectId}
            tank={fromNetwork}
            outletNames={network?.outletNames ?? {}}
            units={units}
          />
          <TankElevation view={view} units={units} />
        </>
      ) : !sizing.ok ? (
        <p role="alert" className="text-sm text-clay-700">
          Cannot size this tank: {sizing.error}
        </p>
      ) : (
        <>
          <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-4">
            <Readout
              emphasis
              label="Tank that never runs dry"
              value={formatQuantity('volume', sizing.value.sizing.totalStorageM3, units)}
              detail={`${formatQuantity('volume', sizing.value.sizing.cycleStorageM3, units)} for the daily cycle + ${formatQuantity('volume', sizing.value.sizing.reserveStorageM3, units)} for ${formatNumber(tank.reserveDays, 1)} days of reserve`}
            />
            <Readout
              emphasis
              label="Fill time from empty"
              value={formatDuration(sizing.value.fillTimeS)}
              detail={`${formatQuantity('volume', tank.volumeM3, units)} at the supply flow, outlets shut`}
            />
            <Readout
              label="Reserve this tank holds"
              value={
                sizing.value.reserveDaysHeld === null ? '—' : `${formatNumber(sizing.value.reserveDaysHeld, 1)} days`
              }
              detail="of average demand beyond the daily cycle"
            />
            <Readout
              label="Overflow to route away"
              value={formatQuantity('flow', sizing.value.sizing.overflowFlowM3s, units)}
              detail={`${formatQuantity('volume', sizing.value.sizing.dailyOverflowM3, units)} a day once full`}
            />
          </div>
          <TankElevation view={view} units={units} />
          <PlanChecks units={units} checks={sizing.value.checks} />
          <div className="grid gap-3 lg:grid-cols-2">
            <HourChart
              title="Mass curve of a day"
              units={units}
              hours={24}
              lines={[
                { key: 'Supply, cumulative', values: sizing.value.cumulativeSupplyM3 },
                { key: 'Demand, cumulative', values: sizing.value.cumulativeDemandM3 },
              ]}
              summary={`Over a day the supply adds ${formatQuantity('volume', sizing.value.sizing.massCurve.dailySupplyM3, units)} and the uses take ${formatQuantity('volume', sizing.value.sizing.massCurve.dailyDemandM3, units)}; the widest gap the tank must bridge is ${formatQuantity('volume', sizing.value.sizing.cycleStorageM3, units)}.`}
            />
            <HourChart
              title="Water in this tank over three days, starting full"
              units={units}
              hours={72}
              lines={[{ key: 'Water in the tank', values: sizing.value.levelOverThreeDaysM3 }]}
              summary={`The tank's lowest level over three days is ${formatQuantity('volume', Math.min(...sizing.value.levelOverThreeDaysM3), units)}.`}
            />
          </div>
        </>
      )}
    </article>
  );
}

/**
 * The tank's storage from the outlets it serves in the network (replaces the project-wide figure for a tank in the
 * network).
 */
function NetworkStorage({
  projectId,
  tank,
  outletNames,
  units,
}: {
  projectId: string;
  tank: TankStorageView;
  outletNames: Record<string, string>;
  units: UnitSystem;
}) {
  return (
    <div className="space-y-3" data-testid="tank-network-storage">
      <p className="text-sm text-creek-800">
        Serves, in the{' '}
        <Link className="underline" href={`/projects/${projectId}/network`}>
          network
        </Link>
        :{' '}
        {tank.servedOutlets.length === 0
          ? 'no outlet'
          : tank.servedOutlets
              .map(
                (o) =>
                  `${outletNames[o.nodeId] ?? 'an outlet'}${o.share < 0.999 ? ` (${formatNumber(o.share * 100, 0)} % of its water)` : ''}`,
              )
              .join(', ')}
        . Its outlets draw {formatQuantity('volume', tank.dailyDemandM3, units)} a day; the network fills it at{' '}
        {formatQuantity('flow', tank.supplyM3s, units)}.
      </p>
      {tank.problem || tank.totalStorageM3 === null ? (
        <p role="alert" className="text-sm text-clay-700">
          Cannot size this tank: {tank.problem ?? 'no supply'}
        </p>
      ) : (
        <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-3">
          <Readout
            emphasis
            label="Tank its outlets need"
            value={formatQuantity('volume', tank.totalStorageM3, units)}
            detail={`${formatQuantity('volume', tank.cycleStorageM3 ?? 0, units)} for the daily cycle + ${formatQuantity('volume', tank.reserveStorageM3 ?? 0, units)} of reserve`}
          />
          <Readout
            label="Fill time from empty"
            value={tank.fillTimeFromEmptyS === null ? '—' : formatDuration(tank.fillTimeFromEmptyS)}
            detail="at the network's inflow, outlets shut"
          />
          <Readout
            label="Drawn from this tank"
            value={`${formatQuantity('volume', tank.dailyDemandM3, units)} a day`}
            detail={`by ${tank.servedOutlets.length} ${tank.servedOutlets.length === 1 ? 'outlet' : 'outlets'}`}
          />
        </div>
      )}
      <HourChart
        title="What its outlets draw from this tank, hour by hour"
        units={units}
        hours={24}
        lines={[{ key: 'Drawn from the tank', values: tank.demandHourlyM3 }]}
        summary={`Over a day the outlets this tank serves draw ${formatQuantity('volume', tank.dailyDemandM3, units)}.`}
      />
    </div>
  );
}

function TankElevation({ view, units }: { view: TankView; units: UnitSystem }) {
  if (!view.sizing.ok) return null;
  const { required, lowestWaterLevelM, shortfallM } = view.sizing.value.elevation;
  if (!required)
    return (
      <p className="text-sm text-creek-700">Add the outlets below the tank to check the tank elevation they need.</p>
    );
  const governing = view.tank.outlets[required.governingOutletIndex];
  return (
    <p className="text-sm text-creek-800">
      Tank elevation needed: lowest working water level at least{' '}
      <strong className="tabular">{formatQuantity('elevation', required.minimumWaterLevelM, units)}</strong>, set by{' '}
      {governing?.label ?? 'an outlet'}
      {lowestWaterLevelM !== null && (
        <>
          ; this tank&apos;s lowest working level is {formatQuantity('elevation', lowestWaterLevelM, units)}
          {shortfallM ? `, ${formatQuantity('head', shortfallM, units)} too low` : ', high enough'}.
        </>
      )}
    </p>
  );
}
