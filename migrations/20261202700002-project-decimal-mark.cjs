'use strict';

/** How a project's people write decimals in number boxes: '.' or ','; null = the browser's locale. */
module.exports = {
  async up(queryInterface, Sequelize) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      await queryInterface.addColumn(
        'projects',
        'decimal_mark',
        { type: Sequelize.STRING(1), allowNull: true },
        { transaction },
      );
      await queryInterface.sequelize.query(
        `ALTER TABLE projects ADD CONSTRAINT projects_decimal_mark_check CHECK (decimal_mark IS NULL OR decimal_mark IN ('.', ','))`,
        { transaction },
      );
    });
  },

  async down(queryInterface) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      await queryInterface.sequelize.query(
        'ALTER TABLE projects DROP CONSTRAINT IF EXISTS projects_decimal_mark_check',
        { transaction },
      );
      await queryInterface.removeColumn('projects', 'decimal_mark', { transaction });
    });
  },
};
