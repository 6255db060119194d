'use strict';

// Invented demo data for "Brackwater Creek ram and hilltop tank": a creek source with dated yield
// readings, a ram below the weir lifting about 70 ft through about 350 ft of pipe to a 5,000 L tank
// on Harrow Knoll, the household, stock and garden it serves, one commissioning reading and the
// year's upkeep. All numbers are made up for the demo. Stored in SI like everything else.
const PROJECT_ID = '6f1c1e52-3a57-4c38-9b0e-0d5b1c7a2002';
const DESIGNER_ID = '6f1c1e52-3a57-4c38-9b0e-0d5b1c7a1002';
const SURVEYOR_ID = '6f1c1e52-3a57-4c38-9b0e-0d5b1c7a1003';
const id = (n) => `6f1c1e52-3a57-4c38-9b0e-0d5b1c7a${n}`;

const FT = 0.3048;
const US_GAL = 0.003785411784;
const GPM = US_GAL / 60;
const PSI = 6894.757293168361;

const SOURCE_ID = id('3001');
const RAM_ID = id('4001');
const TANK_ID = id('5001');

const source = {
  id: SOURCE_ID,
  project_id: PROJECT_ID,
  name: 'Brackwater Creek at the weir',
  kind: 'creek',
  notes: 'Weir pool above the ram site; settling box on the left bank.',
  design_yield_choice: 'lowest-recent-dry',
  other_draw_m3s: 0,
  created_by: DESIGNER_ID,
};

const readings = [
  {
    id: id('3101'),
    measured_on: '2025-08-26',
    season: 'dry',
    bucket_volume_m3: 5 * US_GAL,
    bucket_seconds: 14.5,
    note: 'Five-gallon pail at the weir notch, average of three.',
  },
  {
    id: id('3102'),
    measured_on: '2026-04-10',
    season: 'wet',
    flow_m3s: 100 * GPM,
    note: 'Spring melt; estimated over the weir crest.',
  },
  {
    id: id('3103'),
    measured_on: '2026-08-21',
    season: 'dry',
    bucket_volume_m3: 5 * US_GAL,
    bucket_seconds: 16,
    note: 'Lowest seen; three weeks without rain.',
  },
  {
    id: id('3104'),
    measured_on: '2026-10-18',
    season: 'wet',
    bucket_volume_m3: 5 * US_GAL,
    bucket_seconds: 9,
    note: 'After the October rain.',
  },
].map((reading) => ({
  bucket_volume_m3: null,
  bucket_seconds: null,
  flow_m3s: null,
  source_id: SOURCE_ID,
  created_by: SURVEYOR_ID,
  ...reading,
}));

const tank = {
  id: TANK_ID,
  project_id: PROJECT_ID,
  name: 'Harrow Knoll tank',
  volume_m3: 5,
  base_elevation_m: 170.0,
  low_level_m: 0.15,
  overflow_level_m: 1.5,
  supply_kind: 'ram-sites',
  supply_hours_per_day: 24,
  supply_start_hour: 0,
  reserve_days: 2,
  outlets: JSON.stringify([
    { label: 'Brackwater cottage', elevationM: 146.0, residualHeadM: (20 * PSI) / 9789.3, frictionLossM: 2.5 },
    { label: 'East pasture trough', elevationM: 152.4, residualHeadM: 1.5, frictionLossM: 1.0 },
    { label: 'Garden hydrant', elevationM: 149.0, residualHeadM: 10, frictionLossM: 1.5 },
  ]),
  notes: 'Poly tank on a gravel pad; overflow piped to the gully.',
  created_by: DESIGNER_ID,
};

const ram = {
  id: RAM_ID,
  project_id: PROJECT_ID,
  name: 'Weir ram',
  source_id: SOURCE_ID,
  tank_id: TANK_ID,
  drive_flow_m3s: 15 * GPM,
  fall_m: 6 * FT,
  drive_length_m: 42 * FT,
  drive_inside_diameter_m: 0.04089,
  drive_material: 'steel',
  drive_rigid: null,
  lift_m: 70 * FT,
  delivery_length_m: 350 * FT,
  delivery_route_id: null,
  delivery_pipe_id: 'pe-d2239-sidr9-1in',
  delivery_inside_diameter_m: null,
  delivery_hazen_c: null,
  delivery_rating_pa: null,
  size_class_id: 'drive-40mm',
  pump_count: 1,
  measured_efficiency: null,
  notes: '1-1/2 in galvanised drive pipe, anchored at the elbow. 1 in PE delivery line buried 3 ft.',
  created_by: DESIGNER_ID,
};

