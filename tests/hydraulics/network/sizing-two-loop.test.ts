import { describe, expect, it } from 'vitest';
import { sizeNetwork, solveNetwork } from '../../../hydraulics/index';
import { inchPipe, TWO_LOOP_CANDIDATES_IN_COST, twoLoopNetwork } from './two-loop-fixture';

const candidates = TWO_LOOP_CANDIDATES_IN_COST.map(([inches, costPerM]) => ({ pipe: inchPipe(inches), costPerM }));

describe('sizeNetwork: the two-loop benchmark [NET-AS77]', () => {
  it('finds a feasible one-size-per-pipe design costing no more than 419,000', async () => {
    const result = await sizeNetwork(twoLoopNetwork(new Array(8).fill(24)), {
      candidates,
      minPressureHeadM: 30,
      timeLimitS: 30,
    });
    expect(result.method).toBe('looped-search');
    expect(result.feasible).toBe(true);
    // Best-known design with one diameter per pipe: 419,000 $ [NET-AS77].
    expect(result.cost).toBeLessThanOrEqual(419_000);
    // The design is checked by the solver: every junction at 30 m or more.
    for (const node of ['2', '3', '4', '5', '6', '7'])
      expect(result.solution.pressureHeadsM[node]).toBeGreaterThanOrEqual(30 - 1e-6);
    // And it holds when solved again from scratch.
    const diameters = ['1', '2', '3', '4', '5', '6', '7', '8'].map((id) =>
      Number(result.pipeByLink[id].replace('in', '')),
    );
    const check = solveNetwork(twoLoopNetwork(diameters));
    for (const node of ['2', '3', '4', '5', '6', '7'])
      expect(check.pressureHeadsM[node]).toBeGreaterThanOrEqual(30 - 1e-6);
    expect(result.singleSize.feasible).toBe(true);
    expect(result.singleSize.cost as number).toBeGreaterThan(result.cost);
  }, 120_000);

  it('starts its search from the widest pipes even when a small pipe is priced above every large one (invented price)', async () => {
    const dearSmall = { pipe: { ...inchPipe(0.5), id: 'dear-half-inch' }, costPerM: 10_000 };
    const result = await sizeNetwork(twoLoopNetwork(new Array(8).fill(24)), {
      candidates: [...candidates, dearSmall],
      minPressureHeadM: 30,
      timeLimitS: 5,
    });
    expect(result.feasible).toBe(true);
    expect(Object.values(result.pipeByLink)).not.toContain('dear-half-inch');
  }, 120_000);
});
