import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';

import type { Locator, Page } from 'playwright-core';

import { baseUrl, screenshot, signIn } from './support/app';
import { DESKTOP, openBrowser, PHONE, type BrowserSession, type Viewport } from './support/browser';

type ApiPart = {
  id: number;
  name: string;
  kind: string;
  isDemo: boolean;
  thermal: { kind: string; terms?: { rKPerW: number; tauS: number }[] };
  zthPoints: { timeS: number; zthKPerW: number }[] | null;
  zthFit: { rmsRelativeError: number } | null;
};

async function apiParts(page: Page): Promise<ApiPart[]> {
  const response = await page.request.get(`${baseUrl()}/api/parts`);
  if (!response.ok()) throw new Error(`GET /api/parts answered ${response.status()}`);
  return ((await response.json()) as { items: ApiPart[] }).items;
}

/** Opens the parts library the way a user does: the sidebar, or the Parts tab on a phone. */
async function openLibrary(page: Page): Promise<void> {
  await page.getByRole('link', { name: 'Parts', exact: true }).first().click();
  await page.getByRole('heading', { name: 'Parts', exact: true }).waitFor();
}

/** Scrolls the app's own scroll view so the element starts at the top of the window. */
async function scrollToTop(locator: Locator): Promise<void> {
  await locator.waitFor();
  await locator.evaluate((el) => el.scrollIntoView({ block: 'start' }));
}

// Invented package: three Foster terms, Σ R = 0.8 K/W.
const TERMS = [
  { rKPerW: 0.1, tauS: 0.0005 },
  { rKPerW: 0.3, tauS: 0.01 },
  { rKPerW: 0.4, tauS: 0.2 },
];
const R_TOTAL = 0.8;

const tmp = fs.mkdtempSync(path.join(os.tmpdir(), 'junctura-e2e-zth-'));
afterAll(() => fs.rmSync(tmp, { recursive: true, force: true }));

/**
 * A datasheet-style Zth curve of the invented package, Zth(t) = Σ R (1 − e^(−t/τ)) (PHYSICS.md
 * §3), in ms and °C/W as datasheets print them, from 50 µs to 5 s (25 τ of the slowest term).
 */
function zthCsv(tag: string): { file: string; rows: number } {
  const times = Array.from({ length: 21 }, (_, i) => 5e-5 * 10 ** (i / 4));
  const lines = times.map((t) => `${(t * 1000).toPrecision(4)},${TERMS.reduce((z, x) => z + x.rKPerW * (1 - Math.exp(-t / x.tauS)), 0).toPrecision(4)}`);
  const file = path.join(tmp, `zth-${tag}.csv`);
  fs.writeFileSync(file, ['t (ms),Zth (°C/W)', ...lines].join('\n'));
  return { file, rows: lines.length };
}

