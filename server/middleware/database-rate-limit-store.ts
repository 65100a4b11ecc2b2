import type { ClientRateLimitInfo, Options, Store } from 'express-rate-limit';
import { Op, QueryTypes } from 'sequelize';
import type { Db } from '../db';

/** Ended windows are deleted at most this often by each store. */
const SWEEP_EVERY_MS = 60_000;

/**
 * express-rate-limit store keeping the counts in the `auth_attempts` table, so every server
 * process on the database shares one budget per address. Each count is an upsert (INSERT … ON
 * CONFLICT DO UPDATE, SQLite 3.24+ and PostgreSQL) read back in its own short transaction; the
 * limiter runs before the route, so it is never nested in a route's transaction. A count whose
 * window has ended starts again at 1; ended windows are swept from the table as attempts come in.
 */
export class DatabaseRateLimitStore implements Store {
  /** Counts live in the database: another instance on the same database sees them. */
  localKeys = false;
  private windowMs = 60_000;
  private lastSweep = 0;

  /** `prefix` tells this limiter's rows from other limiters' (one store per limiter). */
  constructor(
    private readonly db: Db,
    readonly prefix: string,
  ) {}

  init(options: Options) {
    this.windowMs = options.windowMs;
  }

  async get(key: string): Promise<ClientRateLimitInfo | undefined> {
    const row = await this.db.models.AuthAttempt.findOne({ where: { key: this.prefix + key, resetAtMs: { [Op.gt]: Date.now() } } });
    return row ? { totalHits: row.hits, resetTime: new Date(row.resetAtMs) } : undefined;
  }

  async increment(key_: string): Promise<ClientRateLimitInfo> {
    const now = Date.now();
    await this.sweep(now);
    const key = this.prefix + key_;
    // The upsert locks the row (PostgreSQL) or holds the write lock (SQLite, taken at BEGIN)
    // until commit, so the count read back is this attempt's own.
    const row = await this.db.sequelize.transaction(async (transaction) => {
      await this.db.sequelize.query(
        `INSERT INTO auth_attempts ("key", hits, reset_at_ms) VALUES (:key, 1, :resetAt)
         ON CONFLICT ("key") DO UPDATE SET
           hits = CASE WHEN auth_attempts.reset_at_ms <= :now THEN 1 ELSE auth_attempts.hits + 1 END,
           reset_at_ms = CASE WHEN auth_attempts.reset_at_ms <= :now THEN excluded.reset_at_ms ELSE auth_attempts.reset_at_ms END`,
        { type: QueryTypes.UPSERT, replacements: { key, now, resetAt: now + this.windowMs }, transaction },
      );
      return this.db.models.AuthAttempt.findByPk(key, { transaction });
    });
    if (!row) throw new Error(`auth_attempts row ${key} missing after its upsert`);
    return { totalHits: row.hits, resetTime: new Date(row.resetAtMs) };
  }

  async decrement(key: string): Promise<void> {
    await this.db.models.AuthAttempt.decrement('hits', {
      by: 1,
      where: { key: this.prefix + key, hits: { [Op.gt]: 0 }, resetAtMs: { [Op.gt]: Date.now() } },
    });
  }

  async resetKey(key: string): Promise<void> {
    await this.db.models.AuthAttempt.destroy({ where: { key: this.prefix + key } });
  }

  async resetAll(): Promise<void> {
    await this.db.models.AuthAttempt.destroy({ where: { key: { [Op.startsWith]: this.prefix } } });
  }

  private async sweep(now: number) {
    if (now - this.lastSweep < SWEEP_EVERY_MS) return;
    this.lastSweep = now;
    await this.db.models.AuthAttempt.destroy({ where: { resetAtMs: { [Op.lte]: now } } });
  }
}
