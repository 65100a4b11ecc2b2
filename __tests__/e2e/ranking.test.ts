import type { Locator, Page } from 'playwright-core';

import { plateFinCandidate } from '@/core/heatsink';

import { apiStudies, baseUrl, screenshot, signIn } from './support/app';
import { DESKTOP, openBrowser, PHONE, type BrowserSession, type Viewport } from './support/browser';

const LAB_SUPPLY = /laboratory supply/i;
const ONBOARD = /on-board 24 V to 5 V/i;

type RankedSink = { id: string; name: string };
type ApiHeatsink = { id: number; name: string; rthKPerW: number; referenceRiseK: number; forcedAir: { airSpeedMPerS: number; rthKPerW: number }[]; notes: string };

async function apiGet<T>(page: Page, path: string): Promise<T> {
  const response = await page.request.get(`${baseUrl()}/api${path}`);
  if (!response.ok()) throw new Error(`GET /api${path} answered ${response.status()}`);
  return (await response.json()) as T;
}

/** Scrolls the app's own scroll view so the element starts at the top of the window. */
async function scrollToTop(locator: Locator): Promise<void> {
  await locator.waitFor();
  await locator.evaluate((el) => el.scrollIntoView({ block: 'start' }));
}

async function openLabSupply(page: Page): Promise<number> {
  const study = (await apiStudies(page)).find((s) => LAB_SUPPLY.test(s.title));
  if (!study) throw new Error('the seeded lab-supply demo study is missing');
  await page.goto(`${baseUrl()}/studies/${study.id}`);
  return study.id;
}

