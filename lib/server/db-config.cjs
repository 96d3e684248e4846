// sequelize-cli connection settings: every environment reads DATABASE_URL (set by scripts/setup.mjs).
const url = process.env.DATABASE_URL;
if (!url) {
  throw new Error(
    'DATABASE_URL is not set (try: DATABASE_URL=$(node scripts/db.mjs start joistwright) npx sequelize-cli db:migrate)',
  );
}

const common = {
  url,
  dialect: 'postgres',
  logging: false,
  // Record applied seeders so `db:seed:all` on every start never seeds the demo firm twice.
  seederStorage: 'sequelize',
  seederStorageTableName: 'SequelizeData',
  migrationStorageTableName: 'SequelizeMeta',
};

module.exports = { development: common, test: common, production: common };
