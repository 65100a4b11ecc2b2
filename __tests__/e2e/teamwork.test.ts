import type { Page } from 'playwright-core';

import { apiStudies, baseUrl, DEMO_TITLE, screenshot, signIn } from './support/app';
import { DESKTOP, openBrowser, PHONE, type BrowserSession, type Viewport } from './support/browser';

type ApiStudy = { id: number; title: string; status: string; version: number; description: string };
type OutboxMessage = { to: string; subject: string; links: string[] };

async function apiJson<T>(page: Page, path: string): Promise<T> {
  const response = await page.request.get(`${baseUrl()}/api${path}`);
  if (!response.ok()) throw new Error(`GET /api${path} answered ${response.status()}`);
  return (await response.json()) as T;
}

const studyOf = async (page: Page, id: number) => (await apiJson<{ study: ApiStudy }>(page, `/studies/${id}`)).study;

/**
 * Screens scroll inside the app's own scroll view, so a "full page" shot shows one window.
 * Grows the window to the content's height for the shot, then restores it.
 */
async function screenshotWhole(page: Page, viewport: Viewport, name: string): Promise<void> {
  const height = await page.evaluate(() => {
    const root = document.documentElement;
    let tallest = root.scrollHeight;
    for (const el of Array.from(document.querySelectorAll('*'))) {
      const overflow = getComputedStyle(el).overflowY;
      if ((overflow === 'auto' || overflow === 'scroll') && el.scrollHeight > el.clientHeight) {
        tallest = Math.max(tallest, el.scrollHeight + root.clientHeight - el.clientHeight);
      }
    }
    return tallest;
  });
  await page.setViewportSize({ width: viewport.width, height: Math.min(Math.ceil(height), 8000) });
  await screenshot(page, viewport, name);
  await page.setViewportSize(viewport);
}

async function openStudy(page: Page, id: number): Promise<void> {
  await page.goto(`${baseUrl()}/studies/${id}`);
  await page.getByRole('heading', { name: 'History' }).waitFor();
}

async function goTo(page: Page, label: string, heading: string | RegExp): Promise<void> {
  await page.getByRole('link', { name: label, exact: true }).first().click();
  await page.getByRole('heading', { name: heading }).first().waitFor();
}

