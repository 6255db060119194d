import { analyzeLine, type LineInput, type LineStation } from '../hydraulics/index';
import { profileScene } from '../lib/chart/profile-scene';
import { displayUnits } from '../lib/units/index';
import type { Benchmark } from './harness';

const STATIONS = 5_000;
const SPACING_M = 1;

/**
 * An invented 5 km hill line as a designer edits it in the browser: 1 m stations with rolling
 * ground and a deep sag, six stretches of PE100 and PE80 in two classes, fittings, valves and one
 * break-pressure tank, 1.5 L/s design flow.
 */
export function editorLine(stationCount = STATIONS): LineInput {
  let state = 977 >>> 0;
  const random = () => (state = (Math.imul(state, 1664525) + 1013904223) >>> 0) / 2 ** 32;
  const stations: LineStation[] = new Array(stationCount);
  const lengthM = (stationCount - 1) * SPACING_M * (STATIONS / stationCount);
  for (let i = 0; i < stationCount; i++) {
    const chainageM = (i * lengthM) / (stationCount - 1);
    const t = chainageM / lengthM;
    const groundElevationM =
      620 - 180 * t - 60 * Math.sin(Math.PI * t) ** 8 + 6 * Math.sin(chainageM / 140) + (random() - 0.5) * 0.3;
    stations[i] = { chainageM, groundElevationM };
  }
  const pipes = [
    'pe100-iso4427-sdr11-63mm',
    'pe100-iso4427-sdr11-50mm',
    'pe80-iso4427-sdr11-50mm',
    'pe100-iso4427-sdr11-50mm',
    'pe100-iso4427-sdr13.6-50mm',
    'pe100-iso4427-sdr11-40mm',
  ];
  const stretches = pipes.map((pipe, s) => ({
    fromM: (s * lengthM) / pipes.length,
    toM: s === pipes.length - 1 ? lengthM : ((s + 1) * lengthM) / pipes.length,
    pipe,
  }));
  return {
    stations,
    stretches,
    fittings: [
      { chainageM: 0, k: 0.5, label: 'entrance' },
      { chainageM: lengthM * 0.5, k: 0.15, label: 'gate valve' },
    ],
    devices: [
      { kind: 'break-pressure-tank', chainageM: lengthM * 0.4 },
      { kind: 'washout', chainageM: lengthM * 0.5 },
      { kind: 'isolation-valve', chainageM: lengthM * 0.9 },
    ],
    start: { kind: 'water-level', levelM: 621 },
    end: { kind: 'outlet', elevationM: stations[stationCount - 1].groundElevationM, residualHeadM: 5 },
    flow: { kind: 'design', flowM3s: 0.0015 },
    settings: { defaultCoverM: 0.6 },
  };
}

function lazy<T>(make: () => T): () => T {
  let value: T | undefined;
  return () => (value ??= make());
}

const line = lazy(() => editorLine());
const metric = displayUnits('metric');

/** What every edit costs in the browser: the whole analysis with its checks of a 5,000-station line. */
export const line5k: Benchmark = { name: 'line-5k', run: () => analyzeLine(line()), warmUps: 10, runs: 31 };

/** The same edit including redrawing the long profile (thinning, paths, zones, axes) at 1,000 px. */
export const line5kDraw: Benchmark = {
  name: 'line-5k-draw',
  run: () => {
    const a = analyzeLine(line());
    return profileScene(a, { units: metric, devices: line().devices ?? [], width: 1000 });
  },
  warmUps: 10,
  runs: 31,
};

const long = lazy(() => {
  const input = editorLine(100_000);
  return { input, analysis: analyzeLine(input) };
});

/** Redrawing the profile of a 100,000-station line (thinned to the pixel width), analysis done. */
export const draw100k: Benchmark = {
  name: 'draw-100k',
  run: () => profileScene(long().analysis, { units: metric, devices: long().input.devices ?? [], width: 1000 }),
  warmUps: 5,
  runs: 15,
};
