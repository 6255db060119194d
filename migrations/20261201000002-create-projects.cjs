'use strict';

/** Projects belong to a team; everything a design holds will hang off a project. */
module.exports = {
  async up(queryInterface, Sequelize) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      await queryInterface.createTable(
        'projects',
        {
          id: { type: Sequelize.UUID, primaryKey: true, defaultValue: Sequelize.literal('gen_random_uuid()') },
          team_id: {
            type: Sequelize.UUID,
            allowNull: false,
            references: { model: 'teams', key: 'id' },
            onDelete: 'CASCADE',
          },
          name: { type: Sequelize.STRING(120), allowNull: false },
          description: { type: Sequelize.TEXT, allowNull: false, defaultValue: '' },
          unit_system: { type: Sequelize.STRING(8), allowNull: false, defaultValue: 'metric' },
          site_notes: { type: Sequelize.TEXT, allowNull: false, defaultValue: '' },
          archived_at: { type: Sequelize.DATE, allowNull: true },
          created_by: {
            type: Sequelize.UUID,
            allowNull: true,
            references: { model: 'users', key: 'id' },
            onDelete: 'SET NULL',
          },
          created_at: { type: Sequelize.DATE, allowNull: false, defaultValue: Sequelize.fn('now') },
          updated_at: { type: Sequelize.DATE, allowNull: false, defaultValue: Sequelize.fn('now') },
        },
        { transaction },
      );
      await queryInterface.addConstraint('projects', {
        type: 'check',
        fields: ['unit_system'],
        name: 'projects_unit_system_check',
        where: { unit_system: ['metric', 'us'] },
        transaction,
      });
      await queryInterface.addIndex('projects', ['team_id'], { transaction });
    });
  },

  async down(queryInterface) {
    await queryInterface.dropTable('projects');
  },
};
