import fs from 'node:fs';
import path from 'node:path';
import request from 'supertest';
import { assertInDelta } from '../helpers/assert-in-delta';
import { createTestApp, makeTeam, makeUser, signedIn } from './test-app';

let ctx: Awaited<ReturnType<typeof createTestApp>>;
let teamId: number;
let otherTeamId: number;

const demo = () => JSON.parse(fs.readFileSync(path.join(__dirname, '../../examples/bench-electronic-load.json'), 'utf8')) as Record<string, unknown>;

beforeAll(async () => {
  ctx = await createTestApp();
  teamId = (await makeTeam(ctx.db, 'Lab A')).id;
  otherTeamId = (await makeTeam(ctx.db, 'Lab B')).id;
  await makeUser(ctx.db, 'owner@a.test', [{ teamId, role: 'owner' }]);
  await makeUser(ctx.db, 'designer@a.test', [{ teamId, role: 'designer' }]);
  await makeUser(ctx.db, 'reviewer@a.test', [{ teamId, role: 'reviewer' }]);
  await makeUser(ctx.db, 'owner@b.test', [{ teamId: otherTeamId, role: 'owner' }]);
  await makeUser(ctx.db, 'owner2@b.test', [{ teamId: otherTeamId, role: 'owner' }]);
});
afterAll(() => ctx.close());

const settingsUrl = (id: number) => `/api/teams/${id}/settings`;

describe('GET /api/teams/:id/settings', () => {
  it('answers 401 without a session', async () => {
    expect((await request(ctx.app).get(settingsUrl(teamId))).status).toBe(401);
  });

  it('gives every member the team defaults, all unset before an owner sets any', async () => {
    for (const email of ['owner@a.test', 'designer@a.test', 'reviewer@a.test']) {
      const res = await (await signedIn(ctx.app, email)).get(settingsUrl(teamId));
      expect(res.status).toBe(200);
      expect(res.body).toMatchObject({ teamId, version: 0, updatedBy: null, settings: { marginK: null, siteAltitudeM: null, lifetimeInNewStudies: false, touchLimitC: null } });
    }
  });

  it('answers 404 to someone outside the team, for reading and for writing', async () => {
    const agent = await signedIn(ctx.app, 'owner2@b.test');
    expect((await agent.get(settingsUrl(teamId))).status).toBe(404);
    expect((await agent.put(settingsUrl(teamId)).send({ marginK: 30 })).status).toBe(404);
    expect((await agent.get('/api/teams/999999/settings')).status).toBe(404);
  });
});

