'use strict';

/**
 * Daily demand uses (people, livestock, garden, a fixed volume) and the project's dated seasonal
 * upkeep tasks. A use either names a published figure or carries the user's own figure.
 */
module.exports = {
  async up(queryInterface, Sequelize) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      const now = { type: Sequelize.DATE, allowNull: false, defaultValue: Sequelize.fn('now') };
      const project = {
        type: Sequelize.UUID,
        allowNull: false,
        references: { model: 'projects', key: 'id' },
        onDelete: 'CASCADE',
      };
      await queryInterface.createTable(
        'demand_uses',
        {
          id: { type: Sequelize.UUID, primaryKey: true, defaultValue: Sequelize.literal('gen_random_uuid()') },
          project_id: project,
          position: { type: Sequelize.INTEGER, allowNull: false, defaultValue: 0 },
          label: { type: Sequelize.STRING(120), allowNull: false, defaultValue: '' },
          kind: { type: Sequelize.STRING(16), allowNull: false },
          count: { type: Sequelize.INTEGER, allowNull: true },
          area_m2: { type: Sequelize.DOUBLE, allowNull: true },
          figure_id: { type: Sequelize.STRING(64), allowNull: true },
          // m³/person/day, m³/head/day, m of depth/day, or m³/day for a fixed use.
          own_figure: { type: Sequelize.DOUBLE, allowNull: true },
          season: { type: Sequelize.STRING(8), allowNull: true },
          delivery_kind: { type: Sequelize.STRING(16), allowNull: false, defaultValue: 'peak-factor' },
          pattern_preset_id: { type: Sequelize.STRING(64), allowNull: true },
          hourly_fractions: { type: Sequelize.JSONB, allowNull: true },
          peak_factor: { type: Sequelize.DOUBLE, allowNull: true },
          delivery_hours: { type: Sequelize.DOUBLE, allowNull: true },
          start_hour: { type: Sequelize.INTEGER, allowNull: true },
          created_at: now,
          updated_at: now,
        },
        { transaction },
      );
      await queryInterface.addIndex('demand_uses', ['project_id', 'position'], { transaction });

      await queryInterface.createTable(
        'seasonal_tasks',
        {
          id: { type: Sequelize.UUID, primaryKey: true, defaultValue: Sequelize.literal('gen_random_uuid()') },
          project_id: project,
          kind: { type: Sequelize.STRING(20), allowNull: false, defaultValue: 'other' },
          title: { type: Sequelize.STRING(160), allowNull: false },
          detail: { type: Sequelize.TEXT, allowNull: false, defaultValue: '' },
          due_on: { type: Sequelize.DATEONLY, allowNull: false },
          done: { type: Sequelize.BOOLEAN, allowNull: false, defaultValue: false },
          done_on: { type: Sequelize.DATEONLY, allowNull: true },
          source: { type: Sequelize.STRING(300), allowNull: false, defaultValue: '' },
          created_at: now,
          updated_at: now,
        },
        { transaction },
      );
      await queryInterface.addIndex('seasonal_tasks', ['project_id', 'due_on'], { transaction });

      const checks = [
        `ALTER TABLE demand_uses ADD CONSTRAINT demand_uses_kind_check CHECK (kind IN ('people', 'livestock', 'garden', 'fixed'))`,
        `ALTER TABLE demand_uses ADD CONSTRAINT demand_uses_amounts_check CHECK (
           (count IS NULL OR count >= 0) AND (area_m2 IS NULL OR area_m2 >= 0) AND (own_figure IS NULL OR own_figure >= 0))`,
        `ALTER TABLE demand_uses ADD CONSTRAINT demand_uses_season_check CHECK (season IS NULL OR season IN ('winter', 'summer'))`,
        `ALTER TABLE demand_uses ADD CONSTRAINT demand_uses_delivery_check CHECK (delivery_kind IN ('pattern', 'peak-factor', 'delivery-hours'))`,
        `ALTER TABLE seasonal_tasks ADD CONSTRAINT seasonal_tasks_kind_check CHECK (
           kind IN ('drain-down', 'refill', 'silt-cleaning', 'intake-screen', 'valve-exercise', 'other'))`,
      ];
      for (const sql of checks) await queryInterface.sequelize.query(sql, { transaction });
    });
  },

  async down(queryInterface) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      await queryInterface.dropTable('seasonal_tasks', { transaction });
      await queryInterface.dropTable('demand_uses', { transaction });
    });
  },
};
