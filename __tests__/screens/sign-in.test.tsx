import { fireEvent, screen, waitFor } from 'expo-router/testing-library';
import type { ValidationError } from 'yup';

import { api } from '@/api/client';
import { signInSchema } from '@/validation';

import { sessionFor } from './support/fixtures';
import { httpError, ok, routeApi } from './support/http';
import { renderApp } from './support/render-app';

jest.mock('@/api/client', () => ({
  apiBaseUrl: '/api',
  api: { get: jest.fn(), post: jest.fn(), delete: jest.fn() },
}));

const mockedApi = api as unknown as Record<'get' | 'post' | 'delete', jest.Mock>;

const UNAUTHENTICATED = { error: { code: 'unauthenticated', message: 'Sign in first.' } };

/** Messages the shared yup schema gives for the given input (the form must show these). */
async function schemaMessages(input: object): Promise<string[]> {
  try {
    await signInSchema.validate(input, { abortEarly: false });
    return [];
  } catch (error) {
    return (error as ValidationError).errors;
  }
}

describe('sign-in screen', () => {
  beforeEach(() => jest.clearAllMocks());

  it('shows the schema’s inline errors for an empty form and sends nothing', async () => {
    routeApi(mockedApi, { 'GET /session': () => httpError(401, UNAUTHENTICATED) });
    renderApp('/sign-in');

    fireEvent.press(await screen.findByRole('button', { name: 'Sign in' }));

    const expected = await schemaMessages({ email: '', password: '' });
    expect(expected).toHaveLength(2);
    for (const message of expected) {
      expect(await screen.findByText(message)).toBeVisible();
    }
    expect(mockedApi.post).not.toHaveBeenCalled();
  });

  it('shows the server’s message on 401 and disables the button while sending', async () => {
    let reject: (reason: unknown) => void = () => undefined;
    routeApi(mockedApi, {
      'GET /session': () => httpError(401, UNAUTHENTICATED),
      'POST /session': () =>
        new Promise((_, fail) => {
          reject = fail;
        }),
    });
    renderApp('/sign-in');

    fireEvent.changeText(await screen.findByLabelText('E-mail'), 'owner@example.com');
    fireEvent.changeText(screen.getByLabelText('Password'), 'not-the-password');
    fireEvent.press(screen.getByRole('button', { name: 'Sign in' }));

    await waitFor(() => expect(screen.getByRole('button', { name: 'Sign in' })).toBeDisabled());
    expect(mockedApi.post).toHaveBeenCalledWith('/session', { email: 'owner@example.com', password: 'not-the-password' });

    // Body shape from the API contract: { error: { code, message } }.
    reject(
      await httpError(401, { error: { code: 'invalid_credentials', message: 'E-mail or password is not right.' } }).catch(
        (error: unknown) => error,
      ),
    );

    expect(await screen.findByText('E-mail or password is not right.')).toBeVisible();
    expect(screen.getByRole('button', { name: 'Sign in' })).toBeEnabled();
  });

  it('opens the workspace after a successful sign-in', async () => {
    routeApi(mockedApi, {
      'GET /session': () => httpError(401, UNAUTHENTICATED),
      'POST /session': () => ok(sessionFor('designer')),
      'GET /studies': () => ok({ studies: [] }),
    });
    const app = renderApp('/sign-in');

    fireEvent.changeText(await screen.findByLabelText('E-mail'), '  Designer@Example.com ');
    fireEvent.changeText(screen.getByLabelText('Password'), 'correct-horse');
    fireEvent.press(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByText('No studies yet')).toBeVisible();
    expect(app.getPathname()).toBe('/');
    // The shared schema trims and lower-cases the address before it is sent.
    expect(mockedApi.post).toHaveBeenCalledWith('/session', { email: 'designer@example.com', password: 'correct-horse' });
  });

  it('sends a visitor without a session from the workspace to sign-in', async () => {
    routeApi(mockedApi, { 'GET /session': () => httpError(401, UNAUTHENTICATED) });
    const app = renderApp('/');

    expect(await screen.findByRole('button', { name: 'Sign in' })).toBeVisible();
    expect(app.getPathname()).toBe('/sign-in');
  });
});
