import fs from 'node:fs';
import path from 'node:path';
import { Sequelize } from 'sequelize';
import { initModels, type Models } from './models';

export type Db = { sequelize: Sequelize; models: Models };

/** Resolves `sqlite:relative/or/absolute.sqlite` (or `sqlite::memory:`) to a storage path. */
export function sqliteStorage(databaseUrl: string): string {
  const rest = databaseUrl.replace(/^sqlite:(\/\/)?/, '');
  if (rest === ':memory:' || rest === '') return ':memory:';
  return path.resolve(rest);
}

/** Creates the Sequelize instance and models. Opens no connection until first used. */
export function createDb(databaseUrl: string): Db {
  const storage = sqliteStorage(databaseUrl);
  if (storage !== ':memory:') fs.mkdirSync(path.dirname(storage), { recursive: true });
  const sequelize = new Sequelize({
    dialect: 'sqlite',
    storage,
    logging: false,
    pool: { max: 1, min: 0, idle: 10_000 },
    retry: { max: 5, match: [/SQLITE_BUSY/] },
  });
  // WAL lets readers carry on while a write commits; the busy timeout waits out short locks.
  sequelize.addHook('afterConnect', async (connection) => {
    const run = (sql: string) =>
      new Promise<void>((resolve, reject) =>
        (connection as { run: (s: string, cb: (e: Error | null) => void) => void }).run(sql, (e) => (e ? reject(e) : resolve())),
      );
    await run('PRAGMA journal_mode = WAL');
    await run('PRAGMA busy_timeout = 5000');
    await run('PRAGMA foreign_keys = ON');
  });
  return { sequelize, models: initModels(sequelize) };
}
