'use strict';

/**
 * Storage tanks, ram pump sites and the ram's dated commissioning readings. Everything is stored
 * in SI (m, m³, m³/s, Pa); plans and sizes are computed from these rows, never stored.
 */
module.exports = {
  async up(queryInterface, Sequelize) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      const now = { type: Sequelize.DATE, allowNull: false, defaultValue: Sequelize.fn('now') };
      const createdBy = {
        type: Sequelize.UUID,
        allowNull: true,
        references: { model: 'users', key: 'id' },
        onDelete: 'SET NULL',
      };
      await queryInterface.createTable(
        'tanks',
        {
          id: { type: Sequelize.UUID, primaryKey: true, defaultValue: Sequelize.literal('gen_random_uuid()') },
          project_id: {
            type: Sequelize.UUID,
            allowNull: false,
            references: { model: 'projects', key: 'id' },
            onDelete: 'CASCADE',
          },
          name: { type: Sequelize.STRING(120), allowNull: false },
          volume_m3: { type: Sequelize.DOUBLE, allowNull: false },
          // Elevation of the tank floor; levels are depths of water above the floor.
          base_elevation_m: { type: Sequelize.DOUBLE, allowNull: true },
          low_level_m: { type: Sequelize.DOUBLE, allowNull: false, defaultValue: 0 },
          overflow_level_m: { type: Sequelize.DOUBLE, allowNull: true },
          supply_kind: { type: Sequelize.STRING(16), allowNull: false, defaultValue: 'ram-sites' },
          supply_source_id: {
            type: Sequelize.UUID,
            allowNull: true,
            references: { model: 'water_sources', key: 'id' },
            onDelete: 'SET NULL',
          },
          supply_flow_m3s: { type: Sequelize.DOUBLE, allowNull: true },
          supply_hours_per_day: { type: Sequelize.DOUBLE, allowNull: false, defaultValue: 24 },
          supply_start_hour: { type: Sequelize.INTEGER, allowNull: false, defaultValue: 0 },
          reserve_days: { type: Sequelize.DOUBLE, allowNull: false, defaultValue: 0 },
          outlets: { type: Sequelize.JSONB, allowNull: false, defaultValue: [] },
          notes: { type: Sequelize.TEXT, allowNull: false, defaultValue: '' },
          created_by: createdBy,
          created_at: now,
          updated_at: now,
        },
        { transaction },
      );
      await queryInterface.addIndex('tanks', ['project_id'], { transaction });

      await queryInterface.createTable(
        'ram_sites',
        {
          id: { type: Sequelize.UUID, primaryKey: true, defaultValue: Sequelize.literal('gen_random_uuid()') },
          project_id: {
            type: Sequelize.UUID,
            allowNull: false,
            references: { model: 'projects', key: 'id' },
            onDelete: 'CASCADE',
          },
          name: { type: Sequelize.STRING(120), allowNull: false },
          source_id: {
            type: Sequelize.UUID,
            allowNull: true,
            references: { model: 'water_sources', key: 'id' },
            onDelete: 'SET NULL',
          },
          tank_id: {
            type: Sequelize.UUID,
            allowNull: true,
            references: { model: 'tanks', key: 'id' },
            onDelete: 'SET NULL',
          },
          drive_flow_m3s: { type: Sequelize.DOUBLE, allowNull: false },
          fall_m: { type: Sequelize.DOUBLE, allowNull: false },
          drive_length_m: { type: Sequelize.DOUBLE, allowNull: false },
          drive_inside_diameter_m: { type: Sequelize.DOUBLE, allowNull: false },
          drive_material: { type: Sequelize.STRING(8), allowNull: false },
          drive_rigid: { type: Sequelize.BOOLEAN, allowNull: true },
          lift_m: { type: Sequelize.DOUBLE, allowNull: false },
          // Copied from the route when one is chosen, so the site stays plannable if the route goes.
          delivery_length_m: { type: Sequelize.DOUBLE, allowNull: false },
          delivery_route_id: {
            type: Sequelize.UUID,
            allowNull: true,
            references: { model: 'routes', key: 'id' },
            onDelete: 'SET NULL',
          },
          delivery_pipe_id: { type: Sequelize.STRING(80), allowNull: true },
          delivery_inside_diameter_m: { type: Sequelize.DOUBLE, allowNull: true },
          delivery_hazen_c: { type: Sequelize.DOUBLE, allowNull: true },
          delivery_rating_pa: { type: Sequelize.DOUBLE, allowNull: true },
          size_class_id: { type: Sequelize.STRING(32), allowNull: true },
          pump_count: { type: Sequelize.INTEGER, allowNull: false, defaultValue: 1 },
          measured_efficiency: { type: Sequelize.DOUBLE, allowNull: true },
          notes: { type: Sequelize.TEXT, allowNull: false, defaultValue: '' },
          created_by: createdBy,
          created_at: now,
          updated_at: now,
        },
        { transaction },
      );
      await queryInterface.addIndex('ram_sites', ['project_id'], { transaction });

      await queryInterface.createTable(
        'ram_commissioning_readings',
        {
          id: { type: Sequelize.UUID, primaryKey: true, defaultValue: Sequelize.literal('gen_random_uuid()') },
          ram_site_id: {
            type: Sequelize.UUID,
            allowNull: false,
            references: { model: 'ram_sites', key: 'id' },
            onDelete: 'CASCADE',
          },
          measured_on: { type: Sequelize.DATEONLY, allowNull: false },
          beats_per_minute: { type: Sequelize.DOUBLE, allowNull: false },
          delivered_bucket_volume_m3: { type: Sequelize.DOUBLE, allowNull: true },
          delivered_bucket_seconds: { type: Sequelize.DOUBLE, allowNull: true },
          delivered_flow_m3s: { type: Sequelize.DOUBLE, allowNull: true },
          // 'drive' or 'waste' measured; 'plan' when neither was, so the planned drive flow stands in.
          drive_measure: { type: Sequelize.STRING(8), allowNull: false, defaultValue: 'plan' },
          drive_bucket_volume_m3: { type: Sequelize.DOUBLE, allowNull: true },
          drive_bucket_seconds: { type: Sequelize.DOUBLE, allowNull: true },
          drive_flow_m3s: { type: Sequelize.DOUBLE, allowNull: true },
          pressure_at_pump_pa: { type: Sequelize.DOUBLE, allowNull: true },
          supply_head_m: { type: Sequelize.DOUBLE, allowNull: false },
          delivery_head_m: { type: Sequelize.DOUBLE, allowNull: true },
          notes: { type: Sequelize.TEXT, allowNull: false, defaultValue: '' },
          created_by: createdBy,
          created_at: now,
          updated_at: now,
        },
        { transaction },
      );
      await queryInterface.addIndex('ram_commissioning_readings', ['ram_site_id', 'measured_on'], { transaction });

      const checks = [
        `ALTER TABLE tanks ADD CONSTRAINT tanks_volume_check CHECK (volume_m3 > 0)`,
        `ALTER TABLE tanks ADD CONSTRAINT tanks_levels_check CHECK (low_level_m >= 0 AND (overflow_level_m IS NULL OR overflow_level_m > low_level_m))`,
        `ALTER TABLE tanks ADD CONSTRAINT tanks_supply_kind_check CHECK (supply_kind IN ('ram-sites', 'source', 'entered'))`,
        `ALTER TABLE tanks ADD CONSTRAINT tanks_supply_flow_check CHECK (supply_flow_m3s IS NULL OR supply_flow_m3s > 0)`,
        `ALTER TABLE tanks ADD CONSTRAINT tanks_supply_hours_check CHECK (supply_hours_per_day > 0 AND supply_hours_per_day <= 24 AND supply_start_hour BETWEEN 0 AND 23)`,
        `ALTER TABLE tanks ADD CONSTRAINT tanks_reserve_check CHECK (reserve_days >= 0)`,
        `ALTER TABLE ram_sites ADD CONSTRAINT ram_sites_positive_check CHECK (
           drive_flow_m3s > 0 AND fall_m > 0 AND drive_length_m > 0 AND drive_inside_diameter_m > 0
           AND lift_m > fall_m AND delivery_length_m >= 0 AND pump_count >= 1)`,
        `ALTER TABLE ram_sites ADD CONSTRAINT ram_sites_material_check CHECK (drive_material IN ('steel', 'pvc', 'pe', 'custom'))`,
        `ALTER TABLE ram_sites ADD CONSTRAINT ram_sites_delivery_pipe_check CHECK (
           delivery_pipe_id IS NOT NULL OR (delivery_inside_diameter_m > 0 AND delivery_hazen_c > 0))`,
        `ALTER TABLE ram_sites ADD CONSTRAINT ram_sites_efficiency_check CHECK (measured_efficiency IS NULL OR (measured_efficiency > 0 AND measured_efficiency <= 1))`,
        `ALTER TABLE ram_commissioning_readings ADD CONSTRAINT ram_readings_drive_measure_check CHECK (drive_measure IN ('drive', 'waste', 'plan'))`,
        `ALTER TABLE ram_commissioning_readings ADD CONSTRAINT ram_readings_delivered_check CHECK (
           (delivered_bucket_volume_m3 > 0 AND delivered_bucket_seconds > 0 AND delivered_flow_m3s IS NULL)
           OR (delivered_flow_m3s > 0 AND delivered_bucket_volume_m3 IS NULL AND delivered_bucket_seconds IS NULL))`,
        `ALTER TABLE ram_commissioning_readings ADD CONSTRAINT ram_readings_heads_check CHECK (
           beats_per_minute > 0 AND supply_head_m > 0 AND (delivery_head_m > 0 OR (delivery_head_m IS NULL AND pressure_at_pump_pa > 0)))`,
      ];
      for (const sql of checks) await queryInterface.sequelize.query(sql, { transaction });
    });
  },

  async down(queryInterface) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      await queryInterface.dropTable('ram_commissioning_readings', { transaction });
      await queryInterface.dropTable('ram_sites', { transaction });
      await queryInterface.dropTable('tanks', { transaction });
    });
  },
};