const commissioning = {
  id: id('4101'),
  ram_site_id: RAM_ID,
  measured_on: '2026-09-19',
  beats_per_minute: 56,
  delivered_bucket_volume_m3: 2 * US_GAL,
  delivered_bucket_seconds: 260,
  delivered_flow_m3s: null,
  drive_measure: 'waste',
  drive_bucket_volume_m3: 5 * US_GAL,
  drive_bucket_seconds: 21,
  drive_flow_m3s: null,
  pressure_at_pump_pa: 31 * PSI,
  supply_head_m: 6 * FT,
  delivery_head_m: null,
  notes: 'Ran by itself after about forty strokes of the waste valve.',
  created_by: DESIGNER_ID,
};

const uses = [
  {
    id: id('6001'),
    position: 0,
    label: 'Household of 4',
    kind: 'people',
    count: 4,
    figure_id: 'us-rural-home',
    delivery_kind: 'pattern',
    pattern_preset_id: 'jordan-morning-evening',
  },
  {
    id: id('6002'),
    position: 1,
    label: '12 cow-calf pairs',
    kind: 'livestock',
    count: 12,
    figure_id: 'cow-calf-pair',
    season: 'summer',
    delivery_kind: 'delivery-hours',
    delivery_hours: 10,
    start_hour: 6,
  },
  {
    id: id('6003'),
    position: 2,
    label: 'Kitchen garden',
    kind: 'garden',
    area_m2: 400 * FT * FT,
    figure_id: 'vegetables-inch-per-week',
    delivery_kind: 'delivery-hours',
    delivery_hours: 2,
    start_hour: 18,
  },
].map((use) => ({
  project_id: PROJECT_ID,
  count: null,
  area_m2: null,
  own_figure: null,
  season: null,
  pattern_preset_id: null,
  hourly_fractions: null,
  peak_factor: null,
  delivery_hours: null,
  start_hour: null,
  ...use,
}));

const NO_SOURCE = 'common practice, no source';
const tasks = [
  {
    id: id('7001'),
    kind: 'intake-screen',
    title: 'Check the intake screen (autumn)',
    due_on: '2026-09-01',
    done: true,
    done_on: '2026-09-02',
  },
  {
    id: id('7002'),
    kind: 'silt-cleaning',
    title: 'Clean the settling box and tank before winter',
    due_on: '2026-09-24',
    done: false,
  },
  { id: id('7003'), kind: 'drain-down', title: 'Drain lines above frost depth', due_on: '2026-10-01', done: false },
  {
    id: id('7004'),
    kind: 'intake-screen',
    title: 'Check the intake screen (winter)',
    due_on: '2026-12-01',
    done: false,
  },
  { id: id('7005'), kind: 'refill', title: 'Close the drains and refill the lines', due_on: '2027-04-27', done: false },
].map((task) => ({ project_id: PROJECT_ID, detail: '', source: NO_SOURCE, done_on: null, ...task }));

const stamp = (rows, now) => rows.map((row) => ({ ...row, created_at: now, updated_at: now }));

module.exports = {
  async up(queryInterface) {
    const [project] = await queryInterface.sequelize.query('SELECT 1 FROM projects WHERE id = :id', {
      replacements: { id: PROJECT_ID },
    });
    if (project.length === 0) return;
    const now = new Date();
    const options = (transaction) => ({ transaction, ignoreDuplicates: true });
    await queryInterface.sequelize.transaction(async (transaction) => {
      await queryInterface.bulkInsert('water_sources', stamp([source], now), options(transaction));
      await queryInterface.bulkInsert('yield_readings', stamp(readings, now), options(transaction));
      await queryInterface.bulkInsert('tanks', stamp([tank], now), options(transaction));
      await queryInterface.bulkInsert('ram_sites', stamp([ram], now), options(transaction));
      await queryInterface.bulkInsert('ram_commissioning_readings', stamp([commissioning], now), options(transaction));
      await queryInterface.bulkInsert('demand_uses', stamp(uses, now), options(transaction));
      await queryInterface.bulkInsert('seasonal_tasks', stamp(tasks, now), options(transaction));
    });
  },

  async down(queryInterface) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      await queryInterface.bulkDelete('seasonal_tasks', { id: tasks.map((task) => task.id) }, { transaction });
      await queryInterface.bulkDelete('demand_uses', { id: uses.map((use) => use.id) }, { transaction });
      await queryInterface.bulkDelete('ram_sites', { id: RAM_ID }, { transaction });
      await queryInterface.bulkDelete('tanks', { id: TANK_ID }, { transaction });
      await queryInterface.bulkDelete('water_sources', { id: SOURCE_ID }, { transaction });
    });
  },
};
