import request from 'supertest';
import { Op } from 'sequelize';
import { createApp, type AppLocals } from '../../server/app';
import { createDb, type Db } from '../../server/db';
import { createTestApp } from './test-app';

/**
 * The sign-in limiter's counts in the database: two app instances, each with its own Sequelize
 * connection pool as two server processes would have, share one budget per address.
 */
describe('sign-in rate limit shared through the database', () => {
  let ctx: Awaited<ReturnType<typeof createTestApp>>;
  const extraDbs: Db[] = [];
  const apps: ReturnType<typeof createApp>[] = [];

  beforeAll(async () => {
    ctx = await createTestApp();
  });
  afterAll(async () => {
    for (const app of apps) (app.locals as AppLocals).stop();
    for (const db of extraDbs) await db.sequelize.close();
    await ctx.close();
  });
  afterEach(async () => {
    await ctx.db.models.AuthAttempt.destroy({ where: {} });
  });

  /** A second "process": its own Db on the same database URL, and its own app. */
  function appOnOwnPool(limit: number) {
    const db = createDb(ctx.config.databaseUrl, { poolMax: ctx.config.databasePoolMax });
    extraDbs.push(db);
    const app = createApp({ ...ctx.config, authRateLimit: limit, authRateLimitStore: 'database' }, db);
    apps.push(app);
    return app;
  }

  const attempt = (app: ReturnType<typeof createApp>) => request(app).post('/api/session').send({ email: 'nobody@limit.test', password: 'wrong password' });

  it('reaches the limit across both instances, not per instance', async () => {
    const a = appOnOwnPool(3);
    const b = appOnOwnPool(3);
    const codes = [];
    for (const app of [a, b, a, b, a]) codes.push((await attempt(app)).status);
    // Three wrong passwords are answered (401), then both instances refuse (429, RFC 6585 §4).
    expect(codes).toEqual([401, 401, 401, 429, 429]);
    const rows = await ctx.db.models.AuthAttempt.findAll({ where: { key: { [Op.startsWith]: 'sign-in:' } } });
    expect(rows).toHaveLength(1);
    expect(rows[0].hits).toBe(5);
  });

  it('counts attempts made at the same time on both instances exactly once each', async () => {
    const a = appOnOwnPool(4);
    const b = appOnOwnPool(4);
    const codes = (await Promise.all([a, b, a, b, a, b, a, b, a, b].map((app) => attempt(app)))).map((r) => r.status);
    expect(codes.filter((c) => c === 401)).toHaveLength(4);
    expect(codes.filter((c) => c === 429)).toHaveLength(6);
  });

  it('says when to retry on a 429, in the Retry-After header and in the message', async () => {
    const a = appOnOwnPool(1);
    const b = appOnOwnPool(1);
    expect((await attempt(a)).status).toBe(401);
    const started = Date.now();
    const res = await attempt(b);
    expect(res.status).toBe(429);
    // Retry-After in delay-seconds (RFC 9110 §10.2.3): the rest of the 15 min window.
    const retryAfter = Number(res.headers['retry-after']);
    expect(Number.isInteger(retryAfter)).toBe(true);
    expect(retryAfter).toBeGreaterThan(14 * 60);
    expect(retryAfter).toBeLessThanOrEqual(15 * 60);
    expect(res.body.retryAfterSeconds).toBe(retryAfter);
    expect(res.body.error).toEqual(expect.objectContaining({ code: 'too_many_attempts', message: 'Too many attempts from this address: try again in 15 min' }));
    const row = await ctx.db.models.AuthAttempt.findOne({ where: { key: { [Op.startsWith]: 'sign-in:' } } });
    expect(Math.abs(row!.resetAtMs - (started + retryAfter * 1000))).toBeLessThan(2000);
  });

  it('starts a new window once the old one has ended', async () => {
    const a = appOnOwnPool(2);
    const b = appOnOwnPool(2);
    expect((await attempt(a)).status).toBe(401);
    expect((await attempt(b)).status).toBe(401);
    expect((await attempt(a)).status).toBe(429);
    // The window ends (its reset time moved into the past, as 15 minutes going by would).
    await ctx.db.models.AuthAttempt.update({ resetAtMs: Date.now() - 1 }, { where: { key: { [Op.startsWith]: 'sign-in:' } } });
    const before = Date.now();
    expect((await attempt(b)).status).toBe(401);
    const row = await ctx.db.models.AuthAttempt.findOne({ where: { key: { [Op.startsWith]: 'sign-in:' } } });
    expect(row!.hits).toBe(1);
    expect(row!.resetAtMs).toBeGreaterThanOrEqual(before + 15 * 60 * 1000);
    expect((await attempt(a)).status).toBe(401);
    expect((await attempt(b)).status).toBe(429);
  });

  it('deletes ended windows of other addresses as attempts come in', async () => {
    await ctx.db.models.AuthAttempt.bulkCreate([
      { key: 'sign-in:198.51.100.7', hits: 9, resetAtMs: Date.now() - 60_000 },
      { key: 'sign-up:198.51.100.8', hits: 2, resetAtMs: Date.now() + 60_000 },
    ]);
    expect((await attempt(appOnOwnPool(5))).status).toBe(401);
    const keys = (await ctx.db.models.AuthAttempt.findAll()).map((r) => r.key).sort();
    expect(keys).not.toContain('sign-in:198.51.100.7');
    expect(keys).toContain('sign-up:198.51.100.8');
    expect(keys).toHaveLength(2);
  });

  it('keeps separate budgets for sign-in and sign-up', async () => {
    const a = appOnOwnPool(1);
    expect((await attempt(a)).status).toBe(401);
    expect((await attempt(a)).status).toBe(429);
    const signUp = await request(a).post('/api/accounts').send({});
    expect(signUp.status).toBe(400);
  });
});
