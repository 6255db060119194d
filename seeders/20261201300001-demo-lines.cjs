'use strict';

// Invented demo data: the design profile of the Kestrel Hollow spring line (Tarnbeck valley) and two
// line designs on it. The first is drawn up with PN 8 pipe, so the sag below the old sheepfold is
// over its static rating and a rise near the spring box runs above the grade line (a siphon stretch);
// the second is the PN 16 option with its valves in place.
const PROJECT_ID = '6f1c1e52-3a57-4c38-9b0e-0d5b1c7a2001';
const ROUTE_ID = '6f1c1e52-3a57-4c38-9b0e-0d5b1c7a3002';
const DESIGNER_ID = '6f1c1e52-3a57-4c38-9b0e-0d5b1c7a1002';
const LINE_IDS = ['6f1c1e52-3a57-4c38-9b0e-0d5b1c7a4001', '6f1c1e52-3a57-4c38-9b0e-0d5b1c7a4002'];

const SPACING_M = 10;
const LENGTH_M = 1400;
// Chainage (m) and ground (m) at the turning points of the walk: spring box, a dip, a low rise,
// the long fall to the sheepfold sag, the shoulder, the house.
const CONTROL = [
  [0, 411],
  [100, 403.5],
  [220, 408],
  [450, 352],
  [650, 300],
  [900, 322],
  [1400, 316],
];
const ORIGIN = { lat: 54.4621, lon: -2.6113 };
const EARTH_RADIUS_M = 6371008.8;

function groundAt(c) {
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

function routePoints() {
  const points = [];
  let east = 0;
  let north = 0;
  let slope = 0;
  for (let seq = 0; seq <= LENGTH_M / SPACING_M; seq++) {
    const c = seq * SPACING_M;
    const z = Math.round(groundAt(c) * 100) / 100;
    if (seq > 0) {
      const bearing = ((140 + 25 * Math.sin(c / 300)) * Math.PI) / 180;
      east += SPACING_M * Math.sin(bearing);
      north += SPACING_M * Math.cos(bearing);
      slope += Math.hypot(SPACING_M, z - points[seq - 1].elevation_m);
    }
    points.push({
      route_id: ROUTE_ID,
      seq,
      latitude: ORIGIN.lat + (north / EARTH_RADIUS_M) * (180 / Math.PI),
      longitude: ORIGIN.lon + (east / (EARTH_RADIUS_M * Math.cos((ORIGIN.lat * Math.PI) / 180))) * (180 / Math.PI),
      chainage_m: c,
      slope_chainage_m: Math.round(slope * 100) / 100,
      elevation_m: z,
      raw_elevation_m: z,
      label: { 0: 'spring box', 650: 'sheepfold sag', 1400: 'house' }[c] || null,
      height_source: 'gnss',
      confidence_m: 0.05,
      recorded_at: null,
    });
  }
  return points;
}

const COMMON = {
  project_id: PROJECT_ID,
  route_id: ROUTE_ID,
  from_chainage_m: null,
  to_chainage_m: null,
  start_condition: JSON.stringify({ kind: 'water-level', levelM: 412 }),
  end_condition: JSON.stringify({ kind: 'outlet', elevationM: 316.5, residualHeadM: 3 }),
  flow: JSON.stringify({ kind: 'design', flowM3s: 0.001 }),
  fittings: JSON.stringify([
    { chainageM: 0, k: 0.5, label: 'intake entrance' },
    { chainageM: 1400, k: 0.2, label: 'gate valve at the house' },
  ]),
  pipes: JSON.stringify([]),
  settings: JSON.stringify({ defaultCoverM: 0.75, waterTemperatureC: 10 }),
  created_by: DESIGNER_ID,
  updated_by: DESIGNER_ID,
};

module.exports = {
  async up(queryInterface) {
    const [existing] = await queryInterface.sequelize.query('SELECT 1 FROM projects WHERE id = :id', {
      replacements: { id: PROJECT_ID },
    });
    if (existing.length === 0) return;
    const [already] = await queryInterface.sequelize.query('SELECT 1 FROM routes WHERE id = :id', {
      replacements: { id: ROUTE_ID },
    });
    if (already.length > 0) return;
    const now = new Date();
    const points = routePoints();
    await queryInterface.sequelize.transaction(async (transaction) => {
      await queryInterface.bulkInsert(
        'routes',
        [
          {
            id: ROUTE_ID,
            project_id: PROJECT_ID,
            name: 'Spring line design profile',
            notes:
              'Levelled along the pegged line from the spring box to the house; design profile for the line designs.',
            point_count: points.length,
            length_m: LENGTH_M,
            created_by: DESIGNER_ID,
            created_at: now,
            updated_at: now,
          },
        ],
        { transaction },
      );
      await queryInterface.bulkInsert('route_points', points, { transaction });
      await queryInterface.bulkInsert(
        'lines',
        [
          {
            ...COMMON,
            id: LINE_IDS[0],
            name: 'Spring box to house',
            notes: 'First layout with the PN 8 pipe left over from the barn supply.',
            stretches: JSON.stringify([
              { fromM: 0, toM: 300, pipe: 'pe80-iso4427-sdr17-40mm' },
              { fromM: 300, toM: 1400, pipe: 'pe80-iso4427-sdr17-50mm' },
            ]),
            devices: JSON.stringify([]),
            revision: 1,
            created_at: now,
            updated_at: now,
          },
          {
            ...COMMON,
            id: LINE_IDS[1],
            name: 'Spring box to house, PN 16 option',
            notes: 'PE100 PN 16 throughout, valves at every summit and sag.',
            stretches: JSON.stringify([{ fromM: 0, toM: 1400, pipe: 'pe100-iso4427-sdr11-50mm' }]),
            devices: JSON.stringify([
              { kind: 'isolation-valve', chainageM: 5, label: 'below the spring box' },
              { kind: 'washout', chainageM: 100 },
              { kind: 'air-release-valve', chainageM: 220 },
              { kind: 'washout', chainageM: 650, label: 'drain to the ditch by the sheepfold' },
              { kind: 'air-release-valve', chainageM: 900 },
              { kind: 'isolation-valve', chainageM: 1395, label: 'house stop valve' },
            ]),
            revision: 1,
            created_at: now,
            updated_at: now,
          },
        ],
        { transaction },
      );
    });
  },

  async down(queryInterface) {
    await queryInterface.bulkDelete('lines', { id: LINE_IDS });
    await queryInterface.bulkDelete('routes', { id: ROUTE_ID });
  },
};
