import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { planBreakPressureTanks, type PlannedTank } from '../../../hydraulics/index';

/** Independent feasibility check of a plan on a piecewise-linear profile with zero cover. */
function planIsFeasible(
  chainage: readonly number[],
  elevation: readonly number[],
  allowableM: number,
  startLevelM: number,
  tanks: readonly PlannedTank[],
): boolean {
  const eps = 1e-7;
  const at = (c: number): number => {
    for (let j = 0; j < chainage.length - 1; j++) {
      if (c <= chainage[j + 1])
        return elevation[j] + ((c - chainage[j]) / (chainage[j + 1] - chainage[j])) * (elevation[j + 1] - elevation[j]);
    }
    return elevation[elevation.length - 1];
  };
  const checkpoints = [...chainage, ...tanks.map((t) => t.chainageM)].sort((a, b) => a - b);
  let level = startLevelM;
  let next = 0;
  for (const c of checkpoints) {
    const z = at(c);
    // Upstream side of a tank: the arriving level.
    if (level - z > allowableM + eps || z > level + eps) return false;
    while (next < tanks.length && tanks[next].chainageM <= c + 1e-12) {
      if (tanks[next].waterLevelM > level + eps) return false;
      level = tanks[next].waterLevelM;
      next++;
    }
    if (level - z > allowableM + eps || z > level + eps) return false;
  }
  return true;
}

/** Smallest number of tanks (0-3) at survey points that works, or Infinity. */
function bruteForceMinimum(chainage: number[], elevation: number[], allowableM: number, startLevelM: number): number {
  const n = chainage.length;
  const sites = Array.from({ length: n - 2 }, (_, i) => i + 1);
  const tanksAt = (picks: number[]): PlannedTank[] =>
    picks.map((k) => ({ chainageM: chainage[k], waterLevelM: elevation[k] }));
  if (planIsFeasible(chainage, elevation, allowableM, startLevelM, [])) return 0;
  for (const a of sites) if (planIsFeasible(chainage, elevation, allowableM, startLevelM, tanksAt([a]))) return 1;
  for (const a of sites)
    for (const b of sites)
      if (b > a && planIsFeasible(chainage, elevation, allowableM, startLevelM, tanksAt([a, b]))) return 2;
  for (const a of sites)
    for (const b of sites)
      for (const c of sites)
        if (b > a && c > b && planIsFeasible(chainage, elevation, allowableM, startLevelM, tanksAt([a, b, c])))
          return 3;
  return Infinity;
}

