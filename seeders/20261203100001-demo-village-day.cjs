'use strict';

// Invented demo data, second step for the Orrin Ford village supply: who draws at each tap stand and
// where the water comes from, so the village's 24-hour day is a sensible one. The first seed gave
// every tap stand a fixed 0.25 L/s drawn all day long (199 m³ a day from a spring line that brings
// about 42 m³), so the tank ran dry in the first hour. Here each tap stand serves its households
// (people at 40 L/person/day on the village-tap morning and evening pattern), the school its day,
// and the spring gets its dry-season bucket tests. With a third of the old peak, the pipes are
// re-sized to what the least-cost sizing now picks from the demo price list (25 mm, with 40 mm on
// the main's first 500 m), and the lines' own design flows and the tank's supply follow the spring
// line. Every name and number is made up for the demo.
// Runs once per database (sequelize-cli keeps the record); it only touches a village still as the
// first seed left it, so a user's own edits to the demo are kept.
const PROJECT_ID = '6f1c1e52-3a57-4c38-9b0e-0d5b1c7a2003';
const DESIGNER_ID = '6f1c1e52-3a57-4c38-9b0e-0d5b1c7a1002';
const id = (n) => `6f1c1e52-3a57-4c38-9b0e-0d5b1c7b${String(n).padStart(4, '0')}`;
const SOURCE_NODE_ID = id(51);
const TANK_ID = id(21);

// The spring and its bucket tests: the design yield is the lowest recent dry-season reading.
const SOURCE_ID = id(31);
const SOURCE = {
  id: SOURCE_ID,
  project_id: PROJECT_ID,
  name: 'Orrin spring',
  kind: 'spring',
  design_yield_choice: 'lowest-recent-dry',
  other_draw_m3s: 0,
  notes: 'Spring box on the fell side above the village; overflow to the beck.',
  created_by: DESIGNER_ID,
};
const READINGS = [
  {
    id: id(32),
    measured_on: '2025-08-28',
    season: 'dry',
    bucket_volume_m3: 0.02,
    bucket_seconds: 23,
    note: '20 L bucket at the spring box outlet, average of three.',
  },
  {
    id: id(33),
    measured_on: '2026-03-14',
    season: 'wet',
    bucket_volume_m3: 0.02,
    bucket_seconds: 8,
    note: 'After the snow melt.',
  },
  {
    id: id(34),
    measured_on: '2026-08-19',
    season: 'dry',
    bucket_volume_m3: 0.02,
    bucket_seconds: 25,
    note: 'Lowest seen; a month without rain.',
  },
].map((reading) => ({ source_id: SOURCE_ID, flow_m3s: null, created_by: DESIGNER_ID, ...reading }));

// Households served at each tap stand, and the school (120 pupils and staff at 20 L each, in school hours).
const HOUSEHOLDS = [
  [1, 45],
  [2, 50],
  [3, 40],
  [4, 55],
  [5, 45],
  [6, 50],
  [7, 40],
  [8, 35],
];
const SCHOOL_NODE_ID = id(109);
const USES = [
  ...HOUSEHOLDS.map(([n, people], position) => ({
    id: id(60 + n),
    position,
    label: `Households at tap stand ${n} (${people} people)`,
    kind: 'people',
    count: people,
    figure_id: 'village-ram-supply',
    delivery_kind: 'pattern',
    pattern_preset_id: 'jordan-morning-evening',
    outlet_node_id: id(100 + n),
  })),
  {
    id: id(69),
    position: HOUSEHOLDS.length,
    label: 'Orrin Ford school (120 pupils and staff)',
    kind: 'fixed',
    own_figure: 2.4,
    delivery_kind: 'delivery-hours',
    delivery_hours: 7,
    start_hour: 8,
    outlet_node_id: SCHOOL_NODE_ID,
  },
].map((use) => ({
  project_id: PROJECT_ID,
  count: null,
  area_m2: null,
  figure_id: null,
  own_figure: null,
  season: null,
  pattern_preset_id: null,
  hourly_fractions: null,
  peak_factor: null,
  delivery_hours: null,
  start_hour: null,
  ...use,
}));
const OUTLET_IDS = [...HOUSEHOLDS.map(([n]) => id(100 + n)), SCHOOL_NODE_ID];

const P25 = 'pe100-iso4427-sdr11-25mm';
const P40 = 'pe100-iso4427-sdr11-40mm';
const LINES = { trunk: id(11), main: id(12) };
// The first seed's sizes of each pipe link, and the size sizing picks now (a link a user has changed is left alone).
const PIPE_LINKS = [
  [3, 'pe100-iso4427-sdr11-50mm'],
  [4, 'pe100-iso4427-sdr11-40mm'],
  [6, 'pe100-iso4427-sdr11-32mm'],
  [7, 'pe100-iso4427-sdr11-50mm'],
  [8, 'pe100-iso4427-sdr11-40mm'],
  [9, 'pe100-iso4427-sdr11-32mm'],
].map(([n, was]) => ({ id: id(200 + n), was, now: P25 }));
// What the 25 mm spring line carries into the tank with its float valve open (about 0.25 L/s), and the village's peak
// hour (about 0.7 L/s).
const TRUNK_FLOW_M3S = 0.00025;
const MAIN_FLOW_M3S = 0.0007;

