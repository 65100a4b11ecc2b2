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

/** The "Full example" of the study format reference (docs/study-format.md). */
const FULL_EXAMPLE = {
  format: 'junctura-study',
  version: 1,
  title: 'Pass transistor on a small sink (demo data)',
  description: 'Demo data: invented values.',
  marginK: 20,
  ambient: { temperatureC: 40 },
  enclosure: { rthKPerW: 2.5, capacityJPerK: 150 },
  sinks: [
    {
      id: 'S1',
      rthKPerW: 1.1,
      massKg: 0.2,
      material: 'aluminium',
      naturalConvection: { referenceRiseK: 50, exponent: 0.25 },
    },
  ],
  devices: [
    {
      id: 'Q1',
      name: 'pass transistor',
      tjMaxC: 150,
      sink: 'S1',
      count: 1,
      package: {
        kind: 'foster',
        terms: [
          { rKPerW: 0.2, tauS: 0.001 },
          { rKPerW: 0.5, tauS: 0.05 },
        ],
      },
      interface: { rthKPerW: 0.3, material: 'silicone pad' },
    },
  ],
  profile: {
    segments: [
      { label: 'warm-up', durationS: 10, powerW: { Q1: 20 } },
      { label: 'load', durationS: 5, vinV: 24, voutV: 12, iloadA: 2 },
      {
        label: 'pulses',
        repeat: 10,
        segments: [
          { durationS: 0.5, vinV: 24, voutV: 12, iloadA: 3 },
          { durationS: 1.5, vinV: 24, voutV: 12, iloadA: 0.2 },
        ],
      },
    ],
    repeat: 2,
    periodic: false,
  },
};

describe('study view', () => {
  beforeEach(() => jest.clearAllMocks());

  it('shows the title, status, description, the inputs read from the document and the caution', async () => {
    const study = { ...STUDIES[1], document: FULL_EXAMPLE };
    routeApi(mockedApi, {
      'GET /session': () => ok(sessionFor('reviewer')),
      'GET /studies/12': () => ok({ study }),
    });
    renderApp('/studies/12');

    // Matchers see text with whitespace collapsed, so no-break spaces before units read as spaces.
    expect(await screen.findByText(study.title)).toBeVisible();
    expect(screen.getByText('Approved')).toBeVisible();
    expect(screen.getByText(study.description)).toBeVisible();
    expect(screen.getByText('junctura-study v1')).toBeVisible();
    expect(screen.getByText('40\u00a0°C')).toBeVisible();
    expect(screen.getByText('Rθ 2.5\u00a0K/W, 150\u00a0J/K')).toBeVisible();
    // Foster network: Rθjc is the sum of the term resistances, 0.2 + 0.5 = 0.7 K/W.
    expect(screen.getByText(/Rθjc 0\.7 K\/W \(Foster, 2 terms\)/)).toBeVisible();
    // Sink capacity = mass × cp = 0.2 kg × 900 J/(kg·K) = 180 J/K (cp of aluminium,
    // Incropera & DeWitt Table A.1, rounded as the format documents); it leads to the enclosure.
    expect(screen.getByText(/heat capacity 180 J\/K · natural convection · to enclosure/)).toBeVisible();
    // Groups expand in place: 2 + 10 × 2 = 22 segments; one pass lasts 10 + 5 + 10 × (0.5 + 1.5) = 35 s.
    expect(screen.getByText('22')).toBeVisible();
    expect(screen.getByText('35\u00a0s')).toBeVisible();
    expect(screen.getByText('2 passes')).toBeVisible();
    expect(screen.getByText('0.2–3\u00a0A')).toBeVisible();
    expect(screen.getByText(/Results are estimates from datasheet values/)).toBeVisible();
  });

  it('names the field at fault when the saved document cannot be read', async () => {
    const broken = { ...FULL_EXAMPLE, devices: [{ ...FULL_EXAMPLE.devices[0], sink: 'S9' }] };
    routeApi(mockedApi, {
      'GET /session': () => ok(sessionFor('reviewer')),
      'GET /studies/12': () => ok({ study: { ...STUDIES[1], document: broken } }),
    });
    renderApp('/studies/12');

    expect(await screen.findByText('The saved document could not be read.')).toBeVisible();
    expect(screen.getByText(/devices\[0\]\.sink/)).toBeVisible();
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