// Product requirement (PRODUCT.md, Team; the team-work API): invitation by e-mail, review
// cycle draft → in review → changes requested → in review → approved, revision history.
describe('team work in the browser', () => {
  const newcomer = { email: `newcomer-${Date.now()}@example.com`, name: 'Nia Newcomer (test)', password: 'newcomer-pass-123' };
  const sessions: BrowserSession[] = [];
  let owner: Page;
  let designer: Page;
  let reviewer: Page;
  let studyId: number;
  let invitationPath: string;

  const browserAt = async (viewport: Viewport) => {
    const session = await openBrowser(viewport);
    sessions.push(session);
    return session.page;
  };

  beforeAll(async () => {
    owner = await browserAt(DESKTOP);
    designer = await browserAt(DESKTOP);
    reviewer = await browserAt(DESKTOP);
  });
  afterAll(async () => {
    for (const session of sessions) await session.close();
  });

  it('lets the owner invite an address and read the link in the outbox', async () => {
    await signIn(owner, 'owner@example.com');
    await goTo(owner, 'Team', 'Demo Lab (demo data)');
    await owner.getByRole('heading', { name: /^Members/ }).waitFor();
    await owner.getByLabel('E-mail to invite').fill(newcomer.email);
    await owner.getByRole('button', { name: 'Send invitation' }).click();
    await owner.getByText(`Invitation sent to ${newcomer.email}.`).waitFor();
    await owner.getByText(newcomer.email, { exact: true }).waitFor();
    await screenshotWhole(owner, DESKTOP, 'teamwork-team');

    await goTo(owner, 'Outbox', 'Outbox');
    const card = owner.locator('[data-testid^="message-"]', { hasText: newcomer.email }).first();
    await card.waitFor();
    invitationPath = (await card.locator('a[href^="/invitations/"]').first().getAttribute('href')) ?? '';
    await screenshotWhole(owner, DESKTOP, 'teamwork-outbox');

    // The server's outbox is the reference for the link the screen shows.
    const { messages } = await apiJson<{ messages: OutboxMessage[] }>(owner, '/outbox');
    const sent = messages.find((message) => message.to === newcomer.email);
    expect(sent?.subject).toMatch(/invited/i);
    expect(invitationPath).toMatch(/^\/invitations\/[^/]+$/);
    expect(new URL(sent?.links[0] ?? 'http://invalid').pathname).toBe(invitationPath);
  });

  it('opens the invitation in a fresh browser, creates the account and lands signed in as designer', async () => {
    const page = await browserAt(DESKTOP);
    await page.goto(`${baseUrl()}${invitationPath}`);
    await page.getByRole('heading', { name: 'Join Demo Lab (demo data)' }).waitFor();
    await page.getByLabel('Your name').fill(newcomer.name);
    await page.getByLabel('Password').fill(newcomer.password);
    await screenshot(page, DESKTOP, 'teamwork-invitation');
    await page.getByRole('button', { name: 'Create account and join' }).click();

    await page.getByRole('heading', { name: 'Studies', exact: true }).waitFor();
    expect(new URL(page.url()).pathname).toBe('/');
    const session = await apiJson<{ user: { email: string }; memberships: { teamName: string; role: string }[] }>(page, '/session');
    expect(session.user.email).toBe(newcomer.email);
    expect(session.memberships).toEqual([expect.objectContaining({ teamName: 'Demo Lab (demo data)', role: 'designer' })]);

    // The link works once.
    await page.goto(`${baseUrl()}${invitationPath}`);
    await page.getByRole('heading', { name: 'Link used or expired' }).waitFor();
  });

  it('takes a demo study through submit, changes requested with a comment, and back', async () => {
    await signIn(designer, 'designer@example.com');
    const demo = (await apiStudies(designer)).find((study) => DEMO_TITLE.test(study.title));
    studyId = demo!.id;
    const start = await studyOf(designer, studyId);
    expect(start.status).toBe('draft');

    await openStudy(designer, studyId);
    await designer.getByRole('button', { name: 'Submit for review' }).click();
    await designer.getByText(`Revision ${start.version} is waiting for a review`).waitFor();

    await signIn(reviewer, 'reviewer@example.com');
    await openStudy(reviewer, studyId);
    await reviewer.getByLabel('Review comment').fill('Check the sink at a 45 °C enclosure ambient.');
    await reviewer.getByRole('button', { name: 'Request changes' }).click();
    await reviewer.getByText(`Changes requested on revision ${start.version}`).waitFor();
    await reviewer.getByLabel('Add a comment').fill('The second burst is where the margin is thinnest.');
    await reviewer.getByLabel('Pin to a time (s), optional').fill('38');
    await reviewer.getByRole('button', { name: 'Post comment' }).click();
    await reviewer.getByText('Pinned at 38 s').first().waitFor();

    await openStudy(designer, studyId);
    await designer.getByText(`Changes requested on revision ${start.version}`).waitFor();
    await designer.getByText('“Check the sink at a 45 °C enclosure ambient.”').first().waitFor();
    expect((await studyOf(designer, studyId)).status).toBe('changes_requested');
  });

  it('approves the resubmitted revision and shows it in the history', async () => {
    // The study editor is not built yet: the designer's change is saved through the API.
    const before = await studyOf(designer, studyId);
    const saved = await designer.request.put(`${baseUrl()}/api/studies/${studyId}`, {
      data: { baseVersion: before.version, description: `${before.description} Checked at 45 °C ambient.` },
    });
    expect(saved.status()).toBe(200);
    const revision = before.version + 1;

    await openStudy(designer, studyId);
    await designer.getByRole('button', { name: 'Submit for review' }).click();
    await designer.getByText(`Revision ${revision} is waiting for a review`).waitFor();

    await openStudy(reviewer, studyId);
    await reviewer.getByRole('button', { name: 'Approve' }).click();
    await reviewer.getByText(`Revision ${revision} approved`).waitFor();

    const history = reviewer.getByRole('region', { name: 'History' });
    const newest = history.getByTestId(`revision-${revision}`);
    await newest.getByText(/^Approved by Rita Reviewer/).waitFor();
    await newest.getByText(/^description: /).waitFor();
    await history.getByTestId(`revision-${before.version}`).getByText(/^Changes requested by Rita Reviewer/).waitFor();
    expect(await studyOf(reviewer, studyId)).toMatchObject({ status: 'approved', version: revision });
    await screenshotWhole(reviewer, DESKTOP, 'teamwork-study');
  });

  it('opens a revision read-only, compared with the current one, and tells the activity in sentences', async () => {
    await openStudy(reviewer, studyId);
    await reviewer.getByRole('link', { name: 'Open revision 1' }).click();
    await reviewer.getByRole('heading', { name: 'Compared with the current version (v2)' }).waitFor();
    // The long description shows the stretch the designer added.
    await reviewer.getByText(/^now: ….*Checked at 45 °C ambient\.$/).waitFor();
    expect(await reviewer.getByRole('button', { name: 'Restore this revision' }).count()).toBe(0);
    await screenshotWhole(reviewer, DESKTOP, 'teamwork-revision');

    await goTo(owner, 'Activity', 'Activity');
    const study = await studyOf(owner, studyId);
    await owner.getByText(`Dan Designer (demo) submitted “${study.title}” revision 1 for review`).waitFor();
    await owner.getByText(`Rita Reviewer (demo) approved “${study.title}” revision 2`).waitFor();
    await owner.getByText(`${newcomer.name} accepted an invitation and joined as designer`).waitFor();
    await screenshotWhole(owner, DESKTOP, 'teamwork-activity');
  });

  it('lets an existing account join a second team and switch between the two', async () => {
    // A second team, started by someone else through the API, invites the demo owner as reviewer.
    const other = await browserAt(DESKTOP);
    const signUp = await other.request.post(`${baseUrl()}/api/accounts`, {
      data: { name: 'Ola Other (test)', email: `other-${Date.now()}@example.com`, password: 'other-team-pass', teamName: 'Second Bench Team (test)' },
    });
    expect(signUp.status()).toBe(201);
    const { memberships } = (await signUp.json()) as { memberships: { teamId: number }[] };
    const invited = await other.request.post(`${baseUrl()}/api/teams/${memberships[0].teamId}/invitations`, {
      data: { email: 'owner@example.com', role: 'reviewer' },
    });
    expect(invited.status()).toBe(201);
    const { messages } = await apiJson<{ messages: OutboxMessage[] }>(other, '/outbox');
    const link = new URL(messages.find((message) => message.to === 'owner@example.com')!.links[0]);

    await owner.goto(`${baseUrl()}${link.pathname}`);
    await owner.getByText('You are signed in as').waitFor();
    await owner.getByRole('button', { name: 'Join Second Bench Team (test)' }).click();
    await owner.getByText('0 studies in Second Bench Team (test)').waitFor();
    // A reviewer there: the owner-only sections follow the current team.
    expect(await owner.getByRole('link', { name: 'Outbox', exact: true }).count()).toBe(0);

    await owner.getByRole('button', { name: /^Team: Second Bench Team \(test\) · Reviewer/ }).click();
    await owner.getByRole('radio', { name: /Demo Lab \(demo data\)/ }).waitFor();
    await screenshot(owner, DESKTOP, 'teamwork-switcher');
    await owner.getByRole('radio', { name: /Demo Lab \(demo data\)/ }).click();
    const demo = (await apiStudies(owner)).filter((s) => DEMO_TITLE.test(s.title));
    await owner.getByText(demo[0].title, { exact: true }).first().waitFor();
    expect(await owner.getByRole('link', { name: 'Outbox', exact: true }).count()).toBe(1);
  });

  it('shows the team, outbox and study on a phone', async () => {
    const page = await browserAt(PHONE);
    await signIn(page, 'owner@example.com');
    await goTo(page, 'Team', 'Demo Lab (demo data)');
    await page.getByText(newcomer.name).first().waitFor();
    await screenshotWhole(page, PHONE, 'teamwork-team');
    await goTo(page, 'Outbox', 'Outbox');
    await page.locator('[data-testid^="message-"]').first().waitFor();
    await screenshotWhole(page, PHONE, 'teamwork-outbox');
    await openStudy(page, studyId);
    await page.getByText('Pinned at 38 s').first().waitFor();
    await screenshotWhole(page, PHONE, 'teamwork-study');
  });
});
