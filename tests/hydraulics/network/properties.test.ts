import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { solveNetwork, type NetworkInput, type NetworkSolution } from '../../../hydraulics/index';
import { randomNetwork } from './random-networks';

/** Net flow into each non-fixed node minus its demand, recomputed from the reported flows. */
function continuityErrors(input: NetworkInput, solution: NetworkSolution): number[] {
  const balance = new Map(input.nodes.map((node) => [node.id, -(node.demandM3s ?? 0)]));
  for (const link of input.links) {
    const q = solution.flowsM3s[link.id];
    balance.set(link.from, (balance.get(link.from) as number) - q);
    balance.set(link.to, (balance.get(link.to) as number) + q);
  }
  return input.nodes.filter((node) => node.kind === 'junction').map((node) => Math.abs(balance.get(node.id) as number));
}

/** Sum of head losses around the loop each extra link closes through the tree links (path by BFS). */
function loopSums(input: NetworkInput, solution: NetworkSolution, loopLinks: number[]): number[] {
  const tree = input.links.filter((_, index) => !loopLinks.includes(index));
  const adjacency = new Map<string, { other: string; loss: number }[]>();
  for (const link of tree) {
    const loss = solution.headLossesM[link.id];
    adjacency.set(link.from, [...(adjacency.get(link.from) ?? []), { other: link.to, loss }]);
    adjacency.set(link.to, [...(adjacency.get(link.to) ?? []), { other: link.from, loss: -loss }]);
  }
  const lossAlongTree = (start: string, end: string): number => {
    const seen = new Map<string, number>([[start, 0]]);
    const queue = [start];
    while (queue.length > 0) {
      const node = queue.shift() as string;
      for (const { other, loss } of adjacency.get(node) ?? []) {
        if (seen.has(other)) continue;
        seen.set(other, (seen.get(node) as number) + loss);
        queue.push(other);
      }
    }
    return seen.get(end) as number;
  };
  return loopLinks.map((index) => {
    const link = input.links[index];
    return solution.headLossesM[link.id] + lossAlongTree(link.to, link.from);
  });
}

describe('solveNetwork on random networks (property tests)', () => {
  it('holds continuity at every junction to 1e-9 m³/s', () => {
    fc.assert(
      fc.property(randomNetwork(), ({ input }) => {
        const solution = solveNetwork(input);
        expect(solution.converged).toBe(true);
        for (const error of continuityErrors(input, solution)) expect(error).toBeLessThan(1e-9);
      }),
      { numRuns: 150 },
    );
  });

  it('loses no head around any loop', () => {
    fc.assert(
      fc.property(randomNetwork(), ({ input, loopLinks }) => {
        const solution = solveNetwork(input);
        for (const sum of loopSums(input, solution, loopLinks)) expect(Math.abs(sum)).toBeLessThan(1e-6);
      }),
      { numRuns: 150 },
    );
  });

  it('gives every link a loss equal to the fall of grade between its ends', () => {
    fc.assert(
      fc.property(randomNetwork(), ({ input }) => {
        const solution = solveNetwork(input);
        for (const link of input.links) {
          expect(
            Math.abs(solution.headLossesM[link.id] - (solution.headsM[link.from] - solution.headsM[link.to])),
          ).toBeLessThan(1e-6);
        }
      }),
      { numRuns: 100 },
    );
  });
});

describe('solveNetwork where a wide pipe carries next to nothing', () => {
  // Found by the property test above: a 187 mm pipe feeding 3.9 mL/s under 150 m of head has so large
  // a conductance that its flow moves by ~1e-11 m³/s with the last bits of the heads every step; the
  // iteration must call that settled rather than run out of steps.
  it('settles, with continuity to 1e-9 m³/s and the source-to-tank flow of a single pipe', () => {
    const pipe = (id: string, insideDiameterM: number) => ({ id, insideDiameterM, hazenWilliamsC: 100 });
    const input: NetworkInput = {
      nodes: [
        { id: 'spring', kind: 'source', elevationM: 200, waterLevelM: 200 },
        { id: 'tap', kind: 'junction', elevationM: 50, demandM3s: 3.902364706360237e-6 },
        { id: 'dead-end', kind: 'junction', elevationM: 50, demandM3s: 0 },
        { id: 'tank', kind: 'tank', elevationM: 150, waterLevelM: 195 },
      ],
      links: [
        { id: 'to-tap', from: 'spring', to: 'tap', lengthM: 10, pipe: pipe('wide', 0.186996927411556) },
        { id: 'to-dead-end', from: 'spring', to: 'dead-end', lengthM: 10, pipe: pipe('small', 0.025) },
        { id: 'to-tank', from: 'spring', to: 'tank', lengthM: 10, pipe: pipe('small', 0.025) },
      ],
      settings: { frictionMethod: 'hazen-williams', freeSurfaceLosses: false },
    };
    const solution = solveNetwork(input);
    expect(solution.converged).toBe(true);
    for (const error of continuityErrors(input, solution)) expect(error).toBeLessThan(1e-9);
    expect(Math.abs(solution.flowsM3s['to-tap'] - 3.902364706360237e-6)).toBeLessThan(1e-9);
    expect(solution.flowsM3s['to-dead-end']).toBe(0);
    // 5 m of head over 10 m of 25 mm pipe, C 100: Q = (5 / (10.6742 · 10 / (100^1.852 · 0.025^4.8704)))^(1/1.852)
    const resistance = (10.6742 * 10) / (100 ** 1.85185 * 0.025 ** 4.87037);
    expect(solution.flowsM3s['to-tank']).toBeCloseTo((5 / resistance) ** (1 / 1.85185), 6);
  });
});
