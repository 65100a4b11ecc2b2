import { loadConfig } from '../config';
import { createDb } from '../db';
import { migrateUp } from '../migrate';

async function run() {
  const db = createDb(loadConfig().databaseUrl);
  const applied = await migrateUp(db.sequelize);
  console.log(applied.length ? `Applied: ${applied.join(', ')}` : 'Database is up to date.');
  await db.sequelize.close();
}

run().catch((err) => {
  console.error(err);
  process.exit(1);
});
