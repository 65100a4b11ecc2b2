import { loadConfig } from '../config';
import { createDb, withStartupLock } from '../db';
import { migrateUp } from '../migrate';
import { seedDemo } from '../seed/demo';

async function run() {
  const config = loadConfig();
  const db = createDb(config.databaseUrl, { poolMax: config.databasePoolMax });
  const seeded = await withStartupLock(db, async () => {
    await migrateUp(db.sequelize);
    return seedDemo(db, config.bcryptCost);
  });
  console.log(seeded ? 'Seeded the demo data.' : 'Users exist already: nothing seeded.');
  await db.sequelize.close();
}

run().catch((err) => {
  console.error(err);
  process.exit(1);
});
