import { fireEvent, screen, waitFor } from 'expo-router/testing-library';

import { api } from '@/api/client';
import { studyCreateSchema } from '@/validation';

import { sessionFor, STUDIES } from './support/fixtures';
import { httpError, ok, routeApi } from './support/http';
import { renderApp } from './support/render-app';

jest.mock('@/api/client', () => ({
  apiBaseUrl: '/api',
  api: { get: jest.fn(), post: jest.fn(), delete: jest.fn() },
}));

const mockedApi = api as unknown as Record<'get' | 'post' | 'delete', jest.Mock>;

describe('new study form', () => {
  beforeEach(() => jest.clearAllMocks());

  it('requires a title, then posts and opens the new study', async () => {
    const created = { ...STUDIES[0], id: 42, title: 'Pass transistor for a 5 V rail', document: {} };
    routeApi(mockedApi, {
      'GET /session': () => ok(sessionFor('designer')),
      'POST /studies': () => ok({ study: created }, 201),
    });
    const app = renderApp('/studies/new');

    fireEvent.press(await screen.findByRole('button', { name: 'Create study' }));
    // The message comes from the shared schema the server validates with too.
    const titleMessage = await studyCreateSchema.validateAt('title', { title: '' }).catch((e: Error) => e.message);
    expect(await screen.findByText(titleMessage)).toBeVisible();
    expect(mockedApi.post).not.toHaveBeenCalled();

    fireEvent.changeText(screen.getByLabelText('Title'), '  Pass transistor for a 5 V rail ');
    fireEvent.changeText(screen.getByLabelText('Description'), 'Worst case at 9 V in.');
    fireEvent.press(screen.getByRole('button', { name: 'Create study' }));

    expect(await screen.findByText(created.title)).toBeVisible();
    expect(app.getPathname()).toBe('/studies/42');
    expect(mockedApi.post).toHaveBeenCalledWith('/studies', {
      title: 'Pass transistor for a 5 V rail',
      description: 'Worst case at 9 V in.',
      teamId: 1,
    });
  });

  it('shows the server’s message when creation is refused', async () => {
    routeApi(mockedApi, {
      'GET /session': () => ok(sessionFor('designer')),
      'POST /studies': () => httpError(403, { error: { code: 'forbidden', message: 'Your role cannot create studies.' } }),
    });
    renderApp('/studies/new');

    fireEvent.changeText(await screen.findByLabelText('Title'), 'Anything');
    fireEvent.press(screen.getByRole('button', { name: 'Create study' }));

    expect(await screen.findByText('Your role cannot create studies.')).toBeVisible();
    await waitFor(() => expect(screen.getByRole('button', { name: 'Create study' })).toBeEnabled());
  });

  it('tells a reviewer that creating is not part of the role instead of showing the form', async () => {
    routeApi(mockedApi, { 'GET /session': () => ok(sessionFor('reviewer')) });
    renderApp('/studies/new');

    expect(await screen.findByText('Reviewers cannot create studies')).toBeVisible();
    expect(screen.queryByLabelText('Title')).toBeNull();
  });
});
