import { fireEvent, screen, within } from 'expo-router/testing-library';

import { api } from '@/api/client';

import { sessionFor, STUDIES } from './support/fixtures';
import { ok, routeApi } from './support/http';
import { renderApp } from './support/render-app';

jest.mock('@/api/client', () => ({
  apiBaseUrl: '/api',
  api: { get: jest.fn(), post: jest.fn(), delete: jest.fn() },
}));

const mockedApi = api as unknown as Record<'get' | 'post' | 'delete', jest.Mock>;

const RUN_S = 4000;

/**
 * One device with a massless lumped package on a sink of 100 J/K: the junction follows
 * Ta + P·(Rjc + Rcs) + P·Rsa·(1 − e^(−t/τ)) with τ = Rsa·C = 200 s (series thermal resistances
 * and the lumped-capacitance step response: Incropera & DeWitt, Fundamentals of Heat and Mass
 * Transfer, §3.1 and §5.1). After 4000 s = 20 τ it sits at the steady state
 * Ta + P·(Rjc + Rcs + Rsa) to within P·Rsa·e^(−20) ≈ 1e-7 K.
 */
function lumpedStudy(powerW: number, extraSegments: object[] = []) {
  return {
    format: 'junctura-study',
    version: 1,
    title: 'Lumped pass transistor on a small sink',
    marginK: 20,
    ambient: { temperatureC: 40 },
    sinks: [{ id: 'HS1', rthKPerW: 2, capacityJPerK: 100 }],
    devices: [
      {
        id: 'Q1',
        name: 'pass transistor',
        tjMaxC: 150,
        sink: 'HS1',
        package: { kind: 'lumped', rthKPerW: 1.5 },
        interface: { rthKPerW: 0.5 },
        electrical: { currentLimit: { points: [{ differentialV: 0, currentA: 1 }] } },
      },
    ],
    profile: { segments: [...extraSegments, { durationS: RUN_S, powerW: { Q1: powerW } }] },
  };
}

function showStudy(document: object) {
  routeApi(mockedApi, {
    'GET /session': () => ok(sessionFor('reviewer')),
    'GET /studies/12': () => ok({ study: { ...STUDIES[1], document } }),
  });
  renderApp('/studies/12');
}

const cell = (table: ReturnType<typeof screen.getByLabelText>, text: string) => expect(within(table).getByText(text)).toBeVisible();

describe('study results', () => {
  beforeEach(() => jest.clearAllMocks());

  it('passes with the hand-worked margin and fills the device and sink tables', async () => {
    // 20 W: Tj = 40 + 20 × (1.5 + 0.5 + 2) = 120 °C; target = 150 − 20 = 130 °C, margin 10 K,
    // at the end of the run (4000 s = 66.7 min). Case = 40 + 20 × (0.5 + 2) = 90 °C; sink = 40 + 20 × 2 = 80 °C.
    showStudy(lumpedStudy(20));

    expect(
      await screen.findByText('Passes: 10\u00a0K margin to the 130\u00a0°C target at the worst point, Q1 at 66.7\u00a0min', undefined, { timeout: 5000 }),
    ).toBeVisible();

    const devices = screen.getByLabelText('Devices');
    cell(devices, '120\u00a0°C'); // peak junction
    cell(devices, '90\u00a0°C'); // peak case
    cell(devices, '30\u00a0K'); // to Tj,max: 150 − 120
    cell(devices, '10\u00a0K'); // to target: 130 − 120
    cell(devices, 'never'); // time above target
    cell(devices, '20\u00a0W peak');
    cell(devices, '20\u00a0W average');
    expect(within(devices).getAllByText('at 66.7\u00a0min').length).toBe(2);

    const sinks = screen.getByLabelText('Sinks');
    cell(sinks, '80\u00a0°C');
    cell(sinks, '2\u00a0K/W');
    // Above about 60 °C a sink can burn on contact (PHYSICS.md §7, common practice).
    expect(screen.getByText(/HS1 reaches 80 °C/)).toBeVisible();
    expect(screen.getByText(/confirm the margins by measurement/)).toBeVisible();
    expect(screen.getByRole('button', { name: 'Download curves (CSV)' })).toBeVisible();
  });

  it('fails by the hand-worked excess and counts the time above the target', async () => {
    // 25 W: Tj = 40 + 25 × 4 = 140 °C, 10 K over the 130 °C target (still 10 K under Tj,max).
    // Tj(t) = 90 + 50(1 − e^(−t/200)) reaches 130 °C at t = 200 ln 5 = 321.9 s, so it stays above
    // for 4000 − 321.9 = 3678 s = 61.3 min.
    showStudy(lumpedStudy(25));

    expect(
      await screen.findByText('Fails: Q1 exceeds its 130\u00a0°C target by 10\u00a0K at 66.7\u00a0min', undefined, { timeout: 5000 }),
    ).toBeVisible();
    expect(screen.getByText('Q1 spends 61.3\u00a0min at or above its target.')).toBeVisible();
    const devices = screen.getByLabelText('Devices');
    cell(devices, '140\u00a0°C');
    cell(devices, '-10\u00a0K');
    cell(devices, '61.3\u00a0min');
  });

  it('lists a current-limit event and moves the crosshair to its time when pressed', async () => {
    // 100 s of no load, then 2 A asked of a part limited to 1 A: the limit clamps from 100 s.
    // Over the 4100 s run the read-out is in minutes: 100 s = 1.67 min, shown to 0.1 min.
    showStudy(lumpedStudy(0, [{ durationS: 100, powerW: { Q1: 0 } }, { durationS: 50, vinV: 12, voutV: 5, iloadA: 2 }]));

    const event = await screen.findByRole('button', { name: /Current limit, Q1 at 100.0 s/ }, { timeout: 5000 });
    expect(screen.getByText(/1 A delivered of 2 A asked, 7 V across, for 50 s/)).toBeVisible();

    fireEvent.press(event);

    expect(within(await screen.findByTestId('heat-curves-readout')).getByText('1.7\u00a0min')).toBeVisible();
  });
});
