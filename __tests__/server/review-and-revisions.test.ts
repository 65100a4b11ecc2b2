import { createTestApp, makeTeam, makeUser, signedIn } from './test-app';

let ctx: Awaited<ReturnType<typeof createTestApp>>;
type Agent = Awaited<ReturnType<typeof signedIn>>;
let designer: Agent;
let reviewer: Agent;
let owner: Agent;

const doc = (ambientC: number, tjMaxC = 150) => ({
  format: 'junctura-study',
  version: 1,
  title: 'Load bank',
  ambient: { temperatureC: ambientC },
  sinks: [{ id: 'S1', rthKPerW: 1.1, capacityJPerK: 180 }],
  devices: [{ id: 'Q1', tjMaxC, sink: 'S1', package: { kind: 'lumped', rthKPerW: 0.5 }, interface: { rthKPerW: 0.3 } }],
  profile: { segments: [{ durationS: 10, powerW: { Q1: 20 } }], repeat: 1 },
});

beforeAll(async () => {
  ctx = await createTestApp();
  const team = await makeTeam(ctx.db, 'Bench');
  await makeUser(ctx.db, 'owner@bench.test', [{ teamId: team.id, role: 'owner' }]);
  await makeUser(ctx.db, 'designer@bench.test', [{ teamId: team.id, role: 'designer' }]);
  await makeUser(ctx.db, 'reviewer@bench.test', [{ teamId: team.id, role: 'reviewer' }]);
  designer = await signedIn(ctx.app, 'designer@bench.test');
  reviewer = await signedIn(ctx.app, 'reviewer@bench.test');
  owner = await signedIn(ctx.app, 'owner@bench.test');
});
afterAll(() => ctx.close());

async function newStudy() {
  const res = await designer.post('/api/studies').send({ title: 'Load bank', document: doc(40) });
  expect(res.status).toBe(201);
  return res.body.study as { id: number; version: number };
}

async function outbox(to: string) {
  const res = await owner.get('/api/outbox');
  return (res.body.messages as { to: string; subject: string; text: string; links: string[] }[]).filter((m) => m.to === to);
}

describe('saving', () => {
  it('stores a revision per save and answers 409 with the current study to a stale save', async () => {
    const s = await newStudy();
    const first = await designer.put(`/api/studies/${s.id}`).send({ baseVersion: 1, document: doc(45) });
    expect(first.status).toBe(200);
    expect(first.body.study.version).toBe(2);

    const stale = await owner.put(`/api/studies/${s.id}`).send({ baseVersion: 1, document: doc(50) });
    expect(stale.status).toBe(409);
    expect(stale.body.error.code).toBe('version_conflict');
    expect(stale.body.current.version).toBe(2);
    expect(stale.body.current.document.ambient.temperatureC).toBe(45);

    const again = await ctx.db.models.Study.findByPk(s.id);
    expect(again!.document).toEqual(doc(45));
    expect(await ctx.db.models.Revision.count({ where: { studyId: s.id } })).toBe(2);
  });

  it('lets only one of two simultaneous saves from the same version win', async () => {
    const s = await newStudy();
    const [a, b] = await Promise.all([
      designer.put(`/api/studies/${s.id}`).send({ baseVersion: 1, title: 'A wins' }),
      owner.put(`/api/studies/${s.id}`).send({ baseVersion: 1, title: 'B wins' }),
    ]);
    expect([a.status, b.status].sort()).toEqual([200, 409]);
    expect(await ctx.db.models.Revision.count({ where: { studyId: s.id } })).toBe(2);
  });
});

