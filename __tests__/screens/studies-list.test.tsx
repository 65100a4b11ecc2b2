import { fireEvent, screen, within } from 'expo-router/testing-library';

import { api } from '@/api/client';
import { useIsWide } from '@/components/ui/use-is-wide';

import { sessionFor, STUDIES } from './support/fixtures';
import { httpError, ok, routeApi } from './support/http';
import { renderApp } from './support/render-app';

jest.mock('@/api/client', () => ({
  apiBaseUrl: '/api',
  api: { get: jest.fn(), post: jest.fn(), delete: jest.fn() },
}));
// The window size decides cards (phone) or table (wide); each test picks one.
jest.mock('@/components/ui/use-is-wide', () => ({ useIsWide: jest.fn(() => false) }));

const mockedApi = api as unknown as Record<'get' | 'post' | 'delete', jest.Mock>;
const mockedIsWide = useIsWide as jest.Mock;

describe('studies list', () => {
  beforeEach(() => {
    jest.clearAllMocks();
    mockedIsWide.mockReturnValue(false);
  });

  it('renders one card per study from the API and no "New study" for a reviewer', async () => {
    routeApi(mockedApi, {
      'GET /session': () => ok(sessionFor('reviewer')),
      'GET /studies': () => ok({ studies: STUDIES }),
    });
    renderApp('/');

    for (const study of STUDIES) {
      const card = await screen.findByTestId(`study-card-${study.id}`);
      expect(within(card).getByText(study.title)).toBeVisible();
    }
    expect(screen.queryByRole('button', { name: 'New study' })).toBeNull();
  });

  it('offers "New study" to a designer and opens the form', async () => {
    routeApi(mockedApi, {
      'GET /session': () => ok(sessionFor('designer')),
      'GET /studies': () => ok({ studies: STUDIES }),
    });
    const app = renderApp('/');

    fireEvent.press(await screen.findByRole('button', { name: 'New study' }));

    expect(await screen.findByLabelText('Title')).toBeVisible();
    expect(app.getPathname()).toBe('/studies/new');
  });

  it('narrows the cards by search words and by status', async () => {
    routeApi(mockedApi, {
      'GET /session': () => ok(sessionFor('owner')),
      'GET /studies': () => ok({ studies: STUDIES }),
    });
    renderApp('/');

    fireEvent.changeText(await screen.findByLabelText('Search studies'), 'BATTERY');
    expect(screen.getByTestId('study-card-13')).toBeVisible();
    expect(screen.queryByTestId('study-card-11')).toBeNull();
    expect(screen.queryByTestId('study-card-12')).toBeNull();

    fireEvent.changeText(screen.getByLabelText('Search studies'), '');
    fireEvent.press(screen.getByRole('radio', { name: 'Approved' }));
    expect(screen.getByTestId('study-card-12')).toBeVisible();
    expect(screen.queryByTestId('study-card-11')).toBeNull();
    expect(screen.queryByTestId('study-card-13')).toBeNull();
  });

  it('shows the empty state when the teams have no studies', async () => {
    routeApi(mockedApi, {
      'GET /session': () => ok(sessionFor('reviewer')),
      'GET /studies': () => ok({ studies: [] }),
    });
    renderApp('/');

    expect(await screen.findByText('No studies yet')).toBeVisible();
  });

  it('shows the error with the server message and recovers on retry', async () => {
    let calls = 0;
    routeApi(mockedApi, {
      'GET /session': () => ok(sessionFor('reviewer')),
      'GET /studies': () =>
        ++calls === 1
          ? httpError(500, { error: { code: 'internal', message: 'The database is busy.' } })
          : ok({ studies: STUDIES }),
    });
    renderApp('/');

    expect(await screen.findByText('The database is busy.')).toBeVisible();
    fireEvent.press(screen.getByRole('button', { name: 'Try again' }));

    expect(await screen.findByTestId('study-card-11')).toBeVisible();
    expect(calls).toBe(2);
  });

  it('shows a table on a wide window, sorted by title when its header is pressed', async () => {
    mockedIsWide.mockReturnValue(true);
    routeApi(mockedApi, {
      'GET /session': () => ok(sessionFor('reviewer')),
      'GET /studies': () => ok({ studies: STUDIES }),
    });
    renderApp('/');

    const rowTitles = async () =>
      (await screen.findAllByTestId(/^study-row-/)).map((row) => {
        const id = Number(row.props.testID.replace('study-row-', ''));
        return STUDIES.find((study) => study.id === id)?.title;
      });

    // Default order: most recently updated first.
    const byUpdated = [...STUDIES].sort((a, b) => Date.parse(b.updatedAt) - Date.parse(a.updatedAt));
    expect(await rowTitles()).toEqual(byUpdated.map((study) => study.title));

    fireEvent.press(screen.getByRole('button', { name: 'Sort by title' }));
    // Reference order from the platform's locale-aware string comparison.
    const byTitle = STUDIES.map((study) => study.title).sort((a, b) => a.localeCompare(b, 'en'));
    expect(await rowTitles()).toEqual(byTitle);

    fireEvent.press(screen.getByRole('button', { name: 'Sort by title' }));
    expect(await rowTitles()).toEqual([...byTitle].reverse());
    expect(screen.queryByTestId('study-card-11')).toBeNull();
  });
});
