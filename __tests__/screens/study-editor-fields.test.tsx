import { fireEvent, screen, waitFor } from 'expo-router/testing-library';

import { api } from '@/api/client';
import { clearDrafts, findDraft } from '@/features/study-editor/draft-storage';

import { editableStudy } from './support/editor-fixtures';
import { httpError, ok, routeApi } from './support/http';
import { renderApp } from './support/render-app';
import { sessionAs } from './support/teamwork-fixtures';

jest.mock('@/api/client', () => ({
  apiBaseUrl: '/api',
  api: { get: jest.fn(), post: jest.fn(), put: jest.fn(), delete: jest.fn() },
}));

const mockedApi = api as unknown as Record<'get' | 'post' | 'put' | 'delete', jest.Mock>;

// The editor mounts every field of the study at once; on a busy machine that takes seconds.
jest.setTimeout(20_000);

async function openEditor() {
  renderApp('/studies/21/edit');
  await screen.findByText('Editing from version 3');
}

const openSection = (name: RegExp) => fireEvent.press(screen.getByRole('button', { name }));

describe('study editor fields', () => {
  beforeEach(() => {
    jest.clearAllMocks();
    clearDrafts(21);
  });

  it('stores a value typed with an SI prefix in SI units and saves it with the base version', async () => {
    const puts: unknown[] = [];
    routeApi(mockedApi, {
      'GET /session': () => ok(sessionAs('designer')),
      'GET /studies/21': () => ok({ study: editableStudy() }),
      'PUT /studies/21': (body) => {
        puts.push(body);
        return ok({ study: { ...editableStudy(4), document: (body as { document: unknown }).document } });
      },
    });
    await openEditor();
    openSection(/^Load profile/);
    fireEvent.changeText(screen.getByLabelText('Segment 2 Iload (A)'), '500 mA');
    openSection(/^Pass elements/);
    fireEvent.changeText(screen.getByLabelText('Q1 term 1 τ (s)'), '2 ms');
    fireEvent.press(screen.getByRole('button', { name: 'Save' }));

    await waitFor(() => expect(puts).toHaveLength(1));
    const body = puts[0] as { baseVersion: number; document: ReturnType<typeof editableStudy>['document'] & Record<string, never> };
    expect(body.baseVersion).toBe(3);
    // SI prefixes (BIPM, The International System of Units, 9th ed., Table 7): m = 10⁻³.
    const doc = body.document as unknown as { profile: { segments: { iloadA?: number }[] }; devices: { package: { terms: { tauS: number }[] } }[] };
    expect(doc.profile.segments[1].iloadA).toBeCloseTo(0.5, 12);
    expect(doc.devices[0].package.terms[0].tauS).toBeCloseTo(0.002, 12);
    expect(await screen.findByText('Saved as version 4')).toBeVisible();
  });

  it('ticks Mains-fed into the saved document, and unticking leaves the field out', async () => {
    const puts: { document: Record<string, unknown> }[] = [];
    routeApi(mockedApi, {
      'GET /session': () => ok(sessionAs('designer')),
      'GET /studies/21': () => ok({ study: editableStudy() }),
      'PUT /studies/21': (body) => {
        puts.push(body as { document: Record<string, unknown> });
        return ok({ study: { ...editableStudy(4 + puts.length - 1), document: (body as { document: unknown }).document } });
      },
    });
    await openEditor();
    openSection(/^Study and margin/);
    const box = screen.getByRole('checkbox', { name: 'Mains-fed' });
    expect(box).not.toBeChecked();
    fireEvent.press(box);
    expect(screen.getByRole('checkbox', { name: 'Mains-fed' })).toBeChecked();
    fireEvent.press(screen.getByRole('button', { name: 'Save' }));
    await waitFor(() => expect(puts).toHaveLength(1));
    // docs/study-format.md, top level: mainsFed is true, false or absent.
    expect(puts[0].document.mainsFed).toBe(true);

    await screen.findByText('Saved as version 4');
    fireEvent.press(screen.getByRole('checkbox', { name: 'Mains-fed' }));
    fireEvent.press(screen.getByRole('button', { name: 'Save' }));
    await waitFor(() => expect(puts).toHaveLength(2));
    expect('mainsFed' in puts[1].document).toBe(false);
  });

  it('shows the reason at the field for text that is not a quantity and for a value the study parser refuses', async () => {
    routeApi(mockedApi, {
      'GET /session': () => ok(sessionAs('designer')),
      'GET /studies/21': () => ok({ study: editableStudy() }),
    });
    await openEditor();
    openSection(/^Pass elements/);
    fireEvent.changeText(screen.getByLabelText('Q1 Tj,max (°C)'), '150 qq');
    fireEvent.changeText(screen.getByLabelText('Q1 term 1 τ (s)'), '-2 ms');
    // The quantity reader names the unit it does not know and the one the field takes; the
    // parser still looks past that field and finds the next problem.
    expect(await screen.findAllByText('unit "qq" is not a unit of temperature (use °C)')).not.toHaveLength(0);
    // The format reference's own example of a parser message (docs/study-format.md, Validation errors).
    const reason = 'must be greater than zero, got -0.002 s';
    await waitFor(() => expect(screen.getAllByText(reason).length).toBeGreaterThanOrEqual(1));
    expect(screen.getByTestId('problem-list')).toHaveTextContent(/2 problems to fix before saving/);
    expect(screen.getByTestId('problem-list')).toHaveTextContent(/Q1 Tj,max: unit "qq" is not a unit of temperature/);
    expect(screen.getByTestId('problem-list')).toHaveTextContent(/Q1 term 1 τ: must be greater than zero, got -0\.002 s/);
    expect(screen.getByTestId('problem-list')).toHaveTextContent(/devices\[0\]\.package\.terms\[0\]\.tauS/);
    expect(screen.getByLabelText('Q1 term 1 τ (s)')).toHaveProp('aria-invalid', true);
  });

  it('keeps the edit when someone saved first, shows both versions, and saves on top of theirs on request', async () => {
    const theirs = editableStudy(4, { title: 'Pass transistor, retitled by a colleague', updatedAt: '2025-05-04T09:00:00.000Z' });
    const puts: { baseVersion: number; document: { ambient: { temperatureC: number } } }[] = [];
    routeApi(mockedApi, {
      'GET /session': () => ok(sessionAs('designer')),
      'GET /studies/21': () => ok({ study: editableStudy() }),
      'GET /studies/21/revisions': () =>
        ok({
          revisions: [
            { number: 4, title: theirs.title, author: { id: 8, name: 'Al Owner' }, createdAt: theirs.updatedAt, changeCount: 1, summary: ['title: retitled'], reviews: [] },
          ],
        }),
      'PUT /studies/21': (body) => {
        const sent = body as (typeof puts)[number];
        puts.push(sent);
        if (sent.baseVersion === 3) {
          return httpError(409, { error: { code: 'version_conflict', message: 'Someone saved this study first (now version 4)' }, current: theirs });
        }
        return ok({ study: { ...editableStudy(5), document: sent.document } });
      },
    });
    await openEditor();
    openSection(/^Ambient/);
    fireEvent.changeText(screen.getByLabelText('Ambient temperature (°C)'), '45');
    fireEvent.press(screen.getByRole('button', { name: 'Save' }));

    expect(await screen.findByText('Someone saved first')).toBeVisible();
    expect(screen.getByText('Saved meanwhile: version 4')).toBeVisible();
    expect(screen.getByText(theirs.title)).toBeVisible();
    expect(await screen.findByText('title: retitled')).toBeVisible();
    expect(screen.getByText('Yours, not saved')).toBeVisible();
    expect(screen.getByText('document.ambient.temperatureC: 40 → 45')).toBeVisible();
    // Nothing is lost: the field still holds the edit.
    expect(screen.getByLabelText('Ambient temperature (°C)')).toHaveDisplayValue('45');

    fireEvent.press(screen.getByRole('button', { name: 'Keep mine' }));
    await waitFor(() => expect(puts).toHaveLength(2));
    expect(puts.map((p) => p.baseVersion)).toEqual([3, 4]);
    expect(puts[1].document.ambient.temperatureC).toBe(45);
    expect(await screen.findByText('Saved as version 5')).toBeVisible();
  });

  it('drops the edit and continues from the saved version when the user takes theirs', async () => {
    const theirs = editableStudy(4, { title: 'Pass transistor, retitled by a colleague' });
    (theirs.document as { ambient: { temperatureC: number } }).ambient.temperatureC = 38;
    routeApi(mockedApi, {
      'GET /session': () => ok(sessionAs('designer')),
      'GET /studies/21': () => ok({ study: editableStudy() }),
      'GET /studies/21/revisions': () => ok({ revisions: [] }),
      'PUT /studies/21': () => httpError(409, { error: { code: 'version_conflict', message: 'Someone saved first' }, current: theirs }),
    });
    await openEditor();
    openSection(/^Ambient/);
    fireEvent.changeText(screen.getByLabelText('Ambient temperature (°C)'), '45');
    fireEvent.press(screen.getByRole('button', { name: 'Save' }));
    fireEvent.press(await screen.findByRole('button', { name: 'Take theirs' }));

    expect(await screen.findByText('Editing from version 4')).toBeVisible();
    expect(screen.getByLabelText('Ambient temperature (°C)')).toHaveDisplayValue('38 °C');
    expect(screen.getByText('No unsaved changes')).toBeVisible();
    expect(findDraft(21)).toBeNull();
  });

  it('shows a refused save at the field the server names', async () => {
    routeApi(mockedApi, {
      'GET /session': () => ok(sessionAs('designer')),
      'GET /studies/21': () => ok({ study: editableStudy() }),
      'PUT /studies/21': () =>
        httpError(400, {
          error: {
            code: 'validation_failed',
            message: 'document.devices[0].sink: no sink has the id "S1" (sinks: HS1)',
            details: [{ path: 'document.devices[0].sink', message: 'no sink has the id "S1" (sinks: HS1)' }],
          },
        }),
    });
    await openEditor();
    openSection(/^Ambient/);
    fireEvent.changeText(screen.getByLabelText('Ambient temperature (°C)'), '41');
    fireEvent.press(screen.getByRole('button', { name: 'Save' }));

    const device = await screen.findByTestId('device-0');
    await waitFor(() => expect(device).toHaveTextContent(/no sink has the id "S1" \(sinks: HS1\)/));
    expect(screen.getByRole('button', { name: /^Pass elements, 1 problem/ })).toBeVisible();
  });

  it('keeps unsaved changes on the device and offers them when the editor opens again', async () => {
    routeApi(mockedApi, {
      'GET /session': () => ok(sessionAs('designer')),
      'GET /studies/21': () => ok({ study: editableStudy() }),
      'GET /studies/21/revisions': () => ok({ revisions: [] }),
      'GET /studies/21/reviews': () => ok({ reviews: [] }),
      'GET /studies/21/comments': () => ok({ comments: [] }),
    });
    await openEditor();
    openSection(/^Ambient/);
    fireEvent.changeText(screen.getByLabelText('Ambient temperature (°C)'), '47 °C');
    expect(await screen.findByText('Unsaved changes, kept on this device until you save')).toBeVisible();
    // The draft is written a moment after the last edit.
    await waitFor(() => expect(findDraft(21)?.values.document.ambient?.temperatureC).toBe(47));

    fireEvent.press(screen.getByText('Back to the study'));
    fireEvent.press(await screen.findByRole('button', { name: 'Edit' }));
    expect(await screen.findByTestId('draft-banner')).toHaveTextContent(/started from version 3/);
    openSection(/^Ambient/);
    expect(screen.getByLabelText('Ambient temperature (°C)')).toHaveDisplayValue('40 °C');
    fireEvent.press(screen.getByRole('button', { name: 'Restore unsaved changes' }));
    expect(screen.getByLabelText('Ambient temperature (°C)')).toHaveDisplayValue('47 °C');
    expect(screen.queryByTestId('draft-banner')).toBeNull();
  });

  it('offers Edit to the designer who wrote the study', async () => {
    routeApi(mockedApi, {
      'GET /session': () => ok(sessionAs('designer')),
      'GET /studies/21': () => ok({ study: editableStudy() }),
      'GET /studies/21/revisions': () => ok({ revisions: [] }),
      'GET /studies/21/reviews': () => ok({ reviews: [] }),
      'GET /studies/21/comments': () => ok({ comments: [] }),
    });
    renderApp('/studies/21');
    fireEvent.press(await screen.findByRole('button', { name: 'Edit' }));
    expect(await screen.findByText('Editing from version 3')).toBeVisible();
  });

  it('never offers Edit to a reviewer', async () => {
    routeApi(mockedApi, {
      'GET /session': () => ok(sessionAs('reviewer')),
      'GET /studies/21': () => ok({ study: editableStudy() }),
      'GET /studies/21/revisions': () => ok({ revisions: [] }),
      'GET /studies/21/reviews': () => ok({ reviews: [] }),
      'GET /studies/21/comments': () => ok({ comments: [] }),
    });
    renderApp('/studies/21');
    expect(await screen.findByText('Design inputs')).toBeVisible();
    expect(screen.queryByRole('button', { name: 'Edit' })).toBeNull();
  });

  it('tells a reviewer who opens the editor that reviewers do not edit', async () => {
    routeApi(mockedApi, {
      'GET /session': () => ok(sessionAs('reviewer')),
      'GET /studies/21': () => ok({ study: editableStudy() }),
    });
    renderApp('/studies/21/edit');
    expect(await screen.findByText('You cannot edit this study')).toBeVisible();
    expect(screen.getByText(/Reviewers read, comment and decide/)).toBeVisible();
  });
});