module.exports = {
  async up(queryInterface) {
    const q = queryInterface.sequelize;
    const [project] = await q.query('SELECT 1 FROM projects WHERE id = :id', { replacements: { id: PROJECT_ID } });
    const [done] = await q.query('SELECT 1 FROM water_sources WHERE id = :id', { replacements: { id: SOURCE_ID } });
    if (project.length === 0 || done.length > 0) return;
    const now = new Date();
    const stamp = (row) => ({ ...row, created_at: now, updated_at: now });
    await q.transaction(async (transaction) => {
      await queryInterface.bulkInsert('water_sources', [stamp(SOURCE)], { transaction });
      await queryInterface.bulkInsert('yield_readings', READINGS.map(stamp), { transaction });
      await q.query(
        'UPDATE network_nodes SET water_source_id = :source, updated_at = :now WHERE id = :node AND water_source_id IS NULL',
        {
          replacements: { source: SOURCE_ID, node: SOURCE_NODE_ID, now },
          transaction,
        },
      );
      // Only outlets that still draw the first seed's fixed flow, and have no uses of their own, take the households.
      const [outlets] = await q.query(
        `SELECT n.id FROM network_nodes n WHERE n.id IN (:ids) AND n.data->>'demandFrom' = 'fixed'
           AND NOT EXISTS (SELECT 1 FROM demand_uses d WHERE d.outlet_node_id = n.id)`,
        { replacements: { ids: OUTLET_IDS }, transaction },
      );
      const untouched = new Set(outlets.map((row) => row.id));
      const uses = USES.filter((use) => untouched.has(use.outlet_node_id));
      if (uses.length > 0) await queryInterface.bulkInsert('demand_uses', uses.map(stamp), { transaction });
      for (const nodeId of untouched) {
        await q.query(
          `UPDATE network_nodes SET data = (data - 'fixedDemandM3s') || '{"demandFrom":"uses"}'::jsonb, updated_at = :now WHERE id = :node`,
          {
            replacements: { node: nodeId, now },
            transaction,
          },
        );
      }
      for (const link of PIPE_LINKS) {
        await q.query(
          `UPDATE network_links SET data = jsonb_set(data, '{pipe}', to_jsonb(CAST(:now AS text))), updated_at = :at WHERE id = :id AND data->>'pipe' = :was`,
          {
            replacements: { id: link.id, was: link.was, now: link.now, at: now },
            transaction,
          },
        );
      }
      // A line is re-sized only while it still has the first seed's one pipe end to end and design flow.
      const [lines] = await q.query('SELECT id, stretches, flow FROM lines WHERE id IN (:ids)', {
        replacements: { ids: [LINES.trunk, LINES.main] },
        transaction,
      });
      for (const line of lines) {
        const stretches = typeof line.stretches === 'string' ? JSON.parse(line.stretches) : line.stretches;
        const flow = typeof line.flow === 'string' ? JSON.parse(line.flow) : line.flow;
        const trunk = line.id === LINES.trunk;
        if (
          stretches.length !== 1 ||
          stretches[0].pipe !== (trunk ? 'pe100-iso4427-sdr11-32mm' : 'pe100-iso4427-sdr11-63mm')
        )
          continue;
        if (flow.kind !== 'design' || flow.flowM3s !== (trunk ? 0.0006 : 0.0023)) continue;
        const end = stretches[0].toM;
        const sized = trunk
          ? [{ fromM: 0, toM: end, pipe: P25 }]
          : [
              { fromM: 0, toM: 500, pipe: P40 },
              { fromM: 500, toM: end, pipe: P25 },
            ];
        await q.query('UPDATE lines SET stretches = :stretches, flow = :flow, updated_at = :now WHERE id = :id', {
          replacements: {
            id: line.id,
            stretches: JSON.stringify(sized),
            flow: JSON.stringify({ kind: 'design', flowM3s: trunk ? TRUNK_FLOW_M3S : MAIN_FLOW_M3S }),
            now,
          },
          transaction,
        });
      }
      await q.query(
        `UPDATE tanks SET supply_flow_m3s = :flow, updated_at = :now WHERE id = :id AND supply_kind = 'entered' AND supply_flow_m3s = 0.0006`,
        {
          replacements: { id: TANK_ID, flow: TRUNK_FLOW_M3S, now },
          transaction,
        },
      );
    });
  },

  async down(queryInterface) {
    await queryInterface.bulkDelete('demand_uses', { id: USES.map((use) => use.id) });
    await queryInterface.bulkDelete('water_sources', { id: SOURCE_ID });
  },
};
