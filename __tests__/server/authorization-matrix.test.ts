import request from 'supertest';
import type { Db } from '../../server/db';
import { createTestApp, makeStudy, makeTeam, makeUser, signedIn } from './test-app';

/**
 * Every team route against every kind of caller. Outsiders get 404 for anything of another
 * team (its existence is not revealed); reviewers get 403 for edits (PRODUCT.md, Roles).
 */
type Who = 'anonymous' | 'outsider' | 'reviewer' | 'designer' | 'owner';
const WHO: Who[] = ['anonymous', 'outsider', 'reviewer', 'designer', 'owner'];

type Fixture = { teamId: number; studyId: number; commentId: number; extraUserId: number; invitationId: number };
type Row = {
  name: string;
  method: 'get' | 'post' | 'put' | 'patch' | 'delete';
  path: (f: Fixture) => string;
  body?: (f: Fixture) => object;
  inReview?: boolean;
  expect: Record<Who, number>;
};

const read = { anonymous: 401, outsider: 404, reviewer: 200, designer: 200, owner: 200 };
const edit = (ok: number) => ({ anonymous: 401, outsider: 404, reviewer: 403, designer: ok, owner: ok });
const ownerOnly = (ok: number) => ({ anonymous: 401, outsider: 404, reviewer: 403, designer: 403, owner: ok });

const ROWS: Row[] = [
  { name: 'list studies', method: 'get', path: () => '/api/studies', expect: { ...read, outsider: 200 } },
  { name: 'create a study in the team', method: 'post', path: () => '/api/studies', body: (f) => ({ title: 'New', teamId: f.teamId }), expect: edit(201) },
  { name: 'open a study', method: 'get', path: (f) => `/api/studies/${f.studyId}`, expect: read },
  { name: 'save a study', method: 'put', path: (f) => `/api/studies/${f.studyId}`, body: () => ({ baseVersion: 1, title: 'Edited' }), expect: edit(200) },
  { name: 'delete a study', method: 'delete', path: (f) => `/api/studies/${f.studyId}`, expect: edit(204) },
  { name: 'duplicate a study', method: 'post', path: (f) => `/api/studies/${f.studyId}/duplicate`, expect: edit(201) },
  { name: 'submit for review', method: 'post', path: (f) => `/api/studies/${f.studyId}/submit`, expect: edit(200) },
  {
    name: 'approve',
    method: 'post',
    path: (f) => `/api/studies/${f.studyId}/review`,
    body: () => ({ decision: 'approved' }),
    inReview: true,
    expect: { anonymous: 401, outsider: 404, reviewer: 200, designer: 403, owner: 200 },
  },
  { name: 'list reviews', method: 'get', path: (f) => `/api/studies/${f.studyId}/reviews`, expect: read },
  { name: 'list revisions', method: 'get', path: (f) => `/api/studies/${f.studyId}/revisions`, expect: read },
  { name: 'open a revision', method: 'get', path: (f) => `/api/studies/${f.studyId}/revisions/1`, expect: read },
  { name: 'restore a revision', method: 'post', path: (f) => `/api/studies/${f.studyId}/revisions/1/restore`, body: () => ({ baseVersion: 1 }), expect: edit(200) },
  { name: 'list comments', method: 'get', path: (f) => `/api/studies/${f.studyId}/comments`, expect: read },
  { name: 'comment', method: 'post', path: (f) => `/api/studies/${f.studyId}/comments`, body: () => ({ body: 'Check the burst at 38 s' }), expect: { ...read, reviewer: 201, designer: 201, owner: 201 } },
  { name: "delete the designer's comment", method: 'delete', path: (f) => `/api/studies/${f.studyId}/comments/${f.commentId}`, expect: edit(204) },
  { name: 'list members', method: 'get', path: (f) => `/api/teams/${f.teamId}/members`, expect: read },
  { name: 'read the team settings', method: 'get', path: (f) => `/api/teams/${f.teamId}/settings`, expect: read },
  { name: 'change the team settings', method: 'put', path: (f) => `/api/teams/${f.teamId}/settings`, body: () => ({ marginK: 25 }), expect: ownerOnly(200) },
  { name: 'change a role', method: 'patch', path: (f) => `/api/teams/${f.teamId}/members/${f.extraUserId}`, body: () => ({ role: 'reviewer' }), expect: ownerOnly(200) },
  { name: 'remove a member', method: 'delete', path: (f) => `/api/teams/${f.teamId}/members/${f.extraUserId}`, expect: ownerOnly(204) },
  { name: 'list invitations', method: 'get', path: (f) => `/api/teams/${f.teamId}/invitations`, expect: ownerOnly(200) },
  { name: 'invite', method: 'post', path: (f) => `/api/teams/${f.teamId}/invitations`, body: () => ({ email: `new${Math.random()}@a.test`, role: 'designer' }), expect: ownerOnly(201) },
  { name: 'revoke an invitation', method: 'delete', path: (f) => `/api/teams/${f.teamId}/invitations/${f.invitationId}`, expect: ownerOnly(204) },
  { name: 'read the activity log', method: 'get', path: (f) => `/api/teams/${f.teamId}/activity`, expect: ownerOnly(200) },
  { name: 'read the outbox', method: 'get', path: () => '/api/outbox', expect: { anonymous: 401, outsider: 200, reviewer: 403, designer: 403, owner: 200 } },
];

