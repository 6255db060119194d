import {
  findPipe,
  runNetworkDay,
  sizeNetwork,
  sizeTankStorage,
  solveNetwork,
  tankFillNodeId,
  type SizingCandidate,
} from '../../hydraulics/index';
import type { NetworkContext } from './context';
import { buildNetworkInput, type BuiltNetwork } from './network-input';
import type { DayRunResult, SizeRunResult, SolveRunResult, TankStorageView } from './run-result';
import { explainCoreError, recordWarning, solveRunResult } from './solve-result';

/**
 * One steady solve of the network at the peak hour (every outlet drawing its peak, tanks at their lowest working
 * level).
 */
export function solveNetworkRun(context: NetworkContext): SolveRunResult {
  const built = buildNetworkInput(context);
  try {
    return solveRunResult(built, solveNetwork(built.input));
  } catch (error) {
    throw explainCoreError(built, context.records, error);
  }
}

/** The team's priced pipes as sizing candidates (prices of pipes no longer in the catalogue are skipped). */
export function sizingCandidates(context: NetworkContext): SizingCandidate[] {
  return context.prices.flatMap(({ pipeId, costPerM }) => {
    const pipe = findPipe(pipeId);
    return pipe
      ? [
          {
            pipe: {
              id: pipe.id,
              insideDiameterM: pipe.insideDiameterM,
              hazenWilliamsC: pipe.hazenWilliamsC,
              roughnessM: pipe.roughnessM,
              pressureRatingPa: pipe.pressureRatingPa,
              label: pipe.label,
            },
            costPerM,
          },
        ]
      : [];
  });
}

/** The built network with each link's pipe replaced by the one sizing chose. */
function withChosenPipes(built: BuiltNetwork, pipeByLink: Record<string, string>): BuiltNetwork {
  const pieces = Object.fromEntries(
    Object.entries(built.pieces).map(([coreId, piece]) => {
      const chosen = pipeByLink[coreId] ? findPipe(pipeByLink[coreId]) : undefined;
      return [coreId, chosen ? { ...piece, pipeId: chosen.id, pipeLabel: chosen.label } : piece];
    }),
  );
  const links = built.input.links.map((link) => {
    const chosen = pipeByLink[link.id] ? findPipe(pipeByLink[link.id]) : undefined;
    return chosen ? { ...link, pipe: chosen } : link;
  });
  return { ...built, pieces, input: { ...built.input, links } };
}

/**
 * Least-cost sizes from the team's price list: every outlet its residual at the peak hour, velocities
 * in band, static pressure within each class's rating (the core's sizing), compared with one size everywhere.
 */
export async function sizeNetworkRun(
  context: NetworkContext,
  options: { onePipePerLink: boolean; timeLimitS: number },
): Promise<SizeRunResult> {
  const built = buildNetworkInput(context);
  const candidates = sizingCandidates(context);
  if (candidates.length === 0) {
    return {
      kind: 'size',
      feasible: false,
      cost: null,
      uniform: null,
      solution: null,
      warnings: [
        {
          code: 'network.no-prices',
          severity: 'warning',
          message: "The team's price list is empty: price some pipes first",
        },
      ],
    };
  }
  const tankFillFlowsM3s = tankFillFlows(context, built);
  for (const nodeId of Object.keys(tankFillFlowsM3s))
    built.names[tankFillNodeId(nodeId)] = `${built.names[nodeId] ?? nodeId} inlet while filling`;
  let result;
  try {
    result = await sizeNetwork(built.input, {
      candidates,
      onePipePerLink: options.onePipePerLink,
      timeLimitS: options.timeLimitS,
      tankFillFlowsM3s,
    });
  } catch (error) {
    throw explainCoreError(built, context.records, error);
  }
  const sized = withChosenPipes(built, result.pipeByLink);
  const single = result.singleSize.pipeId ? findPipe(result.singleSize.pipeId) : undefined;
  return {
    kind: 'size',
    feasible: result.feasible,
    cost: result.feasible ? result.cost : null,
    uniform:
      single && result.singleSize.cost !== undefined
        ? {
            pipeId: single.id,
            pipeLabel: single.label,
            cost: result.singleSize.cost,
            feasible: result.singleSize.feasible,
          }
        : null,
    solution: solveRunResult(sized, result.solution),
    warnings: result.warnings.map((warning) => recordWarning(built, warning)),
  };
}

/**
 * The flow each tank's inlet must pass for the sizing: the daily demand of the outlets it serves (as
 * the storage sizing traces them) over the tank record's supply hours per day. Tanks fed by a ram
 * take what the ram delivers, and a network whose day cannot be traced keeps tanks at a fixed level.
 */
