import { screen } from 'expo-router/testing-library';

import { api } from '@/api/client';
import type { InterfaceMaterial } from '@/features/interface-materials/types';

import { sessionFor } from './support/fixtures';
import { ok, routeApi } from './support/http';
import { renderApp } from './support/render-app';

jest.mock('@/api/client', () => ({
  apiBaseUrl: '/api',
  api: { get: jest.fn(), post: jest.fn(), put: jest.fn(), delete: jest.fn() },
}));

const mockedApi = api as unknown as Record<'get' | 'post' | 'put' | 'delete', jest.Mock>;

/** Invented test materials. */
const common = { teamId: 1, notes: '', isDemo: false, updatedAt: '2025-03-02T09:00:00.000Z' };
const PAD: InterfaceMaterial = {
  ...common,
  id: 5,
  name: 'Gap pad, 0.25 mm',
  kind: 'per_area',
  packageName: null,
  rthKPerW: null,
  conductivityWPerMK: 1.5,
  thicknessMm: 0.25,
  contactKCm2PerW: 0.1,
};
const WASHER: InterfaceMaterial = {
  ...common,
  id: 6,
  name: 'Mica washer, TO-220',
  kind: 'per_package',
  packageName: 'TO-220',
  rthKPerW: 1.2,
  conductivityWPerMK: null,
  thicknessMm: null,
  contactKCm2PerW: null,
  isDemo: true,
};

describe('interface materials', () => {
  beforeEach(() => jest.clearAllMocks());

  it('gives the resistance of one cm² of an area material from its conductivity and thickness', async () => {
    routeApi(mockedApi, {
      'GET /session': () => ok(sessionFor('designer')),
      'GET /interface-materials/5': () => ok({ item: PAD }),
    });
    renderApp('/interface-materials/5');

    // Plane wall R″ = L/k (Incropera & DeWitt, eq. 3.6): 0.25e-3 m / 1.5 W/(m·K) = 1.667e-4 m²·K/W
    // = 1.667 K·cm²/W, plus 0.1 K·cm²/W of contact: 1.77 K·cm²/W.
    expect(await screen.findByText('1.77\u00a0K·cm²/W')).toBeVisible();
    expect(screen.getByRole('button', { name: 'Edit' })).toBeVisible();
  });

  it('lists per-package and per-area materials for a reviewer without edit actions', async () => {
    routeApi(mockedApi, {
      'GET /session': () => ok(sessionFor('reviewer')),
      'GET /interface-materials': () => ok({ items: [PAD, WASHER] }),
    });
    renderApp('/interface-materials');

    const washer = await screen.findByText('Mica washer, TO-220');
    expect(washer).toBeVisible();
    expect(screen.getByText('Rθcs 1.2\u00a0K/W')).toBeVisible();
    expect(screen.getByText('Per package: TO-220')).toBeVisible();
    expect(screen.getAllByText('Demo')).toHaveLength(1);
    expect(screen.queryByRole('button', { name: 'New material' })).toBeNull();
    expect(screen.queryByRole('button', { name: 'Import CSV' })).toBeNull();
    expect(screen.getByRole('button', { name: 'Export CSV' })).toBeVisible();
  });
});