let ctx: Awaited<ReturnType<typeof createTestApp>>;
let teamId: number;
let designerId: number;
let ownerId: number;
const agents = {} as Record<Who, ReturnType<typeof request.agent>>;
let serial = 0;

async function fixture(db: Db, inReview: boolean): Promise<Fixture> {
  serial += 1;
  const study = await makeStudy(db, teamId, designerId, `Study ${serial}`);
  await db.models.Revision.create({ studyId: study.id, number: 1, authorId: designerId, title: study.title, description: '', document: null });
  if (inReview) await study.update({ status: 'in_review' });
  const comment = await db.models.Comment.create({ studyId: study.id, authorId: designerId, revisionNumber: 1, body: 'first', anchor: null });
  const extra = await makeUser(db, `extra${serial}@a.test`, [{ teamId, role: 'designer' }]);
  const invitation = await db.models.Invitation.create({
    teamId,
    invitedById: ownerId,
    email: `inv${serial}@a.test`,
    role: 'designer',
    tokenHash: `hash-${serial}`,
    expiresAt: new Date(Date.now() + 3600_000),
  });
  return { teamId, studyId: study.id, commentId: comment.id, extraUserId: extra.id, invitationId: invitation.id };
}

beforeAll(async () => {
  ctx = await createTestApp();
  const a = await makeTeam(ctx.db, 'Team A');
  const b = await makeTeam(ctx.db, 'Team B');
  teamId = a.id;
  ownerId = (await makeUser(ctx.db, 'owner@a.test', [{ teamId: a.id, role: 'owner' }])).id;
  designerId = (await makeUser(ctx.db, 'designer@a.test', [{ teamId: a.id, role: 'designer' }])).id;
  await makeUser(ctx.db, 'reviewer@a.test', [{ teamId: a.id, role: 'reviewer' }]);
  await makeUser(ctx.db, 'owner@b.test', [{ teamId: b.id, role: 'owner' }]);
  agents.anonymous = request.agent(ctx.app);
  agents.outsider = await signedIn(ctx.app, 'owner@b.test');
  agents.reviewer = await signedIn(ctx.app, 'reviewer@a.test');
  agents.designer = await signedIn(ctx.app, 'designer@a.test');
  agents.owner = await signedIn(ctx.app, 'owner@a.test');
});
afterAll(() => ctx.close());

describe.each(ROWS)('$method $name', (row) => {
  it.each(WHO)('answers the expected status to %s', async (who) => {
    const f = await fixture(ctx.db, !!row.inReview);
    let req = agents[who][row.method](row.path(f));
    if (row.body) req = req.send(row.body(f));
    const res = await req;
    expect({ who, status: res.status }).toEqual({ who, status: row.expect[who] });
    if (res.status >= 400) expect(res.body.error.code).toEqual(expect.any(String));
  });
});

describe('what outsiders can see', () => {
  it('lists none of the other team’s studies and no sign that they exist', async () => {
    await fixture(ctx.db, false);
    const res = await agents.outsider.get('/api/studies');
    expect(res.body.studies).toEqual([]);
    const missing = await agents.outsider.get('/api/studies/999999');
    const existing = await agents.outsider.get(`/api/studies/${(await fixture(ctx.db, false)).studyId}`);
    expect(existing.status).toBe(missing.status);
    expect(existing.body).toEqual(missing.body);
  });
});
