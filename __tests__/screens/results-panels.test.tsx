import fs from 'node:fs';
import path from 'node:path';

import { fireEvent, screen, within } from 'expo-router/testing-library';

import { api } from '@/api/client';
import { evaluateStudy, parseStudy } from '@/core/study';

import { assertInDelta } from '../helpers/assert-in-delta';
import { sessionFor, STUDIES } from './support/fixtures';
import { httpError, ok, routeApi } from './support/http';
import { renderApp } from './support/render-app';

jest.mock('@/api/client', () => ({
  apiBaseUrl: '/api',
  api: { get: jest.fn(), post: jest.fn(), delete: jest.fn() },
}));

const mockedApi = api as unknown as Record<'get' | 'post' | 'delete', jest.Mock>;

// Solving a demo study takes longer than jest's 5 s default on a busy machine.
jest.setTimeout(30_000);

const example = (name: string) => JSON.parse(fs.readFileSync(path.join(__dirname, '../../examples', `${name}.json`), 'utf8'));
const NB = '\u00a0';
const sig3 = (v: number) => String(Number(v.toPrecision(3)));

function showStudy(document: object) {
  routeApi(mockedApi, {
    'GET /session': () => ok(sessionFor('reviewer')),
    'GET /studies/12': () => ok({ study: { ...STUDIES[1], document } }),
    // The ranking panel is tested on its own; here it may fail quietly.
    'GET /studies/12/ranking': () => httpError(409, { error: { code: 'not_rankable', message: 'not ranked in this test' } }),
  });
  renderApp('/studies/12');
}

describe('SOA panel', () => {
  beforeEach(() => jest.clearAllMocks());

  it('names the bench load’s worst point with its share of the allowed current, and warns once about linear mode', async () => {
    const doc = example('bench-electronic-load');
    showStudy(doc);
    const worst = await screen.findByTestId('soa-worst-Q1', undefined, { timeout: 15000 });

    // The 8 A burst starts at 10 + 20 = 30 s; two MOSFETs share it equally, so Ic = 4 A per part at
    // Vce = 30 − 0.4 = 29.6 V (PHYSICS.md §4). Their DC curve follows the thermal line through
    // (2.976 V, 120 A) and (100 V, 3.57 A), so Pmax(25 °C) = 357 W, derated at the case temperature
    // Tc as (Tj,max − Tc)/(Tj,max − 25 °C) with Tj,max 175 °C: Iallowed = Pmax(Tc) / Vce.
    const tc = evaluateStudy(parseStudy(doc)).soa.Q1.worst!.caseC;
    const allowed = (357 * ((175 - tc) / (175 - 25))) / 29.6;
    const share = Math.round((4 / allowed) * 100);
    expect(share).toBe(55);
    expect(worst).toHaveTextContent(
      `Q1: worst point 29.6${NB}V, 4${NB}A at 30${NB}s, ${share}${NB}% of the allowed current, limited by the thermal limit at Tc = ${sig3(tc)}${NB}°C`,
    );
    expect(within(screen.getByTestId('soa-device-Q1')).getByText('SOA passes')).toBeVisible();

    // Switching-type MOSFETs without a DC linear-mode rating working at DC: one warning for both (PHYSICS.md §4).
    const warnings = screen.getAllByTestId('soa-warning-mosfet-linear-mode');
    expect(warnings).toHaveLength(1);
    expect(within(warnings[0]).getByText(/Spirito effect/)).toBeVisible();
    expect(within(warnings[0]).getByText(/Concerns Q1 \(3 stretches from 0\ss\) and Q2 \(3 stretches from 0\ss\)\./)).toBeVisible();
    // Not repeated among the solver warnings above the curves.
    expect(screen.queryByText(/^• Q1: MOSFET in linear mode/)).toBeNull();
  });

  it('moves the heat-curves crosshair to a point’s time when the point is pressed', async () => {
    showStudy(example('bench-electronic-load'));
    const point = await screen.findByRole('button', { name: /^Point at 30\ss, 55 % of the allowed current/ }, { timeout: 15000 });
    fireEvent.press(point);
    expect(within(await screen.findByTestId('heat-curves-readout')).getByText(/^30(\.0)?\ss$/)).toBeVisible();
  });
});

