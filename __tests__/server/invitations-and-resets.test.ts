import request from 'supertest';
import { createTestApp, makeTeam, makeUser, signedIn, TEST_PASSWORD } from './test-app';

let ctx: Awaited<ReturnType<typeof createTestApp>>;
let teamId: number;
let owner: Awaited<ReturnType<typeof signedIn>>;

beforeAll(async () => {
  ctx = await createTestApp();
  teamId = (await makeTeam(ctx.db, 'Amplifier group')).id;
  const other = await makeTeam(ctx.db, 'Other group');
  await makeUser(ctx.db, 'owner@amp.test', [{ teamId, role: 'owner' }]);
  await makeUser(ctx.db, 'elsewhere@amp.test', [{ teamId: other.id, role: 'owner' }]);
  owner = await signedIn(ctx.app, 'owner@amp.test');
});
afterAll(() => ctx.close());

async function lastLinkTo(email: string): Promise<string> {
  const m = await ctx.db.models.MailMessage.findOne({ where: { to: email }, order: [['id', 'DESC']] });
  expect(m).not.toBeNull();
  return m!.links[0];
}
const tokenOf = (link: string) => link.split('/').pop()!;

describe('invitations', () => {
  it('mails a single-use link that creates the account with the role and signs in', async () => {
    const sent = await owner.post(`/api/teams/${teamId}/invitations`).send({ email: 'New.Person@amp.test', role: 'reviewer' });
    expect(sent.status).toBe(201);
    const mail = await ctx.db.models.MailMessage.findOne({ where: { to: 'new.person@amp.test' } });
    expect(mail!.subject).toBe('You are invited to Amplifier group on Junctura');
    expect(mail!.html).toContain(mail!.links[0]);
    const token = tokenOf(mail!.links[0]);
    expect(await ctx.db.models.Invitation.count({ where: { tokenHash: token } })).toBe(0);

    const info = await request(ctx.app).get(`/api/invitations/${token}`);
    expect(info.body.invitation).toMatchObject({ teamName: 'Amplifier group', role: 'reviewer', email: 'new.person@amp.test', accountExists: false });

    const missing = await request(ctx.app).post(`/api/invitations/${token}/accept`).send({});
    expect(missing.status).toBe(400);
    expect(missing.body.error.details.map((d: { path: string }) => d.path).sort()).toEqual(['name', 'password']);

    const agent = request.agent(ctx.app);
    const accepted = await agent.post(`/api/invitations/${token}/accept`).send({ name: 'New Person', password: 'long enough password' });
    expect(accepted.status).toBe(200);
    expect(accepted.body.memberships).toEqual([{ teamId, teamName: 'Amplifier group', role: 'reviewer' }]);
    expect((await agent.get('/api/session')).body.user.email).toBe('new.person@amp.test');

    const twice = await request(ctx.app).post(`/api/invitations/${token}/accept`).send({ name: 'X', password: 'long enough password' });
    expect(twice.status).toBe(410);
  });

  it('adds an existing account only with its password, keeping its other teams', async () => {
    await owner.post(`/api/teams/${teamId}/invitations`).send({ email: 'elsewhere@amp.test', role: 'designer' });
    const token = tokenOf(await lastLinkTo('elsewhere@amp.test'));
    expect((await request(ctx.app).get(`/api/invitations/${token}`)).body.invitation.accountExists).toBe(true);
    const wrong = await request(ctx.app).post(`/api/invitations/${token}/accept`).send({ password: 'not the password' });
    expect(wrong.status).toBe(401);
    const ok = await request(ctx.app).post(`/api/invitations/${token}/accept`).send({ password: TEST_PASSWORD });
    expect(ok.status).toBe(200);
    expect(ok.body.memberships.map((m: { teamName: string; role: string }) => `${m.teamName}:${m.role}`)).toEqual([
      'Amplifier group:designer',
      'Other group:owner',
    ]);
  });

  it('refuses expired and revoked links and members invited twice', async () => {
    await owner.post(`/api/teams/${teamId}/invitations`).send({ email: 'late@amp.test', role: 'designer' });
    const token = tokenOf(await lastLinkTo('late@amp.test'));
    await ctx.db.models.Invitation.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { email: 'late@amp.test' } });
    expect((await request(ctx.app).get(`/api/invitations/${token}`)).status).toBe(410);

    const sent = await owner.post(`/api/teams/${teamId}/invitations`).send({ email: 'withdrawn@amp.test', role: 'designer' });
    await owner.delete(`/api/teams/${teamId}/invitations/${sent.body.invitation.id}`);
    const withdrawn = tokenOf(await lastLinkTo('withdrawn@amp.test'));
    expect((await request(ctx.app).post(`/api/invitations/${withdrawn}/accept`).send({ name: 'W', password: 'long enough password' })).status).toBe(410);

    const dup = await owner.post(`/api/teams/${teamId}/invitations`).send({ email: 'owner@amp.test', role: 'designer' });
    expect(dup.status).toBe(409);
    expect((await request(ctx.app).get('/api/invitations/not-a-token')).status).toBe(404);
  });
});

