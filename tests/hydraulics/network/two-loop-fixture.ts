import type { NetworkInput, NetworkLink } from '../../../hydraulics/index';

/**
 * The two-loop network of Alperovits & Shamir (1977) [NET-AS77] as the benchmark literature states
 * it (docs/references/network.md): reservoir 1 at 210 m, six junctions, eight 1000 m pipes with
 * C = 130, demands in m³/h, 30 m minimum pressure head, nominal diameter taken as inside diameter.
 */
export const TWO_LOOP_DEMANDS_M3H: Record<string, number> = {
  '2': 100,
  '3': 100,
  '4': 120,
  '5': 270,
  '6': 330,
  '7': 200,
};
const ELEVATIONS_M: Record<string, number> = { '2': 150, '3': 160, '4': 155, '5': 150, '6': 165, '7': 160 };
export const TWO_LOOP_PIPES: readonly (readonly [string, string, string])[] = [
  ['1', '1', '2'],
  ['2', '2', '3'],
  ['3', '2', '4'],
  ['4', '4', '5'],
  ['5', '4', '6'],
  ['6', '6', '7'],
  ['7', '3', '5'],
  ['8', '5', '7'],
];
/** Candidate diameters (in) and costs ($/m) [NET-AS77]. */
export const TWO_LOOP_CANDIDATES_IN_COST: readonly (readonly [number, number])[] = [
  [1, 2],
  [2, 5],
  [3, 8],
  [4, 11],
  [6, 16],
  [8, 23],
  [10, 32],
  [12, 50],
  [14, 60],
  [16, 90],
  [18, 130],
  [20, 170],
  [22, 300],
  [24, 550],
];
/** The best-known one-size-per-pipe design, 419,000 $ [NET-AS77]. */
export const TWO_LOOP_419K_DESIGN_IN = [18, 10, 16, 4, 16, 10, 10, 1];

export const INCH_TO_M = 0.0254;

/** Constants the benchmark fixes: ω = 10.667, exponents 1.852 and 4.871 [NET-AS77]. */
export const TWO_LOOP_SETTINGS = {
  frictionMethod: 'hazen-williams',
  // The benchmark's heads count friction alone: no entrance loss at the reservoir.
  freeSurfaceLosses: false,
  hazenWilliamsConstant: 10.667,
  hazenWilliamsFlowExponent: 1.852,
  hazenWilliamsDiameterExponent: 4.871,
} as const;

export function inchPipe(inches: number) {
  return { id: `${inches}in`, insideDiameterM: inches * INCH_TO_M, hazenWilliamsC: 130 };
}

/** The network with the given diameters (in) on pipes 1-8. */
export function twoLoopNetwork(diametersIn: readonly number[]): NetworkInput {
  const links: NetworkLink[] = TWO_LOOP_PIPES.map(([id, from, to], index) => ({
    id,
    from,
    to,
    lengthM: 1000,
    pipe: inchPipe(diametersIn[index]),
  }));
  return {
    nodes: [
      { id: '1', kind: 'source', elevationM: 210, waterLevelM: 210 },
      ...Object.keys(ELEVATIONS_M).map((id) => ({
        id,
        kind: 'junction' as const,
        elevationM: ELEVATIONS_M[id],
        demandM3s: TWO_LOOP_DEMANDS_M3H[id] / 3600,
        minPressureHeadM: 30,
      })),
    ],
    links,
    settings: TWO_LOOP_SETTINGS,
  };
}
