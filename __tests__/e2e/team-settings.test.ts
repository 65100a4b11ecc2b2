import { baseUrl, screenshot, signIn } from './support/app';
import { DESKTOP, openBrowser, PHONE, type BrowserSession, type Viewport } from './support/browser';

type ApiStudy = { id: number; document: { marginK?: number } | null; teamDefaults: { document: { marginK?: number } } | null };

const SOURCE = 'lab design rule 4 (demo data)';

describe.each<[string, Viewport]>([
  ['phone', PHONE],
  ['desktop', DESKTOP],
])('team defaults on a %s', (_name, viewport) => {
  let browser: BrowserSession;
  let teamId: number;

  beforeAll(async () => {
    browser = await openBrowser(viewport);
  });
  afterAll(async () => {
    // Other end-to-end files share the demo team: leave its defaults unset again.
    if (teamId) await browser.page.request.put(`${baseUrl()}/api/teams/${teamId}/settings`, { data: {} });
    await browser?.close();
  });

  it('an owner sets a margin and the next new study starts with it, noted in the editor', async () => {
    const { page } = browser;
    await signIn(page, 'owner@example.com');
    teamId = ((await (await page.request.get(`${baseUrl()}/api/teams`)).json()) as { teams: { teamId: number }[] }).teams[0].teamId;

    await page.goto(`${baseUrl()}/team`);
    await page.getByText('Team settings: defaults for new studies').click();
    await page.getByRole('heading', { name: 'Team settings' }).waitFor();
    const margin = page.getByLabel('Margin (K)');
    await margin.fill('27 K');
    await page.getByLabel('Source', { exact: true }).first().fill(SOURCE);
    await screenshot(page, viewport, 'team-settings');
    await page.getByText('By material and contact').click();
    await page.getByText('Plastic', { exact: true }).click();
    // IEC 62368-1 TS1, plastic held up to 10 s: 85 °C (from memory, as docs/study-format.md lists it).
    await page.getByText(/^Limit 85 °C/).waitFor();
    await page.getByRole('button', { name: 'Save team settings' }).scrollIntoViewIfNeeded();
    await screenshot(page, viewport, 'team-settings-end');
    await page.getByRole('button', { name: 'Save team settings' }).click();
    await page.getByText(/Saved\. Studies started from now on take these defaults/).waitFor();

    // The server is the reference for what was stored.
    const stored = (await (await page.request.get(`${baseUrl()}/api/teams/${teamId}/settings`)).json()) as { settings: { marginK: number; marginSource: string } };
    expect(stored.settings).toMatchObject({ marginK: 27, marginSource: SOURCE, touchMaterial: 'plastic', touchContact: 'brief' });

    const title = `Pass stage with the team margin ${viewport.width} ${Date.now()}`;
    await page.goto(`${baseUrl()}/studies/new`);
    await page.getByText(`Margin below Tj,max: 27 K (${SOURCE})`).waitFor();
    await page.getByLabel('Title').fill(title);
    await screenshot(page, viewport, 'new-study-team-defaults');
    await page.getByRole('button', { name: 'Create study' }).click();
    await page.getByRole('heading', { name: title }).waitFor();
    const id = Number(new URL(page.url()).pathname.split('/').pop());
    const created = ((await (await page.request.get(`${baseUrl()}/api/studies/${id}`)).json()) as { study: ApiStudy }).study;
    expect(created.teamDefaults?.document.marginK).toBe(27);

    await page.goto(`${baseUrl()}/studies/${id}/edit`);
    const field = page.getByLabel('Margin below Tj,max (K)');
    await field.waitFor({ state: 'attached' });
    // On a phone the editor's sections start closed.
    if (!(await field.isVisible())) await page.getByRole('button', { name: /^Study and margin/ }).click();
    await field.waitFor();
    expect(await field.inputValue()).toBe('27 K');
    await page.getByText(`From team defaults (${SOURCE})`, { exact: false }).first().waitFor();
    await page.getByTestId('team-defaults-note').waitFor();
    await screenshot(page, viewport, 'editor-team-defaults');

    // A designer reads the same defaults, each with its source, and cannot change them.
    await page.context().clearCookies();
    await signIn(page, 'designer@example.com');
    await page.goto(`${baseUrl()}/team-settings`);
    await page.getByText('Only owners change the team settings; you see them read-only.').waitFor();
    await page.getByText(`Team default · ${SOURCE}`).waitFor();
    expect(await page.getByRole('button', { name: 'Save team settings' }).count()).toBe(0);
    const refused = await page.request.put(`${baseUrl()}/api/teams/${teamId}/settings`, { data: { marginK: 10 } });
    expect(refused.status()).toBe(403);
    await screenshot(page, viewport, 'team-settings-read-only');
    // Sign the owner back in for the clean-up.
    await page.context().clearCookies();
    await signIn(page, 'owner@example.com');
  });
});
