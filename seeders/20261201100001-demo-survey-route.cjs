'use strict';

// Demo survey route for the invented Kestrel Hollow scenario: a phone-GPS walk from the upper
// spring box down past the old sheepfold to the house. Every number here is made up. The route id
// and name are fixed: the line designer's demo lays its line along this route.
const { Geodesic } = require('geographiclib-geodesic');

const ROUTE_ID = '6f1c1e52-3a57-4c38-9b0e-0d5b1c7a3001';
const ROUTE_NAME = 'Upper spring to house';
const PROJECT_ID = '6f1c1e52-3a57-4c38-9b0e-0d5b1c7a2001';
const SURVEYOR_ID = '6f1c1e52-3a57-4c38-9b0e-0d5b1c7a1003';
const START = { lat: 54.41873, lon: -2.87514 };
const STEP_M = 10;
const LENGTH_M = 1400;
const START_TIME = Date.parse('2026-04-18T08:05:00Z');

// Ground heights along the walk (chainage m, elevation m): a steep spring gully, a long fall to the
// wet ground at the old sheepfold (the low point), a low hummock, then down to the house.
const CONTROL = [
  [0, 412],
  [150, 398.5],
  [300, 381],
  [560, 356],
  [820, 334.5],
  [900, 337],
  [980, 342],
  [1150, 330],
  [1300, 321],
  [1400, 316],
];
// Where the walker turned, as bearings in degrees over chainage ranges.
const BEARINGS = [
  [0, 128],
  [300, 141],
  [620, 118],
  [900, 152],
  [1150, 134],
];
const LABELS = {
  0: 'Upper spring box',
  42: 'Field gate',
  82: 'Old sheepfold (low point)',
  98: 'Top of the hummock',
  140: 'House tank',
};
// Two fixes the phone got wrong, for the clean-up checks to find: +16 m and −12 m.
const SPIKES = { 37: 16, 117: -12 };

function heightAt(c) {
  for (let i = 1; i < CONTROL.length; i += 1) {
    const [c1, z1] = CONTROL[i];
    const [c0, z0] = CONTROL[i - 1];
    if (c <= c1) {
      const t = (c - c0) / (c1 - c0);
      return z0 + ((z1 - z0) * (1 - Math.cos(Math.PI * t))) / 2;
    }
  }
  return CONTROL[CONTROL.length - 1][1];
}

const bearingAt = (c) => BEARINGS.filter(([from]) => c >= from).pop()[1];

/** Deterministic noise in [-0.5, 0.5) m (a 32-bit LCG), so every seed gives the same walk. */
function noise(seed) {
  let state = seed >>> 0;
  return () => {
    state = (Math.imul(state, 1664525) + 1013904223) >>> 0;
    return state / 2 ** 32 - 0.5;
  };
}

function walk() {
  const wgs84 = Geodesic.WGS84;
  const jitter = noise(20260418);
  const points = [];
  let { lat, lon } = START;
  for (let i = 0; i * STEP_M <= LENGTH_M; i += 1) {
    const nominal = i * STEP_M;
    const elevation = Math.round((heightAt(nominal) + 0.8 * jitter() + (SPIKES[i] ?? 0)) * 100) / 100;
    points.push({ lat, lon, elevation });
    const next = wgs84.Direct(lat, lon, bearingAt(nominal) + 6 * jitter(), STEP_M);
    lat = Math.round(next.lat2 * 1e7) / 1e7;
    lon = Math.round(next.lon2 * 1e7) / 1e7;
  }
  let chainage = 0;
  let slope = 0;
  return points.map((p, i) => {
    if (i > 0) {
      const prev = points[i - 1];
      const h = wgs84.Inverse(prev.lat, prev.lon, p.lat, p.lon).s12;
      chainage += h;
      slope += Math.hypot(h, p.elevation - prev.elevation);
    }
    return { ...p, chainage, slope, seq: i };
  });
}

module.exports = {
  async up(queryInterface) {
    const [existing] = await queryInterface.sequelize.query('SELECT 1 FROM routes WHERE id = :id', {
      replacements: { id: ROUTE_ID },
    });
    if (existing.length > 0) return;
    const [project] = await queryInterface.sequelize.query('SELECT 1 FROM projects WHERE id = :id', {
      replacements: { id: PROJECT_ID },
    });
    if (project.length === 0) return; // the demo team seed did not run (or was removed): nothing to hang the route on
    const points = walk();
    const last = points[points.length - 1];
    const now = new Date();
    await queryInterface.sequelize.transaction(async (transaction) => {
      await queryInterface.bulkInsert(
        'routes',
        [
          {
            id: ROUTE_ID,
            project_id: PROJECT_ID,
            name: ROUTE_NAME,
            notes:
              'Walked with a phone on 18 April 2026, spring box to the house tank. Heights are phone GPS: level the key points before choosing pipe class.',
            source_format: 'gps-csv',
            point_count: points.length,
            length_m: last.chainage,
            slope_length_m: last.slope,
            features: JSON.stringify([]),
            import_notes: JSON.stringify([]),
            created_by: SURVEYOR_ID,
            created_at: now,
            updated_at: now,
          },
        ],
        { transaction },
      );
      await queryInterface.bulkInsert(
        'route_points',
        points.map((p) => ({
          route_id: ROUTE_ID,
          seq: p.seq,
          latitude: p.lat,
          longitude: p.lon,
          chainage_m: p.chainage,
          slope_chainage_m: p.slope,
          elevation_m: p.elevation,
          raw_elevation_m: p.elevation,
          label: LABELS[p.seq] ?? null,
          height_source: 'gps',
          confidence_m: 15,
          recorded_at: new Date(START_TIME + p.seq * 9000),
          excluded: false,
        })),
        { transaction },
      );
    });
  },

  async down(queryInterface) {
    await queryInterface.bulkDelete('routes', { id: ROUTE_ID });
  },
};
