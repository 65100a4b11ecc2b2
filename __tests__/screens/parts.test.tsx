import { router } from 'expo-router';
import { act, fireEvent, screen, within } from 'expo-router/testing-library';

import { api } from '@/api/client';
import type { Part, ZthFitResponse } from '@/features/parts/types';

import { sessionFor } from './support/fixtures';
import { httpError, ok, routeApi } from './support/http';
import { renderApp } from './support/render-app';

jest.mock('@/api/client', () => ({
  apiBaseUrl: '/api',
  api: { get: jest.fn(), post: jest.fn(), put: jest.fn(), delete: jest.fn() },
}));
// Screens run on the native preset here, which has no file chooser: a button hands over the file.
jest.mock('@/features/catalogues/components/file-picker', () => {
  const { createElement } = jest.requireActual('react');
  const { Button } = jest.requireActual('@/components/ui');
  const file = { name: 'datasheet.csv', size: 512, blob: new Blob(['t (ms),Zth (°C/W)\n'], { type: 'text/csv' }) };
  return {
    FilePicker: ({ label, onPick }: { label: string; onPick: (f: unknown) => void }) => createElement(Button, { label, onPress: () => onPick(file) }),
  };
});

const mockedApi = api as unknown as Record<'get' | 'post' | 'put' | 'delete', jest.Mock>;

/** Invented test parts. */
const base = { teamId: 1, description: '', notes: '', zthPoints: null, zthFit: null, isDemo: false, updatedAt: '2025-03-02T09:00:00.000Z' };
const REGULATOR: Part = {
  ...base,
  id: 1,
  name: 'TR-5 test regulator',
  kind: 'regulator',
  packageName: 'TO-220',
  tjMaxC: 125,
  thermal: { kind: 'foster', terms: [{ rKPerW: 0.5, tauS: 0.002 }, { rKPerW: 1.5, tauS: 0.3 }] },
  electrical: { iqA: 0.005, dropout: { points: [{ currentA: 0, voltageV: 1.2 }, { currentA: 1, voltageV: 1.8 }] } },
  soa: null,
  isDemo: true,
};
const NPN: Part = {
  ...base,
  id: 2,
  name: 'TB-15 test NPN',
  kind: 'bipolar',
  packageName: 'TO-247',
  tjMaxC: 150,
  thermal: { kind: 'foster', terms: [{ rKPerW: 0.05, tauS: 0.0002 }, { rKPerW: 0.15, tauS: 0.003 }, { rKPerW: 0.3, tauS: 0.04 }, { rKPerW: 0.33, tauS: 0.5 }] },
  electrical: { iqA: 0.02 },
  soa: { kind: 'parameters', transistor: 'bipolar', tjMaxC: 150, icMaxA: 15, vceoV: 140, rthJcKPerW: 0.83 },
};
const MOSFET: Part = {
  ...base,
  id: 3,
  name: 'TM-60 test MOSFET',
  kind: 'mosfet',
  packageName: 'TO-247',
  tjMaxC: 175,
  thermal: { kind: 'lumped', rthKPerW: 0.5, capacityJPerK: 0.4 },
  electrical: null,
  soa: {
    kind: 'points',
    transistor: 'mosfet',
    tjMaxC: 175,
    linearMode: { dcRated: false, longestRatedPulseS: 0.01 },
    curves: [
      { pulseS: 0.001, points: [{ vceV: 1, icA: 80 }, { vceV: 10, icA: 40 }, { vceV: 60, icA: 4 }] },
      { pulseS: 'dc', points: [{ vceV: 1, icA: 60 }, { vceV: 5, icA: 20 }, { vceV: 60, icA: 0.5 }] },
    ],
  },
};
const PARTS = [REGULATOR, NPN, MOSFET];

