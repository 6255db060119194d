import { pipesOfSeries, runNetworkDay, sizeNetwork, type NetworkInput } from '../hydraulics/index';
import type { Benchmark } from './harness';
import { latticeNetwork } from './network-data';

/** Candidates: PE100 SDR 11 sizes at an invented price rising with the square of the bore. */
const candidates = pipesOfSeries('pe100-iso4427-sdr11').map((pipe) => ({
  pipe,
  costPerM: 1 + 900 * pipe.outsideDiameterM ** 2,
}));
const tree = latticeNetwork(501, 500, 11, false);
// A fifth of the lattice's draw: a farm's troughs and taps rather than a town's.
const branched: NetworkInput = {
  ...tree,
  nodes: tree.nodes.map((node) => (node.demandM3s ? { ...node, demandM3s: node.demandM3s * 0.2 } : node)),
};

/** sizing-500: a 500-link branched network sized exactly by the split-pipe LP (target under 2 s). */
export const sizing500: Benchmark = {
  name: 'sizing-500',
  run: async () => {
    const result = await sizeNetwork(branched, {
      candidates,
      minPressureHeadM: 10,
      onePipePerLink: false,
      timeLimitS: 30,
    });
    if (!result.feasible)
      throw new Error(
        `sizing-500: the benchmark network should be feasible: ${result.warnings.map((w) => w.message).join(' / ')}`,
      );
    return result;
  },
  runs: 5,
  warmUps: 1,
};

/** Morning and evening draw for every outlet of the day run. */
const TWO_PEAKS = Array.from({ length: 24 }, (_, hour) =>
  [6, 7, 18, 19].includes(hour) ? 0.2 : hour >= 8 && hour < 18 ? 0.02 : 0,
);
const base = latticeNetwork(1_000, 1_200, 5);
const day: NetworkInput = {
  ...base,
  nodes: base.nodes.map((node) => (node.kind === 'junction' ? { ...node, hourlyFractions: TWO_PEAKS } : node)),
};

/** day-1k: a 24-hour run of a 1,000-node looped network in hourly steps (target under 1 s). */
export const day1k: Benchmark = {
  name: 'day-1k',
  run: () => runNetworkDay(day, { keepSolutions: false }),
  runs: 5,
  warmUps: 1,
};
