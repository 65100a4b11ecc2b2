import { loadConfig } from '../config';
import { createDb } from '../db';
import { migrateUp } from '../migrate';
import { seedDemo } from '../seed/demo';

async function run() {
  const config = loadConfig();
  const db = createDb(config.databaseUrl);
  await migrateUp(db.sequelize);
  console.log((await seedDemo(db, config.bcryptCost)) ? 'Seeded the demo data.' : 'Users exist already: nothing seeded.');
  await db.sequelize.close();
}

run().catch((err) => {
  console.error(err);
  process.exit(1);
});