describe('planBreakPressureTanks', () => {
  it('follows the worked example structure of Jordan App. 4 via ITACA [R1] with its 100 m allowable head (invented elevations)', () => {
    // Spring (1) 1000 m -> low point (2) 880 m: 120 m static, over 100 m -> a tank is needed before 2.
    // Spring -> high point (3) 950 m: within the limit. High point -> reservoir tank (4) 820 m: 130 m, over.
    const chainage = [0, 1200, 2000, 3300];
    const elevation = [1000, 880, 950, 820];
    const plan = planBreakPressureTanks({
      chainageM: chainage,
      groundElevationM: elevation,
      pipeElevationM: elevation,
      allowableHeadM: 100,
      startLevelM: 1000,
    });
    expect(plan.feasible).toBe(true);
    expect(plan.tanks).toHaveLength(2);
    // The first tank must stand high enough for the water to pass the 950 m summit.
    expect(plan.tanks[0].waterLevelM).toBeCloseTo(950, 9);
    expect(plan.tanks[0].chainageM).toBeCloseTo(500, 9);
    // The second resets below the summit where 100 m is reached: 950 - 100 = 850 m on the last fall.
    expect(plan.tanks[1].waterLevelM).toBeCloseTo(850, 9);
    expect(plan.tanks[1].chainageM).toBeCloseTo(2000 + (100 / 130) * 1300, 9);
    expect(planIsFeasible(chainage, elevation, 100, 1000, plan.tanks)).toBe(true);
  });

  it('on an even fall places each tank where the static head reaches the rating (the last chainage within it)', () => {
    const plan = planBreakPressureTanks({
      chainageM: [0, 4000],
      groundElevationM: [1000, 600],
      pipeElevationM: [1000, 600],
      allowableHeadM: 100,
      startLevelM: 1000,
    });
    expect(plan.tanks.map((t) => Math.round(t.chainageM * 1e6) / 1e6)).toEqual([1000, 2000, 3000]);
    expect(plan.tanks.map((t) => Math.round(t.waterLevelM * 1e6) / 1e6)).toEqual([900, 800, 700]);
  });

  it('needs no tank when the static head stays within the rating', () => {
    const plan = planBreakPressureTanks({
      chainageM: [0, 100, 200],
      groundElevationM: [100, 50, 20],
      pipeElevationM: [100, 50, 20],
      allowableHeadM: 80,
      startLevelM: 100,
    });
    expect(plan).toEqual({ tanks: [], feasible: true });
  });

  it('reports a plan that cannot work (rating below the cover head under a tank)', () => {
    const plan = planBreakPressureTanks({
      chainageM: [0, 100],
      groundElevationM: [100, 0],
      pipeElevationM: [90, -10],
      allowableHeadM: 5,
      startLevelM: 100,
    });
    expect(plan.feasible).toBe(false);
    expect(plan.problem?.message).toMatch(/pressure class/);
  });

  it('uses no more tanks than the best placement at survey points (brute force), and its plan is feasible', () => {
    fc.assert(
      fc.property(
        fc.array(fc.integer({ min: -60, max: 30 }), { minLength: 2, maxLength: 8 }),
        fc.integer({ min: 30, max: 80 }),
        (steps, allowableM) => {
          const chainage = [0];
          const elevation = [500];
          for (const step of steps) {
            chainage.push(chainage[chainage.length - 1] + 100);
            elevation.push(elevation[elevation.length - 1] + step);
          }
          const startLevelM = Math.max(...elevation);
          const plan = planBreakPressureTanks({
            chainageM: chainage,
            groundElevationM: elevation,
            pipeElevationM: elevation,
            allowableHeadM: allowableM,
            startLevelM,
          });
          const best = bruteForceMinimum(chainage, elevation, allowableM, startLevelM);
          if (best !== Infinity) {
            expect(plan.feasible).toBe(true);
            expect(plan.tanks.length).toBeLessThanOrEqual(best);
          }
          if (plan.feasible)
            expect(planIsFeasible(chainage, elevation, allowableM, startLevelM, plan.tanks)).toBe(true);
        },
      ),
      { numRuns: 300 },
    );
  });

  it('with a design flow, the grade from each new tank keeps the clearance over the pipe at every point after it', () => {
    fc.assert(
      fc.property(
        fc.array(fc.integer({ min: -60, max: 30 }), { minLength: 2, maxLength: 10 }),
        fc.array(fc.integer({ min: 0, max: 20 }), { minLength: 10, maxLength: 10 }),
        fc.integer({ min: 40, max: 90 }),
        fc.integer({ min: 0, max: 6 }),
        fc.integer({ min: 0, max: 3 }),
        (steps, lossSteps, allowableM, clearanceM, raiseM) => {
          const chainage = [0];
          const ground = [500];
          for (const step of steps) {
            chainage.push(chainage[chainage.length - 1] + 100);
            ground.push(ground[ground.length - 1] + step);
          }
          // Cover between 0.5 and 1.5 m; the loss grows along the line (friction and fittings).
          const pipe = ground.map((z, j) => z - 0.5 - (j % 3) * 0.5);
          const loss = [0];
          for (let j = 1; j < chainage.length; j++) loss.push(loss[j - 1] + lossSteps[j - 1] / 4);
          const plan = planBreakPressureTanks({
            chainageM: chainage,
            groundElevationM: ground,
            pipeElevationM: pipe,
            allowableHeadM: allowableM,
            startLevelM: Math.max(...ground) + 2,
            tankWaterAboveGroundM: raiseM,
            headLossToPointM: loss,
            summitClearanceM: clearanceM,
          });
          if (!plan.feasible) return;
          const lossAt = (c: number): number => {
            const j = Math.min(chainage.length - 2, Math.floor(c / 100));
            return loss[j] + ((c - chainage[j]) / 100) * (loss[j + 1] - loss[j]);
          };
          for (const tank of plan.tanks) {
            const lossAtTank = lossAt(tank.chainageM);
            chainage.forEach((c, j) => {
              if (c < tank.chainageM) return;
              const grade = tank.waterLevelM - (loss[j] - lossAtTank);
              expect(grade, `tank at ${tank.chainageM}, point ${c}`).toBeGreaterThanOrEqual(
                pipe[j] + clearanceM - 1e-6,
              );
            });
          }
        },
      ),
      { numRuns: 400 },
    );
  });
});