describe('members', () => {
  it('keeps at least one owner', async () => {
    const me = (await owner.get('/api/session')).body.user.id;
    const demote = await owner.patch(`/api/teams/${teamId}/members/${me}`).send({ role: 'designer' });
    expect(demote.status).toBe(409);
    expect(demote.body.error.code).toBe('last_owner');
    expect((await owner.delete(`/api/teams/${teamId}/members/${me}`)).status).toBe(409);
  });

  it('lets an owner change a role, which takes effect on the next request', async () => {
    const u = await makeUser(ctx.db, 'promote@amp.test', [{ teamId, role: 'reviewer' }]);
    const agent = await signedIn(ctx.app, 'promote@amp.test');
    expect((await agent.post('/api/studies').send({ title: 'x', teamId })).status).toBe(403);
    const res = await owner.patch(`/api/teams/${teamId}/members/${u.id}`).send({ role: 'designer' });
    expect(res.status).toBe(200);
    expect((await agent.post('/api/studies').send({ title: 'x', teamId })).status).toBe(201);
    expect((await owner.patch(`/api/teams/${teamId}/members/${u.id}`).send({ role: 'boss' })).status).toBe(400);
  });
});

describe('password reset', () => {
  it('answers the same for known and unknown addresses and mails only the known one', async () => {
    const known = await request(ctx.app).post('/api/password-resets').send({ email: 'owner@amp.test' });
    const unknown = await request(ctx.app).post('/api/password-resets').send({ email: 'ghost@amp.test' });
    expect(known.status).toBe(202);
    expect(unknown.status).toBe(202);
    expect(known.body).toEqual(unknown.body);
    expect(await ctx.db.models.MailMessage.count({ where: { to: 'ghost@amp.test' } })).toBe(0);
    expect(await ctx.db.models.MailMessage.count({ where: { to: 'owner@amp.test' } })).toBe(1);
  });

  it('sets the new password once, ends existing sessions and rejects expired links', async () => {
    await makeUser(ctx.db, 'forgetful@amp.test', [{ teamId, role: 'designer' }]);
    const before = await signedIn(ctx.app, 'forgetful@amp.test');
    await request(ctx.app).post('/api/password-resets').send({ email: 'forgetful@amp.test' });
    const token = tokenOf(await lastLinkTo('forgetful@amp.test'));

    expect((await request(ctx.app).post(`/api/password-resets/${token}`).send({ password: 'short' })).status).toBe(400);
    expect((await request(ctx.app).post(`/api/password-resets/${token}`).send({ password: 'a brand new password' })).status).toBe(204);
    expect((await request(ctx.app).post(`/api/password-resets/${token}`).send({ password: 'another new password' })).status).toBe(410);
    expect((await before.get('/api/session')).status).toBe(401);

    const signIn = await request(ctx.app).post('/api/session').send({ email: 'forgetful@amp.test', password: 'a brand new password' });
    expect(signIn.status).toBe(200);
    const old = await request(ctx.app).post('/api/session').send({ email: 'forgetful@amp.test', password: TEST_PASSWORD });
    expect(old.status).toBe(401);

    await request(ctx.app).post('/api/password-resets').send({ email: 'forgetful@amp.test' });
    const late = tokenOf(await lastLinkTo('forgetful@amp.test'));
    await ctx.db.models.PasswordReset.update({ expiresAt: new Date(Date.now() - 1) }, { where: { usedAt: null } });
    expect((await request(ctx.app).post(`/api/password-resets/${late}`).send({ password: 'a third new password' })).status).toBe(410);
  });
});

describe('outbox', () => {
  it('shows an owner only messages to members and invitees of the teams they own', async () => {
    const outsider = await signedIn(ctx.app, 'elsewhere@amp.test');
    const res = await outsider.get('/api/outbox');
    expect(res.status).toBe(200);
    const recipients = new Set(res.body.messages.map((m: { to: string }) => m.to));
    expect(recipients.has('late@amp.test')).toBe(false);
  });
});
