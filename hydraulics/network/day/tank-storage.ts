import { HOURS_PER_DAY, hourlyMultipliers } from '../../demand/hourly-pattern';
import { sizeStorage, type StorageSizingResult } from '../../storage/size-storage';
import type { SupplyProfileOptions } from '../../storage/supply-profile';
import { solveNetwork } from '../solve-network';
import type { NetworkInput } from '../types';
import { servedOutletsByTank, type ServedOutlet } from './served-outlets';

/** Options for {@link sizeTankStorage}. */
export interface TankStorageOptions {
  /** Whole days of average demand held in reserve. @default 0 */
  reserveDays?: number;
  /** Supply into a tank (by tank id), overriding the inflow the network gives it. */
  supplyByTank?: Record<string, SupplyProfileOptions>;
}

/** Storage for one tank, sized from the outlets it actually serves. */
export interface TankStorageResult {
  tankId: string;
  servedOutlets: ServedOutlet[];
  /** Water the tank's outlets draw from it in each hour, m³. */
  demandHourlyM3: number[];
  /** Supply used: the given one, or the tank's inflow in the network solved at mean draw. */
  supply: SupplyProfileOptions;
  /** The storage sizing, or undefined with `problem` saying why it could not be done. */
  storage?: StorageSizingResult;
  problem?: string;
}

/**
 * Sizes each tank's storage from the outlets it actually serves: `servedOutletsByTank` says which
 * outlets draw from the tank and what share of each; their hourly draws (each outlet's pattern)
 * times those shares are the tank's demand, the tank's inflow (solved at mean draw, or given) its
 * supply, and `sizeStorage` (mass curve) gives cycle and reserve storage, fill time and overflow.
 */
export function sizeTankStorage(input: NetworkInput, options: TankStorageOptions = {}): TankStorageResult[] {
  const solution = solveNetwork(input);
  const served = servedOutletsByTank(input, solution);
  const nodes = new Map(input.nodes.map((node) => [node.id, node]));
  return Object.entries(served).map(([tankId, outlets]) => {
    const demandHourlyM3 = new Array<number>(HOURS_PER_DAY).fill(0);
    for (const outlet of outlets) {
      const pattern = nodes.get(outlet.outletId)?.hourlyFractions;
      const multipliers = pattern ? hourlyMultipliers(pattern) : new Array<number>(HOURS_PER_DAY).fill(1);
      multipliers.forEach((factor, hour) => {
        demandHourlyM3[hour] += outlet.demandM3s * outlet.share * factor * 3600;
      });
    }
    let inflow = 0;
    for (const link of input.links) {
      const q = solution.flowsM3s[link.id] ?? 0;
      if (link.to === tankId && q > 0) inflow += q;
      if (link.from === tankId && q < 0) inflow -= q;
    }
    const supply = options.supplyByTank?.[tankId] ?? { flowM3s: inflow };
    if (!(supply.flowM3s > 0)) {
      return {
        tankId,
        servedOutlets: outlets,
        demandHourlyM3,
        supply,
        problem: `Nothing flows into tank "${tankId}" in the network, so no storage can be sized for it: give it a supply.`,
      };
    }
    return {
      tankId,
      servedOutlets: outlets,
      demandHourlyM3,
      supply,
      storage: sizeStorage({
        supply,
        demand: { hourlyVolumeM3: demandHourlyM3 },
        reserveDays: options.reserveDays ?? 0,
      }),
    };
  });
}
