'use strict';

// Invented demo data: a phone-GPS walk of the Larkspur Gill supply, 2.4 km from the Hobb spring over
// the Gill bottom and Cragend ridge to the village tank at Nether Sowby. The ground is a smooth
// curve through the control points below; the heights a phone would log scatter around it (a slow
// drift plus jitter, about 1.3 m at one standard deviation) and one fix is a gross spike. Tests
// work out the expected findings from the smooth ground; the seeder stores the noisy heights.

const SPACING_M = 5;
const LENGTH_M = 2400;
/** Chainage (m) and ground (m) at the turning points of the smooth ground. */
const CONTROL = [
  [0, 520], // Hobb spring
  [330, 486], // hollow below the spring
  [420, 495], // Hobb knoll
  [1000, 410], // Gill bottom (the deep valley)
  [1650, 478], // Cragend ridge
  [2040, 452], // Sowby dip
  [2200, 461], // Sowby rise
  [2400, 452], // village tank
];
/** Index of the fix that jumped (the gross spike) and how far, m. */
const SPIKE = { seq: 302, offsetM: 34 };
/** What the phone states as its vertical accuracy for every fix, m. */
const STATED_ACCURACY_M = 4;

function smoothGroundAt(c) {
  for (let i = 1; i < CONTROL.length; i++) {
    if (c <= CONTROL[i][0]) {
      const [c0, z0] = CONTROL[i - 1];
      const [c1, z1] = CONTROL[i];
      const t = (c - c0) / (c1 - c0);
      return z0 + ((z1 - z0) * (1 - Math.cos(Math.PI * t))) / 2;
    }
  }
  return CONTROL[CONTROL.length - 1][1];
}

/** Deterministic pseudo-random numbers (mulberry32) so the walk is the same on every machine. */
function random(seed) {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

function gaussian(next) {
  const u = Math.max(next(), 1e-12);
  return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * next());
}

/**
 * The walk, one fix every 5 m: chainage, smooth ground, logged height (drift + jitter, one spike),
 * and a position for the plan. Heights in metres on the phone's datum (WGS84 ellipsoid heights
 * corrected to the geoid, as phones log them).
 */
function ridgeWalk() {
  const next = random(20261202);
  const points = [];
  let drift = 0;
  const phi = 0.85; // a phone's height error wanders slowly from fix to fix
  const driftSd = 1.2;
  const jitterSd = 0.5;
  for (let seq = 0; seq <= LENGTH_M / SPACING_M; seq++) {
    const chainageM = seq * SPACING_M;
    drift = phi * drift + Math.sqrt(1 - phi * phi) * driftSd * gaussian(next);
    const groundM = smoothGroundAt(chainageM);
    let loggedM = groundM + drift + jitterSd * gaussian(next);
    if (seq === SPIKE.seq) loggedM += SPIKE.offsetM;
    points.push({ seq, chainageM, groundM, elevationM: Math.round(loggedM * 10) / 10 });
  }
  return points;
}

/**
 * The demo's line on the walk (core shapes, SI): PE100 SDR 17 (PN 10) throughout, 50 mm to the
 * ridge and 63 mm down to the tank, at 1.75 L/s. The Gill bottom is over the PN 10 rating with the
 * line shut and the grade line passes under Cragend ridge, beyond the practical siphon limit.
 */
const WALK_LINE = {
  start: { kind: 'water-level', levelM: 521 },
  end: { kind: 'tank-inlet', elevationM: 453 },
  flow: { kind: 'design', flowM3s: 0.00175 },
  stretches: [
    { fromM: 0, toM: 1650, pipe: 'pe100-iso4427-sdr17-50mm' },
    { fromM: 1650, toM: 2400, pipe: 'pe100-iso4427-sdr17-63mm' },
  ],
  settings: { defaultCoverM: 0.75 },
};

module.exports = { ridgeWalk, WALK_LINE, smoothGroundAt, CONTROL, SPIKE, SPACING_M, LENGTH_M, STATED_ACCURACY_M };
