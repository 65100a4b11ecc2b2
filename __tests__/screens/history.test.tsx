import { fireEvent, screen, waitFor, within } from 'expo-router/testing-library';

import { api } from '@/api/client';

import { httpError, ok, routeApi } from './support/http';
import { renderApp } from './support/render-app';
import { PEOPLE, sessionAs, studyAt } from './support/teamwork-fixtures';

jest.mock('@/api/client', () => ({
  apiBaseUrl: '/api',
  api: { get: jest.fn(), post: jest.fn(), delete: jest.fn() },
}));

const mockedApi = api as unknown as Record<'get' | 'post' | 'delete', jest.Mock>;

const designer = { id: PEOPLE.designer.id, name: PEOPLE.designer.name };
const owner = { id: PEOPLE.owner.id, name: PEOPLE.owner.name };

/** Newest first, as `GET /api/studies/:id/revisions` lists them; summary lines in the server's format. */
const REVISIONS = [
  {
    number: 3,
    title: 'Linear post-regulator after a buck stage',
    author: designer,
    createdAt: '2025-05-03T10:00:00.000Z',
    changeCount: 14,
    summary: ['document.ambient.temperatureC: 40 → 45', 'document.marginK: 15 → 20'],
    reviews: [{ decision: 'approved', reviewer: PEOPLE.reviewer.name, at: '2025-05-04T12:30:00.000Z' }],
  },
  {
    number: 2,
    title: 'Linear post-regulator after a buck stage',
    author: designer,
    createdAt: '2025-05-02T10:00:00.000Z',
    changeCount: 1,
    summary: ['description: "Dropout 1 V" → "Dropout 1.2 V at 3 A."'],
    reviews: [{ decision: 'changes_requested', reviewer: PEOPLE.reviewer.name, at: '2025-05-02T15:00:00.000Z' }],
  },
  {
    number: 1,
    title: 'Post-regulator',
    author: designer,
    createdAt: '2025-05-01T10:00:00.000Z',
    changeCount: 0,
    summary: ['created'],
    reviews: [],
  },
];

const OLD_TEXT = 'Demo data, invented for this example. A linear supply fed from two 24 V adapters in series.';
const NEW_TEXT = 'Demo data, invented for this example. A linear supply fed from two equal 24 V adapters in series.';

/** `GET /api/studies/21/revisions/1`: revision 1 compared with the current version 3. */
const REVISION_ONE = {
  revision: {
    number: 1,
    title: 'Post-regulator',
    description: 'Dropout 1 V',
    document: {},
    author: designer,
    createdAt: '2025-05-01T10:00:00.000Z',
  },
  current: 3,
  changesToCurrent: [
    { kind: 'changed', path: 'title', before: 'Post-regulator', after: 'Linear post-regulator after a buck stage' },
    { kind: 'changed', path: 'description', before: OLD_TEXT, after: NEW_TEXT },
  ],
  // The server's lines keep about 40 characters of each side (src/core/diff).
  summaryToCurrent: [
    'title: "Post-regulator" → "Linear post-regulator after a buck stage"',
    'description: "Demo data, invented for this example… → "Demo data, invented for this example…',
  ],
};

function routes(extra: Record<string, (body?: unknown) => Promise<unknown>> = {}) {
  routeApi(mockedApi, {
    'GET /session': () => ok(sessionAs('designer')),
    'GET /studies/21': () => ok({ study: studyAt('approved', 3) }),
    'GET /studies/21/revisions': () => ok({ revisions: REVISIONS }),
    'GET /studies/21/reviews': () => ok({ reviews: [] }),
    'GET /studies/21/comments': () => ok({ comments: [] }),
    'GET /studies/21/revisions/1': () => ok(REVISION_ONE),
    ...extra,
  });
}

