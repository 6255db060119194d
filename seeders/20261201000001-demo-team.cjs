'use strict';

// The demo scenario is invented: Kestrel Hollow, a hill farm in the (fictional) Tarnbeck valley.
// One team, one user per role; passwords are printed in the README and are for local use only.
const argon2 = require('argon2');

const DEMO_PASSWORD = 'tarnbeck-demo-2026';
const TEAM_ID = '6f1c1e52-3a57-4c38-9b0e-0d5b1c7a0001';
const PEOPLE = [
  { id: '6f1c1e52-3a57-4c38-9b0e-0d5b1c7a1001', email: 'owner@example.test', name: 'Maren Holloway', role: 'owner' },
  { id: '6f1c1e52-3a57-4c38-9b0e-0d5b1c7a1002', email: 'designer@example.test', name: 'Tobias Wren', role: 'designer' },
  { id: '6f1c1e52-3a57-4c38-9b0e-0d5b1c7a1003', email: 'surveyor@example.test', name: 'Ines Calder', role: 'surveyor' },
  { id: '6f1c1e52-3a57-4c38-9b0e-0d5b1c7a1004', email: 'reviewer@example.test', name: 'Dara Okafor', role: 'reviewer' },
  { id: '6f1c1e52-3a57-4c38-9b0e-0d5b1c7a1005', email: 'viewer@example.test', name: 'Hollis Brandt', role: 'viewer' },
];
const PROJECTS = [
  {
    id: '6f1c1e52-3a57-4c38-9b0e-0d5b1c7a2001',
    name: 'Kestrel Hollow spring line',
    description: 'Gravity line from the upper spring box to the house, garden and the east paddock trough.',
    unit_system: 'metric',
    site_notes:
      'Upper spring at about 412 m, boxed in 2019. Line drops 96 m over 1.4 km past the old sheepfold ' +
      '(low point, wet ground) to the house at 316 m. Frost depth about 0.6 m; clay over shale.',
  },
  {
    id: '6f1c1e52-3a57-4c38-9b0e-0d5b1c7a2002',
    name: 'Brackwater Creek ram and hilltop tank',
    description: 'Ram pump below the weir on Brackwater Creek lifting to a 5,000 L tank on Harrow Knoll.',
    unit_system: 'us',
    site_notes:
      'Weir pool gives about 6 ft of fall to the ram site. Tank pad on Harrow Knoll roughly 70 ft above the ram. ' +
      'Creek runs low in late August; measure yield then.',
  },
];

module.exports = {
  async up(queryInterface) {
    const [existing] = await queryInterface.sequelize.query('SELECT 1 FROM users WHERE email = :email', {
      replacements: { email: PEOPLE[0].email },
    });
    if (existing.length > 0) return;

    const passwordHash = await argon2.hash(DEMO_PASSWORD, { type: argon2.argon2id });
    const now = new Date();
    await queryInterface.sequelize.transaction(async (transaction) => {
      await queryInterface.bulkInsert(
        'teams',
        [{ id: TEAM_ID, name: 'Kestrel Hollow Farm', created_at: now, updated_at: now }],
        { transaction },
      );
      await queryInterface.bulkInsert(
        'users',
        PEOPLE.map((p) => ({
          id: p.id,
          email: p.email,
          name: p.name,
          password_hash: passwordHash,
          session_version: 0,
          created_at: now,
          updated_at: now,
        })),
        { transaction },
      );
      await queryInterface.bulkInsert(
        'memberships',
        PEOPLE.map((p) => ({
          team_id: TEAM_ID,
          user_id: p.id,
          role: p.role,
          created_at: now,
          updated_at: now,
        })),
        { transaction },
      );
      await queryInterface.bulkInsert(
        'projects',
        PROJECTS.map((p) => ({
          ...p,
          team_id: TEAM_ID,
          created_by: PEOPLE[1].id,
          created_at: now,
          updated_at: now,
        })),
        { transaction },
      );
    });
  },

  async down(queryInterface) {
    await queryInterface.bulkDelete('teams', { id: TEAM_ID });
    await queryInterface.bulkDelete('users', { email: PEOPLE.map((p) => p.email) });
  },
};