describe('parts library in the browser', () => {
  let browser: BrowserSession;

  beforeAll(async () => {
    browser = await openBrowser(DESKTOP);
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('lists the six invented demo parts, each labelled demo', async () => {
    const { page } = browser;
    await signIn(page, 'designer@example.com');
    await openLibrary(page);

    // The server is the reference: the seed holds 6 invented parts, all flagged as demo data.
    const demo = (await apiParts(page)).filter((p) => p.isDemo);
    expect(demo).toHaveLength(6);
    expect(demo.every((p) => /\(demo\)/.test(p.name))).toBe(true);
    const table = page.getByRole('table', { name: 'Parts' });
    for (const part of demo) await table.getByText(part.name, { exact: true }).waitFor();
    expect(await table.getByText('Demo', { exact: true }).count()).toBe(6);
  });

  it('opens the switching MOSFET and shows its SOA chart at 25 °C and derated', async () => {
    const { page } = browser;
    const mosfet = (await apiParts(page)).find((p) => p.kind === 'mosfet' && /switching/i.test(p.name));
    if (!mosfet) throw new Error('the seeded switching MOSFET is missing');
    await page.getByRole('link', { name: mosfet.name, exact: true }).click();
    await page.getByRole('heading', { name: mosfet.name }).waitFor();
    const chart = page.getByRole('img', { name: /^Safe operating area, Ic against Vce: DC, 25 °C case; DC, 100 °C case; 1 ms pulse, 25 °C case/ });
    await chart.waitFor();
    // Every boundary segment carries the name of its limit; the DC line of this part ends at its voltage limit.
    expect(await chart.locator('text', { hasText: 'voltage' }).count()).toBeGreaterThan(0);
    expect(await page.getByText('not rated in linear mode', { exact: false }).count()).toBeGreaterThan(0);
  });

  it('creates a part from a fitted Zth CSV, saves it and finds it in the list', async () => {
    const { page } = browser;
    const tag = String(Date.now());
    const name = `E2E fitted part ${tag}`;
    const csv = zthCsv(tag);
    await openLibrary(page);
    await page.getByRole('button', { name: 'New part' }).click();
    await page.getByRole('heading', { name: 'New part' }).waitFor();
    await page.getByLabel('Name', { exact: true }).fill(name);

    await page.locator('input[type=file][aria-label="Fit Zth from CSV"]').setInputFiles(csv.file);
    const residual = page.getByTestId('zth-fit-residual');
    await residual.waitFor();
    expect(await residual.innerText()).toMatch(/^Residual: rms [\d.]+[\s\u00a0]%, largest [\d.]+[\s\u00a0]% at /);
    await page.getByRole('button', { name: 'Use these terms' }).click();
    await page.getByRole('button', { name: 'Add part' }).click();
    await page.getByRole('heading', { name }).waitFor();

    const saved = (await apiParts(page)).find((p) => p.name === name);
    expect(saved?.thermal.kind).toBe('foster');
    expect(saved?.zthPoints).toHaveLength(csv.rows);
    // Zth(∞) = Σ R (PHYSICS.md §3): the points reach 25 τ of the slowest term, so the fitted sum matches 0.8 K/W.
    const sum = (saved?.thermal.terms ?? []).reduce((s, t) => s + t.rKPerW, 0);
    expect(Math.abs(sum - R_TOTAL) / R_TOTAL).toBeLessThan(0.02);
    expect(saved?.zthFit?.rmsRelativeError).toBeLessThan(0.02);

    await openLibrary(page);
    await page.getByRole('table', { name: 'Parts' }).getByText(name, { exact: true }).waitFor();
  });
});

describe.each([
  { viewport: PHONE, name: 'phone' },
  { viewport: DESKTOP, name: 'wide' },
])('parts screenshots at $viewport.width x $viewport.height', ({ viewport }: { viewport: Viewport }) => {
  let browser: BrowserSession;

  beforeAll(async () => {
    browser = await openBrowser(viewport);
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('shows the library, a part with its Zth and SOA charts, and the Zth fit step', async () => {
    const { page } = browser;
    await signIn(page, 'designer@example.com');
    await openLibrary(page);
    await page.getByText('Demo', { exact: true }).first().waitFor();
    await screenshot(page, viewport, 'parts');

    const part = (await apiParts(page)).find((p) => /QN-150/.test(p.name));
    if (!part) throw new Error('the seeded bipolar part is missing');
    await page.goto(`${baseUrl()}/parts/${part.id}`);
    await page.getByRole('img', { name: /^Zth\(t\) of the / }).waitFor();
    await scrollToTop(page.getByRole('heading', { name: 'Thermal model, junction to case' }));
    await screenshot(page, viewport, 'part-thermal');
    await page.getByRole('img', { name: /^Safe operating area/ }).waitFor();
    await scrollToTop(page.getByRole('heading', { name: 'Safe operating area' }));
    await screenshot(page, viewport, 'part-soa');

    await page.goto(`${baseUrl()}/parts/new`);
    await page.getByRole('heading', { name: 'New part' }).waitFor();
    await page.locator('input[type=file][aria-label="Fit Zth from CSV"]').setInputFiles(zthCsv(`shot${viewport.width}`).file);
    await scrollToTop(page.getByTestId('zth-fit-panel'));
    await page.getByTestId('zth-fit-residual').waitFor();
    await screenshot(page, viewport, 'part-zth-fit');
  });
});
