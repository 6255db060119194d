import { describe, expect, it } from 'vitest';
import {
  solveNetwork,
  waterKinematicViscosityM2s,
  type NetworkInput,
  type NetworkLink,
  type NetworkSolution,
} from '../../../hydraulics/index';

/**
 * Three looped networks from the example decks of Jeppson's pipe-network manual [NET-JE74]
 * (docs/references/network.md). The decks are in US units; they are converted here with the exact
 * definitions of the foot, the inch and the US gallon. Every deck fixes all inflows and outflows,
 * so the flows depend only on the pipes' relative resistances (any constant in the loss law
 * cancels around a loop): a test of the loop balance the solver reaches.
 *
 * What is compared, and why the tolerances: the reference numbers are an independent program's
 * output on the same decks, printed to 5 significant figures ([NET-JE74] says which, and that the
 * manual's own printed tables were not read). A flow agrees when it is within 1e-4 (example 1,
 * converged to a loop deviation of 3e-7 ft) or 2e-4 (example 2, a Hardy Cross run stopped at
 * 1e-4 cfs) of the printed value, relative: half a unit of the 5th figure is at most 5e-5, so the
 * margins cover rounding and the stop rule and little more. Example 3 is looser, for the reasons
 * given beside it. Published hand solutions would earn 1-3 %; these do not need it.
 */

const FOOT_M = 0.3048; // exact, international foot
const INCH_M = 0.0254; // exact
const CFS_M3S = FOOT_M ** 3;

function relativeError(actual: number, expected: number): number {
  return Math.abs(actual - expected) / Math.abs(expected);
}

/** Signed head loss around a loop given as [link id, +1 along / -1 against its from -> to]. */
function loopHeadSumM(solution: NetworkSolution, loop: readonly (readonly [string, 1 | -1])[]): number {
  return loop.reduce((sum, [id, sign]) => sum + sign * solution.headLossesM[id], 0);
}

// Example 1 [NET-JE74], chapter 6 deck: Hazen-Williams, C = 95, 10 cfs in at A, out 2.5 at D,
// 2.5 at E and 5 at F. Pipes: id, from, to, diameter in, length ft.
const EXAMPLE_1_PIPES: readonly (readonly [string, string, string, number, number])[] = [
  ['1', 'A', 'B', 12, 2000],
  ['2', 'B', 'C', 10, 1500],
  ['3', 'D', 'C', 6, 2000],
  ['4', 'A', 'D', 8, 1500],
  ['5', 'B', 'E', 8, 2000],
  ['6', 'E', 'F', 6, 1000],
  ['7', 'C', 'F', 10, 2000],
];
/** Printed flows, cfs, positive from -> to [NET-JE74], independent program output. */
const EXAMPLE_1_FLOWS_CFS: Record<string, number> = {
  '1': 6.8661,
  '2': 3.8331,
  '3': 0.63389,
  '4': 3.1339,
  '5': 3.033,
  '6': 0.53302,
  '7': 4.467,
};
/** Printed head losses, ft, with the manual's US constant 4.73 [NET-JE74]. */
const EXAMPLE_1_LOSSES_FT: Record<string, number> = {
  '1': 72.93,
  '2': 45.164,
  '3': 25.878,
  '4': 92.216,
  '5': 115.73,
  '6': 9.3865,
  '7': 79.949,
};

const HW_FLOW_EXPONENT = 1 / 0.54;
const HW_DIAMETER_EXPONENT = 2.63 / 0.54;
/**
 * The SI image of the manual's h(ft) = 4.73 L Q^n / (C^n D^m) with L, D in ft and Q in cfs
 * [NET-JE74]: h = 4.73 · 0.3048^(m - 3n) · L Q^n / (C^n D^m) in metres (about 10.676).
 */
const MANUAL_HW_CONSTANT_SI = 4.73 * FOOT_M ** (HW_DIAMETER_EXPONENT - 3 * HW_FLOW_EXPONENT);

