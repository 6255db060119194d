import { HOURS_PER_DAY, hourlyMultipliers } from '../../demand/hourly-pattern';
import { HydraulicsInputError } from '../../errors';
import { assertPositive } from '../../input-guards';
import { resolveNetworkSettings } from '../settings';
import { solveNetwork } from '../solve-network';
import type { NetworkInput, NetworkNode, NetworkSolution, NetworkWarning } from '../types';
import { assertNetworkInput } from '../validate-network';
import type { NetworkDayOptions, NetworkDayResult, NetworkDayStep } from './types';

/** Plan area of a tank's water surface, m². */
export function tankAreaM2(node: NetworkNode): number {
  const storage = node.tank;
  if (!storage) return Infinity;
  return storage.areaM2 ?? (storage.volumeM3 as number) / (storage.overflowLevelM - node.elevationM);
}

/** Net flow into a node from the solution, m³/s. */
function netInflowM3s(input: NetworkInput, solution: NetworkSolution, nodeId: string): number {
  let net = 0;
  for (const link of input.links) {
    const q = solution.flowsM3s[link.id] ?? 0;
    if (link.to === nodeId) net += q;
    if (link.from === nodeId) net -= q;
  }
  return net;
}

function peakHourOf(multipliers: readonly number[]): number {
  return multipliers.reduce((best, value, hour) => (value > multipliers[best] ? hour : best), 0);
}

/**
 * A day of operation in time steps: each step solves the network with every outlet's draw scaled by
 * its hourly pattern (`hourlyFractions`, even when absent; see `hourlyMultipliers`), tanks at their
 * current levels, ram outlets delivering their fixed inflow and float valves shut on full tanks; then
 * moves each tank's level by its net inflow over the step (level += net flow × step / area).
 * Flags a tank that empties or spills, an outlet short of its residual at its peak hour, and a
 * source drawn beyond its design yield. A tank without storage data holds its level all day.
 */
