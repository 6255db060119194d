import { lusolve } from 'mathjs';
import { compileNetwork, GradientSolver, networkTopology, solveNetwork } from '../hydraulics/index';
import type { Benchmark } from './harness';
import { latticeNetwork } from './network-data';

/** The dense matrix of a head system, for the dense comparison. */
function denseOf(
  size: number,
  diagonal: Float64Array,
  edgeA: Int32Array,
  edgeB: Int32Array,
  edgeValue: Float64Array,
): number[][] {
  const dense = Array.from({ length: size }, () => new Array<number>(size).fill(0));
  for (let i = 0; i < size; i++) dense[i][i] = diagonal[i];
  for (let e = 0; e < edgeA.length; e++) {
    dense[edgeA[e]][edgeB[e]] += edgeValue[e];
    dense[edgeB[e]][edgeA[e]] += edgeValue[e];
  }
  return dense;
}

const big = latticeNetwork(10_000, 12_000);
const small = compileNetwork(latticeNetwork(1_000, 1_200));
const smallSolver = new GradientSolver(small, networkTopology(small));
const system = smallSolver.headSystem();
const dense = denseOf(system.size, system.diagonal, system.edgeA, system.edgeB, system.edgeValue);
const rhs = Array.from(system.rhs, (value) => [value]);

/**
 * network-10k: a full solve of a 10,000-node, 12,000-link looped network (target under 150 ms).
 * ratio = mathjs dense `lusolve` of one 1,000-node head system over the sparse Cholesky solve of
 * the same system (ordering, factor and solve), measured in the same run (target above 100).
 */
export const network10k: Benchmark = {
  name: 'network-10k',
  run: () => solveNetwork(big),
  runs: 9,
  warmUps: 2,
  compare: {
    slow: () => lusolve(dense, rhs),
    fast: () => new GradientSolver(small, networkTopology(small)).solveHeadSystem(system),
    runs: 1,
    warmUps: 0,
  },
};
