import fs from 'node:fs';

import { apiStudies, baseUrl, DEMO_TITLE, screenshot, signIn, waitForStudies } from './support/app';
import { DESKTOP, openBrowser, PHONE, type BrowserSession } from './support/browser';

const PNG_SIGNATURE = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);

/** A PNG file starts with its 8-byte signature (ISO/IEC 15948, section 5.2). */
function expectPng(file: string): void {
  const head = fs.readFileSync(file).subarray(0, 8);
  expect(head.equals(PNG_SIGNATURE)).toBe(true);
}

describe.each([
  { viewport: PHONE, layout: 'phone' },
  { viewport: DESKTOP, layout: 'wide' },
])('screens at $viewport.width x $viewport.height', ({ viewport, layout }) => {
  let browser: BrowserSession;

  beforeAll(async () => {
    browser = await openBrowser(viewport);
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('shows sign-in, the studies list and a study in the layout for this width', async () => {
    const { page } = browser;
    await page.goto(`${baseUrl()}/sign-in`);
    await page.getByRole('button', { name: 'Sign in', exact: true }).waitFor();
    expectPng(await screenshot(page, viewport, 'sign-in'));

    await signIn(page, 'designer@example.com');
    const demo = (await apiStudies(page)).filter((study) => DEMO_TITLE.test(study.title));
    await waitForStudies(
      page,
      demo.map((study) => study.title),
    );
    // Wide windows get the sortable table and a sidebar; phones get cards and a bottom bar.
    expect(await page.getByRole('table', { name: 'Studies' }).count()).toBe(layout === 'wide' ? 1 : 0);
    expect(await page.getByRole('columnheader').count()).toBe(layout === 'wide' ? 4 : 0);
    expect(await page.getByRole('navigation', { name: 'Workspace' }).count()).toBe(1);
    expectPng(await screenshot(page, viewport, 'studies'));

    await page.getByText(demo[0].title, { exact: true }).first().click();
    await page.getByRole('heading', { name: 'Design inputs' }).waitFor();
    expect(new URL(page.url()).pathname).toBe(`/studies/${demo[0].id}`);
    expect(await page.getByText(/Results are estimates from datasheet values/).count()).toBe(1);
    expectPng(await screenshot(page, viewport, 'study'));
  });

  it('shows the life, touch and site panel of the on-board regulator demo', async () => {
    const { page } = browser;
    const onboard = (await apiStudies(page)).find((study) => /24 V/.test(study.title) && DEMO_TITLE.test(study.title));
    expect(onboard).toBeDefined();
    await page.goto(`${baseUrl()}/studies/${onboard!.id}`);
    const heading = page.getByRole('heading', { name: 'Life, touch and site' });
    await heading.waitFor({ timeout: 60_000 });
    await heading.scrollIntoViewIfNeeded();
    expectPng(await screenshot(page, viewport, 'study-life-touch-site'));
  });
});
