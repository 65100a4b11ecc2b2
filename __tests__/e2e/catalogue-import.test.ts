import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';

import type { Locator, Page } from 'playwright-core';

import { apiStudies, baseUrl, DEMO_TITLE, screenshot, signIn } from './support/app';
import { DESKTOP, openBrowser, PHONE, type BrowserSession, type Viewport } from './support/browser';

type ApiHeatsink = { id: number; name: string; isDemo: boolean; rthKPerW: number; massKg: number | null; forcedAir: { airSpeedMPerS: number; rthKPerW: number }[] };

async function apiHeatsinks(page: Page): Promise<ApiHeatsink[]> {
  const response = await page.request.get(`${baseUrl()}/api/heatsinks`);
  if (!response.ok()) throw new Error(`GET /api/heatsinks answered ${response.status()}`);
  return ((await response.json()) as { items: ApiHeatsink[] }).items;
}

/** Opens the heatsink library the way a user does: the sidebar, or the Library tab on a phone. */
async function openLibrary(page: Page, viewport: Viewport): Promise<void> {
  await page.getByRole('link', { name: viewport.width < 1024 ? 'Library' : 'Heatsinks', exact: true }).first().click();
  await page.getByRole('heading', { name: 'Heatsinks', exact: true }).waitFor();
}

/** Scrolls the app's own scroll view so the element starts at the top of the window. */
async function scrollToTop(locator: Locator): Promise<void> {
  await locator.waitFor();
  await locator.evaluate((el) => el.scrollIntoView({ block: 'start' }));
}

const tmp = fs.mkdtempSync(path.join(os.tmpdir(), 'junctura-e2e-csv-'));
afterAll(() => fs.rmSync(tmp, { recursive: true, force: true }));

/** A vendor-style table (invented): units in the headers, one forced-air column as our export names it. */
function vendorCsv(tag: string, secondRth: string): string {
  const file = path.join(tmp, `vendor-${tag}-${secondRth.replace(/\W/g, '')}.csv`);
  fs.writeFileSync(
    file,
    [
      'Part,Rth (K/W),Mass (g),Width (mm),Length (mm),Height (mm),rth_k_per_w_at_2_m_s',
      `E2E-${tag}-A,1.2,150,50,75,25,0.6`,
      `E2E-${tag}-B,${secondRth},200,60,80,30,`,
      `E2E-${tag}-C,0.9,180,55,70,28,0.45`,
    ].join('\n'),
  );
  return file;
}

