import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';

import type { Page } from 'playwright-core';

import { apiStudies, baseUrl, screenshot, signIn } from './support/app';
import { DESKTOP, openBrowser, PHONE, type BrowserSession, type Viewport } from './support/browser';

const ARTIFACTS = path.resolve(__dirname, '..', '..', 'artifacts');

/** The app scrolls inside its own view: grow the window to the content for a whole-page shot. */
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
  await page.setViewportSize({ width: viewport.width, height: Math.min(Math.ceil(height), 12000) });
  await screenshot(page, viewport, name);
  await page.setViewportSize(viewport);
}

/** Pages of a PDF file: its page objects ("/Type /Page", not the "/Pages" tree), PDF 1.7 §7.7.3.3. */
function pdfPageCount(file: string): number {
  const text = fs.readFileSync(file).toString('latin1');
  return (text.match(/\/Type\s*\/Page(?![a-z])/g) ?? []).length;
}

async function openReport(page: Page, studyId: number): Promise<void> {
  await page.goto(`${baseUrl()}/studies/${studyId}/report`);
  await page.getByTestId('report-header').waitFor();
  // The report solves the study in the browser; the verdict appears once it has.
  await page.getByTestId('report-section-results').getByTestId('study-verdict').waitFor({ timeout: 60_000 });
  await page.getByTestId('report-section-comments').getByText(/No comments|Pinned|revision \d/).first().waitFor();
}

