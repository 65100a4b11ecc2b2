import { fireEvent, screen, waitFor, within } from 'expo-router/testing-library';

import { api } from '@/api/client';
import { rankSinks, rankingSetupFromStudy, type SinkCandidate, type SortKey } from '@/core/heatsink';
import { parseStudy } from '@/core/study';

import { sessionFor, STUDIES } from './support/fixtures';
import { ok, routeApi } from './support/http';
import { renderApp } from './support/render-app';

jest.mock('@/api/client', () => ({
  apiBaseUrl: '/api',
  api: { get: jest.fn(), post: jest.fn(), delete: jest.fn() },
}));

const mockedApi = api as unknown as Record<'get' | 'post' | 'delete', jest.Mock>;

// Solving the demo studies and waiting out the ranking's typing pause take longer than jest's 5 s default.
jest.setTimeout(30_000);

/** One invented device dissipating 20 W for an hour on sink S1 in 25 °C air (demo-style test data). */
const DOCUMENT = {
  format: 'junctura-study',
  version: 1,
  title: 'Pass transistor, one hour at 20 W',
  marginK: 20,
  ambient: { temperatureC: 25 },
  sinks: [{ id: 'S1', name: 'main sink', rthKPerW: 2, capacityJPerK: 200 }],
  devices: [{ id: 'Q1', tjMaxC: 150, sink: 'S1', package: { kind: 'lumped', rthKPerW: 1 }, interface: { rthKPerW: 0.5 } }],
  profile: { segments: [{ durationS: 3600, powerW: { Q1: 20 } }] },
};

/**
 * Invented catalogue rows. Steady, the junction sits at Ta + P (Rjc + Rcs + Rsa) (series thermal
 * resistances, Incropera & DeWitt §3.1): Rsa ≤ (130 − 25)/20 − 1.5 = 3.75 K/W meets the 130 °C target.
 */
const CATALOGUE: SinkCandidate[] = [
  { id: '1', name: 'Big extrusion', natural: { rthKPerW: 0.5, referenceRiseK: 75 }, massKg: 1.2, material: 'aluminium', volumeM3: 6e-4, price: 30 },
  { id: '2', name: 'Mid extrusion', natural: { rthKPerW: 1, referenceRiseK: 75, exponent: 1 / 3 }, massKg: 0.5, material: 'aluminium', volumeM3: 4e-4, price: 12 },
  { id: '3', name: 'Light clip', natural: { rthKPerW: 1.6, referenceRiseK: 75 }, massKg: 0.3, material: 'aluminium', volumeM3: 1e-4, price: 15 },
  { id: '4', name: 'Tiny clip', natural: { rthKPerW: 9, referenceRiseK: 75 }, massKg: 0.02, material: 'aluminium', volumeM3: 1e-5, price: 1 },
  { id: '5', name: 'Fan-only cartridge', forcedAir: [{ airSpeedMPerS: 2, rthKPerW: 0.3 }], massKg: 0.4, material: 'aluminium' },
];

/** The server's answer, made by the same core the server uses (with the study's own options, e.g. its site). */
function ranking(document: typeof DOCUMENT, params: Record<string, string>) {
  const setup = rankingSetupFromStudy(parseStudy(document), 'S1');
  const options = { ...setup.options, sortBy: params.sort as SortKey, airSpeedMPerS: Number(params.airSpeed ?? 0) };
  const result = rankSinks(setup.setup, CATALOGUE, options);
  return { sinkId: 'S1', candidates: CATALOGUE.length, options, notes: [], result: JSON.parse(JSON.stringify(result)) };
}

function showStudy(document: typeof DOCUMENT = DOCUMENT) {
  const calls: Record<string, string>[] = [];
  routeApi(mockedApi, {
    'GET /session': () => ok(sessionFor('reviewer')),
    'GET /studies/12': () => ok({ study: { ...STUDIES[1], document } }),
    'GET /studies/12/ranking': (config) => {
      const params = (config as { params: Record<string, string> }).params;
      calls.push(params);
      return ok(ranking(document, params));
    },
    'GET /heatsinks/3': () => ok({ item: LIGHT_CLIP_ROW }),
  });
  const app = renderApp('/studies/12');
  return Object.assign(calls, { app });
}

/** The catalogue row of the light clip, as `GET /api/heatsinks/3` answers. */
const LIGHT_CLIP_ROW = {
  id: 3,
  teamId: 1,
  name: 'Light clip',
  description: '',
  rthKPerW: 1.6,
  referenceRiseK: 75,
  forcedAir: [],
  massKg: 0.3,
  material: 'aluminium',
  capacityJPerK: null,
  widthMm: null,
  lengthMm: null,
  heightMm: null,
  devicesPerSink: 1,
  price: 15,
  notes: '',
  isDemo: false,
  updatedAt: '2025-03-02T09:00:00.000Z',
};

const rowNames = (table: ReturnType<typeof screen.getByLabelText>) =>
  within(table)
    .getAllByRole('link')
    .map((link) => within(link).queryByText(/extrusion|clip|cartridge/)?.props.children as string);

