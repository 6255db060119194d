'use strict';

/**
 * Water sources (creek, spring) and their dated yield readings. A reading is a timed bucket
 * (volume + seconds) or a direct flow figure, never both. The design yield is computed from the
 * readings; the source only stores how it is chosen.
 */
module.exports = {
  async up(queryInterface, Sequelize) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      const now = { type: Sequelize.DATE, allowNull: false, defaultValue: Sequelize.fn('now') };
      await queryInterface.createTable(
        'water_sources',
        {
          id: { type: Sequelize.UUID, primaryKey: true, defaultValue: Sequelize.literal('gen_random_uuid()') },
          project_id: {
            type: Sequelize.UUID,
            allowNull: false,
            references: { model: 'projects', key: 'id' },
            onDelete: 'CASCADE',
          },
          name: { type: Sequelize.STRING(120), allowNull: false },
          kind: { type: Sequelize.STRING(16), allowNull: false, defaultValue: 'creek' },
          notes: { type: Sequelize.TEXT, allowNull: false, defaultValue: '' },
          design_yield_choice: { type: Sequelize.STRING(24), allowNull: false, defaultValue: 'lowest-recent-dry' },
          design_reading_id: { type: Sequelize.UUID, allowNull: true },
          entered_yield_m3s: { type: Sequelize.DOUBLE, allowNull: true },
          other_draw_m3s: { type: Sequelize.DOUBLE, allowNull: false, defaultValue: 0 },
          created_by: {
            type: Sequelize.UUID,
            allowNull: true,
            references: { model: 'users', key: 'id' },
            onDelete: 'SET NULL',
          },
          created_at: now,
          updated_at: now,
        },
        { transaction },
      );
      await queryInterface.addIndex('water_sources', ['project_id'], { transaction });

      await queryInterface.createTable(
        'yield_readings',
        {
          id: { type: Sequelize.UUID, primaryKey: true, defaultValue: Sequelize.literal('gen_random_uuid()') },
          source_id: {
            type: Sequelize.UUID,
            allowNull: false,
            references: { model: 'water_sources', key: 'id' },
            onDelete: 'CASCADE',
          },
          measured_on: { type: Sequelize.DATEONLY, allowNull: false },
          season: { type: Sequelize.STRING(16), allowNull: false, defaultValue: 'unspecified' },
          bucket_volume_m3: { type: Sequelize.DOUBLE, allowNull: true },
          bucket_seconds: { type: Sequelize.DOUBLE, allowNull: true },
          flow_m3s: { type: Sequelize.DOUBLE, allowNull: true },
          note: { type: Sequelize.TEXT, allowNull: false, defaultValue: '' },
          created_by: {
            type: Sequelize.UUID,
            allowNull: true,
            references: { model: 'users', key: 'id' },
            onDelete: 'SET NULL',
          },
          created_at: now,
          updated_at: now,
        },
        { transaction },
      );
      await queryInterface.addIndex('yield_readings', ['source_id', 'measured_on'], { transaction });

      const checks = [
        `ALTER TABLE water_sources ADD CONSTRAINT water_sources_kind_check CHECK (kind IN ('creek', 'spring', 'other'))`,
        `ALTER TABLE water_sources ADD CONSTRAINT water_sources_choice_check CHECK (design_yield_choice IN ('lowest-recent-dry', 'reading', 'entered'))`,
        `ALTER TABLE water_sources ADD CONSTRAINT water_sources_entered_check CHECK (entered_yield_m3s IS NULL OR entered_yield_m3s > 0)`,
        `ALTER TABLE water_sources ADD CONSTRAINT water_sources_other_draw_check CHECK (other_draw_m3s >= 0)`,
        `ALTER TABLE water_sources ADD CONSTRAINT water_sources_design_reading_fk FOREIGN KEY (design_reading_id) REFERENCES yield_readings (id) ON DELETE SET NULL`,
        `ALTER TABLE yield_readings ADD CONSTRAINT yield_readings_season_check CHECK (season IN ('dry', 'wet', 'unspecified'))`,
        `ALTER TABLE yield_readings ADD CONSTRAINT yield_readings_measure_check CHECK (
           (bucket_volume_m3 > 0 AND bucket_seconds > 0 AND flow_m3s IS NULL)
           OR (flow_m3s > 0 AND bucket_volume_m3 IS NULL AND bucket_seconds IS NULL))`,
      ];
      for (const sql of checks) await queryInterface.sequelize.query(sql, { transaction });
    });
  },

  async down(queryInterface) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      await queryInterface.sequelize.query(
        'ALTER TABLE water_sources DROP CONSTRAINT IF EXISTS water_sources_design_reading_fk',
        { transaction },
      );
      await queryInterface.dropTable('yield_readings', { transaction });
      await queryInterface.dropTable('water_sources', { transaction });
    });
  },
};