function example1(): NetworkInput {
  return {
    nodes: [
      // The deck has no elevations or heads: any fixed level at A gives the same flows.
      { id: 'A', kind: 'source', elevationM: 0, waterLevelM: 100 },
      { id: 'B', kind: 'junction', elevationM: 0 },
      { id: 'C', kind: 'junction', elevationM: 0 },
      { id: 'D', kind: 'junction', elevationM: 0, demandM3s: 2.5 * CFS_M3S },
      { id: 'E', kind: 'junction', elevationM: 0, demandM3s: 2.5 * CFS_M3S },
      { id: 'F', kind: 'junction', elevationM: 0, demandM3s: 5 * CFS_M3S },
    ],
    links: EXAMPLE_1_PIPES.map(([id, from, to, diameterIn, lengthFt]): NetworkLink => ({
      id,
      from,
      to,
      lengthM: lengthFt * FOOT_M,
      pipe: { id: `p${id}`, insideDiameterM: diameterIn * INCH_M, hazenWilliamsC: 95 },
    })),
    settings: {
      frictionMethod: 'hazen-williams',
      freeSurfaceLosses: false,
      hazenWilliamsConstant: MANUAL_HW_CONSTANT_SI,
      hazenWilliamsFlowExponent: HW_FLOW_EXPONENT,
      hazenWilliamsDiameterExponent: HW_DIAMETER_EXPONENT,
    },
  };
}

describe('solveNetwork: Jeppson manual, chapter 6 deck (Hazen-Williams, two loops) [NET-JE74]', () => {
  const solution = solveNetwork(example1());

  it('converges and keeps continuity', () => {
    expect(solution.converged).toBe(true);
    expect(solution.maxContinuityErrorM3s).toBeLessThan(1e-9);
  });

  it('reproduces the printed flows of all seven pipes to 1e-4 relative', () => {
    // Jeppson [NET-JE74] chapter 6 deck; tolerance: 5 printed figures, converged run (see top).
    for (const [id, flowCfs] of Object.entries(EXAMPLE_1_FLOWS_CFS)) {
      expect(relativeError(solution.flowsM3s[id] / CFS_M3S, flowCfs), `pipe ${id}`).toBeLessThan(1e-4);
    }
  });

  it("reproduces the printed head losses to 1e-4 relative with the manual's constant 4.73 pinned", () => {
    // Jeppson [NET-JE74] chapter 6 deck; the loss carries the constant, so it is pinned above.
    for (const [id, lossFt] of Object.entries(EXAMPLE_1_LOSSES_FT)) {
      expect(relativeError(solution.headLossesM[id] / FOOT_M, lossFt), `pipe ${id}`).toBeLessThan(1e-4);
    }
  });

  it('closes the head around both loops', () => {
    // Loops as the deck lists them: (1, 2, -3, -4) and (5, 6, -7, -2).
    expect(
      Math.abs(
        loopHeadSumM(solution, [
          ['1', 1],
          ['2', 1],
          ['3', -1],
          ['4', -1],
        ]),
      ),
    ).toBeLessThan(1e-6);
    expect(
      Math.abs(
        loopHeadSumM(solution, [
          ['5', 1],
          ['6', 1],
          ['7', -1],
          ['2', -1],
        ]),
      ),
    ).toBeLessThan(1e-6);
  });
});

// Example 2 [NET-JE74], chapter 7 deck: Darcy-Weisbach with Colebrook, roughness 0.012 in,
// ν = 1.217e-5 ft²/s; 3.34 cfs in at A and at E, out 5.12 at C, 0.67 at D and 0.89 at F.
const EXAMPLE_2_PIPES: readonly (readonly [string, string, string, number, number])[] = [
  ['1', 'A', 'B', 12, 3000],
  ['2', 'B', 'C', 14, 2000],
  ['3', 'D', 'C', 10, 3000],
  ['4', 'A', 'D', 10, 2000],
  ['5', 'E', 'B', 14, 3000],
  ['6', 'E', 'F', 10, 2000],
  ['7', 'F', 'C', 12, 3000],
];
const EXAMPLE_2_FLOWS_CFS: Record<string, number> = {
  '1': 1.7474,
  '2': 3.4873,
  '3': 0.9226,
  '4': 1.5926,
  '5': 1.7399,
  '6': 1.6001,
  '7': 0.71006,
};
const EXAMPLE_2_LOSSES_FT: Record<string, number> = {
  '1': 4.8817,
  '2': 5.6573,
  '3': 3.6113,
  '4': 6.9278,
  '5': 2.2054,
  '6': 6.9913,
  '7': 0.87151,
};
const DECK_VISCOSITY_M2S = 1.217e-5 * FOOT_M ** 2;
/** Water temperature at which the core's viscosity equals the deck's 1.217e-5 ft²/s (found by bisection) [C]. */
const DECK_TEMPERATURE_C = 15.2886;

