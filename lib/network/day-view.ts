import type { DayRunResult } from './run-result';
import type { NetworkView } from './view';

/** A tank through the day: water depth above its floor at every hour boundary, m. */
export interface DayTank {
  nodeId: string;
  name: string;
  depthsM: number[];
  overflowDepthM: number;
  lowestDepthM: number;
  highestDepthM: number;
  storageNeededM3: number | null;
}

/** An outlet through the day, with its worst hour against what it wants. */
export interface DayOutlet {
  nodeId: string;
  name: string;
  pressureHeadsM: (number | null)[];
  wantedM: number | null;
  lowest: { pressureHeadM: number; hour: number } | null;
  /** The lowest pressure is below what the outlet wants. */
  short: boolean;
}

export interface DaySource {
  nodeId: string;
  name: string;
  drawM3s: number[];
  yieldM3s: number | null;
  highestDrawM3s: number;
  /** Drawn beyond the source's design yield in some hour. */
  overYield: boolean;
}

export interface DayViewModel {
  hours: number;
  tanks: DayTank[];
  outlets: DayOutlet[];
  sources: DaySource[];
}

/** Below this a pressure is taken as meeting what is wanted (the solver's own precision). */
const HEAD_TOLERANCE_M = 1e-6;
const FLOW_TOLERANCE_M3S = 1e-9;

/** The 24-hour run as the day view shows it: parts by name, tank depths above the floor, outlets' worst hour. */
export function dayViewModel(view: NetworkView, day: DayRunResult): DayViewModel {
  const names = new Map(view.records.nodes.map((n) => [n.id, n.name]));
  const nameOf = (id: string) => names.get(id) ?? 'a part no longer in the network';
  return {
    hours: day.hours.length,
    tanks: day.tanks.map((tank) => {
      const depthsM = tank.levelsM.map((level) => level - tank.floorM);
      return {
        nodeId: tank.nodeId,
        name: nameOf(tank.nodeId),
        depthsM,
        overflowDepthM: tank.overflowM - tank.floorM,
        lowestDepthM: Math.min(...depthsM),
        highestDepthM: Math.max(...depthsM),
        storageNeededM3: tank.storageNeededM3,
      };
    }),
    outlets: (day.outlets ?? []).map((outlet) => ({
      nodeId: outlet.nodeId,
      name: nameOf(outlet.nodeId),
      pressureHeadsM: outlet.pressureHeadsM,
      wantedM: outlet.minPressureHeadM,
      lowest: outlet.lowest,
      short:
        outlet.lowest !== null &&
        outlet.minPressureHeadM !== null &&
        outlet.lowest.pressureHeadM < outlet.minPressureHeadM - HEAD_TOLERANCE_M,
    })),
    sources: day.sources.map((source) => {
      const highestDrawM3s = Math.max(0, ...source.drawM3s);
      return {
        nodeId: source.nodeId,
        name: nameOf(source.nodeId),
        drawM3s: source.drawM3s,
        yieldM3s: source.yieldM3s,
        highestDrawM3s,
        overYield: source.yieldM3s !== null && highestDrawM3s > source.yieldM3s + FLOW_TOLERANCE_M3S,
      };
    }),
  };
}