describe('study history', () => {
  beforeEach(() => jest.clearAllMocks());

  it('lists the revisions newest first with their change summaries and review decisions', async () => {
    routes();
    renderApp('/studies/21');

    const newest = await screen.findByTestId('revision-3');
    expect(within(newest).getByText('document.ambient.temperatureC: 40 → 45')).toBeVisible();
    expect(within(newest).getByText('document.marginK: 15 → 20')).toBeVisible();
    // 14 changes, 2 lines shown.
    expect(within(newest).getByText('and 12 more changes')).toBeVisible();
    expect(within(newest).getByText(new RegExp(`^Approved by ${PEOPLE.reviewer.name}`))).toBeVisible();
    expect(within(screen.getByTestId('revision-2')).getByText(new RegExp(`^Changes requested by ${PEOPLE.reviewer.name}`))).toBeVisible();
    expect(within(screen.getByTestId('revision-1')).getByText('First revision: the study as created.')).toBeVisible();
  });

  it('opens a revision read-only, compares it with the current one and restores it with baseVersion', async () => {
    routes({ 'POST /studies/21/revisions/1/restore': () => ok({ study: studyAt('draft', 4) }) });
    const app = renderApp('/studies/21');

    fireEvent.press(await screen.findByRole('link', { name: 'Open revision 1' }));
    expect(await screen.findByText(/^Read-only: revision 1/)).toBeVisible();
    expect(app.getPathname()).toBe('/studies/21/revisions/1');
    expect(screen.getByText(REVISION_ONE.summaryToCurrent[0])).toBeVisible();
    // A long text shows the stretch the edit touched, not two identical openings.
    const now = screen.getByText(/^now: /);
    expect(now).toHaveTextContent(/equal 24 V adapters/);
    expect(now).toHaveTextContent(/^now: …/);
    expect(screen.getByText(/^was: /)).not.toHaveTextContent(/equal/);

    fireEvent.press(screen.getByRole('button', { name: 'Restore this revision' }));
    expect(screen.getByText(/Its content becomes revision 4/)).toBeVisible();
    expect(mockedApi.post).not.toHaveBeenCalled();
    fireEvent.press(screen.getByRole('button', { name: 'Restore' }));

    await waitFor(() => expect(app.getPathname()).toBe('/studies/21'));
    expect(mockedApi.post).toHaveBeenCalledWith('/studies/21/revisions/1/restore', { baseVersion: 3 });
  });

  it('shows both versions when someone saved first, and keeps mine on top of theirs', async () => {
    const theirs = studyAt('draft', 4, { updatedAt: '2025-05-05T08:00:00.000Z' });
    const sent: unknown[] = [];
    routes({
      'POST /studies/21/revisions/1/restore': (body) => {
        sent.push(body);
        if (sent.length === 1) {
          // 409 body of a stale save: the error and the server's current study.
          return httpError(409, {
            error: { code: 'version_conflict', message: 'Someone saved this study first (now version 4); your changes are not saved yet' },
            current: theirs,
          });
        }
        return ok({ study: studyAt('draft', 5) });
      },
    });
    const app = renderApp('/studies/21/revisions/1');

    fireEvent.press(await screen.findByRole('button', { name: 'Restore this revision' }));
    fireEvent.press(screen.getByRole('button', { name: 'Restore' }));

    const conflict = await screen.findByTestId('version-conflict');
    expect(within(conflict).getByText('Someone saved first')).toBeVisible();
    expect(within(conflict).getByText('Saved meanwhile: version 4')).toBeVisible();
    expect(within(conflict).getByText('Restore revision 1')).toBeVisible();

    fireEvent.press(within(conflict).getByRole('button', { name: 'Keep mine' }));
    await waitFor(() => expect(app.getPathname()).toBe('/studies/21'));
    expect(sent).toEqual([{ baseVersion: 3 }, { baseVersion: 4 }]);
  });

  it('offers no restore to someone who cannot edit the study', async () => {
    routeApi(mockedApi, {
      'GET /session': () => ok(sessionAs('reviewer')),
      'GET /studies/21': () => ok({ study: studyAt('approved', 3, { author: owner }) }),
      'GET /studies/21/revisions/1': () => ok(REVISION_ONE),
    });
    renderApp('/studies/21/revisions/1');

    expect(await screen.findByText(REVISION_ONE.summaryToCurrent[0])).toBeVisible();
    expect(screen.queryByRole('button', { name: 'Restore this revision' })).toBeNull();
  });
});
