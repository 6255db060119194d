import { describe, expect, it } from 'vitest';
import { sizeNetwork, solveNetwork, type NetworkInput, type SizingCandidate } from '../../../hydraulics/index';

/** PE bores with invented prices; smooth plastic roughness for the default Darcy-Weisbach. */
const CANDIDATES: SizingCandidate[] = [20, 25, 32, 40, 50].map((mm, i) => ({
  pipe: { id: `d${mm}`, insideDiameterM: (mm * 0.82) / 1000, roughnessM: 1.5e-6, hazenWilliamsC: 150 },
  costPerM: [0.6, 0.9, 1.4, 2.2, 3.4][i],
}));

/**
 * An invented hill farm: a spring at 130 m feeds a tank (floor 100 m, overflow 103 m) through 2 km
 * of trunk; the tank feeds a yard tap at 80 m drawing 0.3 L/s at its peak. The tap's uses take
 * 17.28 m³ a day, which the trunk must bring in 24 h: 0.2 L/s.
 */
function hillFarm(): NetworkInput {
  return {
    nodes: [
      { id: 'spring', kind: 'source', elevationM: 130, waterLevelM: 130 },
      { id: 'tank', kind: 'tank', elevationM: 100, waterLevelM: 100.5, tank: { overflowLevelM: 103, volumeM3: 10 } },
      { id: 'tap', kind: 'outlet', elevationM: 80, demandM3s: 0.0003, minPressureHeadM: 5 },
    ],
    links: [
      {
        id: 'trunk',
        from: 'spring',
        to: 'tank',
        lengthM: 2000,
        pipe: 'pe100-iso4427-sdr11-32mm',
        status: 'float-valve',
      },
      { id: 'service', from: 'tank', to: 'tap', lengthM: 300, pipe: 'pe100-iso4427-sdr11-32mm' },
    ],
  };
}
const FILL_M3S = 17.28 / 86_400;

/** What the chosen trunk delivers into the full tank (float open, level at the overflow). */
function trunkFlowIntoFullTank(trunkPipeId: string): number {
  const input = hillFarm();
  const pipe = CANDIDATES.find((c) => c.pipe.id === trunkPipeId)!.pipe;
  const solution = solveNetwork({
    ...input,
    nodes: input.nodes.map((n) => (n.id === 'tank' ? { ...n, waterLevelM: 102.999 } : n)),
    links: input.links.map((l) => (l.id === 'trunk' ? { ...l, pipe } : l)),
  });
  return solution.flowsM3s.trunk;
}

describe('sizeNetwork fills each tank over its fill window', () => {
  it('held at a fixed level, the tank asks nothing of its trunk: the cheapest pipe, which cannot fill it (the old fault)', async () => {
    const result = await sizeNetwork(hillFarm(), { candidates: CANDIDATES, timeLimitS: 5 });
    expect(result.pipeByLink.trunk).toBe('d20');
    expect(trunkFlowIntoFullTank(result.pipeByLink.trunk)).toBeLessThan(FILL_M3S);
  });

  it("sizes the trunk to bring the tank's daily demand in through its fill window, at the least cost that does", async () => {
    const result = await sizeNetwork(hillFarm(), {
      candidates: CANDIDATES,
      timeLimitS: 5,
      tankFillFlowsM3s: { tank: FILL_M3S },
    });
    expect(result.feasible).toBe(true);
    const chosen = result.pipeByLink.trunk;
    // The chosen trunk fills the full tank at no less than the fill flow ...
    expect(trunkFlowIntoFullTank(chosen)).toBeGreaterThanOrEqual(FILL_M3S * (1 - 1e-9));
    // ... and the next cheaper pipe does not (so nothing dearer than needed was bought).
    const cheaper = CANDIDATES[CANDIDATES.findIndex((c) => c.pipe.id === chosen) - 1];
    expect(trunkFlowIntoFullTank(cheaper.pipe.id)).toBeLessThan(FILL_M3S);
    // The check solve carries the fill flow into the tank's inlet.
    expect(result.solution.flowsM3s.trunk).toBeCloseTo(FILL_M3S, 12);
    expect(result.solution.pressureHeadsM['tank#fill']).toBeGreaterThanOrEqual(-1e-9);
  });

  it('names a tank to fill that nothing is laid into', async () => {
    await expect(sizeNetwork(hillFarm(), { candidates: CANDIDATES, tankFillFlowsM3s: { tap: 0.001 } })).rejects.toThrow(
      /"tap" is not a tank/,
    );
    const noInlet = hillFarm();
    noInlet.links = noInlet.links.filter((l) => l.id !== 'trunk');
    await expect(sizeNetwork(noInlet, { candidates: CANDIDATES, tankFillFlowsM3s: { tank: 0.001 } })).rejects.toThrow(
      /no link is laid into it/,
    );
  });
});
