import { describe, expect, it } from 'vitest';
import { pipeHeadLossM, solveNetwork, type NetworkInput } from '../../../hydraulics/index';
import { TWO_LOOP_419K_DESIGN_IN, twoLoopNetwork } from './two-loop-fixture';

/** Hazen-Williams with the textbook constants pinned for hand calculation: 10.67, 1.852, 4.87. */
const HAND_SETTINGS = {
  frictionMethod: 'hazen-williams' as const,
  freeSurfaceLosses: false,
  hazenWilliamsConstant: 10.67,
  hazenWilliamsFlowExponent: 1.852,
  hazenWilliamsDiameterExponent: 4.87,
};

function branched(): NetworkInput {
  return {
    nodes: [
      { id: 'spring', kind: 'source', elevationM: 100, waterLevelM: 100 },
      { id: 'tee', kind: 'junction', elevationM: 80 },
      { id: 'trough', kind: 'outlet', elevationM: 60, demandM3s: 0.001 },
      { id: 'house', kind: 'outlet', elevationM: 70, demandM3s: 0.002 },
    ],
    links: [
      {
        id: 'main',
        from: 'spring',
        to: 'tee',
        lengthM: 500,
        pipe: { id: 'p100', insideDiameterM: 0.1, hazenWilliamsC: 140 },
      },
      {
        id: 'to-trough',
        from: 'tee',
        to: 'trough',
        lengthM: 300,
        pipe: { id: 'p50', insideDiameterM: 0.05, hazenWilliamsC: 140 },
      },
      {
        id: 'to-house',
        from: 'house',
        to: 'tee',
        lengthM: 400,
        pipe: { id: 'p75', insideDiameterM: 0.075, hazenWilliamsC: 140 },
      },
    ],
    settings: HAND_SETTINGS,
  };
}

describe('solveNetwork: a branched network', () => {
  it('gives the flows continuity alone fixes, exactly', () => {
    const solution = solveNetwork(branched());
    expect(solution.converged).toBe(true);
    expect(solution.flowsM3s.main).toBeCloseTo(0.003, 12);
    expect(solution.flowsM3s['to-trough']).toBeCloseTo(0.001, 12);
    // Drawn against the link's direction (house -> tee), so negative.
    expect(solution.flowsM3s['to-house']).toBeCloseTo(-0.002, 12);
  });

  it('gives heads that match a hand calculation', () => {
    // Hand calculation, h = 10.67 L Q^1.852 / (C^1.852 D^4.87):
    //   main:      500 m, 3 L/s, 0.100 m, C 140 -> 0.8915 m  -> tee   100 - 0.8915 = 99.1085 m
    //   to-trough: 300 m, 1 L/s, 0.050 m, C 140 -> 2.0449 m  -> trough 99.1085 - 2.0449 = 97.0636 m
    //   to-house:  400 m, 2 L/s, 0.075 m, C 140 -> 1.3663 m  -> house  99.1085 - 1.3663 = 97.7421 m
    const solution = solveNetwork(branched());
    expect(solution.headsM.tee).toBeCloseTo(99.1085, 4);
    expect(solution.headsM.trough).toBeCloseTo(97.0636, 4);
    expect(solution.headsM.house).toBeCloseTo(97.7421, 4);
    expect(solution.pressureHeadsM.trough).toBeCloseTo(37.0636, 4);
    expect(solution.headLossesM['to-house']).toBeCloseTo(-1.3663, 4);
  });

  it('holds continuity at every node to 1e-9 m³/s', () => {
    expect(solveNetwork(branched()).maxContinuityErrorM3s).toBeLessThan(1e-9);
  });

  it("solves with Darcy-Weisbach too, and agrees with Hazen-Williams to within the laws' spread", () => {
    const input = branched();
    const darcy: NetworkInput = {
      ...input,
      links: input.links.map((link) => ({
        ...link,
        pipe: {
          ...(link.pipe as object),
          id: 'x',
          insideDiameterM: (link.pipe as { insideDiameterM: number }).insideDiameterM,
          roughnessM: 1.5e-6,
        },
      })),
      settings: { frictionMethod: 'darcy-weisbach' },
    };
    const solution = solveNetwork(darcy);
    expect(solution.converged).toBe(true);
    expect(solution.flowsM3s.main).toBeCloseTo(0.003, 12);
    // Smooth pipe vs C = 140: same flows, losses within ~30 % (common practice, no source).
    expect(100 - solution.headsM.tee).toBeGreaterThan(0.6);
    expect(100 - solution.headsM.tee).toBeLessThan(1.2);
  });
});

