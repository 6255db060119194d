import { describe, expect, it } from 'vitest';
import { sizeNetwork, solveNetwork, type NetworkInput, type SizingCandidate } from '../../../hydraulics/index';

/** Three candidate pipes (invented prices), C = 140. */
const CANDIDATES: SizingCandidate[] = [
  { pipe: { id: 'd40', insideDiameterM: 0.04, hazenWilliamsC: 140 }, costPerM: 3 },
  { pipe: { id: 'd50', insideDiameterM: 0.05, hazenWilliamsC: 140 }, costPerM: 4.5 },
  { pipe: { id: 'd63', insideDiameterM: 0.063, hazenWilliamsC: 140 }, costPerM: 7 },
  { pipe: { id: 'd75', insideDiameterM: 0.075, hazenWilliamsC: 140 }, costPerM: 10 },
];
const SETTINGS = {
  frictionMethod: 'hazen-williams' as const,
  freeSurfaceLosses: false,
  hazenWilliamsConstant: 10.67,
  hazenWilliamsFlowExponent: 1.852,
  hazenWilliamsDiameterExponent: 4.87,
};

/** A spring feeding a tee, then a trough line and a house line (invented). */
function farm(): NetworkInput {
  return {
    nodes: [
      { id: 'spring', kind: 'source', elevationM: 120 },
      { id: 'tee', kind: 'junction', elevationM: 95 },
      { id: 'bend', kind: 'junction', elevationM: 90 },
      { id: 'trough', kind: 'outlet', elevationM: 92, demandM3s: 0.0015, minPressureHeadM: 5 },
      { id: 'house', kind: 'outlet', elevationM: 88, demandM3s: 0.002, minPressureHeadM: 15 },
    ],
    links: [
      { id: 'main', from: 'spring', to: 'tee', lengthM: 600, pipe: 'pe100-iso4427-sdr11-63mm' },
      { id: 'trough-line', from: 'tee', to: 'trough', lengthM: 450, pipe: 'pe100-iso4427-sdr11-63mm' },
      { id: 'house-1', from: 'tee', to: 'bend', lengthM: 300, pipe: 'pe100-iso4427-sdr11-63mm' },
      { id: 'house-2', from: 'bend', to: 'house', lengthM: 200, pipe: 'pe100-iso4427-sdr11-63mm' },
    ],
    settings: SETTINGS,
  };
}

/** Every one-pipe-per-link design, checked by the solver: the cheapest feasible one. */
function cheapestByEnumeration(input: NetworkInput): { cost: number; pipes: string[] } {
  let best = { cost: Infinity, pipes: [] as string[] };
  const n = input.links.length;
  for (let code = 0; code < CANDIDATES.length ** n; code++) {
    const picks = Array.from({ length: n }, (_, i) => Math.floor(code / CANDIDATES.length ** i) % CANDIDATES.length);
    const cost = picks.reduce((sum, c, i) => sum + CANDIDATES[c].costPerM * input.links[i].lengthM, 0);
    if (cost >= best.cost) continue;
    const solution = solveNetwork({
      ...input,
      links: input.links.map((link, i) => ({ ...link, pipe: CANDIDATES[picks[i]].pipe })),
    });
    const ok = input.nodes.every(
      (node) => node.minPressureHeadM === undefined || solution.pressureHeadsM[node.id] >= node.minPressureHeadM - 1e-9,
    );
    const velocityOk = input.links.every((link) => Math.abs(solution.velocitiesMs[link.id]) <= 3);
    if (ok && velocityOk) best = { cost, pipes: picks.map((c) => CANDIDATES[c].pipe.id) };
  }
  return best;
}

