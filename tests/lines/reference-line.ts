import type { LineInput, LineStation } from '../../hydraulics/index';

/**
 * Invented reference line for the drawing and export tests: 1.4 km from a spring box at 412 m to a
 * house at 316 m through a sag at 300 m, 10 m stations, cosine-eased between the control points so
 * the only highs and lows are the intended ones. PE80 SDR 17 (PN 8) is over its static rating in
 * the sag; a 40 mm first stretch puts a short rise near the source above the grade line.
 */
const CONTROL: [number, number][] = [
  [0, 411],
  [100, 403.5],
  [220, 408],
  [450, 352],
  [650, 300],
  [900, 322],
  [1400, 316],
];

export function referenceGroundM(chainageM: number): number {
  for (let i = 1; i < CONTROL.length; i++) {
    if (chainageM <= CONTROL[i][0]) {
      const [c0, z0] = CONTROL[i - 1];
      const [c1, z1] = CONTROL[i];
      const t = (chainageM - c0) / (c1 - c0);
      return z0 + ((z1 - z0) * (1 - Math.cos(Math.PI * t))) / 2;
    }
  }
  return CONTROL[CONTROL.length - 1][1];
}

export function referenceStations(spacingM = 10, lengthM = 1400): LineStation[] {
  const n = Math.round(lengthM / spacingM) + 1;
  return Array.from({ length: n }, (_, i) => ({
    chainageM: i * spacingM,
    groundElevationM: Math.round(referenceGroundM(i * spacingM) * 100) / 100,
  }));
}

export function referenceLine(): LineInput {
  return {
    stations: referenceStations(),
    stretches: [
      { fromM: 0, toM: 300, pipe: 'pe80-iso4427-sdr17-40mm' },
      { fromM: 300, toM: 1400, pipe: 'pe80-iso4427-sdr17-50mm' },
    ],
    fittings: [{ chainageM: 0, k: 0.5, label: 'intake entrance' }],
    devices: [{ kind: 'air-release-valve', chainageM: 900 }],
    start: { kind: 'water-level', levelM: 412 },
    end: { kind: 'outlet', elevationM: 316.5, residualHeadM: 3 },
    flow: { kind: 'design', flowM3s: 0.001 },
    settings: { defaultCoverM: 0.75 },
  };
}

/** The reference line's design parts (everything but the stations), as the API stores them. */
export function referenceDesignParts(): Omit<LineInput, 'stations'> {
  const { stations, ...rest } = referenceLine();
  void stations;
  return rest;
}