describe('PUT /api/teams/:id/settings', () => {
  it('answers 403 to designers and reviewers and changes nothing', async () => {
    for (const email of ['designer@a.test', 'reviewer@a.test']) {
      const res = await (await signedIn(ctx.app, email)).put(settingsUrl(teamId)).send({ marginK: 30 });
      expect(res.status).toBe(403);
      expect(res.body.error.code).toBe('forbidden');
    }
    expect(await ctx.db.models.TeamSetting.count()).toBe(0);
  });

  it.each([
    // The limits are the study parser's (docs/study-format.md), so each message is the parser's reason.
    [{ marginK: -5 }, 'marginK', /must not be negative/],
    [{ marginK: 'twenty' }, 'marginK', /must be a number/],
    // The standard atmosphere's troposphere ends at 11 km (U.S. Standard Atmosphere 1976).
    [{ siteAltitudeM: 12000 }, 'siteAltitudeM', /at most about 11,000 m/],
    [{ siteAltitudeM: -600 }, 'siteAltitudeM', /at least -500 m/],
    [{ siteRadiationShare: 0.5 }, 'siteAltitudeM', /is required/],
    [{ siteAltitudeM: 100, siteRadiationShare: 0.95 }, 'siteRadiationShare', /at most 0.9/],
    [{ lifetimeInNewStudies: true }, 'missionHoursPerDay', /required while new studies include a lifetime section/],
    [{ lifetimeInNewStudies: true, missionHoursPerDay: 25 }, 'missionHoursPerDay', /at most 24 h/],
    [{ cyclingExponent: 0, cyclingExponentSource: 'test report' }, 'cyclingExponent', /greater than zero/],
    [{ cyclingActivationEV: 6, cyclingActivationSource: 'test report' }, 'cyclingActivationEV', /at most 5 eV/],
    [{ cyclingCoefficient: 900 }, 'cyclingCoefficientSource', /say where this value comes from/],
    [{ arrheniusActivationEV: 0.7, arrheniusActivationSource: 'common practice' }, 'arrheniusReferenceC', /is required/],
    [{ touchLimitC: 50, touchMaterial: 'glass' }, 'touchMaterial', /either limitC or material and contact/],
    [{ touchMaterial: 'steel' }, 'touchMaterial', /must be one of metal, glass, plastic, wood/],
    [{ lifetimeInNewStudies: 'yes' }, 'lifetimeInNewStudies', /true or false/],
    [{ marginK: 20, colour: 'red' }, '(body)', /Unknown field: colour/],
  ])('refuses %j naming %s and why', async (body, field, reason) => {
    const agent = await signedIn(ctx.app, 'owner@a.test');
    const res = await agent.put(settingsUrl(teamId)).send(body);
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('validation_failed');
    const detail = (res.body.error.details as { path: string; message: string }[]).find((d) => d.path === field);
    expect(detail?.message).toMatch(reason);
  });

  it('lets an owner set the defaults, records who changed what in the activity log', async () => {
    const agent = await signedIn(ctx.app, 'owner@a.test');
    const res = await agent.put(settingsUrl(teamId)).send({
      marginK: 25,
      marginSource: 'lab design rule 4',
      siteAltitudeM: 2000,
      siteSource: 'plant in the hills (demo data)',
      lifetimeInNewStudies: true,
      missionHoursPerDay: 8,
      cyclingExponent: 4.5,
      cyclingExponentSource: 'maker report (demo data)',
      touchMaterial: 'plastic',
      touchContact: 'short',
    });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ version: 1, updatedBy: { name: 'owner' }, settings: { marginK: 25, siteAltitudeM: 2000, cyclingExponent: 4.5, cyclingCoefficient: null } });
    expect((await agent.get(settingsUrl(teamId))).body.settings.marginSource).toBe('lab design rule 4');

    const events = (await agent.get(`/api/teams/${teamId}/activity`)).body.events as { action: string; details: { changed: string[]; to: Record<string, unknown> } }[];
    const event = events.find((e) => e.action === 'team.settings_changed');
    expect(event?.details.changed).toEqual(expect.arrayContaining(['marginK', 'siteAltitudeM', 'cyclingExponent']));
    expect(event?.details.to.marginK).toBe(25);
  });
});

