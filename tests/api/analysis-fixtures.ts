/** A flat 1 km line of 100 mm bore, C = 150, carrying 10 L/s (core.md §8.2 quick cross-check). */
export const REFERENCE_PIPE = {
  id: 'test-100mm-c150',
  label: '100 mm test pipe',
  material: 'custom',
  nominalSize: '100 mm',
  outsideDiameterM: 0.11,
  insideDiameterM: 0.1,
  wallM: 0.005,
  pressureRatingPa: 1_000_000,
  hazenWilliamsC: 150,
  roughnessM: 1.5e-6,
  waveSpeedMs: 400,
  source: 'test pipe, invented',
};

export function referenceLine() {
  return {
    stations: [
      { chainageM: 0, groundElevationM: 0 },
      { chainageM: 500, groundElevationM: 0 },
      { chainageM: 1000, groundElevationM: 0 },
    ],
    stretches: [{ fromM: 0, toM: 1000, pipe: REFERENCE_PIPE.id }],
    pipes: [REFERENCE_PIPE],
    start: { kind: 'water-level', levelM: 30 },
    end: { kind: 'free-discharge' },
    flow: { kind: 'design', flowM3s: 0.01 },
    settings: { checkSurge: false },
  };
}
