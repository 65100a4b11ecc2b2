import { apiStudies, DEMO_ACCOUNTS, DEMO_TITLE, sessionStatus, signIn, signOut, waitForStudies } from './support/app';
import { DESKTOP, openBrowser, PHONE, type BrowserSession } from './support/browser';

// Product requirement (PRODUCT.md, demo data): three seeded demo studies, visible to every
// member of the demo team; only owners and designers may start a study.
describe.each([DESKTOP, PHONE])('demo accounts at %o', (viewport) => {
  let browser: BrowserSession;

  beforeAll(async () => {
    browser = await openBrowser(viewport);
  });
  afterAll(async () => {
    await browser?.close();
  });

  it.each(DEMO_ACCOUNTS)('$email signs in, sees the three demo studies and signs out', async ({ email, role }) => {
    const { page } = browser;
    await signIn(page, email);

    const studies = await apiStudies(page);
    const demoTitles = studies.map((study) => study.title).filter((title) => DEMO_TITLE.test(title));
    expect(demoTitles).toHaveLength(3);
    await waitForStudies(page, demoTitles);
    for (const title of demoTitles) {
      expect(await page.getByText(title, { exact: true }).first().isVisible()).toBe(true);
    }

    const newStudy = await page.getByRole('button', { name: 'New study' }).count();
    expect(newStudy).toBe(role === 'reviewer' ? 0 : 1);

    await signOut(page, viewport);
    expect(new URL(page.url()).pathname).toBe('/sign-in');
    expect(await sessionStatus(page)).toBe(401);
  });

  it('sends a signed-out visitor from the studies list to sign-in', async () => {
    const { page } = browser;
    await page.goto(new URL('/', page.url()).toString());
    await page.getByRole('button', { name: 'Sign in', exact: true }).waitFor();
    expect(new URL(page.url()).pathname).toBe('/sign-in');
  });
});
