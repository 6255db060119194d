import { analyzeLine, type FrictionMethod, type LineInput, type LineStation } from '../hydraulics/index';
import type { Benchmark } from './harness';

const STATIONS = 100_000;
const STRETCHES = 50;
const SPACING_M = 0.5;

/** Deterministic pseudo-random numbers in [0, 1) (a 32-bit LCG, Numerical Recipes constants). */
function lcg(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (Math.imul(state, 1664525) + 1013904223) >>> 0;
    return state / 2 ** 32;
  };
}

/**
 * An invented 50 km line: a falling valley route with rolling ground and survey noise, 50 one-km
 * stretches alternating two PE100 sizes (90 and 110 mm SDR 11), 2 L/s design flow.
 */
export function benchmarkLine(frictionMethod: FrictionMethod): LineInput {
  const random = lcg(20240611);
  const stations: LineStation[] = new Array(STATIONS);
  for (let i = 0; i < STATIONS; i++) {
    const chainageM = i * SPACING_M;
    const groundElevationM = 900 - chainageM * 0.004 + 12 * Math.sin(chainageM / 1300) + (random() - 0.5) * 0.4;
    stations[i] = { chainageM, groundElevationM, coverM: 0.6 };
  }
  const lengthM = (STATIONS - 1) * SPACING_M;
  const stretches = Array.from({ length: STRETCHES }, (_, s) => ({
    fromM: (s * lengthM) / STRETCHES,
    toM: s === STRETCHES - 1 ? lengthM : ((s + 1) * lengthM) / STRETCHES,
    pipe: s % 2 === 0 ? 'pe100-iso4427-sdr11-90mm' : 'pe100-iso4427-sdr11-110mm',
  }));
  return {
    stations,
    stretches,
    start: { kind: 'water-level', levelM: 901 },
    end: { kind: 'outlet', elevationM: stations[STATIONS - 1].groundElevationM, residualHeadM: 10 },
    flow: { kind: 'design', flowM3s: 0.002 },
    settings: { frictionMethod },
  };
}

/** The floor: one plain loop summing the station-to-station (slope) distances of the same line. */
function sumDistances(stations: readonly LineStation[]): number {
  let total = 0;
  for (let i = 1; i < stations.length; i++) {
    const dx = stations[i].chainageM - stations[i - 1].chainageM;
    const dz = stations[i].groundElevationM - stations[i - 1].groundElevationM;
    total += Math.sqrt(dx * dx + dz * dz);
  }
  return total;
}

function profileBenchmark(name: string, method: FrictionMethod): Benchmark {
  // Built on first use, so running one benchmark does not hold the other's 100,000 stations.
  let line: LineInput | undefined;
  const get = () => (line ??= benchmarkLine(method));
  return {
    name,
    run: () => analyzeLine(get()),
    floor: () => sumDistances(get().stations),
    // Enough warm-up for the optimising compiler to settle on the hot loops: traced, it still
    // optimised and re-optimised parts of the analysis up to about the 25th run, and each run
    // before that was slower by up to half.
    warmUps: 40,
    runs: 31,
  };
}

/** Full line analysis (profile, zones and every check) of a 100 000-station line. */
export const profile100k: Benchmark = profileBenchmark('profile-100k', 'hazen-williams');
/** The same with Darcy-Weisbach friction. */
export const profile100kDw: Benchmark = profileBenchmark('profile-100k-dw', 'darcy-weisbach');

/**
 * A reference, not a target: what writing the analysis's per-point results alone costs on this machine, over the
 * same floor. One fused pass reads each station and writes the twelve arrays a profile returns (chainage, ground,
 * pipe, static line, grade line, flowing and static pressure, velocity, friction and fitting losses, station and
 * stretch index) with placeholder hydraulics: no checks, no zones, no planning. The gap between its ratio and
 * `profile-100k`'s is what the checks cost.
 */
function writeResultArrays(stations: readonly LineStation[]): Float64Array[] {
  const n = stations.length;
  const floats = Array.from({ length: 10 }, () => new Float64Array(n));
  const [chainage, ground, pipe, staticLine, grade, pressure, staticPressure, velocity, friction, fittings] = floats;
  const stationIndex = new Int32Array(n);
  const stretchIndex = new Int32Array(n);
  let gradeM = 901;
  let frictionM = 0;
  for (let j = 0; j < n; j++) {
    const station = stations[j];
    chainage[j] = station.chainageM;
    ground[j] = station.groundElevationM;
    const pipeM = station.groundElevationM - (station.coverM ?? 0.75);
    pipe[j] = pipeM;
    if (j > 0) {
      const dx = chainage[j] - chainage[j - 1];
      const dz = pipeM - pipe[j - 1];
      const loss = 0.001 * Math.sqrt(dx * dx + dz * dz);
      frictionM += loss;
      gradeM -= loss;
    }
    staticLine[j] = 901;
    grade[j] = gradeM;
    pressure[j] = gradeM - pipeM;
    staticPressure[j] = 901 - pipeM;
    velocity[j] = 0.4;
    friction[j] = frictionM;
    fittings[j] = 0;
    stationIndex[j] = j;
    stretchIndex[j] = j >> 11;
  }
  return floats;
}

let referenceLine: LineInput | undefined;
const referenceStations = () => (referenceLine ??= benchmarkLine('hazen-williams')).stations;

/** `profile-100k-results`: the cost of the results alone (see `writeResultArrays`), with the same floor. */
export const profile100kResults: Benchmark = {
  name: 'profile-100k-results',
  run: () => writeResultArrays(referenceStations()),
  floor: () => sumDistances(referenceStations()),
  warmUps: 40,
  runs: 31,
};