describe('rail-plan panel', () => {
  beforeEach(() => jest.clearAllMocks());

  it('shows the lab supply’s worst case per tap as worked out by hand', async () => {
    const doc = example('lab-supply-two-tap');
    showStudy(doc);
    const table = await screen.findByLabelText('Worst case per tap', undefined, { timeout: 15000 });

    // PHYSICS.md §2: the worst case of a tap sits at the lowest output it serves and its highest current.
    // Low tap: the adapters in parallel, 24.8 V less a 0.7 V diode and 3 A / 2 through 0.12 + 0.05 Ω:
    // 23.845 V at 3 A; it serves down to 0 V. P = (Vin − Vout) I + Vin Iq, Iq = 2 parts × 15 mA (PHYSICS.md §1).
    const iq = 2 * 0.015;
    const low = 23.845 * 3 + 23.845 * iq;
    // High tap: in series, 2 × 24.8 V less 3 A × 2 × 0.12 Ω = 48.88 V; it serves down to θ − h/2 = 21.5 − 0.3 = 21.2 V.
    const high = (48.88 - 21.2) * 3 + 48.88 * iq;
    const plan = evaluateStudy(parseStudy(doc)).railPlan!;
    assertInDelta(plan.worst.taps[0]!.powerW, low, 1e-9, 'low tap worst power');
    assertInDelta(plan.worst.taps[1]!.powerW, high, 1e-9, 'high tap worst power');

    expect(within(table).getAllByText(`${sig3(low)}${NB}W at 0${NB}V, 3${NB}A`).length).toBeGreaterThanOrEqual(1);
    // The high tap's worst is also the whole plan's.
    expect(within(table).getAllByText(`${sig3(high)}${NB}W at 21.2${NB}V, 3${NB}A`)).toHaveLength(2);
    // With the best threshold the high tap reaches lower: θbest − h/2, at the same 48.88 V.
    const best = plan.thresholds[0].bestV;
    const highBest = (48.88 - (best - 0.3)) * 3 + 48.88 * iq;
    expect(within(table).getAllByText(`${sig3(highBest)}${NB}W at ${sig3(best - 0.3)}${NB}V, 3${NB}A`)).toHaveLength(2);
    // The given 21.5 V threshold lies above the best one, and the table says so.
    expect(within(table).getByText(`21.5${NB}V / ${sig3(best)}${NB}V`)).toBeVisible();
    expect(within(table).getByText(/above the best/)).toBeVisible();

    // Break-before-make: ΔV ≈ I · tbreak / Cin = 3 A × 10 ms / 4.7 mF = 6.38 V > 0.6 V hysteresis (PHYSICS.md §2).
    expect(within(screen.getByTestId('rail-chatter')).getByText(/droops 6\.38 V/)).toBeVisible();
    expect(screen.getByText(/^Dissipation of Q1 \(all its parts together\) at each output/)).toBeVisible();
    expect(screen.getByText(/Required: Rθsa ≤ 0\.48\sK\/W with the thresholds given/)).toBeVisible();
    // The selection along the profile: the 30 V segment at 21 min runs on the series tap.
    expect(screen.getByText(`21${NB}min · tap 2, adapters in series`)).toBeVisible();
  });

  it('shows no rail-plan or SOA section for a study without them', async () => {
    const doc = example('onboard-24v-to-5v');
    showStudy(doc);
    await screen.findByTestId('study-verdict', undefined, { timeout: 15000 });
    expect(screen.queryByTestId('rail-plan-panel')).toBeNull();
    expect(screen.queryByTestId('soa-panel')).toBeNull();
  });
});

describe('cautions', () => {
  beforeEach(() => jest.clearAllMocks());

  // PHYSICS.md §7: mains wiring follows local electrical codes and is done by qualified people.
  it('adds the mains-wiring caution when the study is flagged mains-fed', async () => {
    showStudy({ ...example('lab-supply-two-tap'), mainsFed: true });
    expect(await screen.findByTestId('mains-caution', undefined, { timeout: 15000 })).toHaveTextContent(
      /fed from the mains: its mains wiring follows the local electrical codes and is done by qualified people/,
    );
    expect(screen.queryByTestId('mains-hint')).toBeNull();
    expect(screen.getByText(/confirm the margins by measurement/)).toBeVisible();
  });

  it('only prompts for the flag when the text mentions a mains transformer and the flag is absent', async () => {
    const doc = example('lab-supply-two-tap');
    showStudy({ ...doc, description: 'Demo data: fed from a 2 × 24 V mains transformer.' });
    expect(await screen.findByTestId('mains-hint', undefined, { timeout: 15000 })).toHaveTextContent(
      /mentions mains; tick 'Mains-fed' in the study fields if it is/,
    );
    expect(screen.queryByTestId('mains-caution')).toBeNull();
  });

  it('says nothing of the mains when the flag is false, whatever the text says', async () => {
    showStudy({ ...example('lab-supply-two-tap'), mainsFed: false, description: 'Demo data: a mains transformer.' });
    await screen.findByTestId('rail-plan-panel', undefined, { timeout: 15000 });
    expect(screen.queryByTestId('mains-caution')).toBeNull();
    expect(screen.queryByTestId('mains-hint')).toBeNull();
  });

  it('leaves the mains note out for external adapters', async () => {
    showStudy(example('lab-supply-two-tap'));
    await screen.findByTestId('rail-plan-panel', undefined, { timeout: 15000 });
    expect(screen.queryByTestId('mains-caution')).toBeNull();
  });
});
