import { fireEvent, screen } from 'expo-router/testing-library';

import { api } from '@/api/client';

import { httpError, ok, routeApi } from './support/http';
import { renderApp } from './support/render-app';

jest.mock('@/api/client', () => ({
  apiBaseUrl: '/api',
  api: { get: jest.fn(), post: jest.fn(), delete: jest.fn() },
}));

const mockedApi = api as unknown as Record<'get' | 'post' | 'delete', jest.Mock>;

const SIGNED_OUT = () => httpError(401, { error: { code: 'unauthenticated', message: 'Sign in first.' } });

describe('password reset', () => {
  beforeEach(() => jest.clearAllMocks());

  it('is reached from sign-in and gives the same confirmation for any address', async () => {
    routeApi(mockedApi, {
      'GET /session': SIGNED_OUT,
      // The API answers 202 whether or not the address has an account.
      'POST /password-resets': () => ok({ message: 'If this address has an account, a reset link is on its way.' }, 202),
    });
    const app = renderApp('/sign-in');

    fireEvent.press(await screen.findByText('Forgot password?'));
    fireEvent.changeText(await screen.findByLabelText('E-mail'), '  Someone@Example.com ');
    fireEvent.press(screen.getByRole('button', { name: 'Send reset link' }));

    expect(await screen.findByText(/a link to choose a new password is on its way/)).toBeVisible();
    expect(app.getPathname()).toBe('/forgot-password');
    expect(mockedApi.post).toHaveBeenCalledWith('/password-resets', { email: 'someone@example.com' });
  });

  it('sets a new password from the link', async () => {
    routeApi(mockedApi, {
      'GET /session': SIGNED_OUT,
      'POST /password-resets/r3s3t': () => ok(undefined, 204),
    });
    renderApp('/reset-password/r3s3t');

    fireEvent.changeText(await screen.findByLabelText('New password'), 'a-new-long-password');
    fireEvent.press(screen.getByRole('button', { name: 'Set new password' }));

    expect(await screen.findByText('Password changed')).toBeVisible();
    expect(mockedApi.post).toHaveBeenCalledWith('/password-resets/r3s3t', { password: 'a-new-long-password' });
  });

  it('says the link is used or expired on 410', async () => {
    routeApi(mockedApi, {
      'GET /session': SIGNED_OUT,
      'POST /password-resets/r3s3t': () =>
        httpError(410, { error: { code: 'reset_gone', message: 'This reset link has been used or has expired: ask for a new one' } }),
    });
    renderApp('/reset-password/r3s3t');

    fireEvent.changeText(await screen.findByLabelText('New password'), 'a-new-long-password');
    fireEvent.press(screen.getByRole('button', { name: 'Set new password' }));

    expect(await screen.findByText('Link used or expired')).toBeVisible();
    expect(screen.getByText('Ask for a new link')).toBeVisible();
  });
});
