import fs from 'node:fs';
import path from 'node:path';
import type { Page } from 'playwright-core';

import type { ToleranceResult } from '@/core/tolerance';
import { headline } from '@/features/tolerance/tolerance-text';

import { apiStudies, baseUrl, signIn } from './support/app';
import { DESKTOP, openBrowser, PHONE, type BrowserSession, type Viewport } from './support/browser';

const BENCH_LOAD = /bench electronic load/i;
const SCREENSHOT_DIR = path.resolve(__dirname, '..', '..', 'artifacts', 'screenshots');

async function openBenchLoad(page: Page): Promise<number> {
  const study = (await apiStudies(page)).find((s) => BENCH_LOAD.test(s.title));
  if (!study) throw new Error('the seeded bench electronic-load demo study is missing');
  await page.goto(`${baseUrl()}/studies/${study.id}`);
  return study.id;
}

/** Runs a small Monte Carlo sweep in the panel and checks it against the server's answer for the same request. */
async function sweep(page: Page, viewport: Viewport, name: string): Promise<void> {
  const id = await openBenchLoad(page);
  const panel = page.getByTestId('tolerance-panel');
  await panel.waitFor({ timeout: 60_000 });
  await panel.getByLabel('Runs (count)').fill('120');
  await panel.getByLabel('Seed (whole number)').fill('5');
  await panel.getByRole('button', { name: 'Run sweep' }).click();
  const answer = panel.getByTestId('tolerance-answer');
  await answer.waitFor({ timeout: 90_000 });

  // The server's pool is the reference: the same spreads and seed give the same runs.
  const body = {
    mode: 'monte-carlo',
    rthJcPct: 10,
    rthSaPct: 15,
    interfacePct: 20,
    ambientLowK: -5,
    ambientHighK: 10,
    linePct: 10,
    loadPct: 5,
    sharePct: 10,
    runs: 120,
    seed: 5,
    distributions: { rthJc: 'normal', rthSa: 'normal', interface: 'normal', share: 'normal', ambient: 'uniform', line: 'uniform', load: 'uniform' },
  };
  const response = await page.request.post(`${baseUrl()}/api/studies/${id}/tolerance`, { data: body, headers: { Origin: baseUrl() } });
  expect(response.status()).toBe(200);
  const reference = ((await response.json()) as { result: ToleranceResult }).result;
  expect(await answer.getByText(headline(reference), { exact: true }).count()).toBe(1);
  // The sweep ran in this browser's Web Worker, not on the server.
  expect(await answer.getByText(/^120 runs, seed 5, solved in this browser in/).count()).toBe(1);
  await page.getByRole('img', { name: /^Histogram of the peak junction temperature of Q\d over 120 runs/ }).waitFor();
  expect(await answer.getByRole('list', { name: 'Inputs by their pull on the peak' }).getByRole('listitem').count()).toBe(reference.inputs.length);

  // The panel sits in the app's own scroll view: a tall window shows all of it at once.
  fs.mkdirSync(SCREENSHOT_DIR, { recursive: true });
  await page.setViewportSize({ width: viewport.width, height: 3200 });
  await answer.evaluate((el) => el.scrollIntoView({ block: 'start' }));
  await page.mouse.move(0, 0);
  await answer.screenshot({ path: path.join(SCREENSHOT_DIR, `${viewport.width}x${viewport.height}-${name}.png`) });
}

// Product requirement (PRODUCT.md item 10: tolerance / worst-case sweep).
describe('tolerance sweep in the browser', () => {
  let browser: BrowserSession | undefined;

  afterEach(async () => {
    await browser?.close();
    browser = undefined;
  });

  it('runs a Monte Carlo sweep of the bench load on a desktop window', async () => {
    browser = await openBrowser(DESKTOP);
    await signIn(browser.page, 'reviewer@example.com');
    await sweep(browser.page, DESKTOP, 'tolerance-answer');
  });

  it('runs the same sweep on a phone', async () => {
    browser = await openBrowser(PHONE);
    await signIn(browser.page, 'designer@example.com');
    await sweep(browser.page, PHONE, 'tolerance-answer');
  });
});
