import type { Server } from 'node:http';
import { createApp, type AppLocals } from './app';
import { ConfigError, loadConfig } from './config';
import { createDb, withStartupLock } from './db';
import { migrateUp } from './migrate';
import { DEMO_ACCOUNTS, DEMO_PASSWORD, seedDemo } from './seed/demo';

/** Connects, migrates, seeds on first start and listens. */
export async function main(): Promise<Server> {
  let config;
  try {
    config = loadConfig();
  } catch (err) {
    if (err instanceof ConfigError) {
      console.error(err.message);
      process.exit(1);
    }
    throw err;
  }
  const db = createDb(config.databaseUrl, { poolMax: config.databasePoolMax });
  await db.sequelize.authenticate();
  // Several processes may start at once on one PostgreSQL database: one migrates and seeds,
  // the others wait for it and then find nothing left to do.
  await withStartupLock(db, async () => {
    const applied = await migrateUp(db.sequelize);
    if (applied.length > 0) console.log(`Applied migrations: ${applied.join(', ')}`);
    if (config.seedDemo && (await seedDemo(db, config.bcryptCost))) console.log('Seeded the demo team, accounts and studies.');
  });

  const app = createApp(config, db);
  const server = await new Promise<Server>((resolve) => {
    const s = app.listen(config.port, config.host, () => resolve(s));
  });
  const address = server.address();
  const port = typeof address === 'object' && address ? address.port : config.port;
  console.log(`Junctura is ready at http://localhost:${port}`);
  if (config.seedDemo) {
    console.log(`Demo accounts (password "${DEMO_PASSWORD}"): ${DEMO_ACCOUNTS.map((a) => `${a.email} (${a.role})`).join(', ')}`);
  }

  const stop = () => {
    server.close(() => {
      void (app.locals as AppLocals).close().finally(() => process.exit(0));
    });
    const forceExit: NodeJS.Timeout = setTimeout(() => process.exit(0), 5000) as unknown as NodeJS.Timeout;
    forceExit.unref();
  };
  process.once('SIGINT', stop);
  process.once('SIGTERM', stop);
  return server;
}

if (require.main === module) {
  main().catch((err) => {
    console.error(err);
    process.exit(1);
  });
}
