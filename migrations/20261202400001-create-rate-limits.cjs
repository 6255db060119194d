'use strict';

/**
 * Counters for request limits (sign-in attempts per account, per client address and per known
 * device; analyses per user), kept in the database so every app instance sees the same counts.
 * Columns are the ones rate-limiter-flexible's PostgreSQL store reads and writes.
 */
module.exports = {
  async up(queryInterface) {
    await queryInterface.sequelize.query(
      `CREATE TABLE rate_limits (
         key varchar(255) PRIMARY KEY,
         points integer NOT NULL DEFAULT 0,
         expire bigint
       );
       CREATE INDEX rate_limits_expire ON rate_limits (expire);`,
    );
  },

  async down(queryInterface) {
    await queryInterface.sequelize.query('DROP TABLE rate_limits;');
  },
};
