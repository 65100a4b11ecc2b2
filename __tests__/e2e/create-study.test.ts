import { apiStudies, baseUrl, signIn } from './support/app';
import { openBrowser, PHONE, type BrowserSession } from './support/browser';

describe('a designer creates a study', () => {
  let browser: BrowserSession;

  beforeAll(async () => {
    browser = await openBrowser(PHONE);
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('fills the form, lands on the new study and finds it in the list', async () => {
    const { page } = browser;
    const title = `Series pass stage for a 9 V bench rail ${Date.now()}`;
    await signIn(page, 'designer@example.com');

    await page.getByRole('button', { name: 'New study' }).click();
    await page.getByLabel('Title').fill(title);
    await page.getByLabel('Description').fill('Two TO-247 devices sharing one sink.');
    await page.getByRole('button', { name: 'Create study' }).click();

    await page.getByRole('heading', { name: title }).waitFor();
    expect(new URL(page.url()).pathname).toMatch(/^\/studies\/\d+$/);

    // The server is the reference: it must hold the study, authored by this designer, as a draft.
    const stored = (await apiStudies(page)).find((study) => study.title === title);
    expect(stored).toMatchObject({ status: 'draft' });
    expect(new URL(page.url()).pathname).toBe(`/studies/${stored?.id}`);

    await page.getByRole('link', { name: 'Studies' }).first().click();
    await page.getByText(title, { exact: true }).waitFor();
    expect(new URL(page.url()).pathname).toBe('/');
  });

  it('is refused to a reviewer by the server as well as hidden in the screen', async () => {
    const { page } = browser;
    await page.context().clearCookies();
    await signIn(page, 'reviewer@example.com');
    expect(await page.getByRole('button', { name: 'New study' }).count()).toBe(0);

    const response = await page.request.post(`${baseUrl()}/api/studies`, { data: { title: 'Not allowed' } });
    expect(response.status()).toBe(403);
  });
});
