'use strict';

/**
 * What a delivery line fed by a ram and a line's winter plan need: the elevation of a ram pump
 * (where the delivery line's head is measured from), the frost depth of a project's site, and per
 * line how it is kept through winter (buried below frost depth or drained). SI, all optional.
 */
module.exports = {
  async up(queryInterface, Sequelize) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      await queryInterface.addColumn(
        'ram_sites',
        'pump_elevation_m',
        { type: Sequelize.DOUBLE, allowNull: true },
        { transaction },
      );
      await queryInterface.addColumn(
        'projects',
        'frost_depth_m',
        { type: Sequelize.DOUBLE, allowNull: true },
        { transaction },
      );
      await queryInterface.addColumn('lines', 'winter', { type: Sequelize.JSONB, allowNull: true }, { transaction });
      await queryInterface.addConstraint('projects', {
        type: 'check',
        fields: ['frost_depth_m'],
        name: 'projects_frost_depth_m_check',
        transaction,
        where: { frost_depth_m: { [Sequelize.Op.between]: [0, 10] } },
      });
    });
  },

  async down(queryInterface) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      await queryInterface.removeConstraint('projects', 'projects_frost_depth_m_check', { transaction });
      await queryInterface.removeColumn('ram_sites', 'pump_elevation_m', { transaction });
      await queryInterface.removeColumn('projects', 'frost_depth_m', { transaction });
      await queryInterface.removeColumn('lines', 'winter', { transaction });
    });
  },
};