// Product requirement (PRODUCT.md items 4–6 and the heatsink-ranking endpoint of the team-work API).
describe('rail plan, SOA and heatsink ranking in the browser', () => {
  let browser: BrowserSession;

  beforeAll(async () => {
    browser = await openBrowser(DESKTOP);
    await signIn(browser.page, 'designer@example.com');
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('shows the lab supply’s dissipation map and SOA, and ranks the demo catalogue to the smallest passing sink', async () => {
    const { page } = browser;
    const id = await openLabSupply(page);
    await page.getByRole('img', { name: /^Dissipation of Q1 over output voltage and current, 2 taps/ }).waitFor({ timeout: 60_000 });
    await page.getByRole('img', { name: /^Safe operating area of Q1/ }).waitFor();
    expect(await page.getByTestId('soa-worst-Q1').innerText()).toMatch(/^Q1: worst point .+\s%\sof the allowed current, limited by .+ at Tc = /);

    // The server is the reference: its own ranking of the demo catalogue by mass in still air.
    const reference = await apiGet<{ result: { smallest: RankedSink | null; passing: RankedSink[] } }>(page, `/studies/${id}/ranking?sink=HS1&sort=mass&airSpeed=0`);
    const smallest = reference.result.smallest;
    if (!smallest) throw new Error('the demo catalogue has no passing sink for the lab supply');
    const table = page.getByRole('table', { name: 'Passing heatsinks' });
    await table.waitFor({ timeout: 60_000 });
    const highlighted = page.getByTestId(`ranked-${smallest.id}`);
    expect(await highlighted.getByText('Smallest passing').count()).toBe(1);
    expect(await highlighted.getByRole('link').innerText()).toBe(smallest.name);
    expect(await table.getByRole('row').count()).toBe(reference.result.passing.length + 1);

    // Ranked by price instead, the highlight moves to the server's cheapest passing sink.
    await page.getByRole('radio', { name: 'Price' }).click();
    const byPrice = await apiGet<{ result: { smallest: RankedSink | null } }>(page, `/studies/${id}/ranking?sink=HS1&sort=price&airSpeed=0`);
    await page.getByText(/^Smallest passing sink by price: /).waitFor({ timeout: 60_000 });
    expect(await page.getByTestId(`ranked-${byPrice.result.smallest!.id}`).getByText('Smallest passing').count()).toBe(1);

    // Each row opens the sink's catalogue page.
    await page.getByTestId(`ranked-${byPrice.result.smallest!.id}`).getByRole('link').click();
    await page.getByRole('heading', { name: byPrice.result.smallest!.name, exact: true }).waitFor();
  });

  it('ranks the on-board demo, whose copper pour sheds into the enclosure air, to the server’s smallest passing sink', async () => {
    const { page } = browser;
    const study = (await apiStudies(page)).find((s) => ONBOARD.test(s.title));
    if (!study) throw new Error('the seeded on-board demo study is missing');
    // The server is the reference: its own ranking of the demo catalogue in the pour's slot.
    const reference = await apiGet<{ result: { smallest: RankedSink | null; enclosure?: { rthKPerW: number } } }>(page, `/studies/${study.id}/ranking?sink=PCB&sort=mass&airSpeed=0`);
    expect(reference.result.enclosure).toBeDefined();
    await page.goto(`${baseUrl()}/studies/${study.id}`);
    await page.getByTestId('ranking-answer').waitFor({ timeout: 60_000 });
    expect(await page.getByTestId('ranking-enclosure').innerText()).toMatch(/^The sink sheds into the enclosure air, simulated with it: 3\.9\sK\/W to the room, 90\sJ\/K of air and walls\. Each sink’s mean rise is its rise above that air\.$/);
    const smallest = reference.result.smallest;
    if (smallest) {
      expect(await page.getByTestId(`ranked-${smallest.id}`).getByText('Smallest passing').count()).toBe(1);
    } else {
      expect(await page.getByTestId('ranking-answer').innerText()).toMatch(/^No (sink|candidate)/);
    }
  });

  it('designs a custom extrusion and saves it to the catalogue', async () => {
    const { page } = browser;
    await page.goto(`${baseUrl()}/heatsinks`);
    await page.getByRole('button', { name: 'Design from geometry' }).click();
    await page.getByRole('heading', { name: 'Design from geometry' }).waitFor();
    await page.getByRole('textbox', { name: 'Fin count' }).fill('12');
    const name = `E2E extrusion ${Date.now()} (estimate)`;
    await page.getByLabel('Name', { exact: true }).fill(name);
    await page.getByRole('button', { name: 'Save to catalogue' }).click();
    await page.getByRole('heading', { name, exact: true }).waitFor();

    // The saved rating is the core's for the same geometry: 100 × 75 mm base 5 mm thick, 12 fins 25 × 2 mm, ε 0.85.
    const { candidate } = plateFinCandidate(
      { baseWidthM: 0.1, lengthM: 0.075, baseThicknessM: 0.005, finCount: 12, finHeightM: 0.025, finThicknessM: 0.002, material: 'aluminium', emissivity: 0.85 },
      { id: 'x', referenceRiseK: 50, airSpeedsMPerS: [1, 2, 4], ambientC: 25 },
    );
    const saved = (await apiGet<{ items: ApiHeatsink[] }>(page, '/heatsinks')).items.find((h) => h.name === name);
    expect(saved).toBeDefined();
    expect(saved!.referenceRiseK).toBe(50);
    expect(saved!.rthKPerW).toBeCloseTo(candidate.natural!.rthKPerW, 9);
    expect(saved!.forcedAir.map((p) => p.airSpeedMPerS)).toEqual([1, 2, 4]);
    expect(saved!.notes).toMatch(/^Estimate from geometry, not a measurement/);
    await page.getByText(/Estimate from geometry, not a measurement/).first().waitFor();
  });
});

describe.each([
  { viewport: PHONE, name: 'phone' },
  { viewport: DESKTOP, name: 'wide' },
])('rail map, SOA, ranking and geometry screenshots at $viewport.width x $viewport.height', ({ viewport }: { viewport: Viewport }) => {
  let browser: BrowserSession;

  beforeAll(async () => {
    browser = await openBrowser(viewport);
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('shows each panel in the layout for this width', async () => {
    const { page } = browser;
    await signIn(page, 'designer@example.com');
    // The bench load shows the SOA panel at its fullest: two MOSFETs and their linear-mode warning.
    const bench = (await apiStudies(page)).find((s) => /bench electronic load/i.test(s.title));
    await page.goto(`${baseUrl()}/studies/${bench!.id}`);
    await page.getByRole('img', { name: /^Safe operating area of Q2/ }).waitFor({ timeout: 60_000 });
    await scrollToTop(page.getByRole('heading', { name: 'Safe operating area' }));
    await screenshot(page, viewport, 'soa-panel');

    await openLabSupply(page);
    await page.getByRole('img', { name: /^Dissipation of Q1/ }).waitFor({ timeout: 60_000 });
    await scrollToTop(page.getByRole('heading', { name: 'Rail plan' }));
    await screenshot(page, viewport, 'rail-map');
    await page.getByTestId('ranking-answer').waitFor({ timeout: 60_000 });
    await scrollToTop(page.getByTestId('ranking-panel'));
    await screenshot(page, viewport, 'ranking-panel');

    // The on-board demo: a copper pour that sheds into the air of a closed housing.
    const onboard = (await apiStudies(page)).find((s) => ONBOARD.test(s.title));
    await page.goto(`${baseUrl()}/studies/${onboard!.id}`);
    await page.getByTestId('ranking-answer').waitFor({ timeout: 60_000 });
    await scrollToTop(page.getByTestId('ranking-panel'));
    await screenshot(page, viewport, 'ranking-panel-enclosure');

    await page.goto(`${baseUrl()}/heatsinks/design`);
    await page.getByTestId('plate-fin-estimate').waitFor();
    await screenshot(page, viewport, 'sink-design');
    if (viewport.width < 1024) {
      // On a phone the estimate sits under the form.
      await scrollToTop(page.getByText('Estimate', { exact: true }));
      await screenshot(page, viewport, 'sink-design-estimate');
    }
  });
});
