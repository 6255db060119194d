'use strict';

// The demo people of Kestrel Hollow sign in with confirmed addresses (they are invented; the
// mail they would get goes to the local fake mail server).
const DEMO_EMAILS = [
  'owner@example.test',
  'designer@example.test',
  'surveyor@example.test',
  'reviewer@example.test',
  'viewer@example.test',
];

module.exports = {
  async up(queryInterface) {
    await queryInterface.sequelize.query(
      'UPDATE users SET email_verified_at = now() WHERE email IN (:emails) AND email_verified_at IS NULL',
      { replacements: { emails: DEMO_EMAILS } },
    );
  },

  async down() {},
};
