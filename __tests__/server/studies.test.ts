import request from 'supertest';
import { createTestApp, makeStudy, makeTeam, makeUser, signedIn } from './test-app';

let ctx: Awaited<ReturnType<typeof createTestApp>>;
let ownStudyId: number;
let otherStudyId: number;
let teamId: number;

beforeAll(async () => {
  ctx = await createTestApp();
  const team = await makeTeam(ctx.db, 'Lab A');
  const other = await makeTeam(ctx.db, 'Lab B');
  teamId = team.id;
  const owner = await makeUser(ctx.db, 'owner@a.test', [{ teamId: team.id, role: 'owner' }]);
  await makeUser(ctx.db, 'designer@a.test', [{ teamId: team.id, role: 'designer' }]);
  await makeUser(ctx.db, 'reviewer@a.test', [{ teamId: team.id, role: 'reviewer' }]);
  const outsider = await makeUser(ctx.db, 'owner@b.test', [{ teamId: other.id, role: 'owner' }]);
  ownStudyId = (await makeStudy(ctx.db, team.id, owner.id, 'Load bank burst')).id;
  otherStudyId = (await makeStudy(ctx.db, other.id, outsider.id, 'Secret amplifier')).id;
});
afterAll(() => ctx.close());

describe('GET /api/studies', () => {
  it('answers 401 JSON without a session', async () => {
    const res = await request(ctx.app).get('/api/studies');
    expect(res.status).toBe(401);
    expect(res.headers['content-type']).toMatch(/json/);
    expect(res.body.error.code).toBe('unauthenticated');
  });

  it("lists only the studies of the user's own teams", async () => {
    const agent = await signedIn(ctx.app, 'reviewer@a.test');
    const res = await agent.get('/api/studies');
    expect(res.status).toBe(200);
    expect(res.body.studies.map((s: { title: string }) => s.title)).toEqual(['Load bank burst']);
    expect(res.body.studies[0]).toMatchObject({ teamName: 'Lab A', status: 'draft', version: 1, author: { name: 'owner' } });
    expect(res.body.studies[0].document).toBeUndefined();
  });
});

describe('POST /api/studies', () => {
  it('lets a designer create a draft in their team', async () => {
    const agent = await signedIn(ctx.app, 'designer@a.test');
    const res = await agent.post('/api/studies').send({ title: '  Regulator on copper ', description: 'pulsed load' });
    expect(res.status).toBe(201);
    expect(res.headers.location).toBe(`/api/studies/${res.body.study.id}`);
    expect(res.body.study).toMatchObject({ title: 'Regulator on copper', status: 'draft', teamId, author: { name: 'designer' } });
  });

  it('answers 403 to a reviewer and writes nothing', async () => {
    const before = await ctx.db.models.Study.count();
    const agent = await signedIn(ctx.app, 'reviewer@a.test');
    const res = await agent.post('/api/studies').send({ title: 'Not allowed' });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('forbidden');
    expect(await ctx.db.models.Study.count()).toBe(before);
  });

  it('answers 404 when the team asked for is not one of the user’s', async () => {
    const outsiderTeam = (await ctx.db.models.Team.findOne({ where: { name: 'Lab B' } }))!.id;
    const agent = await signedIn(ctx.app, 'designer@a.test');
    const res = await agent.post('/api/studies').send({ title: 'Elsewhere', teamId: outsiderTeam });
    expect(res.status).toBe(404);
  });

  it('answers 400 naming the title when it is blank or too long', async () => {
    const agent = await signedIn(ctx.app, 'owner@a.test');
    const blank = await agent.post('/api/studies').send({ title: '   ' });
    expect(blank.status).toBe(400);
    expect(blank.body.error.details[0].path).toBe('title');
    const long = await agent.post('/api/studies').send({ title: 'x'.repeat(201) });
    expect(long.status).toBe(400);
    expect(long.body.error.details[0].message).toMatch(/200/);
  });
});

describe('GET /api/studies/:id', () => {
  it('answers a study of the own team with its document', async () => {
    const agent = await signedIn(ctx.app, 'reviewer@a.test');
    const res = await agent.get(`/api/studies/${ownStudyId}`);
    expect(res.status).toBe(200);
    expect(res.body.study).toMatchObject({ id: ownStudyId, title: 'Load bank burst', document: null });
  });

  it('answers 404, not 403, for a study of another team', async () => {
    const agent = await signedIn(ctx.app, 'owner@a.test');
    const res = await agent.get(`/api/studies/${otherStudyId}`);
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('not_found');
    expect(JSON.stringify(res.body)).not.toContain('Secret');
  });

  it('answers 404 for an id that is not a number or does not exist', async () => {
    const agent = await signedIn(ctx.app, 'owner@a.test');
    expect((await agent.get('/api/studies/abc')).status).toBe(404);
    expect((await agent.get('/api/studies/999999')).status).toBe(404);
  });
});

describe('unknown API routes', () => {
  it('answer a JSON 404', async () => {
    const res = await request(ctx.app).get('/api/nothing-here');
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('not_found');
  });
});
