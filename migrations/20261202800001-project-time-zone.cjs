'use strict';

/** The IANA time zone a project's survey times are read in when a file gives no offset; null = UTC. */
module.exports = {
  async up(queryInterface, Sequelize) {
    await queryInterface.addColumn('projects', 'time_zone', { type: Sequelize.STRING(64), allowNull: true });
  },

  async down(queryInterface) {
    await queryInterface.removeColumn('projects', 'time_zone');
  },
};
