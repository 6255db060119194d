'use strict';

// Invented demo data: the Brackwater Creek delivery line from the Weir ram up to the Harrow Knoll
// tank, on its own levelled route (about 350 ft, with a small sag below the knoll), and the two
// figures the line needs from the rest of the project: the pump's elevation and the site's frost
// depth. All numbers are made up for the demo. Idempotent, fixed ids; figures already set are kept.
const PROJECT_ID = '6f1c1e52-3a57-4c38-9b0e-0d5b1c7a2002';
const DESIGNER_ID = '6f1c1e52-3a57-4c38-9b0e-0d5b1c7a1002';
const RAM_ID = '6f1c1e52-3a57-4c38-9b0e-0d5b1c7a4001';
const ROUTE_ID = '6f1c1e52-3a57-4c38-9b0e-0d5b1c7a8001';
const LINE_ID = '6f1c1e52-3a57-4c38-9b0e-0d5b1c7a8002';

const FT = 0.3048;
const LENGTH_M = 350 * FT;
const PUMP_ELEVATION_M = 150.3;
const FROST_DEPTH_M = 3.5 * FT;
/** Levelled pegs (chainage, ground): up from the ram, over a hump, a sag, then the climb to the tank pad. */
const PEGS = [
  [0, 150.3],
  [15, 151.6],
  [30, 152.4],
  [45, 151.2],
  [60, 155.0],
  [80, 161.5],
  [95, 166.8],
  [LENGTH_M, 170.0],
];
const ORIGIN = { lat: 54.4412, lon: -2.6347 };
const EARTH_RADIUS_M = 6371008.8;

function groundAt(c) {
  for (let i = 1; i < PEGS.length; i++) {
    const [c0, z0] = PEGS[i - 1];
    const [c1, z1] = PEGS[i];
    if (c <= c1) return z0 + ((c - c0) / (c1 - c0)) * (z1 - z0);
  }
  return PEGS[PEGS.length - 1][1];
}

function routePoints() {
  const chainages = [];
  for (let c = 0; c < LENGTH_M; c += 5) chainages.push(c);
  chainages.push(Math.round(LENGTH_M * 100) / 100);
  let slope = 0;
  return chainages.map((c, seq) => {
    const z = Math.round(groundAt(c) * 100) / 100;
    if (seq > 0) slope += Math.hypot(c - chainages[seq - 1], z - groundAt(chainages[seq - 1]));
    const north = c * Math.cos((35 * Math.PI) / 180);
    const east = c * Math.sin((35 * Math.PI) / 180);
    return {
      route_id: ROUTE_ID,
      seq,
      latitude: ORIGIN.lat + (north / EARTH_RADIUS_M) * (180 / Math.PI),
      longitude: ORIGIN.lon + (east / (EARTH_RADIUS_M * Math.cos((ORIGIN.lat * Math.PI) / 180))) * (180 / Math.PI),
      chainage_m: c,
      slope_chainage_m: Math.round(slope * 100) / 100,
      elevation_m: z,
      raw_elevation_m: z,
      label: seq === 0 ? 'Weir ram' : seq === chainages.length - 1 ? 'Harrow Knoll tank pad' : null,
      height_source: 'gnss',
      confidence_m: 0.05,
      recorded_at: null,
    };
  });
}

module.exports = {
  async up(queryInterface) {
    const [project] = await queryInterface.sequelize.query('SELECT 1 FROM projects WHERE id = :id', {
      replacements: { id: PROJECT_ID },
    });
    const [ram] = await queryInterface.sequelize.query('SELECT 1 FROM ram_sites WHERE id = :id', {
      replacements: { id: RAM_ID },
    });
    if (project.length === 0 || ram.length === 0) return;
    await queryInterface.sequelize.transaction(async (transaction) => {
      await queryInterface.sequelize.query(
        'UPDATE ram_sites SET pump_elevation_m = :z WHERE id = :id AND pump_elevation_m IS NULL',
        { replacements: { id: RAM_ID, z: PUMP_ELEVATION_M }, transaction },
      );
      await queryInterface.sequelize.query(
        'UPDATE projects SET frost_depth_m = :d WHERE id = :id AND frost_depth_m IS NULL',
        { replacements: { id: PROJECT_ID, d: FROST_DEPTH_M }, transaction },
      );
      const [already] = await queryInterface.sequelize.query('SELECT 1 FROM routes WHERE id = :id', {
        replacements: { id: ROUTE_ID },
        transaction,
      });
      if (already.length > 0) return;
      const now = new Date();
      const points = routePoints();
      await queryInterface.bulkInsert(
        'routes',
        [
          {
            id: ROUTE_ID,
            project_id: PROJECT_ID,
            name: 'Ram delivery line, weir to Harrow Knoll',
            notes: 'Levelled along the trench line from the ram house to the tank pad; 1 in PE laid 3 ft deep.',
            point_count: points.length,
            length_m: LENGTH_M,
            slope_length_m: points[points.length - 1].slope_chainage_m,
            source_format: 'typed',
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
            id: LINE_ID,
            project_id: PROJECT_ID,
            route_id: ROUTE_ID,
            name: 'Ram delivery to Harrow Knoll tank',
            notes:
              'Delivery pipe of the Weir ram. Start heads typed in from the first plan; the ram site can feed the line directly.',
            from_chainage_m: null,
            to_chainage_m: null,
            start_condition: JSON.stringify({ kind: 'pump', outletHeadM: 172.5 }),
            end_condition: JSON.stringify({ kind: 'tank-inlet', elevationM: 171.6 }),
            flow: JSON.stringify({ kind: 'design', flowM3s: (0.75 * 0.003785411784) / 60 }),
            stretches: JSON.stringify([
              { fromM: 0, toM: Math.round(LENGTH_M * 100) / 100, pipe: 'pe-d2239-sidr9-1in' },
            ]),
            fittings: JSON.stringify([{ chainageM: 0, k: 2, label: 'check valve and tee at the ram' }]),
            devices: JSON.stringify([]),
            pipes: JSON.stringify([]),
            settings: JSON.stringify({ defaultCoverM: 3 * FT, waterTemperatureC: 10 }),
            winter: null,
            revision: 1,
            created_by: DESIGNER_ID,
            updated_by: DESIGNER_ID,
            created_at: now,
            updated_at: now,
          },
        ],
        { transaction },
      );
    });
  },

  async down(queryInterface) {
    await queryInterface.bulkDelete('lines', { id: LINE_ID });
    await queryInterface.bulkDelete('routes', { id: ROUTE_ID });
  },
};
