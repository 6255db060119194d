// Connection settings for sequelize-cli (migrations and seeders). The app itself reads the same
// DATABASE_URL through lib/env.ts; both default to the cluster `npm start` runs on loopback.
const url = process.env.DATABASE_URL || 'postgres://runnel@127.0.0.1:5488/runnel';

const settings = {
  url,
  dialect: 'postgres',
  logging: false,
  // Seeders are recorded like migrations, so the demo scenario is seeded only once.
  seederStorage: 'sequelize',
  seederStorageTableName: 'SequelizeData',
};

module.exports = { development: settings, test: settings, production: settings };