function tankFillFlows(context: NetworkContext, built: BuiltNetwork): Record<string, number> {
  let storage: TankStorageView[];
  try {
    storage = tankStorageRun(context);
  } catch {
    return {};
  }
  const fills: Record<string, number> = {};
  const kindOf = new Map(built.input.nodes.map((n) => [n.id, n.kind]));
  for (const tank of storage) {
    const inlets = built.input.links.filter((link) => link.to === tank.nodeId);
    if (inlets.length === 0 || inlets.some((link) => kindOf.get(link.from) === 'ram-outlet')) continue;
    const record = context.tanks.find((t) => t.id === tank.tankId);
    const hours = record?.supplyHoursPerDay ?? 24;
    if (tank.dailyDemandM3 > 0) fills[tank.nodeId] = tank.dailyDemandM3 / (hours * 3600);
  }
  return fills;
}

/**
 * Each tank's storage sized from the outlets it actually serves (traced along the flows solved at
 * the mean draw), with the reserve days of its tank record; keyed by the record nodes.
 */
export function tankStorageRun(
  context: NetworkContext,
  built: BuiltNetwork = buildNetworkInput(context, 'day'),
): TankStorageView[] {
  const reserveDays: Record<string, number> = {};
  for (const node of context.records.nodes) {
    const tank = node.kind === 'tank' ? context.tanks.find((t) => t.id === node.tankId) : undefined;
    if (tank) reserveDays[node.id] = tank.reserveDays;
  }
  let results;
  try {
    results = sizeTankStorage(built.input, { reserveDays: 0 });
  } catch (error) {
    throw explainCoreError(built, context.records, error);
  }
  const tankIdOf = new Map(context.records.nodes.map((n) => [n.id, n.tankId]));
  return results.map((result) => {
    const dailyDemandM3 = result.demandHourlyM3.reduce((sum, v) => sum + v, 0);
    const reserve = (reserveDays[result.tankId] ?? 0) * dailyDemandM3;
    const storage = result.storage;
    return {
      nodeId: result.tankId,
      tankId: tankIdOf.get(result.tankId) ?? null,
      servedOutlets: result.servedOutlets.map((o) => ({ nodeId: o.outletId, share: o.share, demandM3s: o.demandM3s })),
      dailyDemandM3,
      demandHourlyM3: result.demandHourlyM3,
      supplyM3s: result.supply.flowM3s,
      cycleStorageM3: storage ? storage.cycleStorageM3 : null,
      reserveStorageM3: storage ? reserve : null,
      totalStorageM3: storage ? storage.cycleStorageM3 + reserve : null,
      fillTimeFromEmptyS: storage ? storage.fillTimeFromEmptyS : null,
      problem: result.problem
        ? result.problem.replace(/"([^"]+)"/g, (quoted, key: string) =>
            built.names[key] ? `"${built.names[key]}"` : quoted,
          )
        : null,
    };
  });
}

/** A 24-hour day in hourly steps: tank levels, the source draw, outlet pressures and the flags the core raises. */
export function dayNetworkRun(context: NetworkContext): DayRunResult {
  const built = buildNetworkInput(context, 'day');
  let day;
  try {
    day = runNetworkDay(built.input, { keepSolutions: false });
  } catch (error) {
    throw explainCoreError(built, context.records, error);
  }
  const tanks = built.input.nodes.filter((n) => n.kind === 'tank' && n.tank);
  const sources = built.input.nodes.filter((n) => n.kind === 'source' || n.kind === 'ram-outlet');
  const outlets = built.input.nodes.filter((n) => n.kind === 'outlet');
  // A network whose tanks serve nothing still has its day; storage is then simply not sized.
  const storage = new Map<string, number | null>();
  try {
    for (const tank of tankStorageRun(context, built)) storage.set(tank.nodeId, tank.totalStorageM3);
  } catch {
    // The day's own flags say what is wrong with such a network.
  }
  return {
    kind: 'day',
    friction: { method: day.frictionMethod, freeSurfaceLosses: day.freeSurfaceLosses },
    hours: day.steps.map((step) => step.hour),
    tanks: tanks.map((tank) => ({
      nodeId: tank.id,
      levelsM: day.tankLevelsM[tank.id] ?? [],
      floorM: tank.elevationM,
      overflowM: tank.tank!.overflowLevelM,
      storageNeededM3: storage.get(tank.id) ?? null,
    })),
    sources: sources.map((source) => ({
      nodeId: source.id,
      drawM3s: day.steps.map((step) => step.sourceDrawM3s[source.id] ?? 0),
      yieldM3s: source.yieldM3s ?? null,
    })),
    outlets: outlets.map((outlet) => ({
      nodeId: outlet.id,
      pressureHeadsM: day.steps.map((step) => step.outletPressureHeadsM[outlet.id] ?? null),
      minPressureHeadM: outlet.minPressureHeadM ?? null,
      lowest: day.outletLowestPressureHeadM[outlet.id] ?? null,
    })),
    warnings: [
      ...built.notes.map((note) => ({ ...note, code: 'network.assumed-figure', severity: 'info' as const })),
      ...day.warnings.map((warning) => recordWarning(built, warning)),
    ],
  };
}