// Product requirement (PRODUCT.md §9 Report; docs/study-format.md): a study exported as a file
// and imported back is the same study; its report is printable with inputs, results and cautions.
describe('study file round trip and report', () => {
  let desktop: BrowserSession;
  let phone: BrowserSession;
  const downloads = fs.mkdtempSync(path.join(os.tmpdir(), 'junctura-e2e-downloads-'));
  let importedId = 0;

  beforeAll(async () => {
    desktop = await openBrowser(DESKTOP);
    phone = await openBrowser(PHONE);
  });
  afterAll(async () => {
    // The copy carries the demo study's title: other tests count the demo studies.
    if (importedId > 0) await desktop?.page.request.delete(`${baseUrl()}/api/studies/${importedId}`);
    await desktop?.close();
    await phone?.close();
    fs.rmSync(downloads, { recursive: true, force: true });
  });

  it('downloads a demo study as a file and imports it back as a new study', async () => {
    const { page } = desktop;
    await signIn(page, 'designer@example.com');
    const demo = (await apiStudies(page)).find((study) => /Laboratory supply/.test(study.title));
    if (!demo) throw new Error('the demo laboratory supply study is missing');
    const stored = (await (await page.request.get(`${baseUrl()}/api/studies/${demo.id}`)).json()) as { study: { document: Record<string, unknown> } };

    await page.goto(`${baseUrl()}/studies/${demo.id}`);
    const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Download study file' }).click()]);
    const file = path.join(downloads, download.suggestedFilename());
    await download.saveAs(file);
    expect(download.suggestedFilename()).toMatch(/^laboratory-supply.*\.json$/);
    const saved = JSON.parse(fs.readFileSync(file, 'utf8')) as Record<string, unknown>;
    // The file is the saved document under the study's own title (docs/study-format.md).
    expect(saved).toEqual({ ...stored.study.document, title: demo.title, description: saved.description });
    expect(saved).toMatchObject({ format: 'junctura-study', version: 1 });

    await page.getByRole('link', { name: 'Studies' }).first().click();
    const [chooser] = await Promise.all([page.waitForEvent('filechooser'), page.getByRole('button', { name: 'Import study file' }).click()]);
    await chooser.setFiles(file);
    const preview = page.getByTestId('import-study-preview');
    await preview.getByText(demo.title, { exact: true }).waitFor();
    await page.getByRole('button', { name: 'Create study from file' }).click();

    await page.waitForURL((url) => /^\/studies\/\d+$/.test(url.pathname) && url.pathname !== `/studies/${demo.id}`);
    importedId = Number(new URL(page.url()).pathname.split('/').pop());
    await page.getByRole('heading', { name: demo.title }).waitFor();
    // The server is the reference: a new draft by this designer holding the file's document.
    const imported = (await (await page.request.get(`${baseUrl()}/api/studies/${importedId}`)).json()) as {
      study: { status: string; author: { name: string }; document: unknown };
    };
    expect(imported.study.status).toBe('draft');
    expect(imported.study.document).toEqual(saved);
  });

  it('has its first revision approved, a pinned comment, then a newer draft (through the API)', async () => {
    const { page } = desktop;
    const api = `${baseUrl()}/api/studies/${importedId}`;
    expect((await page.request.post(`${api}/comments`, { data: { body: 'Sink peak near the end of the 30 V step.', anchor: { kind: 'time', timeS: 1890 } } })).status()).toBe(201);
    expect((await page.request.post(`${api}/submit`)).ok()).toBe(true);

    await signIn(phone.page, 'reviewer@example.com');
    const review = await phone.page.request.post(`${api}/review`, { data: { decision: 'approved', revision: 1 } });
    expect(review.ok()).toBe(true);

    const { study } = (await (await page.request.get(api)).json()) as { study: { version: number; description: string } };
    const saved = await page.request.put(api, { data: { baseVersion: study.version, description: `${study.description} Checked again.` } });
    expect(saved.ok()).toBe(true);
  });

  it('opens the imported study\'s report with its inputs, results and cautions, and prints it to PDF', async () => {
    const { page } = desktop;
    const reviewer = ((await (await phone.page.request.get(`${baseUrl()}/api/session`)).json()) as { user: { name: string } }).user.name;
    await page.goto(`${baseUrl()}/studies/${importedId}`);
    await page.getByRole('button', { name: 'Report' }).click();
    await page.waitForURL((url) => url.pathname === `/studies/${importedId}/report`);
    await openReport(page, importedId);

    const inputs = page.getByTestId('report-section-inputs');
    await inputs.getByRole('table', { name: 'Pass devices' }).waitFor();
    await inputs.getByRole('table', { name: 'Sources' }).waitFor();
    expect(await inputs.getByRole('table', { name: 'Profile segments' }).getByRole('row').count()).toBeGreaterThan(1);
    const results = page.getByTestId('report-section-results');
    await results.getByRole('table', { name: 'Devices' }).waitFor();
    await results.getByText('Rail plan', { exact: true }).waitFor();
    await results.getByTestId('report-soa-chart-Q1').getByRole('img').waitFor();
    const approval = page.getByTestId('report-approval');
    expect(await approval.getByRole('heading').textContent()).toMatch(new RegExp(`^Revision 1 approved by ${reviewer.replace(/[()]/g, '\\$&')} on \\d`));
    expect(await page.getByTestId('report-not-approved').textContent()).toMatch(/^Not approved: Revision 2, shown in this report, is not the approved revision/);
    await page.getByTestId('report-section-comments').getByText('Pinned at 31.5 min').waitFor();
    await page.getByTestId('report-section-cautions').getByText(/JEDEC JESD51-1/).waitFor();
    await page.getByTestId('report-section-cautions').getByText(/IEC 62368-1/).waitFor();

    await screenshotWhole(page, DESKTOP, 'report');

    fs.mkdirSync(ARTIFACTS, { recursive: true });
    const pdf = path.join(ARTIFACTS, 'report.pdf');
    await page.emulateMedia({ media: 'print' });
    await page.pdf({ path: pdf, format: 'A4', printBackground: true });
    await page.emulateMedia({ media: 'screen' });
    expect(fs.readFileSync(pdf).subarray(0, 5).toString('latin1')).toBe('%PDF-');
    // Each section starts a page (the print rules): header and approval, inputs, assumptions, results, cautions, comments.
    expect(pdfPageCount(pdf)).toBeGreaterThanOrEqual(6);
  });

  it('reads on a phone, for the reviewer', async () => {
    const { page } = phone;
    await openReport(page, importedId);
    await page.getByTestId('report-section-inputs').getByRole('list', { name: 'Pass devices' }).waitFor();
    await screenshotWhole(page, PHONE, 'report');
  });
});
