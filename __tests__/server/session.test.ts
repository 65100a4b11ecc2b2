import request from 'supertest';
import { createTestApp, makeTeam, makeUser, signedIn, TEST_PASSWORD } from './test-app';

let ctx: Awaited<ReturnType<typeof createTestApp>>;

beforeAll(async () => {
  ctx = await createTestApp();
  const team = await makeTeam(ctx.db, 'Stage team');
  await makeUser(ctx.db, 'ada@example.com', [{ teamId: team.id, role: 'designer' }]);
});
afterAll(() => ctx.close());

function sessionCookie(res: request.Response): string | undefined {
  const cookies = ([] as string[]).concat(res.headers['set-cookie'] ?? []);
  return cookies.find((c) => c.startsWith('junctura.sid='));
}

describe('POST /api/session', () => {
  it('signs in with the right password and answers the user and memberships', async () => {
    const res = await request(ctx.app).post('/api/session').send({ email: 'ADA@example.com ', password: TEST_PASSWORD });
    expect(res.status).toBe(200);
    expect(res.body.user).toEqual({ id: expect.any(Number), email: 'ada@example.com', name: 'ada' });
    expect(res.body.memberships).toEqual([{ teamId: expect.any(Number), teamName: 'Stage team', role: 'designer' }]);
    expect(res.body.user.passwordHash).toBeUndefined();
  });

  it('sets an httpOnly, SameSite=Lax session cookie (not Secure over plain HTTP)', async () => {
    const res = await request(ctx.app).post('/api/session').send({ email: 'ada@example.com', password: TEST_PASSWORD });
    const cookie = sessionCookie(res);
    expect(cookie).toBeDefined();
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
    expect(cookie).not.toMatch(/;\s*Secure/i);
  });

  it('answers the same 401 for a wrong password and an unknown address', async () => {
    const wrong = await request(ctx.app).post('/api/session').send({ email: 'ada@example.com', password: 'not it at all' });
    const unknown = await request(ctx.app).post('/api/session').send({ email: 'nobody@example.com', password: 'not it at all' });
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(wrong.body).toEqual(unknown.body);
    expect(wrong.body.error.code).toBe('invalid_credentials');
  });

  it('answers 400 naming each bad field', async () => {
    const res = await request(ctx.app).post('/api/session').send({ email: 'not-an-address' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('validation_failed');
    const paths = res.body.error.details.map((d: { path: string }) => d.path).sort();
    expect(paths).toEqual(['email', 'password']);
  });

  it('answers 400 for malformed JSON without a stack trace', async () => {
    const res = await request(ctx.app).post('/api/session').set('Content-Type', 'application/json').send('{"email":');
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('malformed_json');
    expect(JSON.stringify(res.body)).not.toMatch(/at .*\.ts/);
  });

  it('gives a new session id at every sign-in', async () => {
    const agent = request.agent(ctx.app);
    const first = sessionCookie(await agent.post('/api/session').send({ email: 'ada@example.com', password: TEST_PASSWORD }));
    const second = sessionCookie(await agent.post('/api/session').send({ email: 'ada@example.com', password: TEST_PASSWORD }));
    expect(first).toBeDefined();
    expect(second).toBeDefined();
    expect(second!.split(';')[0]).not.toBe(first!.split(';')[0]);
  });
});

describe('GET and DELETE /api/session', () => {
  it('answers 401 JSON without a session', async () => {
    const res = await request(ctx.app).get('/api/session');
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('unauthenticated');
  });

  it('answers the signed-in user, then 401 after sign-out', async () => {
    const agent = await signedIn(ctx.app, 'ada@example.com');
    const me = await agent.get('/api/session');
    expect(me.status).toBe(200);
    expect(me.body.user.email).toBe('ada@example.com');
    expect((await agent.delete('/api/session')).status).toBe(204);
    expect((await agent.get('/api/session')).status).toBe(401);
  });

  it('removes the session row from the store at sign-out', async () => {
    const agent = await signedIn(ctx.app, 'ada@example.com');
    // The store's own model quotes the mixed-case table name on every dialect.
    const sessions = ctx.db.sequelize.models.Session;
    const before = await sessions.count();
    await agent.delete('/api/session');
    expect(await sessions.count()).toBe(before - 1);
  });
});
