import request from 'supertest';
import { DEMO_ACCOUNTS, DEMO_PASSWORD, DEMO_STUDY_FILES, seedDemo } from '../../server/seed/demo';
import { createTestApp } from './test-app';

let ctx: Awaited<ReturnType<typeof createTestApp>>;

beforeAll(async () => {
  ctx = await createTestApp();
});
afterAll(() => ctx.close());

describe('seedDemo', () => {
  it('creates one demo team, one account per role and the three demo studies, once', async () => {
    expect(await seedDemo(ctx.db, 4)).toBe(true);
    expect(await seedDemo(ctx.db, 4)).toBe(false);
    expect(await ctx.db.models.Team.count()).toBe(1);
    expect(await ctx.db.models.User.count()).toBe(3);
    expect(await ctx.db.models.Study.count()).toBe(DEMO_STUDY_FILES.length);
    expect(await ctx.db.models.Revision.count()).toBe(DEMO_STUDY_FILES.length);
    expect(await ctx.db.models.Heatsink.count()).toBe(40);
    expect(await ctx.db.models.InterfaceMaterial.count()).toBe(8);
    expect(await ctx.db.models.Part.count()).toBe(6);
  });

  it('labels the invented data as demo data', async () => {
    const team = await ctx.db.models.Team.findOne();
    expect(team!.name).toMatch(/demo/i);
    for (const s of await ctx.db.models.Study.findAll()) {
      expect(s.title).toMatch(/demo/i);
      expect(s.description).toMatch(/demo data/i);
      expect(s.document).toMatchObject({ format: 'junctura-study', version: 1 });
    }
    for (const row of [...(await ctx.db.models.Heatsink.findAll()), ...(await ctx.db.models.Part.findAll()), ...(await ctx.db.models.InterfaceMaterial.findAll())]) {
      expect(row.isDemo).toBe(true);
      expect(row.name).toMatch(/\(demo\)/);
    }
  });

  it('lets each demo account sign in with the documented password and see the three studies', async () => {
    for (const account of DEMO_ACCOUNTS) {
      const agent = request.agent(ctx.app);
      const signIn = await agent.post('/api/session').send({ email: account.email, password: DEMO_PASSWORD });
      expect(signIn.status).toBe(200);
      expect(signIn.body.memberships[0].role).toBe(account.role);
      const list = await agent.get('/api/studies');
      expect(list.body.studies).toHaveLength(3);
    }
  });
});
