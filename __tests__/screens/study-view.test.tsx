import { screen } from 'expo-router/testing-library';

import { api } from '@/api/client';

import { sessionFor, STUDIES } from './support/fixtures';
import { httpError, ok, routeApi } from './support/http';
import { renderApp } from './support/render-app';

jest.mock('@/api/client', () => ({
  apiBaseUrl: '/api',
  api: { get: jest.fn(), post: jest.fn(), delete: jest.fn() },
}));

const mockedApi = api as unknown as Record<'get' | 'post' | 'delete', jest.Mock>;

describe('study view', () => {
  beforeEach(() => jest.clearAllMocks());

  it('shows the study’s title, status, description, document sections and the estimate caution', async () => {
    const study = {
      ...STUDIES[1],
      document: { formatVersion: 1, devices: [{}, {}], ambient: { celsius: 40 }, notes: 'Idle only' },
    };
    routeApi(mockedApi, {
      'GET /session': () => ok(sessionFor('reviewer')),
      'GET /studies/12': () => ok({ study }),
    });
    renderApp('/studies/12');

    expect(await screen.findByText(study.title)).toBeVisible();
    expect(screen.getByText('Approved')).toBeVisible();
    expect(screen.getByText(study.description)).toBeVisible();
    expect(screen.getByText('format v1')).toBeVisible();
    // Two array entries, one nested field, one short text: described as they are.
    expect(screen.getByText('Devices')).toBeVisible();
    expect(screen.getByText('2 entries')).toBeVisible();
    expect(screen.getByText('1 field')).toBeVisible();
    expect(screen.getByText('Idle only')).toBeVisible();
    expect(screen.getByText(/Results are estimates from datasheet values/)).toBeVisible();
  });

  it('says plainly when the document holds no inputs yet', async () => {
    routeApi(mockedApi, {
      'GET /session': () => ok(sessionFor('reviewer')),
      'GET /studies/11': () => ok({ study: { ...STUDIES[0], document: {} } }),
    });
    renderApp('/studies/11');

    expect(await screen.findByText('No design inputs have been saved in this study yet.')).toBeVisible();
  });

  it('shows "Study not found" on 404 without offering a retry', async () => {
    routeApi(mockedApi, {
      'GET /session': () => ok(sessionFor('reviewer')),
      'GET /studies/999': () => httpError(404, { error: { code: 'not_found', message: 'Study not found' } }),
    });
    renderApp('/studies/999');

    expect(await screen.findByText('Study not found')).toBeVisible();
    expect(screen.queryByRole('button', { name: 'Try again' })).toBeNull();
  });
});