describe('sizeNetwork: branched networks solved exactly [NET-KGM68]', () => {
  it('the MIP finds the same least cost as trying all 256 designs', async () => {
    const enumerated = cheapestByEnumeration(farm());
    const result = await sizeNetwork(farm(), { candidates: CANDIDATES });
    expect(result.method).toBe('branched-mip');
    expect(result.feasible).toBe(true);
    expect(result.provenOptimal).toBe(true);
    expect(result.cost).toBeCloseTo(enumerated.cost, 6);
    expect(['main', 'trough-line', 'house-1', 'house-2'].map((id) => result.pipeByLink[id])).toEqual(enumerated.pipes);
  });

  it('splitting links between sizes (the LP) costs no more than one size per link', async () => {
    const whole = await sizeNetwork(farm(), { candidates: CANDIDATES });
    const split = await sizeNetwork(farm(), { candidates: CANDIDATES, onePipePerLink: false });
    expect(split.method).toBe('branched-lp');
    expect(split.feasible).toBe(true);
    expect(split.cost).toBeLessThanOrEqual(whole.cost + 1e-6);
    // Each link's pieces add up to its length, and the solver confirms every residual.
    for (const link of farm().links) {
      const pieces = split.piecesByLink?.[link.id] ?? [];
      expect(pieces.reduce((sum, piece) => sum + piece.lengthM, 0)).toBeCloseTo(link.lengthM, 6);
    }
    expect(split.solution.pressureHeadsM.house).toBeGreaterThanOrEqual(15 - 1e-6);
    expect(split.solution.pressureHeadsM.trough).toBeGreaterThanOrEqual(5 - 1e-6);
  });

  it('reports the cheapest single size for comparison', async () => {
    const result = await sizeNetwork(farm(), { candidates: CANDIDATES });
    expect(result.singleSize.feasible).toBe(true);
    expect(result.singleSize.cost as number).toBeGreaterThanOrEqual(result.cost);
    // One size everywhere: the smallest that works is checked directly.
    const sizes = CANDIDATES.filter((candidate) => candidate.pipe.id === result.singleSize.pipeId);
    expect(sizes).toHaveLength(1);
  });

  it('keeps pipes whose rating is below the static head out of the design', async () => {
    const low = CANDIDATES.map((candidate, index) => ({
      ...candidate,
      pipe: { ...candidate.pipe, pressureRatingPa: index < 2 ? 2e5 : 1e6 },
    }));
    // Static head at the house: 120 - 88 = 32 m, about 3.1 bar, above the 2 bar of the two cheapest.
    const result = await sizeNetwork(farm(), { candidates: low });
    expect(result.feasible).toBe(true);
    expect(['d63', 'd75']).toContain(result.pipeByLink['house-2']);
  });

  it('says so, naming the node, when no pipe can help', async () => {
    const input = farm();
    const high: NetworkInput = {
      ...input,
      nodes: input.nodes.map((node) => (node.id === 'house' ? { ...node, minPressureHeadM: 40 } : node)),
    };
    const result = await sizeNetwork(high, { candidates: CANDIDATES });
    expect(result.feasible).toBe(false);
    expect(result.warnings[0].code).toBe('head-not-enough');
    expect(result.warnings[0].message).toContain('"house"');
  });
});

describe('sizeNetwork on the default law counts the entrance at the spring', () => {
  it("gives a split-pipe design the solver confirms, the spring's entrance and velocity head included", async () => {
    // The farm above on the network's default (Darcy-Weisbach, K = 1.5 where water leaves the spring).
    const pe = (id: string, mm: number, costPerM: number): SizingCandidate => ({
      pipe: { id, insideDiameterM: mm / 1000, roughnessM: 1.5e-6, hazenWilliamsC: 150 },
      costPerM,
    });
    const input: NetworkInput = { ...farm(), settings: undefined };
    const result = await sizeNetwork(input, {
      candidates: [pe('d40', 40, 3), pe('d50', 50, 4.5), pe('d63', 63, 7), pe('d75', 75, 10)],
      onePipePerLink: false,
    });
    expect(result.solution.freeSurfaceLosses).toBe(true);
    expect(result.warnings.map((w) => w.code)).not.toContain('design-check-failed');
    expect(result.feasible).toBe(true);
    expect(result.solution.pressureHeadsM.trough).toBeGreaterThanOrEqual(5 - 1e-6);
    expect(result.solution.pressureHeadsM.house).toBeGreaterThanOrEqual(15 - 1e-6);
  });
});
