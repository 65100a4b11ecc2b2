import type { Page } from 'playwright-core';

import { apiStudies, baseUrl, screenshot, signIn } from './support/app';
import { DESKTOP, openBrowser, PHONE, type BrowserSession, type Viewport } from './support/browser';

type Doc = { ambient: { temperatureC: number }; profile: { segments: { iloadA?: number }[] } };
type ApiStudy = { id: number; title: string; version: number; document: Doc };

const BENCH_LOAD = /bench electronic load/i;
const LAB_SUPPLY = /laboratory supply/i;

async function api<T>(page: Page, method: 'get' | 'post' | 'delete', path: string, data?: unknown): Promise<T> {
  const response = await page.request[method](`${baseUrl()}/api${path}`, { headers: { Origin: baseUrl() }, data });
  if (!response.ok()) throw new Error(`${method.toUpperCase()} /api${path} answered ${response.status()}`);
  return (response.status() === 204 ? undefined : await response.json()) as T;
}

/** The editor scrolls inside its own columns: the window grows to the tallest of them for the shot. */
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
  await page.setViewportSize({ width: viewport.width, height: Math.min(Math.ceil(height), 15000) });
  await screenshot(page, viewport, name);
  await page.setViewportSize(viewport);
}

// Product requirement (PRODUCT.md, Study and Load profile; the team-work API's save contract).
describe('the study editor in the browser', () => {
  const sessions: BrowserSession[] = [];
  let designer: Page;
  let copy: ApiStudy;

  beforeAll(async () => {
    const session = await openBrowser(DESKTOP);
    sessions.push(session);
    designer = session.page;
    await signIn(designer, 'designer@example.com');
    // A copy of a demo study, so the demo studies other suites use stay as seeded.
    const demo = (await apiStudies(designer)).find((s) => BENCH_LOAD.test(s.title));
    copy = (await api<{ study: ApiStudy }>(designer, 'post', `/studies/${demo!.id}/duplicate`)).study;
  });
  afterAll(async () => {
    if (copy) await api(designer, 'delete', `/studies/${copy.id}`).catch(() => undefined);
    for (const session of sessions) await session.close();
  });

  it('lets the designer change the ambient and a segment, see the verdict follow, save and find the values after a reload', async () => {
    await designer.goto(`${baseUrl()}/studies/${copy.id}`);
    await designer.getByRole('button', { name: 'Edit' }).click();
    await designer.getByText(`Editing from version ${copy.version}`).waitFor();
    const verdict = designer.getByTestId('study-verdict');
    await verdict.waitFor();
    const before = await verdict.innerText();
    await screenshotWhole(designer, DESKTOP, 'editor');

    const ambient = designer.getByLabel('Ambient temperature (°C)');
    const iload = designer.getByLabel('Segment 3 Iload (A)');
    await ambient.fill('55');
    await iload.fill('8.5 A');
    await designer.waitForFunction((text) => (document.querySelector('[data-testid="study-verdict"]') as HTMLElement | null)?.innerText !== text, before, { timeout: 20_000 });
    expect(await verdict.innerText()).not.toBe(before);

    await designer.getByRole('button', { name: 'Save', exact: true }).click();
    await designer.getByText(`Saved as version ${copy.version + 1}`).waitFor();
    // The server is the reference for what was saved, in SI units.
    const saved = (await api<{ study: ApiStudy }>(designer, 'get', `/studies/${copy.id}`)).study;
    expect(saved.version).toBe(copy.version + 1);
    expect(saved.document.ambient.temperatureC).toBe(55);
    expect(saved.document.profile.segments[2].iloadA).toBe(8.5);

    await designer.reload();
    await designer.getByText(`Editing from version ${copy.version + 1}`).waitFor();
    expect(await designer.getByLabel('Ambient temperature (°C)').inputValue()).toBe('55 °C');
    expect(await designer.getByLabel('Segment 3 Iload (A)').inputValue()).toBe('8.5 A');
  });

  it('shows the editor on a phone in one column of sections', async () => {
    // The same signed-in page at phone width (sign-ins are rate-limited).
    await designer.setViewportSize(PHONE);
    await designer.goto(`${baseUrl()}/studies/${copy.id}/edit`);
    await designer.getByRole('button', { name: 'Open all sections' }).click();
    await designer.getByTestId('live-verdict').getByTestId('study-verdict').waitFor();
    expect(await designer.getByTestId('live-results').count()).toBe(0);
    await screenshotWhole(designer, PHONE, 'editor');
    await designer.setViewportSize(DESKTOP);
  });

  it('edits a rail tap and an SOA value and sees the verdict and the SOA check follow the server’s solve', async () => {
    const demo = (await apiStudies(designer)).find((s) => LAB_SUPPLY.test(s.title));
    const lab = (await api<{ study: ApiStudy & { document: Record<string, unknown> } }>(designer, 'post', `/studies/${demo!.id}/duplicate`)).study;
    try {
      await designer.setViewportSize(DESKTOP);
      await designer.goto(`${baseUrl()}/studies/${lab.id}/edit`);
      const verdict = designer.getByTestId('study-verdict');
      await verdict.waitFor({ timeout: 60_000 });
      const first = await verdict.innerText();
      await screenshotWhole(designer, DESKTOP, 'editor-rails-soa');

      // The reference: the server solving the same edited document (POST /api/solve).
      type Plan = { taps: { circuit: Record<string, unknown> }[] };
      const doc = JSON.parse(JSON.stringify(lab.document)) as { railPlan: Plan; devices: { soa: Record<string, unknown> }[] };
      doc.railPlan.taps[1].circuit.diodeV = 2;
      const tapEdit = (await api<{ result: { worst: { marginToTargetK: number }; soaPasses: boolean } }>(designer, 'post', '/solve', { document: doc })).result;
      await designer.getByLabel('adapters in series diode drop (V)').fill('2 V');
      await designer.waitForFunction((text) => (document.querySelector('[data-testid="study-verdict"]') as HTMLElement | null)?.innerText !== text, first, { timeout: 60_000 });
      await designer.getByTestId('results-updating').waitFor({ state: 'detached', timeout: 60_000 });
      const afterTap = await verdict.innerText();
      // The verdict shows the margin to three significant digits.
      expect(Math.abs(Number(/Passes: ([\d.]+)\sK/.exec(afterTap)?.[1]) - tapEdit.worst.marginToTargetK)).toBeLessThan(0.1);

      doc.devices[0].soa.icMaxA = 1;
      const soaEdit = (await api<{ result: { soaPasses: boolean } }>(designer, 'post', '/solve', { document: doc })).result;
      expect(soaEdit.soaPasses).toBe(false);
      await designer.getByLabel('Q1 Ic,max (A)').fill('1 A');
      await designer.getByTestId('study-verdict').getByText('SOA check fails for Q1', { exact: false }).waitFor({ timeout: 60_000 });
      await designer.getByTestId('soa-device-Q1').waitFor();
      await screenshotWhole(designer, DESKTOP, 'editor-rails-soa-edited');

      await designer.setViewportSize(PHONE);
      await designer.goto(`${baseUrl()}/studies/${lab.id}/edit`);
      await designer.getByRole('button', { name: /^Rail plan/ }).click();
      await designer.getByRole('button', { name: /^Pass elements/ }).click();
      await designer.getByLabel('adapters in series diode drop (V)').waitFor();
      await screenshotWhole(designer, PHONE, 'editor-rails-soa');
      await designer.setViewportSize(DESKTOP);
    } finally {
      await api(designer, 'delete', `/studies/${lab.id}`).catch(() => undefined);
    }
  });

  it('gives a reviewer no Edit action', async () => {
    const session = await openBrowser(DESKTOP);
    sessions.push(session);
    const reviewer = session.page;
    await signIn(reviewer, 'reviewer@example.com');
    await reviewer.goto(`${baseUrl()}/studies/${copy.id}`);
    await reviewer.getByRole('heading', { name: 'Design inputs' }).waitFor();
    expect(await reviewer.getByRole('button', { name: 'Edit' }).count()).toBe(0);
  });
});
