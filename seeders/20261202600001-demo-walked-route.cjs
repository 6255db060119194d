'use strict';

// Invented demo data: the Larkspur Gill village supply, a phone-GPS walk of 2.4 km from the Hobb
// spring over the Gill bottom and Cragend ridge to the village tank at Nether Sowby, with a line on
// it. The heights scatter like a phone's (and one fix spiked, taken out in clean-up), so the line
// page shows what the analysis makes of a real walk. The walk itself lives in lib/demo/ridge-walk.cjs,
// shared with the tests that work out its expected findings from the smooth ground.
const { ridgeWalk, SPIKE, STATED_ACCURACY_M, WALK_LINE, LENGTH_M } = require('../lib/demo/ridge-walk.cjs');

const TEAM_ID = '6f1c1e52-3a57-4c38-9b0e-0d5b1c7a0001';
const PROJECT_ID = '6f1c1e52-3a57-4c38-9b0e-0d5b1c7a2601';
const ROUTE_ID = '6f1c1e52-3a57-4c38-9b0e-0d5b1c7a3601';
const LINE_ID = '6f1c1e52-3a57-4c38-9b0e-0d5b1c7a4601';
const DESIGNER_ID = '6f1c1e52-3a57-4c38-9b0e-0d5b1c7a1002';
const SURVEYOR_ID = '6f1c1e52-3a57-4c38-9b0e-0d5b1c7a1003';
const ORIGIN = { lat: 54.5312, lon: -2.4021 };
const EARTH_RADIUS_M = 6371008.8;
const START_TIME = Date.parse('2026-05-09T09:12:00Z');
const LABELS = {
  0: 'Hobb spring',
  420: 'Hobb knoll',
  1000: 'Gill bottom',
  1650: 'Cragend ridge',
  2400: 'Nether Sowby tank',
};

function routePoints() {
  let east = 0;
  let north = 0;
  let slope = 0;
  const walk = ridgeWalk();
  return walk.map((p, i) => {
    if (i > 0) {
      const step = p.chainageM - walk[i - 1].chainageM;
      const bearing = ((95 + 30 * Math.sin(p.chainageM / 400)) * Math.PI) / 180;
      east += step * Math.sin(bearing);
      north += step * Math.cos(bearing);
      if (p.seq !== SPIKE.seq) slope += Math.hypot(step, p.elevationM - walk[i - 1].elevationM);
    }
    const spike = p.seq === SPIKE.seq;
    return {
      route_id: ROUTE_ID,
      seq: p.seq,
      latitude: ORIGIN.lat + (north / EARTH_RADIUS_M) * (180 / Math.PI),
      longitude: ORIGIN.lon + (east / (EARTH_RADIUS_M * Math.cos((ORIGIN.lat * Math.PI) / 180))) * (180 / Math.PI),
      chainage_m: p.chainageM,
      slope_chainage_m: Math.round(slope * 100) / 100,
      elevation_m: p.elevationM,
      raw_elevation_m: p.elevationM,
      label: LABELS[p.chainageM] || null,
      height_source: 'gps',
      confidence_m: STATED_ACCURACY_M,
      recorded_at: new Date(START_TIME + p.seq * 4000),
      // The spiked fix was found by the clean-up checks and taken out of the profile by the surveyor.
      excluded: spike,
    };
  });
}

module.exports = {
  async up(queryInterface) {
    const [team] = await queryInterface.sequelize.query('SELECT 1 FROM teams WHERE id = :id', {
      replacements: { id: TEAM_ID },
    });
    if (team.length === 0) return;
    const [already] = await queryInterface.sequelize.query('SELECT 1 FROM projects WHERE id = :id', {
      replacements: { id: PROJECT_ID },
    });
    if (already.length > 0) return;
    const now = new Date();
    const points = routePoints();
    await queryInterface.sequelize.transaction(async (transaction) => {
      await queryInterface.bulkInsert(
        'projects',
        [
          {
            id: PROJECT_ID,
            team_id: TEAM_ID,
            name: 'Larkspur Gill village supply',
            description: 'Gravity supply from the Hobb spring to the Nether Sowby village tank, walked with a phone.',
            unit_system: 'metric',
            site_notes:
              'Route walked with a phone GPS in May 2026; heights scatter by a metre or more. Level the Gill bottom and Cragend ridge before ordering pipe.',
            created_by: DESIGNER_ID,
            created_at: now,
            updated_at: now,
          },
        ],
        { transaction },
      );
      await queryInterface.bulkInsert(
        'routes',
        [
          {
            id: ROUTE_ID,
            project_id: PROJECT_ID,
            name: 'Hobb spring to Nether Sowby (phone walk)',
            notes: 'Walked with a phone logging every 5 m; one spiked fix near Cragend taken out in clean-up.',
            point_count: points.length,
            length_m: LENGTH_M,
            source_format: 'gps-csv',
            created_by: SURVEYOR_ID,
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
            name: 'Hobb spring to village tank',
            notes:
              'First sizing on the walked heights: PE100 SDR 17 (PN 10), 50 mm to the ridge and 63 mm down to the tank.',
            from_chainage_m: null,
            to_chainage_m: null,
            start_condition: JSON.stringify(WALK_LINE.start),
            end_condition: JSON.stringify(WALK_LINE.end),
            flow: JSON.stringify(WALK_LINE.flow),
            stretches: JSON.stringify(WALK_LINE.stretches),
            fittings: JSON.stringify([]),
            devices: JSON.stringify([]),
            pipes: JSON.stringify([]),
            settings: JSON.stringify(WALK_LINE.settings),
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
    await queryInterface.bulkDelete('projects', { id: PROJECT_ID });
  },
};
