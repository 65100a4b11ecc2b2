import { fireEvent, screen, waitFor, within } from 'expo-router/testing-library';

import { api } from '@/api/client';
import { flatPlateAtPower, flatPlateAtRise, plateFinCandidate, plateFinNaturalAtPower, type PlateFinGeometry } from '@/core/heatsink';

import { assertInDelta, assertInRelDelta } from '../helpers/assert-in-delta';
import { sessionFor } from './support/fixtures';
import { ok, routeApi } from './support/http';
import { renderApp } from './support/render-app';

jest.mock('@/api/client', () => ({
  apiBaseUrl: '/api',
  api: { get: jest.fn(), post: jest.fn(), put: jest.fn(), delete: jest.fn() },
}));

const mockedApi = api as unknown as Record<'get' | 'post' | 'put' | 'delete', jest.Mock>;

jest.setTimeout(30_000);

/** The form's starting extrusion: 100 × 75 mm base 5 mm thick, ten fins 25 × 2 mm, anodised-like ε 0.85. */
const START: PlateFinGeometry = {
  baseWidthM: 0.1,
  lengthM: 0.075,
  baseThicknessM: 0.005,
  finCount: 10,
  finHeightM: 0.025,
  finThicknessM: 0.002,
  material: 'aluminium',
  emissivity: 0.85,
};

const kPerW = (v: number) => `${Number(v.toPrecision(3))}\u00a0K/W`;

function open(role: 'designer' | 'reviewer' = 'designer', url = '/heatsinks/design') {
  const posted: Record<string, unknown>[] = [];
  routeApi(mockedApi, {
    'GET /session': () => ok(sessionFor(role)),
    'GET /heatsinks': () => ok({ items: [] }),
    'POST /heatsinks': (body) => {
      posted.push(body as Record<string, unknown>);
      return ok({ item: { ...(body as object), id: 99, teamId: 1, isDemo: false, updatedAt: '2025-03-02T09:00:00.000Z' } }, 201);
    },
    'GET /heatsinks/99': () => ok({ item: { ...posted[0], id: 99, teamId: 1, isDemo: false, updatedAt: '2025-03-02T09:00:00.000Z' } }),
  });
  const app = renderApp(url);
  return { app, posted };
}

