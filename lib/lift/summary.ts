import type { RamPlanResult } from '../../hydraulics/index';
import { commissioningOutcome, type CommissioningView } from './commissioning';
import { demandView, type DemandView } from './demand';
import { deliveryLengthM, planRamSite, tablePlanOf } from './ram-plan';
import type {
  CommissioningRecord,
  LiftRecords,
  Outcome,
  RamSiteRecord,
  RouteOption,
  SeasonalTaskRecord,
  TankRecord,
} from './records';
import { sourceYieldView, type SourceYieldView } from './source-yield';
import { tankSizingView, type TankSizingView, type TankSupply } from './storage';

export interface RamSiteView {
  site: RamSiteRecord;
  deliveryLengthM: number;
  routeName: string | null;
  source: { id: string; name: string } | null;
  tank: { id: string; name: string; volumeM3: number } | null;
  plan: Outcome<RamPlanResult>;
  /** The plan on the published efficiency table when the site carries a measured override. */
  tablePlan: RamPlanResult | null;
  /** Newest first. */
  commissioning: { reading: CommissioningRecord; result: Outcome<CommissioningView> }[];
}

export interface TankView {
  tank: TankRecord;
  supply: TankSupply;
  sizing: Outcome<TankSizingView>;
}

/** Everything the lift and storage page shows, computed from the stored rows. */
export interface LiftSummary {
  sources: SourceYieldView[];
  ramSites: RamSiteView[];
  tanks: TankView[];
  demand: DemandView;
  seasonalTasks: SeasonalTaskRecord[];
  routes: RouteOption[];
}

function ramSiteView(site: RamSiteRecord, records: LiftRecords): RamSiteView {
  const tank = records.tanks.find((candidate) => candidate.id === site.tankId) ?? null;
  const source = records.sources.find((candidate) => candidate.id === site.sourceId) ?? null;
  const context = { routes: records.routes, tankVolumeM3: tank?.volumeM3 ?? null };
  const plan = planRamSite(site, context);
  const tablePlan = tablePlanOf(site, context);
  const comparePlan = tablePlan ?? (plan.ok ? plan.value : null);
  const commissioning = records.commissioning
    .filter((reading) => reading.ramSiteId === site.id)
    .sort((a, b) => b.measuredOn.localeCompare(a.measuredOn))
    .map((reading) => ({ reading, result: commissioningOutcome(reading, comparePlan) }));
  return {
    site,
    deliveryLengthM: deliveryLengthM(site, records.routes),
    routeName: records.routes.find((route) => route.id === site.deliveryPipe.routeId)?.name ?? null,
    source: source && { id: source.id, name: source.name },
    tank: tank && { id: tank.id, name: tank.name, volumeM3: tank.volumeM3 },
    plan,
    tablePlan,
    commissioning,
  };
}

function tankSupply(
  tank: TankRecord,
  ramSites: readonly RamSiteView[],
  sources: readonly SourceYieldView[],
): TankSupply {
  if (tank.supplyKind === 'entered')
    return { flowM3s: tank.supplyFlowM3s, basis: 'entered', note: 'Supply flow entered.' };
  if (tank.supplyKind === 'source') {
    const source = sources.find((view) => view.source.id === tank.supplySourceId);
    if (!source) return { flowM3s: null, basis: 'source', note: 'Choose the source that feeds this tank.' };
    if (!source.design.ok)
      return {
        flowM3s: null,
        basis: 'source',
        note: `No design yield for ${source.source.name}: ${source.design.error}`,
      };
    return {
      flowM3s: source.design.value.designYieldM3s,
      basis: 'source',
      note: `Design yield of ${source.source.name}.`,
    };
  }
  const feeding = ramSites.filter((view) => view.site.tankId === tank.id);
  const planned = feeding.flatMap((view) => (view.plan.ok && view.plan.value.deliveredFlowM3s > 0 ? [view] : []));
  if (planned.length === 0) {
    return {
      flowM3s: null,
      basis: 'ram-sites',
      note: feeding.length
        ? 'The ram sites that deliver here have no workable plan yet.'
        : 'No ram site delivers to this tank yet.',
    };
  }
  const flowM3s = planned.reduce((sum, view) => sum + (view.plan.ok ? view.plan.value.deliveredFlowM3s : 0), 0);
  return {
    flowM3s,
    basis: 'ram-sites',
    note: `Planned delivery of ${planned.map((view) => view.site.name).join(', ')}.`,
  };
}

/** Builds the lift summary; pure, so the page, the API and the tests compute the same thing. */
export function buildLiftSummary(records: LiftRecords): LiftSummary {
  const ramSites = records.ramSites.map((site) => ramSiteView(site, records));
  const sources = records.sources.map((source) => {
    const rams = records.ramSites.filter((site) => site.sourceId === source.id);
    const drawM3s = rams.reduce((sum, site) => sum + site.driveFlowM3s, 0) + source.otherDrawM3s;
    return sourceYieldView(source, records.yieldReadings, drawM3s);
  });
  const demand = demandView(records.demandUses);
  const demandHourlyM3 = demand.total.ok ? demand.total.value.hourlyVolumeM3 : new Array<number>(24).fill(0);
  const tanks = records.tanks.map((tank) => {
    const supply = tankSupply(tank, ramSites, sources);
    return { tank, supply, sizing: tankSizingView(tank, supply, demandHourlyM3) };
  });
  const seasonalTasks = [...records.seasonalTasks].sort(
    (a, b) => a.dueOn.localeCompare(b.dueOn) || a.title.localeCompare(b.title),
  );
  return { sources, ramSites, tanks, demand, seasonalTasks, routes: records.routes };
}