function example2(): NetworkInput {
  return {
    nodes: [
      { id: 'A', kind: 'source', elevationM: 0, waterLevelM: 100 },
      { id: 'B', kind: 'junction', elevationM: 0 },
      { id: 'C', kind: 'junction', elevationM: 0, demandM3s: 5.12 * CFS_M3S },
      { id: 'D', kind: 'junction', elevationM: 0, demandM3s: 0.67 * CFS_M3S },
      // A fixed second inflow; the ram-outlet node is the kind that carries one.
      { id: 'E', kind: 'ram-outlet', elevationM: 0, inflowM3s: 3.34 * CFS_M3S },
      { id: 'F', kind: 'junction', elevationM: 0, demandM3s: 0.89 * CFS_M3S },
    ],
    links: EXAMPLE_2_PIPES.map(([id, from, to, diameterIn, lengthFt]): NetworkLink => ({
      id,
      from,
      to,
      lengthM: lengthFt * FOOT_M,
      pipe: { id: `p${id}`, insideDiameterM: diameterIn * INCH_M, roughnessM: 0.012 * INCH_M },
    })),
    settings: { frictionMethod: 'darcy-weisbach', freeSurfaceLosses: false, waterTemperatureC: DECK_TEMPERATURE_C },
  };
}

describe('solveNetwork: Jeppson manual, chapter 7 deck (Darcy-Weisbach, Hardy Cross example) [NET-JE74]', () => {
  const solution = solveNetwork(example2());

  it("runs at the deck's viscosity", () => {
    expect(relativeError(waterKinematicViscosityM2s(DECK_TEMPERATURE_C), DECK_VISCOSITY_M2S)).toBeLessThan(1e-4);
  });

  it('converges and keeps continuity', () => {
    expect(solution.converged).toBe(true);
    expect(solution.maxContinuityErrorM3s).toBeLessThan(1e-9);
  });

  it('reproduces the printed flows of all seven pipes to 2e-4 relative', () => {
    // Jeppson [NET-JE74] chapter 7 deck; the run stopped at a 1e-4 cfs loop correction (see top).
    for (const [id, flowCfs] of Object.entries(EXAMPLE_2_FLOWS_CFS)) {
      expect(relativeError(solution.flowsM3s[id] / CFS_M3S, flowCfs), `pipe ${id}`).toBeLessThan(2e-4);
    }
  });

  it('reproduces the printed head losses to 2e-3 relative', () => {
    // Jeppson [NET-JE74] chapter 7 deck. The deck takes 2g = 64.4 ft/s²; the core uses
    // g = 9.80665 m/s² (32.174 ft/s²), which alone moves every loss by 0.08 %.
    for (const [id, lossFt] of Object.entries(EXAMPLE_2_LOSSES_FT)) {
      expect(relativeError(solution.headLossesM[id] / FOOT_M, lossFt), `pipe ${id}`).toBeLessThan(2e-3);
    }
  });

  it('closes the head around both loops', () => {
    // Loops as the deck lists them: (1, 2, -3, -4) and (-2, -5, 6, 7).
    expect(
      Math.abs(
        loopHeadSumM(solution, [
          ['1', 1],
          ['2', 1],
          ['3', -1],
          ['4', -1],
        ]),
      ),
    ).toBeLessThan(1e-6);
    expect(
      Math.abs(
        loopHeadSumM(solution, [
          ['2', -1],
          ['5', -1],
          ['6', 1],
          ['7', 1],
        ]),
      ),
    ).toBeLessThan(1e-6);
  });

  it('would notice a wrong friction law: Hazen-Williams C = 130 moves the flows by more than the tolerance', () => {
    const input = example2();
    const wrong = solveNetwork({
      ...input,
      links: input.links.map((link) => ({
        ...link,
        pipe: {
          ...(link.pipe as object),
          id: 'hw',
          insideDiameterM: (link.pipe as { insideDiameterM: number }).insideDiameterM,
          hazenWilliamsC: 130,
        },
      })),
      settings: { frictionMethod: 'hazen-williams', freeSurfaceLosses: false },
    });
    const worst = Math.max(
      ...Object.entries(EXAMPLE_2_FLOWS_CFS).map(([id, flowCfs]) =>
        relativeError(wrong.flowsM3s[id] / CFS_M3S, flowCfs),
      ),
    );
    expect(worst).toBeGreaterThan(2e-4);
  });
});

