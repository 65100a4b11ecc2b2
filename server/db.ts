import fs from 'node:fs';
import path from 'node:path';
import { Sequelize, Transaction } from 'sequelize';
import { initModels, type Models } from './models';

export type Dialect = 'sqlite' | 'postgres';
export type Db = { sequelize: Sequelize; models: Models; dialect: Dialect };

/** `postgres://` or `postgresql://` selects PostgreSQL; `sqlite:` (the default) SQLite. */
export function dialectOf(databaseUrl: string): Dialect {
  return /^postgres(ql)?:\/\//.test(databaseUrl) ? 'postgres' : 'sqlite';
}

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

type TransactionFn = (...args: unknown[]) => Promise<unknown>;
const transactionOf = (sequelize: Sequelize) => sequelize as unknown as { transaction: TransactionFn };

/**
 * SQLite: one write transaction at a time in this process. node-sqlite3 runs statements on
 * libuv's small thread pool; transactions waiting on SQLite's write lock would otherwise occupy
 * every thread while the one holding the lock waits for a thread to commit.
 */
function serialiseTransactions(sequelize: Sequelize) {
  let tail: Promise<unknown> = Promise.resolve();
  const begin = sequelize.transaction.bind(sequelize) as TransactionFn;
  transactionOf(sequelize).transaction = (...args: unknown[]) => {
    const run = tail.then(() => begin(...args));
    tail = run.catch(() => undefined);
    return run;
  };
}

/** SQLSTATEs after which PostgreSQL asks the client to run the whole transaction again. */
const RETRYABLE_SQLSTATES = new Set(['40001', '40P01']); // serialization_failure, deadlock_detected
export const TRANSACTION_ATTEMPTS = 5;

export function isRetryableTransactionError(err: unknown): boolean {
  const e = err as { parent?: { code?: string }; original?: { code?: string }; code?: string } | undefined;
  const code = e?.parent?.code ?? e?.original?.code ?? e?.code;
  return typeof code === 'string' && RETRYABLE_SQLSTATES.has(code);
}

/**
 * PostgreSQL: a managed transaction (`transaction(callback)`) that fails on a serialization
 * failure or a deadlock is rolled back and run again, a few times with a short random wait.
 * Callbacks therefore only touch the database and their own local variables; mail and other
 * effects happen after the transaction. Writes from every process rely on row locks and
 * compare-and-set updates (`WHERE version = …`), not on running one at a time.
 */
function retryTransactions(sequelize: Sequelize) {
  const begin = sequelize.transaction.bind(sequelize) as TransactionFn;
  transactionOf(sequelize).transaction = async (...args: unknown[]) => {
    const managed = args.some((a) => typeof a === 'function');
    if (!managed) return begin(...args);
    for (let attempt = 1; ; attempt++) {
      try {
        return await begin(...args);
      } catch (err) {
        if (attempt >= TRANSACTION_ATTEMPTS || !isRetryableTransactionError(err)) throw err;
        await new Promise((resolve) => setTimeout(resolve, 5 * 2 ** attempt * Math.random()));
      }
    }
  };
}

export type DbOptions = {
  /** PostgreSQL connections per process (SQLite always uses one per transaction). */
  poolMax?: number;
};

function createSqlite(databaseUrl: string): Sequelize {
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
  return sequelize;
}

function createPostgres(databaseUrl: string, options: DbOptions): Sequelize {
  const sequelize = new Sequelize(databaseUrl, {
    dialect: 'postgres',
    logging: false,
    pool: { max: options.poolMax ?? 10, min: 0, idle: 10_000, acquire: 30_000 },
    // A statement inside a transaction cannot be retried alone (the transaction is aborted);
    // retryTransactions runs the whole transaction again instead.
    retry: { max: 1 },
    // Said explicitly so a server-wide default_transaction_isolation does not change it: a
    // compare-and-set UPDATE that waited for another writer's row lock re-reads the row and
    // matches nothing, which the services turn into a conflict answer.
    isolationLevel: Transaction.ISOLATION_LEVELS.READ_COMMITTED,
  });
  retryTransactions(sequelize);
  return sequelize;
}

/** Creates the Sequelize instance and models. Opens no connection until first used. */
export function createDb(databaseUrl: string, options: DbOptions = {}): Db {
  const dialect = dialectOf(databaseUrl);
  const sequelize = dialect === 'postgres' ? createPostgres(databaseUrl, options) : createSqlite(databaseUrl);
  return { sequelize, models: initModels(sequelize), dialect };
}

/**
 * Runs `fn` (migrations, the first seed) while no other server process on the same database
 * does, so processes started together do not both migrate or both seed. PostgreSQL: a
 * transaction-scoped advisory lock, held on a connection of its own while `fn` uses others.
 * SQLite (one host): a lock file beside the database holding the owner's pid; a file left
 * by a process that died is taken over.
 */
export async function withStartupLock<T>(db: Db, fn: () => Promise<T>): Promise<T> {
  if (db.dialect === 'postgres') {
    const t = await db.sequelize.transaction();
    try {
      await db.sequelize.query('SELECT pg_advisory_xact_lock(:key)', { replacements: { key: STARTUP_LOCK_KEY }, transaction: t });
      const result = await fn();
      await t.commit();
      return result;
    } catch (err) {
      await t.rollback().catch(() => undefined);
      throw err;
    }
  }
  const storage = (db.sequelize as unknown as { options: { storage?: string } }).options.storage ?? ':memory:';
  if (storage === ':memory:') return fn();
  const lockFile = `${storage}.startup-lock`;
  const deadline = Date.now() + STARTUP_LOCK_WAIT_MS;
  for (;;) {
    try {
      fs.writeFileSync(lockFile, String(process.pid), { flag: 'wx' });
      break;
    } catch (err) {
      if ((err as NodeJS.ErrnoException).code !== 'EEXIST') throw err;
      if (!lockHolderAlive(lockFile)) {
        fs.rmSync(lockFile, { force: true });
        continue;
      }
      if (Date.now() > deadline) throw new Error(`${lockFile} is held by another process for over ${STARTUP_LOCK_WAIT_MS / 1000} s`);
      await new Promise((resolve) => setTimeout(resolve, 100));
    }
  }
  try {
    return await fn();
  } finally {
    fs.rmSync(lockFile, { force: true });
  }
}

function lockHolderAlive(lockFile: string): boolean {
  let pid: number;
  try {
    pid = Number(fs.readFileSync(lockFile, 'utf8'));
  } catch {
    return true; // being written or just removed: look again
  }
  if (!Number.isInteger(pid) || pid <= 0) {
    // Created but not yet written: alive for a moment, then taken for a leftover.
    const stat = fs.statSync(lockFile, { throwIfNoEntry: false });
    return !!stat && Date.now() - stat.mtimeMs < 5000;
  }
  try {
    process.kill(pid, 0);
    return true;
  } catch (err) {
    return (err as NodeJS.ErrnoException).code === 'EPERM';
  }
}

const STARTUP_LOCK_WAIT_MS = 120_000;
/** Any fixed 64-bit number; it names the lock in pg_locks. */
const STARTUP_LOCK_KEY = 7_405_221_903;