describe('new studies take the defaults', () => {
  it('writes them as explicit values into a new study; a later change leaves it alone', async () => {
    const designer = await signedIn(ctx.app, 'designer@a.test');
    const created = await designer.post('/api/studies').send({ title: 'Load at altitude', teamId });
    expect(created.status).toBe(201);
    const first = created.body.study;
    expect(first.teamDefaults.document).toEqual({
      marginK: 25,
      site: { altitudeM: 2000 },
      lifetime: { mission: { hoursPerDay: 8 }, powerCycling: { exponent: 4.5 } },
      touch: { material: 'plastic', contact: 'short' },
    });
    expect(first.teamDefaults.sources).toMatchObject({ marginK: 'lab design rule 4', 'lifetime.powerCycling.exponent': 'maker report (demo data)' });

    // The editor starts the document from them; save it and solve it.
    const { marginK: _m, ...rest } = demo();
    const document = { ...rest, title: 'Load at altitude', ...first.teamDefaults.document };
    expect((await designer.put(`/api/studies/${first.id}`).send({ baseVersion: 1, document })).status).toBe(200);
    const solved = (await designer.get(`/api/studies/${first.id}/result`)).body.result;
    const q1 = solved.devices.Q1;
    // Target = Tj,max − margin (docs/study-format.md; 20–25 K is common practice).
    assertInDelta(q1.targetC, 175 - 25, 1e-9);
    // U.S. Standard Atmosphere 1976 table: 79.50 kPa at 2,000 m against 101.325 kPa (from memory), ratio 0.7846.
    assertInDelta(solved.site.pressureRatio, 79.495 / 101.325, 1e-3);
    // IEC 62368-1 TS1, plastic held up to 1 min: 60 °C (from memory, as docs/study-format.md lists it).
    expect(solved.touch.sinks.HS1.limitC).toBe(60);

    const owner = await signedIn(ctx.app, 'owner@a.test');
    expect((await owner.put(settingsUrl(teamId)).send({ marginK: 30, siteAltitudeM: 500 })).status).toBe(200);

    const again = (await designer.get(`/api/studies/${first.id}`)).body.study;
    expect(again.document.marginK).toBe(25);
    expect(again.document.site).toEqual({ altitudeM: 2000 });
    expect(again.teamDefaults.document.marginK).toBe(25);

    const second = (await designer.post('/api/studies').send({ title: 'Later study', teamId })).body.study;
    expect(second.teamDefaults.document).toEqual({ marginK: 30, site: { altitudeM: 500 } });
  });

  it('keeps a study file’s document as it is and gives a team without defaults none', async () => {
    const owner = await signedIn(ctx.app, 'owner@a.test');
    const imported = (await owner.post('/api/studies').send({ title: 'From a file', teamId, document: demo() })).body.study;
    expect(imported.teamDefaults).toBeNull();
    expect(imported.document.marginK).toBe(20);

    const other = await signedIn(ctx.app, 'owner@b.test');
    const plain = (await other.post('/api/studies').send({ title: 'No defaults', teamId: otherTeamId })).body.study;
    expect(plain.teamDefaults).toBeNull();
  });

  it('takes two owners saving at once one after the other: one row, both changes counted', async () => {
    const [a, b] = [await signedIn(ctx.app, 'owner@b.test'), await signedIn(ctx.app, 'owner2@b.test')];
    const [ra, rb] = await Promise.all([a.put(settingsUrl(otherTeamId)).send({ marginK: 22 }), b.put(settingsUrl(otherTeamId)).send({ siteAltitudeM: 800 })]);
    expect([ra.status, rb.status]).toEqual([200, 200]);
    expect(await ctx.db.models.TeamSetting.count({ where: { teamId: otherTeamId } })).toBe(1);
    const final = (await a.get(settingsUrl(otherTeamId))).body;
    expect(final.version).toBe(2);
    // The later save replaces the whole set: exactly one of the two values survives.
    expect([final.settings.marginK, final.settings.siteAltitudeM].filter((v) => v !== null)).toHaveLength(1);
    await a.put(settingsUrl(otherTeamId)).send({});
  });

  it('saves on top of the version read, and answers 409 with the current settings when another owner saved first', async () => {
    // Optimistic concurrency (common practice, HTTP 409 Conflict per RFC 9110 §15.5.10): the later save names the version it read.
    const [a, b] = [await signedIn(ctx.app, 'owner@b.test'), await signedIn(ctx.app, 'owner2@b.test')];
    const read = (await a.get(settingsUrl(otherTeamId))).body;
    const first = await a.put(settingsUrl(otherTeamId)).send({ marginK: 18, baseVersion: read.version });
    expect(first.status).toBe(200);
    expect(first.body.version).toBe(read.version + 1);
    const late = await b.put(settingsUrl(otherTeamId)).send({ siteAltitudeM: 1200, baseVersion: read.version });
    expect(late.status).toBe(409);
    expect(late.body.error.code).toBe('version_conflict');
    expect(late.body.error.message).toMatch(/Another owner saved the team settings first \(now version \d+\)/);
    expect(late.body.current).toMatchObject({ version: read.version + 1, settings: { marginK: 18, siteAltitudeM: null } });
    // Nothing of the late save was written.
    expect((await a.get(settingsUrl(otherTeamId))).body.settings).toMatchObject({ marginK: 18, siteAltitudeM: null });
    // Saved again on top of the current version, it goes through.
    const retried = await b.put(settingsUrl(otherTeamId)).send({ marginK: 18, siteAltitudeM: 1200, baseVersion: late.body.current.version });
    expect(retried.status).toBe(200);
    expect(retried.body.settings).toMatchObject({ marginK: 18, siteAltitudeM: 1200 });
    // A bad baseVersion is named.
    const bad = await a.put(settingsUrl(otherTeamId)).send({ marginK: 18, baseVersion: 'latest' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.details[0].path).toBe('baseVersion');
    await a.put(settingsUrl(otherTeamId)).send({});
  });

  it('copies the defaults a study was started with into its duplicate', async () => {
    const designer = await signedIn(ctx.app, 'designer@a.test');
    const original = (await designer.post('/api/studies').send({ title: 'To copy', teamId })).body.study;
    const copy = await designer.post(`/api/studies/${original.id}/duplicate`);
    expect(copy.status).toBe(201);
    expect(copy.body.study.teamDefaults).toEqual(original.teamDefaults);
  });
});
