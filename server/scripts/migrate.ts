import { loadConfig } from '../config';
import { createDb, withStartupLock } from '../db';
import { migrateUp } from '../migrate';

async function run() {
  const config = loadConfig();
  const db = createDb(config.databaseUrl, { poolMax: config.databasePoolMax });
  const applied = await withStartupLock(db, () => migrateUp(db.sequelize));
  console.log(applied.length ? `Applied: ${applied.join(', ')}` : 'Database is up to date.');
  await db.sequelize.close();
}

run().catch((err) => {
  console.error(err);
  process.exit(1);
});
