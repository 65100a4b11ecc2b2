import { fireEvent, screen, waitFor, within } from 'expo-router/testing-library';

import { api } from '@/api/client';
import { parseStudy } from '@/core/study';
import { runTolerance, type ToleranceSpec } from '@/core/tolerance';

import { sessionFor, STUDIES } from './support/fixtures';
import { httpError, ok, routeApi } from './support/http';
import { renderApp } from './support/render-app';

jest.mock('@/api/client', () => ({
  apiBaseUrl: '/api',
  api: { get: jest.fn(), post: jest.fn(), delete: jest.fn() },
}));

const mockedApi = api as unknown as Record<'get' | 'post' | 'delete', jest.Mock>;

// Solving the study view's own panels and the sweep takes longer than jest's 5 s default.
jest.setTimeout(30_000);

/**
 * One invented device (demo-style test data) with no heat capacity anywhere: Tj follows the
 * power at once, Tj = Ta + P (Rjc + Rcs + Rsa) (series thermal resistances, textbook).
 */
const DOCUMENT = {
  format: 'junctura-study',
  version: 1,
  title: 'Pass transistor at 20 W',
  marginK: 20,
  ambient: { temperatureC: 25 },
  sinks: [{ id: 'S1', rthKPerW: 2 }],
  devices: [{ id: 'Q1', tjMaxC: 150, sink: 'S1', package: { kind: 'lumped', rthKPerW: 1 }, interface: { rthKPerW: 0.5 } }],
  profile: { segments: [{ durationS: 60, powerW: { Q1: 20 } }] },
};

function showStudy() {
  const bodies: Record<string, unknown>[] = [];
  routeApi(mockedApi, {
    'GET /session': () => ok(sessionFor('reviewer')),
    'GET /studies/12': () => ok({ study: { ...STUDIES[1], document: DOCUMENT } }),
    'GET /studies/12/ranking': () => httpError(409, { error: { code: 'no_catalogue', message: 'No catalogue in this test' } }),
    // The server's answer, made by the same core the server runs.
    'POST /studies/12/tolerance': (body) => {
      bodies.push(body as Record<string, unknown>);
      const result = runTolerance(parseStudy(DOCUMENT), body as ToleranceSpec);
      return ok({ version: 3, result: JSON.parse(JSON.stringify(result)) });
    },
  });
  renderApp('/studies/12');
  return bodies;
}

const field = (label: string) => within(screen.getByTestId('tolerance-panel')).getByLabelText(label);

describe('tolerance panel', () => {
  beforeEach(() => jest.clearAllMocks());

  it('sweeps the corners and names the worst one in words', async () => {
    const bodies = showStudy();
    await screen.findByTestId('tolerance-panel', undefined, { timeout: 15000 });
    fireEvent.press(screen.getByRole('radio', { name: 'Corners' }));
    fireEvent.press(screen.getByRole('button', { name: 'Run sweep' }));
    const answer = await screen.findByTestId('tolerance-answer', undefined, { timeout: 15000 });
    // Line and share have nothing to act on here, so 2^5 corners; the worst is every resistance,
    // the ambient and the load high: 35 + 21 × (1.1 + 0.6 + 2.3) = 119 °C, 11 K below the 130 °C target.
    expect(bodies[0]).toMatchObject({ mode: 'corners', rthJcPct: 10, rthSaPct: 15, interfacePct: 20, ambientLowK: -5, ambientHighK: 10, loadPct: 5 });
    expect(
      within(answer).getByText('Worst of 32 corners: Q1 peaks at 119 °C, 11 K below its target, with Rθjc +10 %, Rθsa +15 %, Interface Rθcs +20 %, Ambient +10 K, Load current +5 %.'),
    ).toBeVisible();
    expect(within(answer).getByText('Line voltage left out: the profile has no electrical segment and the study no rail plan.')).toBeVisible();
    // Tj is linear in each input here, so each main effect is its swing: the ambient's 15 K range,
    // then Rθsa's 20 W × 2 K/W × 0.3 = 12 K (series sum, textbook).
    const bars = within(answer).getByLabelText('Inputs by their pull on the peak');
    const items = within(bars).getAllByLabelText(/: [+−][\d.]+ K$/);
    expect(items.slice(0, 2).map((i) => i.props['aria-label'])).toEqual(['Ambient: +15.0 K', 'Rθsa: +12.0 K']);
    // The chart draws once it knows its width.
    fireEvent(within(answer).getByTestId('tolerance-histogram'), 'layout', { nativeEvent: { layout: { x: 0, y: 0, width: 360, height: 200 } } });
    expect(within(answer).getByLabelText('Histogram of the peak junction temperature of Q1 over 32 runs, with its target 130 °C and Tj,max 150 °C')).toBeTruthy();
  });

  it('runs Monte Carlo with the typed spreads, seed and distribution', async () => {
    const bodies = showStudy();
    await screen.findByTestId('tolerance-panel', undefined, { timeout: 15000 });
    fireEvent.changeText(field('Rθsa spread (± %)'), '±50 %');
    fireEvent.changeText(field('Ambient high (K)'), '20 K');
    fireEvent.changeText(field('Runs (count)'), '400');
    fireEvent.changeText(field('Seed (whole number)'), '7');
    fireEvent.press(screen.getByRole('radio', { name: 'Uniform' }));
    fireEvent.press(screen.getByRole('button', { name: 'Run sweep' }));
    const answer = await screen.findByTestId('tolerance-answer', undefined, { timeout: 15000 });
    // The hottest build, 45 + 21 × (1.1 + 0.6 + 3) = 143.7 °C, is over the 130 °C target: some runs pass it.
    expect(bodies[0]).toMatchObject({ mode: 'monte-carlo', rthSaPct: 50, ambientHighK: 20, runs: 400, seed: 7, distributions: { rthSa: 'uniform', ambient: 'uniform' } });
    const expected = runTolerance(parseStudy(DOCUMENT), bodies[0] as ToleranceSpec);
    const t = expected.anyExceedTarget;
    expect(t.count).toBeGreaterThan(0);
    expect(within(answer).getByText(new RegExp(`^A junction went above its target in ${t.count} of 400 runs`))).toBeVisible();
    expect(within(answer).getByText(/400 runs, seed 7, solved on the server/)).toBeVisible();
  });

  it('names a field that does not read and sends nothing, keeping the text', async () => {
    const bodies = showStudy();
    await screen.findByTestId('tolerance-panel', undefined, { timeout: 15000 });
    fireEvent.changeText(field('Rθsa spread (± %)'), 'lots');
    fireEvent.changeText(field('Runs (count)'), '50000');
    fireEvent.press(screen.getByRole('button', { name: 'Run sweep' }));
    expect(await within(screen.getByTestId('tolerance-panel')).findByText('"lots" is not a percentage')).toBeVisible();
    expect(within(screen.getByTestId('tolerance-panel')).getByText('Runs must be at most 20,000')).toBeVisible();
    expect(field('Rθsa spread (± %)')).toHaveProp('value', 'lots');
    await waitFor(() => expect(bodies).toHaveLength(0));
  });
});