describe('design a sink from geometry', () => {
  beforeEach(() => jest.clearAllMocks());

  it('opens from the heatsink library', async () => {
    const { app } = open('designer', '/heatsinks');
    fireEvent.press(await screen.findByRole('button', { name: 'Design from geometry' }));
    await waitFor(() => expect(app.getPathname()).toBe('/heatsinks/design'));
    expect(await screen.findByRole('heading', { name: 'Design from geometry' })).toBeVisible();
  });

  it('shows the still-air Rθsa the core gives for the same inputs, and follows edits with units', async () => {
    open();
    const estimate = await screen.findByTestId('plate-fin-estimate');
    expect(within(estimate).getByText(kPerW(plateFinNaturalAtPower(START, 20, { ambientC: 25 }).rsaKPerW))).toBeVisible();

    // Lengths take SI prefixes: 0.1 m is the same 100 mm; 14 fins change the estimate.
    fireEvent.changeText(screen.getByLabelText('Base width (mm)'), '0.1 m');
    fireEvent.changeText(screen.getByLabelText('Fin count'), '14');
    const fourteen = plateFinNaturalAtPower({ ...START, finCount: 14 }, 20, { ambientC: 25 });
    expect(await within(screen.getByTestId('plate-fin-estimate')).findByText(kPerW(fourteen.rsaKPerW))).toBeVisible();
    // The same rise is found again from the power: Rθsa × P (thermal Ohm's law).
    expect(within(screen.getByTestId('plate-fin-estimate')).getByText(new RegExp(`${Number((fourteen.rsaKPerW * 20).toPrecision(3))}\\sK rise`))).toBeVisible();
  });

  it('names the field at fault, in the form’s words', async () => {
    open();
    await screen.findByTestId('plate-fin-estimate');
    fireEvent.changeText(screen.getByLabelText('Fin thickness (mm)'), 'thin');
    expect(await screen.findByText('Fin thickness "thin" is not a number')).toBeVisible();
    fireEvent.changeText(screen.getByLabelText('Fin thickness (mm)'), '2');
    // 60 fins of 2 mm need 120 mm: more than the 100 mm base.
    fireEvent.changeText(screen.getByLabelText('Fin count'), '60');
    expect(await screen.findByText(/^Fin count: 60 fins of 2 mm do not fit on a 100 mm base/)).toBeVisible();
    expect(screen.queryByTestId('plate-fin-estimate')).toBeNull();
  });

  it('saves the extrusion to the catalogue with its rating, mass and notes, then opens it', async () => {
    const { app, posted } = open();
    await screen.findByTestId('plate-fin-estimate');
    fireEvent.changeText(screen.getByLabelText('Name'), 'Test extrusion (estimate)');
    fireEvent.press(screen.getByRole('button', { name: 'Save to catalogue' }));
    await waitFor(() => expect(posted).toHaveLength(1));
    const body = posted[0];

    const { candidate } = plateFinCandidate(START, { id: 'x', referenceRiseK: 50, airSpeedsMPerS: [1, 2, 4], ambientC: 25 });
    expect(body).toMatchObject({ teamId: 1, name: 'Test extrusion (estimate)', referenceRiseK: 50, material: 'aluminium', devicesPerSink: 1 });
    assertInRelDelta(body.rthKPerW as number, candidate.natural!.rthKPerW, 1e-12, 'Rθsa at 50 K');
    // The model's own exponent, n = ln(R(25 K)/R(50 K)) / ln 2, goes with the sink: near the
    // laminar 1/4 (Incropera & DeWitt ch. 9, from memory) for this extrusion.
    assertInRelDelta(body.convectionExponent as number, candidate.natural!.exponent!, 1e-12, 'exponent');
    assertInDelta(body.convectionExponent as number, 0.25, 0.05, 'exponent near laminar');
    expect(body.forcedAir).toEqual(candidate.forcedAir);
    // Metal: the base W·L·tb plus the fins N·t·H·L = 37.5 + 37.5 cm³ = 75 cm³; at 2700 kg/m³ that is
    // 202.5 g, and × 900 J/(kg·K) 182.25 J/K (aluminium, Incropera & DeWitt Table A.1, rounded for 6063).
    assertInDelta(body.massKg as number, 0.2025, 1e-9, 'mass');
    assertInDelta(body.capacityJPerK as number, 182.25, 1e-6, 'heat capacity');
    expect(body).toMatchObject({ widthMm: 100, lengthMm: 75 });
    assertInDelta(body.heightMm as number, 30, 1e-9, 'height: base and fins');
    expect(body.notes).toMatch(/^Estimate from geometry, not a measurement/);
    expect(body.notes).toMatch(/Bar-Cohen & Rohsenow/);
    expect((body.notes as string).length).toBeLessThanOrEqual(4000);

    await waitFor(() => expect(app.getPathname()).toBe('/heatsinks/99'));
  });

  it('estimates a copper area with the core’s flat-plate model', async () => {
    open();
    fireEvent.press(await screen.findByRole('radio', { name: 'Flat plate or PCB copper' }));
    const estimate = await screen.findByTestId('flat-plate-estimate');
    // 50 × 40 mm of 1 oz copper (35 µm), both faces, solder mask ε 0.9, shedding 2 W in 25 °C air.
    const core = flatPlateAtPower({ heightM: 0.05, widthM: 0.04, thicknessM: 35e-6, material: 'copper', emissivity: 0.9, faces: 2 }, 2, { ambientC: 25 });
    expect(within(estimate).getByText(kPerW(core.rsaKPerW))).toBeVisible();
    expect(within(estimate).getByText(new RegExp(`about ${Number(core.rsaWithSpreadingKPerW.toPrecision(3))}\\sK/W`))).toBeVisible();
  });

  it('saves a copper area with the rise exponent of its own model', async () => {
    const { posted } = open();
    fireEvent.press(await screen.findByRole('radio', { name: 'Flat plate or PCB copper' }));
    await screen.findByTestId('flat-plate-estimate');
    fireEvent.press(screen.getByRole('button', { name: 'Save to catalogue' }));
    await waitFor(() => expect(posted).toHaveLength(1));
    const body = posted[0];
    // Rated at the form's 50 K: n through the model's Rθsa (spreading included) at 25 K and 50 K
    // on Rθ(ΔT) = Rθref (ΔTref/ΔT)^n (Incropera & DeWitt ch. 9, from memory).
    const g = { heightM: 0.05, widthM: 0.04, thicknessM: 35e-6, material: 'copper' as const, emissivity: 0.9, faces: 2 as const };
    const at50 = flatPlateAtRise(g, 50, { ambientC: 25 });
    const at25 = flatPlateAtRise(g, 25, { ambientC: 25 });
    expect(body).toMatchObject({ referenceRiseK: 50, material: 'copper' });
    assertInRelDelta(body.rthKPerW as number, at50.rsaWithSpreadingKPerW, 1e-12, 'Rθsa at 50 K');
    assertInRelDelta(body.convectionExponent as number, Math.log(at25.rsaWithSpreadingKPerW / at50.rsaWithSpreadingKPerW) / Math.LN2, 1e-9, 'exponent');
    // Radiation, hr = εσ(Ts² + T∞²)(Ts + T∞) (Incropera & DeWitt eq. 1.9), grows by only
    // (323² + 298²)(621) → (348² + 298²)(646), ×1.131, from 25 K to 50 K (n ≈ 0.18, hand value),
    // and a thin copper area spreads worse as h grows: n lies below the laminar 1/4.
    expect(body.convectionExponent).toBeGreaterThan(0);
    expect(body.convectionExponent).toBeLessThan(0.25);
    expect(body.notes).toMatch(/rise exponent n = 0\.\d+ is kept as the sink's convection exponent/);
  });

  it('lets reviewers estimate but not save', async () => {
    open('reviewer');
    await screen.findByTestId('plate-fin-estimate');
    expect(screen.queryByRole('button', { name: 'Save to catalogue' })).toBeNull();
    expect(screen.getByText(/Owners and designers of the team can save/)).toBeVisible();
  });
});