// Example 3 [NET-JE74], chapter 5 deck: Darcy-Weisbach with Colebrook, roughness 0.0102 in,
// ν = 1.217e-5 ft²/s; 2000 gpm in at J1 and at J6, out 1500 at J3, 1000 at J4 and 1500 at J5.
const US_GALLON_M3 = 0.003785411784; // exact
const GPM_M3S = US_GALLON_M3 / 60;
const EXAMPLE_3_PIPES: readonly (readonly [string, string, string, number, number])[] = [
  ['1', 'J1', 'J2', 8, 1106],
  ['2', 'J3', 'J2', 12, 751],
  ['3', 'J4', 'J3', 10, 1000],
  ['4', 'J1', 'J4', 12, 500],
  ['5', 'J2', 'J5', 10, 1200],
  ['6', 'J6', 'J5', 6, 600],
  ['7', 'J6', 'J3', 8, 800],
];
const EXAMPLE_3_FLOWS_GPM: Record<string, number> = {
  '1': 463.45,
  '2': 294.2,
  '3': 536.55,
  '4': 1536.5,
  '5': 757.65,
  '6': 742.35,
  '7': 1257.7,
};
const EXAMPLE_3_LOSSES_FT: Record<string, number> = {
  '1': 5.0945,
  '2': 0.18879,
  '3': 1.9568,
  '4': 2.9497,
  '5': 4.565,
  '6': 30.637,
  '7': 25.885,
};

function example3(): NetworkInput {
  return {
    nodes: [
      { id: 'J1', kind: 'source', elevationM: 0, waterLevelM: 100 },
      { id: 'J2', kind: 'junction', elevationM: 0 },
      { id: 'J3', kind: 'junction', elevationM: 0, demandM3s: 1500 * GPM_M3S },
      { id: 'J4', kind: 'junction', elevationM: 0, demandM3s: 1000 * GPM_M3S },
      { id: 'J5', kind: 'junction', elevationM: 0, demandM3s: 1500 * GPM_M3S },
      { id: 'J6', kind: 'ram-outlet', elevationM: 0, inflowM3s: 2000 * GPM_M3S },
    ],
    links: EXAMPLE_3_PIPES.map(([id, from, to, diameterIn, lengthFt]): NetworkLink => ({
      id,
      from,
      to,
      lengthM: lengthFt * FOOT_M,
      pipe: { id: `p${id}`, insideDiameterM: diameterIn * INCH_M, roughnessM: 0.0102 * INCH_M },
    })),
    settings: { frictionMethod: 'darcy-weisbach', freeSurfaceLosses: false, waterTemperatureC: DECK_TEMPERATURE_C },
  };
}

describe('solveNetwork: Jeppson manual, chapter 5 deck (Darcy-Weisbach, six junctions, two inflows) [NET-JE74]', () => {
  const solution = solveNetwork(example3());

  it('converges and keeps continuity', () => {
    expect(solution.converged).toBe(true);
    expect(solution.maxContinuityErrorM3s).toBeLessThan(1e-9);
  });

  it('reproduces the printed flows of all seven pipes to 1e-3 relative', () => {
    // Jeppson [NET-JE74] chapter 5 deck. That run stopped when its last two iterates still
    // differed by up to 2.4e-4 relative (pipe 2), and its losses differ from this core's (next
    // test), so 1e-3: the flows here agree to 6e-4 or better.
    for (const [id, flowGpm] of Object.entries(EXAMPLE_3_FLOWS_GPM)) {
      expect(relativeError(solution.flowsM3s[id] / GPM_M3S, flowGpm), `pipe ${id}`).toBeLessThan(1e-3);
    }
  });

  it('reproduces the printed head losses to 3 % relative', () => {
    // Jeppson [NET-JE74] chapter 5 deck. The printed losses run 0.5-2.6 % above this core's
    // Colebrook losses at nearly the same flows; the cause was not traced (see the reference entry).
    for (const [id, lossFt] of Object.entries(EXAMPLE_3_LOSSES_FT)) {
      expect(relativeError(solution.headLossesM[id] / FOOT_M, lossFt), `pipe ${id}`).toBeLessThan(0.03);
    }
  });

  it('closes the head around both loops', () => {
    // Loops as the deck lists them: (1, -2, -3, -4) and (5, -6, 7, 2).
    expect(
      Math.abs(
        loopHeadSumM(solution, [
          ['1', 1],
          ['2', -1],
          ['3', -1],
          ['4', -1],
        ]),
      ),
    ).toBeLessThan(1e-6);
    expect(
      Math.abs(
        loopHeadSumM(solution, [
          ['5', 1],
          ['6', -1],
          ['7', 1],
          ['2', 1],
        ]),
      ),
    ).toBeLessThan(1e-6);
  });
});
