'use strict';

/**
 * Which published efficiency table a ram site is planned with: the old trade rule (lift/fall up to
 * 26) or the tested rams of Water for the World's Table 1 (up to 40). Existing sites keep the first.
 */
module.exports = {
  async up(queryInterface, Sequelize) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      await queryInterface.addColumn(
        'ram_sites',
        'efficiency_table_id',
        { type: Sequelize.STRING(32), allowNull: false, defaultValue: 'trade-pocketbook' },
        { transaction },
      );
      await queryInterface.sequelize.query(
        `ALTER TABLE ram_sites ADD CONSTRAINT ram_sites_efficiency_table_check CHECK (efficiency_table_id IN ('trade-pocketbook', 'tested-blake-rams'))`,
        { transaction },
      );
    });
  },

  async down(queryInterface) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      await queryInterface.sequelize.query(
        'ALTER TABLE ram_sites DROP CONSTRAINT IF EXISTS ram_sites_efficiency_table_check',
        { transaction },
      );
      await queryInterface.removeColumn('ram_sites', 'efficiency_table_id', { transaction });
    });
  },
};