describe('heatsink catalogue in the browser', () => {
  let browser: BrowserSession;

  beforeAll(async () => {
    browser = await openBrowser(DESKTOP);
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('lists the invented demo catalogue, every sink labelled demo', async () => {
    const { page } = browser;
    await signIn(page, 'designer@example.com');
    await openLibrary(page, DESKTOP);

    // The server is the reference: the seed holds 40 invented sinks, all flagged as demo data.
    const demo = (await apiHeatsinks(page)).filter((h) => h.isDemo);
    expect(demo).toHaveLength(40);
    const table = page.getByRole('table', { name: 'Heatsinks' });
    for (const sink of demo) await table.getByText(sink.name, { exact: true }).waitFor();
    expect(await table.getByText('Demo', { exact: true }).count()).toBe(40);
    expect(demo.every((h) => /\(demo\)/.test(h.name))).toBe(true);
  });

  it('refuses a file with a bad row, shows the row and saves nothing, then imports the fixed file', async () => {
    const { page } = browser;
    const tag = String(Date.now());
    const before = (await apiHeatsinks(page)).length;
    await page.getByRole('button', { name: 'Import CSV' }).click();
    await page.getByRole('heading', { name: 'Import heatsinks' }).waitFor();

    await page.locator('input[type=file]').first().setInputFiles(vendorCsv(tag, 'abc'));
    await page.getByRole('heading', { name: '3. Columns' }).waitFor();
    // The suggestion read the units from the headers: Rθsa from "Rth (K/W)", mass in grams.
    expect(await page.getByLabel('Column for Rθsa').inputValue()).toBe('Rth (K/W)');
    expect(await page.getByLabel('Column for Mass').inputValue()).toBe('Mass (g)');
    expect(await page.getByLabel('Forced-air column 1', { exact: true }).inputValue()).toBe('rth_k_per_w_at_2_m_s');

    await page.getByRole('button', { name: 'Import 3 rows' }).click();
    await page.getByText('Nothing was saved.').waitFor();
    const problems = page.getByRole('table', { name: 'Problems in the file' });
    // Row 3 of the file (the header is row 1) holds "abc" in the Rθsa column.
    const row = problems.getByRole('row').nth(1);
    expect(await row.getByRole('cell').allInnerTexts()).toEqual(['3', 'Rth (K/W)', expect.stringContaining('abc')]);
    expect(await problems.getByRole('row').count()).toBe(2);
    expect(await apiHeatsinks(page)).toHaveLength(before);

    await page.locator('input[type=file]').first().setInputFiles(vendorCsv(tag, '1.1'));
    await page.getByText(`E2E-${tag}-B`).waitFor();
    await page.getByRole('button', { name: 'Import 3 rows' }).click();
    await page.getByText(/^Imported 3 heatsinks into /).waitFor();

    const after = await apiHeatsinks(page);
    expect(after).toHaveLength(before + 3);
    const second = after.find((h) => h.name === `E2E-${tag}-B`);
    // 200 g = 0.2 kg (1 kg = 1000 g); the empty forced-air cell leaves no point.
    expect(second).toMatchObject({ rthKPerW: 1.1, massKg: 0.2, forcedAir: [] });
    expect(after.find((h) => h.name === `E2E-${tag}-A`)?.forcedAir).toEqual([{ airSpeedMPerS: 2, rthKPerW: 0.6 }]);
  });
});

describe.each([
  { viewport: PHONE, name: 'phone' },
  { viewport: DESKTOP, name: 'wide' },
])('catalogue and results screenshots at $viewport.width x $viewport.height', ({ viewport }) => {
  let browser: BrowserSession;

  beforeAll(async () => {
    browser = await openBrowser(viewport);
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('shows a demo study with its verdict and curves, the heatsink library and the import mapping step', async () => {
    const { page } = browser;
    await signIn(page, 'designer@example.com');

    const study = (await apiStudies(page)).find((s) => DEMO_TITLE.test(s.title) && /bench/i.test(s.title));
    if (!study) throw new Error('the seeded bench-load demo study is missing');
    await page.goto(`${baseUrl()}/studies/${study.id}`);
    const verdict = page.getByTestId('study-verdict');
    await verdict.waitFor();
    expect(await verdict.innerText()).toMatch(/^(Passes|Fails): /);
    await page.getByRole('img', { name: /^Heat curves: / }).waitFor();
    await scrollToTop(page.getByRole('heading', { name: 'Results' }));
    await screenshot(page, viewport, 'study-results');

    await openLibrary(page, viewport);
    await page.getByText('Demo', { exact: true }).first().waitFor();
    await screenshot(page, viewport, 'heatsinks');

    // The seeded demo sinks give no exponent: each shows the laminar default, n = 1/4.
    const first = (await apiHeatsinks(page)).find((h) => h.isDemo)!;
    await page.goto(`${baseUrl()}/heatsinks/${first.id}`);
    await page.getByText('Convection exponent n', { exact: true }).waitFor();
    expect(await page.getByText('1/4 (default)', { exact: true }).count()).toBe(1);
    await screenshot(page, viewport, 'heatsink-detail');
    await page.goto(`${baseUrl()}/heatsinks/${first.id}/edit`);
    await page.getByRole('button', { name: 'Fit n from a second still-air rating' }).click();
    await page.getByLabel('Rθsa of the second rating, K/W').fill(String(first.rthKPerW * 1.2));
    await page.getByLabel('Rise of the second rating, K').fill('37.5');
    await page.getByRole('button', { name: /^Use n = / }).waitFor();
    await scrollToTop(page.getByText('Thermal', { exact: true }));
    await screenshot(page, viewport, 'heatsink-form-exponent');

    await page.goto(`${baseUrl()}/heatsinks/import`);
    await page.locator('input[type=file]').first().setInputFiles(vendorCsv(`shot${viewport.width}`, '1.1'));
    await scrollToTop(page.getByRole('heading', { name: '3. Columns' }));
    await screenshot(page, viewport, 'heatsink-import-mapping');
  });
});
