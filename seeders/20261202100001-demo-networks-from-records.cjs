'use strict';

const { buildNetworksFromRecords } = require('../migrations/support/network-from-records.cjs');

// The demo's farm projects were seeded after the network migration ran, so their lines, ram site,
// tanks and demand uses are joined into one network per project here, by the migration's own code.
// Projects that already have a network are left alone (idempotent).
module.exports = {
  async up(queryInterface) {
    await queryInterface.sequelize.transaction((transaction) =>
      buildNetworksFromRecords(queryInterface.sequelize, transaction),
    );
  },
  async down() {},
};
