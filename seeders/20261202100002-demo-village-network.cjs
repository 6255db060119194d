'use strict';

// Invented demo data: the Orrin Ford village supply in the (fictional) Tarnbeck valley. A spring
// intake feeds a 20 m³ storage tank by a trunk line; a distribution main runs from the tank down
// through the village to tap stand 8, with two take-offs: branch A (tap stands 1-3 and the school)
// and branch B (tap stands 4-7), joined by a loop pipe from tap stand 3 to tap stand 4. Routes are
// walked with a phone (metre-level height scatter). Every name and number is made up for the demo.
// Idempotent, fixed ids. The next seed (demo-village-day) ties each tap stand to the households it
// serves, gives the spring its yield tests and re-sizes the pipes for that demand.
const TEAM_ID = '6f1c1e52-3a57-4c38-9b0e-0d5b1c7a0001';
const DESIGNER_ID = '6f1c1e52-3a57-4c38-9b0e-0d5b1c7a1002';
const PROJECT_ID = '6f1c1e52-3a57-4c38-9b0e-0d5b1c7a2003';
const id = (n) => `6f1c1e52-3a57-4c38-9b0e-0d5b1c7b${String(n).padStart(4, '0')}`;
const ROUTES = { trunk: id(1), main: id(2) };
const LINES = { trunk: id(11), main: id(12) };
const TANK_ID = id(21);
const EARTH_RADIUS_M = 6371008.8;
const ORIGIN = { lat: 54.4721, lon: -2.7013 };

/** Deterministic scatter, ±1 m, like phone GPS heights. */
function scatter(seed) {
  const x = Math.sin(seed * 12.9898) * 43758.5453;
  return (x - Math.floor(x) - 0.5) * 2;
}

/** A walked route: heading (deg from north) per leg, ground by chainage from pegs. */
function walk(start, legs, pegs, seed) {
  const points = [];
  let east = start.east;
  let north = start.north;
  let chainage = 0;
  const total = legs.reduce((sum, leg) => sum + leg.lengthM, 0);
  const groundAt = (c) => {
    for (let i = 1; i < pegs.length; i++)
      if (c <= pegs[i][0])
        return pegs[i - 1][1] + ((c - pegs[i - 1][0]) / (pegs[i][0] - pegs[i - 1][0])) * (pegs[i][1] - pegs[i - 1][1]);
    return pegs[pegs.length - 1][1];
  };
  for (const leg of legs) {
    const steps = Math.round(leg.lengthM / 10);
    for (let s = 0; s < steps; s++) {
      points.push({ east, north, chainage });
      east += (leg.lengthM / steps) * Math.sin((leg.headingDeg * Math.PI) / 180);
      north += (leg.lengthM / steps) * Math.cos((leg.headingDeg * Math.PI) / 180);
      chainage += leg.lengthM / steps;
    }
  }
  points.push({ east, north, chainage: total });
  let slope = 0;
  return points.map((p, seq) => {
    const noise = seq === 0 || seq === points.length - 1 ? 0 : scatter(seed + seq);
    const z = Math.round((groundAt(p.chainage) + noise) * 100) / 100;
    if (seq > 0) slope += Math.hypot(p.chainage - points[seq - 1].chainage, z - groundAt(points[seq - 1].chainage));
    return {
      seq,
      chainage_m: Math.round(p.chainage * 100) / 100,
      slope_chainage_m: Math.round(slope * 100) / 100,
      elevation_m: z,
      raw_elevation_m: z,
      latitude: ORIGIN.lat + (p.north / EARTH_RADIUS_M) * (180 / Math.PI),
      longitude: ORIGIN.lon + (p.east / (EARTH_RADIUS_M * Math.cos((ORIGIN.lat * Math.PI) / 180))) * (180 / Math.PI),
      height_source: 'gps',
      confidence_m: 4,
      label: null,
      recorded_at: null,
      excluded: false,
    };
  });
}

const TRUNK = walk(
  { east: 0, north: 0 },
  [
    { headingDeg: 150, lengthM: 500 },
    { headingDeg: 175, lengthM: 400 },
  ],
  [
    [0, 520],
    [300, 505],
    [600, 492],
    [900, 482],
  ],
  1,
);
const MAIN = walk(
  // Starts where the trunk ends, at the tank.
  {
    east: 500 * Math.sin((150 * Math.PI) / 180) + 400 * Math.sin((175 * Math.PI) / 180),
    north: 500 * Math.cos((150 * Math.PI) / 180) + 400 * Math.cos((175 * Math.PI) / 180),
  },
  [
    { headingDeg: 190, lengthM: 600 },
    { headingDeg: 210, lengthM: 600 },
    { headingDeg: 190, lengthM: 400 },
  ],
  [
    [0, 480],
    [500, 440],
    [1000, 415],
    [1600, 385],
  ],
  500,
);

