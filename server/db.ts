import fs from 'node:fs';
import path from 'node:path';
import { Sequelize, Transaction } from 'sequelize';
import { initModels, type Models } from './models';

export type Db = { sequelize: Sequelize; models: Models };

/** Resolves `sqlite:relative/or/absolute.sqlite` (or `sqlite::memory:`) to a storage path. */
export function sqliteStorage(databaseUrl: string): string {
  const rest = databaseUrl.replace(/^sqlite:(\/\/)?/, '');
  if (rest === ':memory:' || rest === '') return ':memory:';
  return path.resolve(rest);
}

type SqliteConnection = {
  run: (sql: string, cb: (err: Error | null) => void) => void;
  configure: (option: 'busyTimeout', ms: number) => void;
  juncturaConfigured?: boolean;
};

const BUSY_TIMEOUT_MS = 5000;

/**
 * Sequelize's SQLite dialect opens one connection per transaction and runs no afterConnect
 * hooks, so each new connection gets WAL mode (readers go on while a write commits) and a busy
 * timeout (waits out short write locks instead of failing) here.
 */
function configureSqliteConnections(sequelize: Sequelize) {
  const manager = sequelize.connectionManager as unknown as { getConnection: (o?: unknown) => Promise<SqliteConnection> };
  const open = manager.getConnection.bind(manager);
  manager.getConnection = async (options) => {
    const connection = await open(options);
    if (!connection.juncturaConfigured) {
      connection.juncturaConfigured = true;
      connection.configure('busyTimeout', BUSY_TIMEOUT_MS);
      await new Promise<void>((resolve, reject) => connection.run('PRAGMA journal_mode = WAL', (e) => (e ? reject(e) : resolve())));
    }
    return connection;
  };
}

/**
 * One write transaction at a time in this process. node-sqlite3 runs statements on libuv's
 * small thread pool; transactions waiting on SQLite's write lock would otherwise occupy every
 * thread while the one holding the lock waits for a thread to commit.
 */
function serialiseTransactions(sequelize: Sequelize) {
  let tail: Promise<unknown> = Promise.resolve();
  const begin = sequelize.transaction.bind(sequelize) as (...args: unknown[]) => Promise<unknown>;
  (sequelize as unknown as { transaction: (...args: unknown[]) => Promise<unknown> }).transaction = (...args: unknown[]) => {
    const run = tail.then(() => begin(...args));
    tail = run.catch(() => undefined);
    return run;
  };
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
    // Writers take the write lock at BEGIN, so concurrent transactions queue on the busy
    // timeout instead of failing when a read lock cannot be upgraded.
    transactionType: Transaction.TYPES.IMMEDIATE,
  });
  configureSqliteConnections(sequelize);
  serialiseTransactions(sequelize);
  return { sequelize, models: initModels(sequelize) };
}