/** Zth(t) = Σ R (1 − e^(−t/τ)) of an invented two-term Foster set (PHYSICS.md §3), as a datasheet curve would read. */
const FIT_TERMS = [{ rKPerW: 0.1, tauS: 0.001 }, { rKPerW: 0.4, tauS: 0.05 }];
const FIT: ZthFitResponse = {
  points: [1e-4, 1e-3, 0.01, 0.1, 1].map((timeS) => ({ timeS, zthKPerW: FIT_TERMS.reduce((z, t) => z + t.rKPerW * (1 - Math.exp(-timeS / t.tauS)), 0) })),
  fit: {
    terms: FIT_TERMS,
    rmsRelativeError: 0.012,
    maxRelativeError: 0.034,
    maxErrorTimeS: 0.01,
    warning: 'The points stop before the curve levels off: Rθjc is extrapolated.',
    grid: { tauMinS: 1e-5, tauMaxS: 10, perDecade: 4 },
  },
};

/** Gives a chart its width, as a window does on layout. */
function layOut(testID: string, index = 0) {
  fireEvent(screen.getAllByTestId(testID)[index], 'layout', { nativeEvent: { layout: { width: 360, height: 280, x: 0, y: 0 } } });
}

describe('parts library', () => {
  beforeEach(() => jest.clearAllMocks());

  it('shows a reviewer the library, its filter and a part with its charts, but no way to change them', async () => {
    routeApi(mockedApi, {
      'GET /session': () => ok(sessionFor('reviewer')),
      'GET /parts': () => ok({ items: PARTS }),
      'GET /parts/2': () => ok({ item: NPN }),
    });
    renderApp('/parts');

    const regulator = await screen.findByTestId('part-card-1');
    expect(within(regulator).getByText('Demo')).toBeVisible();
    // Rθjc of a Foster set is the sum of its R (Zth(∞) = Σ R, PHYSICS.md §3): 0.05 + 0.15 + 0.3 + 0.33 = 0.83 K/W.
    expect(within(screen.getByTestId('part-card-2')).getByText('Tj,max 150\u00a0°C · Rθjc 0.83\u00a0K/W')).toBeVisible();
    expect(screen.getByRole('button', { name: 'Export CSV' })).toBeVisible();
    expect(screen.queryByRole('button', { name: 'New part' })).toBeNull();
    expect(screen.queryByRole('button', { name: 'Import CSV' })).toBeNull();

    fireEvent.press(screen.getByRole('radio', { name: 'MOSFET' }));
    expect(screen.getAllByTestId(/^part-card-/).map((c) => c.props.testID)).toEqual(['part-card-3']);

    act(() => router.push('/parts/2'));
    expect(await screen.findByText('TB-15 test NPN')).toBeVisible();
    expect(screen.queryByRole('button', { name: 'Edit' })).toBeNull();
    expect(screen.queryByRole('button', { name: 'Delete' })).toBeNull();
    // The Foster set is shown with its Cauer ladder: as many stages as terms (PHYSICS.md §3), three cells each, and the reason in one line.
    expect(within(screen.getByTestId('cauer-ladder')).getAllByRole('cell')).toHaveLength(4 * 3);
    expect(screen.getByTestId('foster-note')).toHaveTextContent(/case at a fixed temperature/);
    layOut('soa-chart-area');
    expect(screen.getByLabelText('Safe operating area, Ic against Vce: DC, 25 °C case; DC, 100 °C case')).toBeTruthy();
  });

  it('fits a Zth CSV, shows the residual and the warning, fills the terms and saves them with the points', async () => {
    let saved: Record<string, unknown> | undefined;
    routeApi(mockedApi, {
      'GET /session': () => ok(sessionFor('designer')),
      'POST /parts/zth-fit': () => ok(FIT),
      'POST /parts': (body) => {
        saved = body as Record<string, unknown>;
        return ok({ item: { ...base, ...(body as object), id: 9 } }, 201);
      },
      'GET /parts/9': () => ok({ item: { ...base, ...saved, id: 9 } }),
    });
    const app = renderApp('/parts/new');

    fireEvent.changeText(await screen.findByLabelText('Name'), 'Fitted test part');
    fireEvent.press(screen.getByRole('button', { name: 'Fit Zth from CSV' }));

    // 0.012 = 1.2 %, 0.034 = 3.4 %; 0.01 s = 10 ms (SI prefix milli, BIPM SI Brochure Table 7).
    expect(await screen.findByTestId('zth-fit-residual')).toHaveTextContent('Residual: rms 1.2\u00a0%, largest 3.4\u00a0% at 10\u00a0ms');
    expect(screen.getByText(FIT.fit.warning!)).toBeVisible();
    fireEvent.press(screen.getByRole('button', { name: 'Use these terms' }));

    expect(screen.getByLabelText('R of term 1 (K/W)').props.value).toBe('0.1');
    expect(screen.getByLabelText('τ of term 2 (s)').props.value).toBe('50 ms');
    fireEvent.press(screen.getByRole('button', { name: 'Add part' }));

    expect(await screen.findByText('Fitted test part')).toBeVisible();
    expect(app.getPathname()).toBe('/parts/9');
    expect(saved).toMatchObject({ teamId: 1, name: 'Fitted test part', kind: 'bipolar', tjMaxC: 150, thermal: { kind: 'foster', terms: FIT_TERMS }, zthPoints: FIT.points, zthFit: FIT.fit });
  });

  it('reads SOA points from a CSV, shows the curves on the chart and saves them in the model', async () => {
    const curves = [
      { pulseS: 'dc', points: [{ vceV: 1, icA: 50 }, { vceV: 8, icA: 30 }, { vceV: 80, icA: 1 }] },
      { pulseS: 0.001, points: [{ vceV: 1, icA: 90 }, { vceV: 12, icA: 45 }, { vceV: 80, icA: 5 }] },
    ];
    let saved: Record<string, unknown> | undefined;
    routeApi(mockedApi, {
      'GET /session': () => ok(sessionFor('designer')),
      'GET /parts/3': () => ok({ item: MOSFET }),
      'POST /parts/soa-points': () => ok({ curves }),
      'PUT /parts/3': (body) => {
        saved = body as Record<string, unknown>;
        return ok({ item: { ...MOSFET, ...(body as object) } });
      },
    });
    const app = renderApp('/parts/3/edit');

    fireEvent.press(await screen.findByRole('button', { name: 'SOA points from CSV' }));
    const table = await screen.findByTestId('soa-csv-curves');
    expect(within(table).getByText('DC')).toBeVisible();
    expect(within(table).getByText('1\u00a0ms pulse')).toBeVisible();
    const panel = screen.getByTestId('soa-csv-panel');
    fireEvent(within(panel).getByTestId('soa-chart-area'), 'layout', { nativeEvent: { layout: { width: 360, height: 280, x: 0, y: 0 } } });
    // DC at 25 °C and derated at 100 °C, then the 1 ms curve at 25 °C.
    expect(within(panel).getByLabelText('SOA curves from datasheet.csv')).toBeTruthy();
    expect(within(panel).getByText('1 ms pulse, 25 °C case')).toBeVisible();

    fireEvent.press(screen.getByRole('button', { name: 'Use these curves' }));
    expect(screen.getByLabelText('Curve 2: pulse').props.value).toBe('1 ms');
    fireEvent.press(screen.getByRole('button', { name: 'Save changes' }));

    expect(await screen.findByRole('button', { name: 'Edit' })).toBeVisible();
    expect(app.getPathname()).toBe('/parts/3');
    expect(saved?.soa).toEqual({ kind: 'points', transistor: 'mosfet', tjMaxC: 175, linearMode: { dcRated: false, longestRatedPulseS: 0.01 }, curves });
  });

  it('shows a refused SOA value at its field: the shared check before sending, the server’s path error after', async () => {
    let puts = 0;
    routeApi(mockedApi, {
      'GET /session': () => ok(sessionFor('designer')),
      'GET /parts/2': () => ok({ item: NPN }),
      'PUT /parts/2': () => {
        puts += 1;
        // Whatever rule the server applies, it names the field by its path (docs/study-format.md, validation errors).
        return httpError(400, {
          error: { code: 'validation_failed', message: 'soa.vceoV: must be at most the rating this library allows', details: [{ path: 'soa.vceoV', message: 'must be at most the rating this library allows' }] },
        });
      },
    });
    renderApp('/parts/2/edit');

    fireEvent.changeText(await screen.findByLabelText('Ic,max (A)'), '-1');
    fireEvent.press(screen.getByRole('button', { name: 'Save changes' }));
    // Ic,max is a current limit and must be positive (PHYSICS.md §4); the SOA core says so at soa.icMaxA.
    expect(await within(screen.getByTestId('field-soa.icMaxA')).findByText(/must be > 0, got -1/)).toBeVisible();
    expect(puts).toBe(0);

    fireEvent.changeText(screen.getByLabelText('Ic,max (A)'), '15');
    fireEvent.press(screen.getByRole('button', { name: 'Save changes' }));
    expect(await within(screen.getByTestId('field-soa.vceoV')).findByText('must be at most the rating this library allows')).toBeVisible();
    expect(puts).toBe(1);
    expect(screen.getByTestId('part-form-problems')).toHaveTextContent(/SOA, Vceo: must be at most/);
  });
  it('imports simple parts from CSV with their Rθjc column, and holds the import until that column is chosen', async () => {
    const preview = {
      columns: ['Part', 'Kind', 'Tj max (°C)', 'Rth_jc (K/W)'],
      delimiter: ',',
      rowCount: 2,
      firstRows: [
        ['IP-1', 'bipolar', '150', '1.5'],
        ['IP-2', 'mosfet', '175', '0.4'],
      ],
      suggestedMapping: { name: { column: 'Part' }, kind: { column: 'Kind' }, tjMaxC: { column: 'Tj max (°C)', unit: '°C' } },
      fields: [
        { field: 'name', label: 'Name', kind: 'text' },
        { field: 'kind', label: 'Kind', kind: 'choice' },
        { field: 'tjMaxC', label: 'Tj,max', kind: 'quantity', units: ['°C', 'C'], defaultUnit: '°C' },
      ],
    };
    routeApi(mockedApi, {
      'GET /session': () => ok(sessionFor('designer')),
      'POST /parts/import/preview': () => ok(preview),
      'POST /parts/import': () => ok({ imported: 2, teamId: 1 }, 201),
    });
    renderApp('/parts/import');

    fireEvent.press(await screen.findByRole('button', { name: 'Choose a CSV file' }));
    expect(await screen.findByText('IP-2')).toBeVisible();
    // The suggestion found no Rθjc column: the import waits for it.
    expect(screen.getByText(/Choose the column that holds Rθjc/)).toBeVisible();
    expect(screen.getByRole('button', { name: 'Import 2 rows' })).toBeDisabled();

    fireEvent.press(screen.getByRole('button', { name: 'Column for Rθjc (K/W)' }));
    fireEvent.press(screen.getByRole('radio', { name: 'Rth_jc (K/W)' }));
    fireEvent.press(screen.getByRole('button', { name: 'Import 2 rows' }));
    expect(await screen.findByText('Imported 2 parts into Test Lab.')).toBeVisible();

    // The server takes Rθjc as `rthJcKPerW: { column }` beside the plain fields (parts import API).
    const form = mockedApi.post.mock.calls.find(([url]) => url === '/parts/import')![1] as FormData;
    expect(JSON.parse(String(form.get('mapping')))).toEqual({
      name: { column: 'Part' },
      kind: { column: 'Kind' },
      tjMaxC: { column: 'Tj max (°C)', unit: '°C' },
      rthJcKPerW: { column: 'Rth_jc (K/W)' },
    });
    expect(form.get('teamId')).toBe('1');
  });
});
