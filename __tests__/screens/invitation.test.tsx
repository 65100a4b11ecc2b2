import { fireEvent, screen, waitFor } from 'expo-router/testing-library';
import type { ValidationError } from 'yup';

import { api } from '@/api/client';
import { signUpSchema } from '@/validation';

import { httpError, ok, routeApi } from './support/http';
import { renderApp } from './support/render-app';

jest.mock('@/api/client', () => ({
  apiBaseUrl: '/api',
  api: { get: jest.fn(), post: jest.fn(), delete: jest.fn() },
}));

const mockedApi = api as unknown as Record<'get' | 'post' | 'delete', jest.Mock>;

const SIGNED_OUT = () => httpError(401, { error: { code: 'unauthenticated', message: 'Sign in first.' } });
const TOKEN = 'k3J9c0ffee';

/** Shaped like `GET /api/invitations/:token` for an address without an account. */
const INVITATION = {
  teamName: 'Bench Supplies Group',
  role: 'designer',
  email: 'dana@example.com',
  invitedBy: 'Al Owner',
  expiresAt: '2030-06-08T09:00:00.000Z',
  accountExists: false,
};

const NEW_SESSION = {
  user: { id: 31, email: 'dana@example.com', name: 'Dana Newcomer' },
  memberships: [{ teamId: 4, teamName: 'Bench Supplies Group', role: 'designer' }],
};

describe('invitation page', () => {
  beforeEach(() => jest.clearAllMocks());

  it('creates the account, signs in and opens the studies list', async () => {
    routeApi(mockedApi, {
      'GET /session': SIGNED_OUT,
      [`GET /invitations/${TOKEN}`]: () => ok({ invitation: INVITATION }),
      [`POST /invitations/${TOKEN}/accept`]: () => ok(NEW_SESSION),
      'GET /studies': () => ok({ studies: [] }),
    });
    const app = renderApp(`/invitations/${TOKEN}`);

    expect(await screen.findByText('Join Bench Supplies Group')).toBeVisible();
    expect(screen.getByText('Designer')).toBeVisible();
    expect(screen.getByText('Al Owner')).toBeVisible();
    expect(screen.getByText(/Create your account for dana@example.com to join Bench Supplies Group/)).toBeVisible();

    fireEvent.changeText(screen.getByLabelText('Your name'), '  Dana Newcomer ');
    fireEvent.changeText(screen.getByLabelText('Password'), 'long-enough-pass');
    fireEvent.press(screen.getByRole('button', { name: 'Create account and join' }));

    expect(await screen.findByText('No studies yet')).toBeVisible();
    expect(app.getPathname()).toBe('/');
    expect(mockedApi.post).toHaveBeenCalledWith(`/invitations/${TOKEN}/accept`, {
      name: 'Dana Newcomer',
      password: 'long-enough-pass',
    });
  });

  it('holds a short password back with the sign-up rule and sends nothing', async () => {
    routeApi(mockedApi, {
      'GET /session': SIGNED_OUT,
      [`GET /invitations/${TOKEN}`]: () => ok({ invitation: INVITATION }),
    });
    renderApp(`/invitations/${TOKEN}`);

    fireEvent.changeText(await screen.findByLabelText('Your name'), 'Dana');
    fireEvent.changeText(screen.getByLabelText('Password'), 'short');
    fireEvent.press(screen.getByRole('button', { name: 'Create account and join' }));

    // The rule comes from the shared sign-up schema (the server enforces the same minimum).
    const message = await signUpSchema
      .validateAt('password', { password: 'short' })
      .catch((error: ValidationError) => error.message);
    expect(await screen.findByText(message)).toBeVisible();
    expect(mockedApi.post).not.toHaveBeenCalled();
  });

  it('says plainly that a used or expired link no longer works', async () => {
    routeApi(mockedApi, {
      'GET /session': SIGNED_OUT,
      [`GET /invitations/${TOKEN}`]: () =>
        httpError(410, {
          error: { code: 'invitation_gone', message: 'This invitation link has been used, withdrawn or has expired: ask for a new one' },
        }),
    });
    renderApp(`/invitations/${TOKEN}`);

    expect(await screen.findByText('Link used or expired')).toBeVisible();
    expect(screen.getByText('Ask the team owner to send you a new invitation.')).toBeVisible();
    expect(screen.queryByLabelText('Password')).toBeNull();
    expect(screen.getByText('Go to sign-in')).toBeVisible();
  });

  it('asks an existing account for its password and shows the refusal under the field', async () => {
    const refusal = 'Sign in as dana@example.com or give that account’s password to accept';
    routeApi(mockedApi, {
      'GET /session': SIGNED_OUT,
      [`GET /invitations/${TOKEN}`]: () => ok({ invitation: { ...INVITATION, accountExists: true } }),
      [`POST /invitations/${TOKEN}/accept`]: () =>
        httpError(401, { error: { code: 'invalid_credentials', message: refusal, details: [{ path: 'password', message: 'is not the password of the invited account' }] } }),
    });
    renderApp(`/invitations/${TOKEN}`);

    expect(await screen.findByText(/already has an account/)).toBeVisible();
    expect(screen.queryByLabelText('Your name')).toBeNull();
    fireEvent.changeText(screen.getByLabelText('Password'), 'not-this-one');
    fireEvent.press(screen.getByRole('button', { name: 'Sign in and join' }));

    expect(await screen.findByText(refusal)).toBeVisible();
    await waitFor(() => expect(screen.getByRole('button', { name: 'Sign in and join' })).toBeEnabled());
    expect(mockedApi.post).toHaveBeenCalledWith(`/invitations/${TOKEN}/accept`, { password: 'not-this-one' });
  });
});