describe('solveNetwork: the two-loop benchmark [NET-AS77]', () => {
  // Heads of the 419,000 $ design with ω = 10.667, exponents 1.852 / 4.871 (docs/references/network.md, [NET-AS77]
  // §"solved heads").
  const PUBLISHED_HEADS_M: Record<string, number> = {
    '2': 203.247,
    '3': 190.462,
    '4': 198.449,
    '5': 183.803,
    '6': 195.445,
    '7': 190.552,
  };
  const PUBLISHED_FLOWS_M3H: Record<string, number> = {
    '1': 1120.0,
    '2': 336.88,
    '3': 683.12,
    '4': 32.56,
    '5': 530.56,
    '6': 200.56,
    '7': 236.88,
    '8': -0.56,
  };

  it('reproduces the published heads to 0.01 m with the constants pinned', () => {
    const solution = solveNetwork(twoLoopNetwork(TWO_LOOP_419K_DESIGN_IN));
    expect(solution.converged).toBe(true);
    for (const [node, head] of Object.entries(PUBLISHED_HEADS_M))
      expect(Math.abs(solution.headsM[node] - head)).toBeLessThan(0.01);
  });

  it('reproduces the published flows to 0.01 m³/h, pipe 8 nearly still and reversed', () => {
    const solution = solveNetwork(twoLoopNetwork(TWO_LOOP_419K_DESIGN_IN));
    for (const [pipe, flow] of Object.entries(PUBLISHED_FLOWS_M3H))
      expect(Math.abs(solution.flowsM3s[pipe] * 3600 - flow)).toBeLessThan(0.01);
    expect(solution.maxContinuityErrorM3s).toBeLessThan(1e-9);
  });
});

describe("solveNetwork: the default friction law is the line analysis's", () => {
  // Spring at 100 m to a tank at 90 m through 800 m of 50 mm PE (invented). Energy between two free
  // surfaces, as the line analysis writes it (analyze-profile.ts, profile-and-checks.md §5.2):
  // Δz = (K_entrance 0.5 + f·L/D + 1)·v²/2g, f by Colebrook.
  const pipe = { id: 'pe50', insideDiameterM: 0.05, roughnessM: 1.5e-6, hazenWilliamsC: 150 };
  const input = (settings?: NetworkInput['settings']): NetworkInput => ({
    nodes: [
      { id: 'spring', kind: 'source', elevationM: 100, waterLevelM: 100 },
      { id: 'tank', kind: 'tank', elevationM: 88, waterLevelM: 90 },
    ],
    links: [{ id: 'trunk', from: 'spring', to: 'tank', lengthM: 800, pipe }],
    settings,
  });

  it('is Darcy-Weisbach with the entrance and velocity head at the spring, and says so', () => {
    const solution = solveNetwork(input());
    expect(solution.frictionMethod).toBe('darcy-weisbach');
    expect(solution.freeSurfaceLosses).toBe(true);
    const q = solution.flowsM3s.trunk;
    const v = q / (Math.PI * 0.025 ** 2);
    const friction = pipeHeadLossM({ method: 'darcy-weisbach', flowM3s: q, lengthM: 800, pipe });
    expect(friction + (1.5 * v * v) / (2 * 9.80665)).toBeCloseTo(10, 6);
  });

  it('leaves the free-surface losses out when asked (published benchmarks), so the flow rises', () => {
    const without = solveNetwork(input({ freeSurfaceLosses: false }));
    expect(without.freeSurfaceLosses).toBe(false);
    const q = without.flowsM3s.trunk;
    expect(pipeHeadLossM({ method: 'darcy-weisbach', flowM3s: q, lengthM: 800, pipe })).toBeCloseTo(10, 6);
    expect(q).toBeGreaterThan(solveNetwork(input()).flowsM3s.trunk);
  });

  it('reports Hazen-Williams when a network asks for it', () => {
    const hw = solveNetwork({
      ...input({ frictionMethod: 'hazen-williams' }),
      links: [
        {
          id: 'trunk',
          from: 'spring',
          to: 'tank',
          lengthM: 800,
          pipe: { id: 'c140', insideDiameterM: 0.05, hazenWilliamsC: 140 },
        },
      ],
    });
    expect(hw.frictionMethod).toBe('hazen-williams');
  });
});