describe('heatsink ranking panel', () => {
  beforeEach(() => jest.clearAllMocks());

  it('lists the passing sinks sorted by mass and highlights the lightest', async () => {
    const calls = showStudy();
    const table = await screen.findByLabelText('Passing heatsinks', undefined, { timeout: 15000 });
    expect(calls[0]).toMatchObject({ sink: 'S1', sort: 'mass', airSpeed: '0' });

    // Tiny clip (9 K/W) cannot meet the 3.75 K/W the steady state needs; the fan-only cartridge has no still-air rating.
    const passing = CATALOGUE.filter((c) => c.natural && c.natural.rthKPerW <= 3.75);
    const byMass = [...passing].sort((a, b) => a.massKg! - b.massKg!).map((c) => c.name);
    expect(rowNames(table)).toEqual(byMass);
    const lightest = screen.getByTestId('ranked-3');
    expect(within(lightest).getByText('Smallest passing')).toBeVisible();
    expect(within(table).getAllByText('Smallest passing')).toHaveLength(1);
    expect(screen.getByTestId('ranking-answer')).toHaveTextContent(/^Smallest passing sink by mass: Light clip, 300 g/);
    // Each still-air row names its law's exponent: the catalogue's, or the laminar 1/4 filled in.
    expect(within(screen.getByTestId('ranked-2')).getByText(/still air, n = 0\.333?, at a .* mean rise/)).toBeVisible();
    expect(within(lightest).getByText(/still air, n = 1\/4 \(default\), at a .* mean rise/)).toBeVisible();
    // At sea level (no site) there is no site line.
    expect(screen.queryByTestId('ranking-site')).toBeNull();

    // Failing and left-out sinks stay folded until asked for, with their margins and reasons.
    fireEvent.press(screen.getByRole('button', { name: 'Show 1 failing sink' }));
    expect(within(screen.getByLabelText('failing sink')).getByText('Tiny clip')).toBeVisible();
    fireEvent.press(screen.getByRole('button', { name: 'Show 1 sink left out' }));
    expect(within(screen.getByLabelText('sink left out')).getByText(/still-air/i)).toBeVisible();
    // Each name opens its catalogue page.
    fireEvent.press(within(lightest).getByRole('link'));
    await waitFor(() => expect(calls.app.getPathname()).toBe('/heatsinks/3'));
    expect(await screen.findByText('Light clip')).toBeVisible();
  });

  it('ranks again by price when asked, and the cheapest passing sink is highlighted', async () => {
    const calls = showStudy();
    await screen.findByLabelText('Passing heatsinks', undefined, { timeout: 15000 });
    fireEvent.press(screen.getByRole('radio', { name: 'Price' }));
    // The ranking waits for a pause in the what-ifs before it asks again.
    await screen.findByText(/^Smallest passing sink by price: /, undefined, { timeout: 5000 });
    expect(calls[calls.length - 1]).toMatchObject({ sort: 'price' });
    const byPrice = CATALOGUE.filter((c) => c.natural && c.natural.rthKPerW <= 3.75)
      .sort((a, b) => a.price! - b.price!)
      .map((c) => c.name);
    expect(rowNames(screen.getByLabelText('Passing heatsinks'))).toEqual(byPrice);
    expect(within(screen.getByTestId('ranked-2')).getByText('Smallest passing')).toBeVisible();
  });

  it('asks with the air speed typed, and names a bad one without asking', async () => {
    const calls = showStudy();
    await screen.findByLabelText('Passing heatsinks', undefined, { timeout: 15000 });
    fireEvent.press(screen.getByRole('radio', { name: 'Moving air' }));
    fireEvent.changeText(screen.getByLabelText('Air speed (m/s)'), 'fast');
    expect(await screen.findByText('Air speed "fast" is not a number')).toBeVisible();
    const before = calls.length;
    fireEvent.changeText(screen.getByLabelText('Air speed (m/s)'), '2 m/s');
    await waitFor(() => expect(calls.length).toBeGreaterThan(before), { timeout: 5000 });
    expect(calls[calls.length - 1]).toMatchObject({ airSpeed: '2' });
    // The unreadable speed never reached the server.
    for (const c of calls) expect(Number.isFinite(Number(c.airSpeed))).toBe(true);
    // At 2 m/s the cartridge's own forced-air point applies: 0.3 K/W, and it passes.
    expect(await screen.findByTestId('ranked-5')).toBeVisible();
  });

  it('says the catalogue was ranked at the study site, with the factor on Rθsa', async () => {
    showStudy({ ...DOCUMENT, site: { altitudeM: 1800 } } as typeof DOCUMENT);
    await screen.findByLabelText('Passing heatsinks', undefined, { timeout: 15000 });
    // Standard atmosphere at 1,800 m: p/p0 ≈ 0.804 (U.S. Standard Atmosphere 1976, from memory);
    // laminar natural convection h ∝ ρ^(1/2), so Rθsa × 1/sqrt(0.804) ≈ 1.12 (PHYSICS.md §5).
    expect(screen.getByTestId('ranking-site')).toHaveTextContent(/^Ranked at 1800\sm: Rθsa × 1\.12 \(air pressure 0\.804 of sea level\)\.$/);
  });

  it('ranks a sink inside an enclosure with the air’s rise counted in the steady answer', async () => {
    showStudy({ ...DOCUMENT, enclosure: { rthKPerW: 1, capacityJPerK: 500 } } as typeof DOCUMENT);
    await screen.findByTestId('ranking-answer', undefined, { timeout: 15000 });
    expect(screen.getByTestId('ranking-enclosure')).toHaveTextContent(/^The sink sheds into the enclosure air, simulated with it: 1\sK\/W to the room, 500\sJ\/K of air and walls\. Each sink’s mean rise is its rise above that air\.$/);
    // Series thermal resistances (Incropera & DeWitt §3.1): all 20 W cross the enclosure wall,
    // 20 × 1 = 20 K, so Rsa ≤ (130 − 25 − 20)/20 − 1.5 = 2.75 K/W.
    expect(screen.getByTestId('ranking-answer')).toHaveTextContent(/needs Rθsa ≤ 2\.75\sK\/W, set by Q1, with the enclosure air 20\sK above the ambient\./);
  });
});
