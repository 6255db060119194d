'use strict';

/**
 * Survey routes (ordered ground stations along which lines are laid) and the files they came from.
 * Points are keyed by (route, seq): a route is saved whole, in one transaction, so reordering is a
 * rewrite of its points rather than a shuffle of keys.
 */
module.exports = {
  async up(queryInterface, Sequelize) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      const now = { type: Sequelize.DATE, allowNull: false, defaultValue: Sequelize.fn('now') };
      await queryInterface.createTable(
        'attachments',
        {
          id: { type: Sequelize.UUID, primaryKey: true, defaultValue: Sequelize.literal('gen_random_uuid()') },
          project_id: {
            type: Sequelize.UUID,
            allowNull: false,
            references: { model: 'projects', key: 'id' },
            onDelete: 'CASCADE',
          },
          kind: { type: Sequelize.STRING(16), allowNull: false },
          file_name: { type: Sequelize.STRING(255), allowNull: false },
          content_type: { type: Sequelize.STRING(120), allowNull: false },
          size_bytes: { type: Sequelize.BIGINT, allowNull: false },
          sha256: { type: Sequelize.STRING(64), allowNull: false },
          storage_key: { type: Sequelize.STRING(300), allowNull: false, unique: true },
          uploaded_by: {
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
      await queryInterface.addIndex('attachments', ['project_id'], { transaction });

      await queryInterface.createTable(
        'routes',
        {
          id: { type: Sequelize.UUID, primaryKey: true, defaultValue: Sequelize.literal('gen_random_uuid()') },
          project_id: {
            type: Sequelize.UUID,
            allowNull: false,
            references: { model: 'projects', key: 'id' },
            onDelete: 'CASCADE',
          },
          name: { type: Sequelize.STRING(120), allowNull: false },
          notes: { type: Sequelize.TEXT, allowNull: false, defaultValue: '' },
          source_attachment_id: {
            type: Sequelize.UUID,
            allowNull: true,
            references: { model: 'attachments', key: 'id' },
            onDelete: 'SET NULL',
          },
          point_count: { type: Sequelize.INTEGER, allowNull: false, defaultValue: 0 },
          length_m: { type: Sequelize.DOUBLE, allowNull: false, defaultValue: 0 },
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
      await queryInterface.addIndex('routes', ['project_id'], { transaction });

      await queryInterface.createTable(
        'route_points',
        {
          route_id: {
            type: Sequelize.UUID,
            allowNull: false,
            primaryKey: true,
            references: { model: 'routes', key: 'id' },
            onDelete: 'CASCADE',
          },
          seq: { type: Sequelize.INTEGER, allowNull: false, primaryKey: true },
          latitude: { type: Sequelize.DOUBLE, allowNull: true },
          longitude: { type: Sequelize.DOUBLE, allowNull: true },
          chainage_m: { type: Sequelize.DOUBLE, allowNull: false },
          slope_chainage_m: { type: Sequelize.DOUBLE, allowNull: true },
          elevation_m: { type: Sequelize.DOUBLE, allowNull: false },
          // As surveyed, before any accepted clean-up; never overwritten.
          raw_elevation_m: { type: Sequelize.DOUBLE, allowNull: false },
          label: { type: Sequelize.STRING(200), allowNull: true },
          height_source: { type: Sequelize.STRING(16), allowNull: false },
          confidence_m: { type: Sequelize.DOUBLE, allowNull: true },
          recorded_at: { type: Sequelize.DATE, allowNull: true },
        },
        { transaction },
      );
      await queryInterface.addConstraint('route_points', {
        type: 'check',
        fields: ['height_source'],
        name: 'route_points_height_source_check',
        where: { height_source: ['gps', 'gnss', 'level', 'hose-level', 'inclinometer', 'altimeter', 'map', 'typed'] },
        transaction,
      });
    });
  },

  async down(queryInterface) {
    await queryInterface.dropTable('route_points');
    await queryInterface.dropTable('routes');
    await queryInterface.dropTable('attachments');
  },
};
