import request from 'supertest';
import { createTestApp, makeTeam, makeUser } from './test-app';

let ctx: Awaited<ReturnType<typeof createTestApp>>;

beforeAll(async () => {
  ctx = await createTestApp();
  const team = await makeTeam(ctx.db, 'Existing team');
  await makeUser(ctx.db, 'taken@example.com', [{ teamId: team.id, role: 'owner' }]);
});
afterAll(() => ctx.close());

const valid = { name: 'Grace', email: 'grace@example.com', password: 'a long enough pass', teamName: 'Supply group' };

describe('POST /api/accounts', () => {
  it('creates the user and a team they own, and signs them in', async () => {
    const agent = request.agent(ctx.app);
    const res = await agent.post('/api/accounts').send(valid);
    expect(res.status).toBe(201);
    expect(res.body.user.email).toBe('grace@example.com');
    expect(res.body.memberships).toEqual([{ teamId: expect.any(Number), teamName: 'Supply group', role: 'owner' }]);
    const me = await agent.get('/api/session');
    expect(me.status).toBe(200);
    expect(me.body.user.email).toBe('grace@example.com');
  });

  it('stores a bcrypt hash with a cost of at least 4 in tests, never the password', async () => {
    const user = await ctx.db.models.User.findOne({ where: { email: 'grace@example.com' } });
    expect(user!.passwordHash).toMatch(/^\$2[aby]\$\d\d\$/);
    expect(user!.passwordHash).not.toContain(valid.password);
  });

  it('answers 409 for an address that already has an account', async () => {
    const res = await request(ctx.app).post('/api/accounts').send({ ...valid, email: 'taken@example.com' });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('email_taken');
  });

  it('lets one of two simultaneous sign-ups with one address in and answers the other 409', async () => {
    const body = { ...valid, email: 'twice@example.com' };
    const [a, b] = await Promise.all([request(ctx.app).post('/api/accounts').send(body), request(ctx.app).post('/api/accounts').send(body)]);
    expect([a.status, b.status].sort()).toEqual([201, 409]);
    expect([a, b].find((r) => r.status === 409)!.body.error.code).toBe('email_taken');
    expect(await ctx.db.models.User.count({ where: { email: 'twice@example.com' } })).toBe(1);
  });

  it('answers 400 naming the short password and the missing team name', async () => {
    const res = await request(ctx.app).post('/api/accounts').send({ name: 'X', email: 'x@example.com', password: 'short' });
    expect(res.status).toBe(400);
    const byPath = Object.fromEntries(res.body.error.details.map((d: { path: string; message: string }) => [d.path, d.message]));
    expect(byPath.password).toMatch(/at least 10/);
    expect(byPath.teamName).toMatch(/required/i);
  });

  it('rejects unknown fields and writes nothing', async () => {
    const before = await ctx.db.models.User.count();
    const res = await request(ctx.app).post('/api/accounts').send({ ...valid, email: 'new@example.com', role: 'owner' });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/role/);
    expect(await ctx.db.models.User.count()).toBe(before);
  });
});