export function runNetworkDay(input: NetworkInput, options: NetworkDayOptions = {}): NetworkDayResult {
  assertNetworkInput(input);
  const stepS = options.stepS ?? 3600;
  const durationS = options.durationS ?? HOURS_PER_DAY * 3600;
  assertPositive(stepS, 'stepS');
  assertPositive(durationS, 'durationS');
  const stepCount = Math.ceil(durationS / stepS - 1e-9);
  if (stepCount > 100_000) throw new HydraulicsInputError('stepS', `gives ${stepCount} steps; use a longer step`);
  const multipliers = new Map<string, number[]>();
  input.nodes.forEach((node, index) => {
    if (node.hourlyFractions !== undefined)
      multipliers.set(node.id, hourlyMultipliers(node.hourlyFractions, `nodes[${index}].hourlyFractions`));
  });
  const tanks = input.nodes.filter((node) => node.kind === 'tank');
  const levels = new Map(
    tanks.map((tank) => [
      tank.id,
      Math.min(tank.waterLevelM ?? tank.elevationM, tank.tank?.overflowLevelM ?? Infinity),
    ]),
  );
  const history: Record<string, number[]> = Object.fromEntries(
    tanks.map((tank) => [tank.id, [levels.get(tank.id) as number]]),
  );
  const overflow: Record<string, number> = Object.fromEntries(tanks.map((tank) => [tank.id, 0]));
  const shortfall: Record<string, number> = Object.fromEntries(tanks.map((tank) => [tank.id, 0]));
  const emptiedAt = new Map<string, number>();
  const spilledAt = new Map<string, number>();
  const lowest: NetworkDayResult['outletLowestPressureHeadM'] = {};
  const overYield = new Map<string, { hours: number[]; worstM3s: number }>();
  const shortAtPeak: NetworkWarning[] = [];
  const steps: NetworkDayStep[] = [];
  const floatFed = new Set(input.links.filter((link) => link.status === 'float-valve').map((link) => link.to));
  for (let s = 0; s < stepCount; s++) {
    const timeS = s * stepS;
    const dt = Math.min(stepS, durationS - timeS);
    const hour = Math.floor(timeS / 3600) % HOURS_PER_DAY;
    const nodes = input.nodes.map((node): NetworkNode => {
      if (node.kind === 'tank') return { ...node, waterLevelM: levels.get(node.id) };
      const factor = multipliers.get(node.id)?.[hour];
      return factor === undefined || node.demandM3s === undefined
        ? node
        : { ...node, demandM3s: node.demandM3s * factor };
    });
    const solution = solveNetwork({ ...input, nodes });
    const tankNetInflowM3s: Record<string, number> = {};
    const tankLevelsM: Record<string, number> = {};
    for (const tank of tanks) {
      const level = levels.get(tank.id) as number;
      tankLevelsM[tank.id] = level;
      const net = netInflowM3s(input, solution, tank.id);
      tankNetInflowM3s[tank.id] = net;
      if (!tank.tank) continue;
      let next = level + (net * dt) / tankAreaM2(tank);
      if (next > tank.tank.overflowLevelM) {
        // A float valve shuts as the tank fills; anything else (a ram's delivery, an open pipe) spills.
        if (!floatFed.has(tank.id)) overflow[tank.id] += (next - tank.tank.overflowLevelM) * tankAreaM2(tank);
        if (!floatFed.has(tank.id) && !spilledAt.has(tank.id)) spilledAt.set(tank.id, timeS);
        next = tank.tank.overflowLevelM;
      }
      if (next < tank.elevationM) {
        shortfall[tank.id] += (tank.elevationM - next) * tankAreaM2(tank);
        if (!emptiedAt.has(tank.id)) emptiedAt.set(tank.id, timeS);
        next = tank.elevationM;
      }
      levels.set(tank.id, next);
      history[tank.id].push(next);
    }
    const outletPressureHeadsM: Record<string, number> = {};
    for (const node of input.nodes) {
      if (node.kind !== 'outlet') continue;
      const pressure = solution.pressureHeadsM[node.id];
      if (pressure === undefined) continue;
      outletPressureHeadsM[node.id] = pressure;
      if (!(node.id in lowest) || pressure < lowest[node.id].pressureHeadM)
        lowest[node.id] = { pressureHeadM: pressure, hour };
      const peak = peakHourOf(multipliers.get(node.id) ?? new Array<number>(HOURS_PER_DAY).fill(1));
      const isPeakStep = hour === peak && timeS === Math.floor(timeS / 3600) * 3600;
      if (isPeakStep && node.minPressureHeadM !== undefined && pressure < node.minPressureHeadM) {
        shortAtPeak.push({
          code: 'outlet-short-at-peak',
          severity: 'warning',
          message: `At its peak hour (${String(hour).padStart(2, '0')}:00) "${node.id}" gets ${pressure.toFixed(2)} m of pressure head, short of the ${node.minPressureHeadM} m it needs.`,
          values: { hour, pressureHeadM: pressure, targetHeadM: node.minPressureHeadM },
          elementId: node.id,
        });
      }
    }
    const sourceDrawM3s: Record<string, number> = {};
    for (const node of input.nodes) {
      if (node.kind !== 'source') continue;
      const draw = -netInflowM3s(input, solution, node.id);
      sourceDrawM3s[node.id] = draw;
      if (node.yieldM3s !== undefined && draw > node.yieldM3s * (1 + 1e-9)) {
        const entry = overYield.get(node.id) ?? { hours: [], worstM3s: 0 };
        entry.hours.push(hour);
        entry.worstM3s = Math.max(entry.worstM3s, draw);
        overYield.set(node.id, entry);
      }
    }
    steps.push({
      timeS,
      hour,
      tankLevelsM,
      tankNetInflowM3s,
      outletPressureHeadsM,
      sourceDrawM3s,
      ...(options.keepSolutions === false ? {} : { solution }),
    });
  }
  const warnings: NetworkWarning[] = [];
  for (const [tankId, time] of emptiedAt) {
    warnings.push({
      code: 'tank-empties',
      severity: 'danger',
      message: `Tank "${tankId}" runs empty at ${clock(time)}; the outlets it serves go short by ${shortfall[tankId].toFixed(2)} m³ over the day. Enlarge the tank, raise its supply, or start it fuller.`,
      values: { timeS: time, shortfallM3: shortfall[tankId] },
      elementId: tankId,
    });
  }
  for (const [tankId, time] of spilledAt) {
    warnings.push({
      code: 'tank-overflows',
      severity: 'warning',
      message: `Tank "${tankId}" is full at ${clock(time)} and spills ${overflow[tankId].toFixed(2)} m³ over the day: size its overflow and make sure the spill drains safely away.`,
      values: { timeS: time, overflowM3: overflow[tankId] },
      elementId: tankId,
    });
  }
  for (const [sourceId, { hours, worstM3s }] of overYield) {
    warnings.push({
      code: 'source-over-yield',
      severity: 'warning',
      message: `Source "${sourceId}" is drawn beyond its design yield in ${hours.length} step${hours.length === 1 ? '' : 's'} (up to ${(worstM3s * 1000).toFixed(2)} L/s): the intake will run dry at those hours.`,
      values: { hours: hours.map(String), worstDrawM3s: worstM3s },
      elementId: sourceId,
    });
  }
  const { frictionMethod, freeSurfaceLosses } = resolveNetworkSettings(input.settings);
  return {
    frictionMethod,
    freeSurfaceLosses,
    steps,
    tankLevelsM: history,
    tankOverflowM3: overflow,
    tankShortfallM3: shortfall,
    outletLowestPressureHeadM: lowest,
    warnings: [...warnings, ...shortAtPeak],
  };
}

function clock(timeS: number): string {
  const minutes = Math.round(timeS / 60);
  return `${String(Math.floor(minutes / 60) % 24).padStart(2, '0')}:${String(minutes % 60).padStart(2, '0')}`;
}
