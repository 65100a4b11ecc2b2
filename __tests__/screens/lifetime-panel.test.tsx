import fs from 'node:fs';
import path from 'node:path';

import { fireEvent, screen, within } from 'expo-router/testing-library';

import { Rect, Text as SvgText } from 'react-native-svg';

import { api } from '@/api/client';
import { evaluateStudy, parseStudy } from '@/core/study';

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
    'GET /studies/12/ranking': () => httpError(409, { error: { code: 'not_rankable', message: 'not ranked in this test' } }),
  });
  renderApp('/studies/12');
}

describe('life, touch and site panel', () => {
  beforeEach(() => jest.clearAllMocks());

  it('shows the on-board regulator’s life, its cycle histogram, the touch verdict and the site', async () => {
    const doc = example('onboard-24v-to-5v');
    showStudy(doc);
    const device = await screen.findByTestId('lifetime-U1', undefined, { timeout: 20000 });
    const result = evaluateStudy(parseStudy(doc));
    const life = result.lifetime!.devices.U1;

    // Four sessions a day of the 1,100 s run, each from a cold start (the demo's mission).
    expect(result.lifetime!.repeatsPerDay).toBe(4);
    // Shown to two significant digits, in months below a year.
    const months = String(Number((life.lifeYears! * 12).toPrecision(2)));
    expect(within(device).getByText(new RegExp(`^U1: about ${months} months to the end of its power-cycling life`))).toBeVisible();
    fireEvent(screen.getByTestId('cycle-histogram-U1'), 'layout', { nativeEvent: { layout: { width: 360, height: 190, x: 0, y: 0 } } });
    const chart = screen.getByLabelText('Rainflow cycles of U1 by junction swing');
    // Bars holding 10 % or more of the damage carry their share.
    const heavy = life.histogram.damageShare.filter((s) => s >= 0.1);
    expect(heavy.length).toBeGreaterThan(0);
    const svgTexts = within(chart).UNSAFE_getAllByType(SvgText).map((t) => String(t.props.children));
    for (const share of heavy) expect(svgTexts).toContain(`${Math.round(share * 100)}${NB}%`);
    // One bar per non-empty bin of the histogram.
    expect(within(chart).UNSAFE_getAllByType(Rect)).toHaveLength(life.histogram.counts.filter((c) => c > 0).length);
    // The warm-up from 40 °C ambient to the 165 °C shutdown trip is the largest swing: 125 K, half a cycle
    // per session (ASTM E1049 §5.4.4 residue), about (40 + 165)/2 = 102.5 °C.
    const table = within(device).getByLabelText('Most damaging cycles of U1');
    expect(within(table).getByText(`ΔTj 125${NB}K about 103${NB}°C`)).toBeVisible();

    // Bare metal touched briefly: 60 °C (IEC 62368-1 touch table, from memory); the copper reaches far more.
    const touch = screen.getByLabelText('Touch temperature by sink');
    expect(within(touch).getByText(`60${NB}°C`)).toBeVisible();
    expect(within(touch).getByText('too hot')).toBeVisible();
    expect(screen.getByTestId('touch-warning')).toHaveTextContent(new RegExp(`PCB reaches ${sig3(result.sinks.PCB.peakC)}\\s°C \\(limit 60\\s°C\\)`));
    expect(screen.getByText(/The applicable safety standard and local codes decide\./)).toBeVisible();

    // 1,800 m: p/p0 = (1 − 0.0065 H/288.15)^5.2559 with H = 6,356,766 × 1800/(6,356,766 + 1800) m
    // (U.S. Standard Atmosphere 1976) = 0.8043; laminar natural convection raises Rθsa by 1/√0.8043 = 1.115.
    const H = (6356766 * 1800) / (6356766 + 1800);
    const ratio = Math.pow(1 - (0.0065 * H) / 288.15, 5.25588);
    expect(screen.getByText(new RegExp(`^Site at 1800\\sm: air pressure ${sig3(ratio)} of sea level \\(standard atmosphere\\); Rθsa raised: PCB ×${sig3(1 / Math.sqrt(ratio))}`))).toBeVisible();
  });

  it('adds the cold-start cycle of a periodic study: from the ambient up to the period’s junction peak', async () => {
    const doc = { ...example('bench-electronic-load'), lifetime: { mission: { hoursPerDay: 8, startsPerDay: 1 } } };
    showStudy(doc);
    const device = await screen.findByTestId('lifetime-Q1', undefined, { timeout: 20000 });
    const result = evaluateStudy(parseStudy(doc));
    // A periodic result starts in its periodic steady state, so its peak is the period's peak (PHYSICS.md §3).
    const range = result.devices.Q1.peakJunctionC - result.ambient.minC;
    expect(within(device).getByText(new RegExp(`^Each cold start adds a ΔTj ${sig3(range)}\\sK cycle`))).toBeVisible();
    expect(screen.queryByText('Touch temperature')).toBeNull();
  });

  it('leaves the panel out for a study without site, lifetime or touch', async () => {
    const { site: _site, lifetime: _lifetime, touch: _touch, ...doc } = example('onboard-24v-to-5v');
    showStudy(doc);
    await screen.findByTestId('study-verdict', undefined, { timeout: 20000 });
    expect(screen.queryByText('Life, touch and site')).toBeNull();
    expect(screen.queryByTestId('lifetime-U1')).toBeNull();
  });
});