describe('review', () => {
  it('runs draft → in review → changes requested → in review → approved, mailing each step', async () => {
    const s = await newStudy();
    const submitted = await designer.post(`/api/studies/${s.id}/submit`);
    expect(submitted.body.study.status).toBe('in_review');
    expect((await outbox('reviewer@bench.test')).some((m) => /Review requested: Load bank/.test(m.subject))).toBe(true);

    const noReason = await reviewer.post(`/api/studies/${s.id}/review`).send({ decision: 'changes_requested' });
    expect(noReason.status).toBe(400);
    expect(noReason.body.error.details[0].path).toBe('comment');

    const back = await reviewer.post(`/api/studies/${s.id}/review`).send({ decision: 'changes_requested', comment: 'Use 45 °C ambient' });
    expect(back.body.study.status).toBe('changes_requested');
    const mail = (await outbox('designer@bench.test')).find((m) => /Changes requested/.test(m.subject));
    expect(mail!.text).toMatch(/Use 45 °C ambient/);

    await designer.put(`/api/studies/${s.id}`).send({ baseVersion: 1, document: doc(45) });
    await designer.post(`/api/studies/${s.id}/submit`);
    const approved = await reviewer.post(`/api/studies/${s.id}/review`).send({ decision: 'approved', revision: 2 });
    expect(approved.status).toBe(200);
    expect(approved.body.study.status).toBe('approved');
    expect(approved.body.study.approval).toMatchObject({ revision: 2, reviewer: { name: 'reviewer' } });

    const reviews = await designer.get(`/api/studies/${s.id}/reviews`);
    expect(reviews.body.reviews.map((r: { revision: number; decision: string }) => [r.revision, r.decision])).toEqual([
      [1, 'changes_requested'],
      [2, 'approved'],
    ]);
  });

  it('turns an approved study into a new draft revision when edited; the approval stays with its revision', async () => {
    const s = await newStudy();
    await designer.post(`/api/studies/${s.id}/submit`);
    await reviewer.post(`/api/studies/${s.id}/review`).send({ decision: 'approved' });
    const edited = await designer.put(`/api/studies/${s.id}`).send({ baseVersion: 1, document: doc(40, 175) });
    expect(edited.body.study).toMatchObject({ status: 'draft', version: 2, approval: null });
    const history = await designer.get(`/api/studies/${s.id}/revisions`);
    const r1 = history.body.revisions.find((r: { number: number }) => r.number === 1);
    expect(r1.reviews).toEqual([{ decision: 'approved', reviewer: 'reviewer', at: expect.any(String) }]);
  });

  it('refuses a review of a study not in review, a stale revision, and self-review', async () => {
    const s = await newStudy();
    expect((await reviewer.post(`/api/studies/${s.id}/review`).send({ decision: 'approved' })).status).toBe(409);
    await designer.post(`/api/studies/${s.id}/submit`);
    expect((await reviewer.post(`/api/studies/${s.id}/review`).send({ decision: 'approved', revision: 7 })).status).toBe(409);

    const mine = (await owner.post('/api/studies').send({ title: 'Owner’s own' })).body.study;
    await owner.post(`/api/studies/${mine.id}/submit`);
    const self = await owner.post(`/api/studies/${mine.id}/review`).send({ decision: 'approved' });
    expect(self.status).toBe(403);
  });
});

describe('revisions', () => {
  it('summarise what changed by field, open read-only, compare with current and restore as a new revision', async () => {
    const s = await newStudy();
    await designer.put(`/api/studies/${s.id}`).send({ baseVersion: 1, document: doc(45, 175) });

    const list = await designer.get(`/api/studies/${s.id}/revisions`);
    expect(list.body.revisions.map((r: { number: number }) => r.number)).toEqual([2, 1]);
    expect(list.body.revisions[0].summary).toEqual(['document.ambient.temperatureC: 40 → 45', 'document.devices[0].tjMaxC: 150 → 175']);

    const old = await designer.get(`/api/studies/${s.id}/revisions/1`);
    expect(old.body.revision.document.ambient.temperatureC).toBe(40);
    expect(old.body.summaryToCurrent).toHaveLength(2);

    const restored = await designer.post(`/api/studies/${s.id}/revisions/1/restore`).send({ baseVersion: 2 });
    expect(restored.body.study).toMatchObject({ version: 3, document: doc(40) });
    expect((await designer.get(`/api/studies/${s.id}/revisions/9`)).status).toBe(404);
  });
});

describe('comments', () => {
  it('pin to a time or an SOA point and reject bad anchors by field', async () => {
    const s = await newStudy();
    const atTime = await reviewer.post(`/api/studies/${s.id}/comments`).send({ body: 'Peak here', anchor: { kind: 'time', timeS: 38 } });
    expect(atTime.status).toBe(201);
    expect(atTime.body.comment).toMatchObject({ body: 'Peak here', anchor: { kind: 'time', timeS: 38 }, revision: 1, author: { name: 'reviewer' } });
    const atSoa = await designer.post(`/api/studies/${s.id}/comments`).send({ body: 'Close to the line', anchor: { kind: 'soa', vceV: 15, icA: 2.5 } });
    expect(atSoa.status).toBe(201);

    const bad = await designer.post(`/api/studies/${s.id}/comments`).send({ body: 'x', anchor: { kind: 'soa', vceV: -1 } });
    expect(bad.status).toBe(400);
    const paths = bad.body.error.details.map((d: { path: string }) => d.path).sort();
    expect(paths).toEqual(['anchor.icA', 'anchor.vceV']);

    const list = await owner.get(`/api/studies/${s.id}/comments`);
    expect(list.body.comments).toHaveLength(2);
  });
});

describe('activity', () => {
  it('records who did what to which study for owners', async () => {
    const s = await newStudy();
    await designer.post(`/api/studies/${s.id}/submit`);
    const res = await owner.get(`/api/teams/${(await ctx.db.models.Team.findOne())!.id}/activity`);
    const mine = res.body.events.filter((e: { subjectId: number }) => e.subjectId === s.id);
    expect(mine.map((e: { action: string; actor: { name: string } }) => [e.action, e.actor.name])).toEqual([
      ['study.submitted', 'designer'],
      ['study.created', 'designer'],
    ]);
  });
});
