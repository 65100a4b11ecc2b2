import request from 'supertest';
import { createApp, type AppLocals } from '../../server/app';
import { createTestApp, makeTeam, makeUser, TEST_PASSWORD } from './test-app';

let ctx: Awaited<ReturnType<typeof createTestApp>>;

beforeAll(async () => {
  ctx = await createTestApp();
  const team = await makeTeam(ctx.db, 'Sec');
  await makeUser(ctx.db, 'sec@sec.test', [{ teamId: team.id, role: 'owner' }]);
});
afterAll(() => ctx.close());

describe('cross-site requests', () => {
  it('refuses a state-changing request whose Origin is another site', async () => {
    const res = await request(ctx.app).post('/api/session').set('Origin', 'https://evil.example').send({ email: 'sec@sec.test', password: TEST_PASSWORD });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('cross_site');
  });

  it('accepts the same origin and requests without Origin', async () => {
    const same = await request(ctx.app).post('/api/session').set('Host', 'junctura.test').set('Origin', 'http://junctura.test').send({ email: 'sec@sec.test', password: TEST_PASSWORD });
    expect(same.status).toBe(200);
    const none = await request(ctx.app).post('/api/session').send({ email: 'sec@sec.test', password: TEST_PASSWORD });
    expect(none.status).toBe(200);
  });

  it('lets reads through from anywhere (they change nothing)', async () => {
    const res = await request(ctx.app).get('/api/health').set('Origin', 'https://evil.example');
    expect(res.status).toBe(200);
  });
});

describe('headers', () => {
  it('sends a content-security policy and no x-powered-by', async () => {
    const res = await request(ctx.app).get('/api/health');
    expect(res.headers['content-security-policy']).toMatch(/default-src 'self'/);
    expect(res.headers['x-powered-by']).toBeUndefined();
    expect(res.headers['x-content-type-options']).toBe('nosniff');
  });
});

describe('sign-in rate limit', () => {
  it('answers 429 after the budget of attempts from one address (memory store)', async () => {
    // The memory store: this app's count starts empty although the other app used the database.
    const limited = createApp({ ...ctx.config, authRateLimit: 3, authRateLimitStore: 'memory' }, ctx.db);
    const codes = [];
    for (let i = 0; i < 5; i++) codes.push((await request(limited).post('/api/session').send({ email: 'sec@sec.test', password: 'wrong password' })).status);
    (limited.locals as AppLocals).stop();
    expect(codes).toEqual([401, 401, 401, 429, 429]);
  });
});