const PIPE = {
  p25: 'pe100-iso4427-sdr11-25mm',
  p32: 'pe100-iso4427-sdr11-32mm',
  p40: 'pe100-iso4427-sdr11-40mm',
  p50: 'pe100-iso4427-sdr11-50mm',
  p63: 'pe100-iso4427-sdr11-63mm',
};
const PRICES = [
  [PIPE.p25, 0.9],
  [PIPE.p32, 1.4],
  [PIPE.p40, 2.2],
  [PIPE.p50, 3.4],
  [PIPE.p63, 5.3],
  ['pe100-iso4427-sdr11-75mm', 7.6],
  ['pe100-iso4427-sdr11-90mm', 10.9],
];

const TAP = (n, name, elevation, demand, east, north) => ({
  id: id(100 + n),
  kind: 'outlet',
  name,
  elevation_m: elevation,
  east_m: east,
  north_m: north,
  data: { outletKind: 'tap', residualHeadM: 5, demandFrom: 'fixed', fixedDemandM3s: demand },
});

module.exports = {
  async up(queryInterface) {
    const q = queryInterface.sequelize;
    const [team] = await q.query('SELECT 1 FROM teams WHERE id = :id', { replacements: { id: TEAM_ID } });
    const [already] = await q.query('SELECT 1 FROM projects WHERE id = :id', { replacements: { id: PROJECT_ID } });
    if (team.length === 0 || already.length > 0) return;
    const now = new Date();
    const stamp = { created_at: now, updated_at: now };
    await q.transaction(async (transaction) => {
      const insert = (table, rows) => queryInterface.bulkInsert(table, rows, { transaction });
      await insert('projects', [
        {
          id: PROJECT_ID,
          team_id: TEAM_ID,
          name: 'Orrin Ford village supply',
          unit_system: 'metric',
          description:
            'Spring intake, storage tank and a distribution main with two branches and one loop to eight tap stands and the school.',
          site_notes:
            'Spring at about 520 m above the village. Tap stands need 5 m of residual head at the evening peak. Routes walked with a phone: heights scatter by a metre or so.',
          ...stamp,
        },
      ]);
      for (const [key, points, name] of [
        ['trunk', TRUNK, 'Walked: intake to tank'],
        ['main', MAIN, 'Walked: tank down through the village'],
      ]) {
        const last = points[points.length - 1];
        await insert('routes', [
          {
            id: ROUTES[key],
            project_id: PROJECT_ID,
            name,
            notes: 'Phone GPS walk; heights scatter about a metre.',
            source_format: 'gps-csv',
            point_count: points.length,
            length_m: last.chainage_m,
            slope_length_m: last.slope_chainage_m,
            features: JSON.stringify([]),
            import_notes: JSON.stringify([]),
            created_by: DESIGNER_ID,
            ...stamp,
          },
        ]);
        await insert(
          'route_points',
          points.map((p) => ({ ...p, route_id: ROUTES[key] })),
        );
      }
      await insert('tanks', [
        {
          id: TANK_ID,
          project_id: PROJECT_ID,
          name: 'Orrin Ford storage tank',
          volume_m3: 20,
          base_elevation_m: 480,
          low_level_m: 0.3,
          overflow_level_m: 2,
          supply_kind: 'entered',
          supply_flow_m3s: 0.0006,
          supply_hours_per_day: 24,
          supply_start_hour: 0,
          reserve_days: 0.5,
          outlets: JSON.stringify([]),
          notes: 'Ferro-cement tank above the village, float valve on the inlet.',
          created_by: DESIGNER_ID,
          ...stamp,
        },
      ]);
      const line = (lineId, routeId, name, start, end, flow, pipe, length) => ({
        id: lineId,
        project_id: PROJECT_ID,
        route_id: routeId,
        name,
        notes: '',
        from_chainage_m: null,
        to_chainage_m: null,
        start_condition: JSON.stringify(start),
        end_condition: JSON.stringify(end),
        flow: JSON.stringify(flow),
        stretches: JSON.stringify([{ fromM: 0, toM: length, pipe }]),
        fittings: JSON.stringify([]),
        devices: JSON.stringify([]),
        pipes: JSON.stringify([]),
        settings: JSON.stringify({ defaultCoverM: 0.6, waterTemperatureC: 10 }),
        revision: 1,
        created_by: DESIGNER_ID,
        updated_by: DESIGNER_ID,
        ...stamp,
      });
      await insert('lines', [
        line(
          LINES.trunk,
          ROUTES.trunk,
          'Trunk: intake to storage tank',
          { kind: 'water-level', levelM: 520 },
          { kind: 'tank-inlet', elevationM: 482 },
          { kind: 'design', flowM3s: 0.0006 },
          PIPE.p32,
          TRUNK[TRUNK.length - 1].chainage_m,
        ),
        line(
          LINES.main,
          ROUTES.main,
          'Distribution main',
          { kind: 'water-level', levelM: 480.3 },
          { kind: 'outlet', elevationM: 385, residualHeadM: 5 },
          { kind: 'design', flowM3s: 0.0023 },
          PIPE.p63,
          MAIN[MAIN.length - 1].chainage_m,
        ),
      ]);

      const node = (row) => ({
        project_id: PROJECT_ID,
        water_source_id: null,
        ram_site_id: null,
        tank_id: null,
        line_id: null,
        chainage_m: null,
        east_m: null,
        north_m: null,
        notes: '',
        ...row,
        data: JSON.stringify(row.data ?? {}),
        ...stamp,
      });
      const toLocal = (p) => ({
        east: (p.longitude - ORIGIN.lon) * (Math.PI / 180) * EARTH_RADIUS_M * Math.cos((ORIGIN.lat * Math.PI) / 180),
        north: (p.latitude - ORIGIN.lat) * (Math.PI / 180) * EARTH_RADIUS_M,
      });
      const at = (c) =>
        toLocal(MAIN.reduce((best, p) => (Math.abs(p.chainage_m - c) < Math.abs(best.chainage_m - c) ? p : best)));
      const j1 = at(500);
      const j2 = at(1000);
      await insert('network_nodes', [
        node({ id: id(51), kind: 'source', name: 'Orrin spring intake', elevation_m: 520, data: { waterLevelM: 520 } }),
        node({
          id: id(52),
          kind: 'tank',
          name: 'Orrin Ford storage tank',
          elevation_m: 480,
          tank_id: TANK_ID,
          data: { inletFloatValve: true },
        }),
        node({ id: id(53), kind: 'junction', name: 'Take-off A (chapel lane)', line_id: LINES.main, chainage_m: 500 }),
        node({ id: id(54), kind: 'junction', name: 'Take-off B (mill row)', line_id: LINES.main, chainage_m: 1000 }),
        node(TAP(1, 'Tap stand 1', 435, 0.00025, j1.east - 140, j1.north + 60)),
        node(TAP(2, 'Tap stand 2', 430, 0.00025, j1.east - 280, j1.north + 20)),
        node({
          ...TAP(9, 'Orrin Ford school', 428, 0.0003, j1.east - 330, j1.north + 140),
          data: { outletKind: 'house', residualHeadM: 5, demandFrom: 'fixed', fixedDemandM3s: 0.0003 },
        }),
        node(TAP(3, 'Tap stand 3', 425, 0.00025, j1.east - 400, j1.north - 120)),
        node(TAP(4, 'Tap stand 4', 410, 0.00025, j2.east - 220, j2.north + 40)),
        node(TAP(5, 'Tap stand 5', 405, 0.00025, j2.east - 180, j2.north - 140)),
        node(TAP(6, 'Tap stand 6', 400, 0.00025, j2.east - 40, j2.north - 280)),
        node(TAP(7, 'Tap stand 7', 395, 0.00025, j2.east + 120, j2.north - 200)),
        node(TAP(8, 'Tap stand 8', 385, 0.00025, null, null)),
      ]);
      const link = (n, kind, name, from, to, data, lineId = null) => ({
        id: id(200 + n),
        project_id: PROJECT_ID,
        kind,
        name,
        from_node_id: from,
        to_node_id: to,
        line_id: lineId,
        data: JSON.stringify(data),
        ...stamp,
      });
      await insert('network_links', [
        link(1, 'line', 'Trunk: intake to storage tank', id(51), id(52), {}, LINES.trunk),
        link(2, 'line', 'Distribution main', id(52), id(108), {}, LINES.main),
        link(3, 'pipe', 'Branch A: take-off to tap stand 1', id(53), id(101), { lengthM: 160, pipe: PIPE.p50 }),
        link(4, 'pipe', 'Branch A: tap stand 1 to 2', id(101), id(102), { lengthM: 150, pipe: PIPE.p40 }),
        link(5, 'pipe', 'School spur', id(102), id(109), { lengthM: 130, pipe: PIPE.p25 }),
        link(6, 'pipe', 'Branch A: tap stand 2 to 3', id(102), id(103), { lengthM: 160, pipe: PIPE.p32 }),
        link(7, 'pipe', 'Branch B: take-off to tap stand 4', id(54), id(104), { lengthM: 230, pipe: PIPE.p50 }),
        link(8, 'pipe', 'Branch B: tap stand 4 to 5', id(104), id(105), { lengthM: 190, pipe: PIPE.p40 }),
        link(9, 'pipe', 'Branch B: tap stand 5 to 6', id(105), id(106), { lengthM: 200, pipe: PIPE.p32 }),
        link(10, 'pipe', 'Branch B: tap stand 6 to 7', id(106), id(107), { lengthM: 200, pipe: PIPE.p25 }),
        link(11, 'pipe', 'Loop: tap stand 3 to 4', id(103), id(104), { lengthM: 420, pipe: PIPE.p25 }),
      ]);
      const [priced] = await q.query('SELECT 1 FROM price_list_items WHERE team_id = :team LIMIT 1', {
        replacements: { team: TEAM_ID },
        transaction,
      });
      if (priced.length === 0) {
        await insert(
          'price_list_items',
          PRICES.map(([pipe_id, cost_per_m]) => ({
            team_id: TEAM_ID,
            pipe_id,
            cost_per_m,
            notes: 'Invented demo price, per metre laid',
            ...stamp,
          })),
        );
      }
    });
  },

  async down(queryInterface) {
    await queryInterface.bulkDelete('projects', { id: PROJECT_ID });
  },
};
