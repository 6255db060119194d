'use strict';

/**
 * Pipelines laid along a survey route. The design (ends, flow, stretches, fittings, devices, custom
 * pipes, settings) is kept as JSONB, validated with zod and the engineering core on every write;
 * the analysis is computed from it and never stored. A deleted route leaves its lines in place
 * (route_id set to null) so no design is lost with it.
 */
module.exports = {
  async up(queryInterface, Sequelize) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      const now = { type: Sequelize.DATE, allowNull: false, defaultValue: Sequelize.fn('now') };
      const json = (fallback) => ({ type: Sequelize.JSONB, allowNull: false, defaultValue: fallback });
      await queryInterface.createTable(
        'lines',
        {
          id: { type: Sequelize.UUID, primaryKey: true, defaultValue: Sequelize.literal('gen_random_uuid()') },
          project_id: {
            type: Sequelize.UUID,
            allowNull: false,
            references: { model: 'projects', key: 'id' },
            onDelete: 'CASCADE',
          },
          route_id: {
            type: Sequelize.UUID,
            allowNull: true,
            references: { model: 'routes', key: 'id' },
            onDelete: 'SET NULL',
          },
          name: { type: Sequelize.STRING(120), allowNull: false },
          notes: { type: Sequelize.TEXT, allowNull: false, defaultValue: '' },
          // Chainage window of the route the line follows; null = the whole route.
          from_chainage_m: { type: Sequelize.DOUBLE, allowNull: true },
          to_chainage_m: { type: Sequelize.DOUBLE, allowNull: true },
          start_condition: json({}),
          end_condition: json({}),
          flow: json({}),
          stretches: json([]),
          fittings: json([]),
          devices: json([]),
          pipes: json([]),
          settings: json({}),
          status: { type: Sequelize.STRING(16), allowNull: false, defaultValue: 'draft' },
          checked_by: { type: Sequelize.STRING(120), allowNull: false, defaultValue: '' },
          // Counts saves; the title block shows it and a stale editor is refused (409).
          revision: { type: Sequelize.INTEGER, allowNull: false, defaultValue: 1 },
          created_by: {
            type: Sequelize.UUID,
            allowNull: true,
            references: { model: 'users', key: 'id' },
            onDelete: 'SET NULL',
          },
          updated_by: {
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
      await queryInterface.addConstraint('lines', {
        type: 'check',
        fields: ['status'],
        name: 'lines_status_check',
        where: { status: ['draft', 'for-checking', 'issued'] },
        transaction,
      });
      await queryInterface.addIndex('lines', ['project_id'], { transaction });
      await queryInterface.addIndex('lines', ['route_id'], { transaction });
    });
  },

  async down(queryInterface) {
    await queryInterface.dropTable('lines');
  },
};
