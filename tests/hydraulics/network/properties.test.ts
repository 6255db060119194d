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
          expect(Math.abs(solution.headLossesM[link.id] - (solution.headsM[link.from] - solution.headsM[link.to]))).toBeLessThan(1e-6);
        }
      }),
      { numRuns: 100 },
    );
  });
});
