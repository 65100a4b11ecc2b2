import { router } from 'expo-router';
import { act, fireEvent, screen, waitFor, within } from 'expo-router/testing-library';

import { api } from '@/api/client';
import type { Heatsink } from '@/features/heatsinks/types';

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
  const file = { name: 'vendor.csv', size: 2048, blob: new Blob(['Part\n'], { type: 'text/csv' }) };
  return {
    FilePicker: ({ label, onPick }: { label: string; onPick: (f: unknown) => void }) => createElement(Button, { label, onPress: () => onPick(file) }),
  };
});

const mockedApi = api as unknown as Record<'get' | 'post' | 'put' | 'delete', jest.Mock>;

/** Invented test sinks. */
const base: Omit<Heatsink, 'id' | 'name' | 'rthKPerW' | 'widthMm' | 'lengthMm' | 'heightMm' | 'massKg'> = {
  teamId: 1,
  description: '',
  referenceRiseK: 75,
  convectionExponent: null,
  forcedAir: [],
  material: 'aluminium',
  capacityJPerK: null,
  devicesPerSink: 1,
  price: null,
  notes: '',
  isDemo: false,
  updatedAt: '2025-03-02T09:00:00.000Z',
};
const SINKS: Heatsink[] = [
  { ...base, id: 1, name: 'Tall fin', rthKPerW: 1.1, widthMm: 40, lengthMm: 50, heightMm: 60, massKg: 0.21 },
  { ...base, id: 2, name: 'Flat plate', rthKPerW: 2.5, widthMm: 100, lengthMm: 100, heightMm: 5, massKg: 0.084, isDemo: true },
  { ...base, id: 3, name: 'Unknown size', rthKPerW: 4, widthMm: null, lengthMm: null, heightMm: null, massKg: null },
  {
    ...base,
    id: 4,
    name: 'Wide extrusion',
    rthKPerW: 0.6,
    widthMm: 120,
    lengthMm: 100,
    heightMm: 40,
    massKg: 1.4,
    convectionExponent: 0.33,
    forcedAir: [{ airSpeedMPerS: 2, rthKPerW: 0.25 }],
  },
];

const PREVIEW = {
  columns: ['Part', 'Rth (K/W)', 'Mass (g)', 'rth_k_per_w_at_2_m_s'],
  delimiter: ',',
  rowCount: 3,
  firstRows: [
    ['PV-A', '1.2', '150', '0.6'],
    ['PV-B', 'abc', '200', ''],
    ['PV-C', '0.9', '-5', '0.45'],
  ],
  suggestedMapping: { name: { column: 'Part' }, rthKPerW: { column: 'Rth (K/W)', unit: 'K/W' }, massKg: { column: 'Mass (g)', unit: 'g' }, forcedAir: [{ column: 'rth_k_per_w_at_2_m_s', airSpeedMPerS: 2 }] },
  fields: [
    { field: 'name', label: 'Name', kind: 'text' },
    { field: 'rthKPerW', label: 'Rθsa', kind: 'quantity', units: ['K/W', '°C/W', 'C/W'], defaultUnit: 'K/W' },
    { field: 'massKg', label: 'Mass', kind: 'quantity', units: ['g', 'kg'], defaultUnit: 'g' },
  ],
};

describe('heatsink catalogue', () => {
  beforeEach(() => jest.clearAllMocks());

  it('shows a reviewer the library and its export but no way to change it', async () => {
    routeApi(mockedApi, {
      'GET /session': () => ok(sessionFor('reviewer')),
      'GET /heatsinks': () => ok({ items: SINKS }),
      'GET /heatsinks/4': () => ok({ item: SINKS[3] }),
    });
    renderApp('/heatsinks');

    expect(await screen.findByTestId('heatsink-card-2')).toBeVisible();
    expect(screen.getByRole('button', { name: 'Export CSV' })).toBeVisible();
    expect(screen.queryByRole('button', { name: 'New heatsink' })).toBeNull();
    expect(screen.queryByRole('button', { name: 'Import CSV' })).toBeNull();

    act(() => router.push('/heatsinks/4'));
    expect(await screen.findByText('Wide extrusion')).toBeVisible();
    expect(screen.getByText('Rθsa 0.25\u00a0K/W at 2\u00a0m/s')).toBeVisible();
    expect(screen.queryByRole('button', { name: 'Edit' })).toBeNull();
    expect(screen.queryByRole('button', { name: 'Delete' })).toBeNull();
  });

  it('gives a designer edit and delete, with a confirmation before deleting', async () => {
    routeApi(mockedApi, {
      'GET /session': () => ok(sessionFor('designer')),
      'GET /heatsinks/4': () => ok({ item: SINKS[3] }),
      'DELETE /heatsinks/4': () => ok(undefined, 204),
      'GET /heatsinks': () => ok({ items: SINKS.slice(0, 3) }),
    });
    const app = renderApp('/heatsinks/4');

    expect(await screen.findByRole('button', { name: 'Edit' })).toBeVisible();
    fireEvent.press(screen.getByRole('button', { name: 'Delete' }));
    expect(mockedApi.delete).not.toHaveBeenCalled();
    fireEvent.press(await screen.findByRole('button', { name: 'Delete heatsink' }));

    expect(await screen.findByTestId('heatsink-card-1')).toBeVisible();
    expect(mockedApi.delete).toHaveBeenCalledWith('/heatsinks/4');
    expect(app.getPathname()).toBe('/heatsinks');
  });

  it('shows mass and size in readable units and sorts by envelope volume, unknown sizes last', async () => {
    routeApi(mockedApi, {
      'GET /session': () => ok(sessionFor('designer')),
      'GET /heatsinks': () => ok({ items: SINKS }),
    });
    renderApp('/heatsinks');

    // 0.084 kg = 84 g (1 kg = 1000 g, BIPM SI Brochure); below a kilogram the card reads in grams.
    const flat = await screen.findByTestId('heatsink-card-2');
    expect(within(flat).getByText(/84 g · 100 × 100 × 5 mm/)).toBeVisible();
    expect(within(flat).getByText('Demo')).toBeVisible();

    fireEvent.press(screen.getByRole('radio', { name: 'Volume' }));
    // W × L × H: 40·50·60 = 120,000 mm³; 100·100·5 = 50,000 mm³; 120·100·40 = 480,000 mm³.
    const order = screen.getAllByTestId(/^heatsink-card-/).map((card) => card.props.testID);
    expect(order).toEqual(['heatsink-card-2', 'heatsink-card-1', 'heatsink-card-4', 'heatsink-card-3']);
  });

  it('shows each sink’s convection exponent, the laminar 1/4 where the catalogue gives none', async () => {
    routeApi(mockedApi, {
      'GET /session': () => ok(sessionFor('reviewer')),
      'GET /heatsinks': () => ok({ items: SINKS }),
      'GET /heatsinks/4': () => ok({ item: SINKS[3] }),
      'GET /heatsinks/1': () => ok({ item: SINKS[0] }),
    });
    renderApp('/heatsinks');
    // Laminar natural convection, h ∝ ΔT^(1/4) (Incropera & DeWitt ch. 9, from memory): the default.
    expect(within(await screen.findByTestId('heatsink-card-1')).getByText('Exponent n 1/4 (default)')).toBeVisible();
    expect(within(screen.getByTestId('heatsink-card-4')).getByText('Exponent n 0.33')).toBeVisible();

    act(() => router.push('/heatsinks/4'));
    expect(await screen.findByText('Convection exponent n')).toBeVisible();
    expect(screen.getByText('0.33')).toBeVisible();
    act(() => router.push('/heatsinks/1'));
    expect(await screen.findByText('1/4 (default)')).toBeVisible();
  });

  it('edits the exponent, fits it from a second still-air rating, and saves it with the sink', async () => {
    const puts: Record<string, unknown>[] = [];
    routeApi(mockedApi, {
      'GET /session': () => ok(sessionFor('designer')),
      'GET /heatsinks/1': () => ok({ item: SINKS[0] }),
      'PUT /heatsinks/1': (body) => {
        puts.push(body as Record<string, unknown>);
        return ok({ item: { ...SINKS[0], ...(body as object) } });
      },
      'GET /heatsinks': () => ok({ items: SINKS }),
    });
    renderApp('/heatsinks/1/edit');

    const field = await screen.findByLabelText('Convection exponent n');
    expect(field.props.value).toBe('');
    fireEvent.changeText(field, '1.5');
    fireEvent.press(screen.getByRole('button', { name: 'Save changes' }));
    expect(await screen.findByText('Convection exponent must lie in 0…1 (1/4 for laminar natural convection)')).toBeVisible();
    expect(puts).toHaveLength(0);
    expect(screen.getByLabelText('Convection exponent n').props.value).toBe('1.5');

    // Turbulent natural convection, h ∝ ΔT^(1/3) (Incropera & DeWitt ch. 9, from memory): a sink
    // rated 1.1 K/W at 75 K reads 1.1 × 2^(1/3) = 1.385906 K/W at 37.5 K (hand value).
    fireEvent.press(screen.getByRole('button', { name: 'Fit n from a second still-air rating' }));
    fireEvent.changeText(screen.getByLabelText('Rθsa of the second rating, K/W'), '1.385906');
    fireEvent.changeText(screen.getByLabelText('Rise of the second rating, K'), '37.5');
    fireEvent.press(await screen.findByRole('button', { name: 'Use n = 0.333' }));
    expect(screen.getByLabelText('Convection exponent n').props.value).toBe('0.333');
    fireEvent.press(screen.getByRole('button', { name: 'Save changes' }));

    await waitFor(() => expect(puts).toHaveLength(1));
    expect(puts[0].convectionExponent).toBe(0.333);
  });

  it('offers no fit when the second rating gives n outside 0…1 or repeats the reference rise', async () => {
    routeApi(mockedApi, {
      'GET /session': () => ok(sessionFor('designer')),
      'GET /heatsinks/1': () => ok({ item: SINKS[0] }),
    });
    renderApp('/heatsinks/1/edit');
    fireEvent.press(await screen.findByRole('button', { name: 'Fit n from a second still-air rating' }));
    // 1.1 K/W at 75 K and 1.2 K/W at 150 K: Rθsa rising with the rise, n = ln(1.1/1.2)/ln 2 = −0.126.
    fireEvent.changeText(screen.getByLabelText('Rθsa of the second rating, K/W'), '1.2');
    fireEvent.changeText(screen.getByLabelText('Rise of the second rating, K'), '150');
    expect(await screen.findByText('n = -0.126 lies outside 0…1: check both ratings (Rθsa should fall as the rise grows).')).toBeVisible();
    expect(screen.queryByRole('button', { name: /^Use n = / })).toBeNull();
    fireEvent.changeText(screen.getByLabelText('Rise of the second rating, K'), '75');
    expect(await screen.findByText('Needs a rise other than the reference rise')).toBeVisible();
    expect(screen.queryByRole('button', { name: /^Use n = / })).toBeNull();
  });

  it('lists every row problem of a refused import and says that nothing was saved', async () => {
    const details = [
      { path: 'row 3, Rth (K/W)', row: 3, column: 'Rth (K/W)', message: '"abc" is not a thermal resistance' },
      { path: 'row 4, Mass (g)', row: 4, column: 'Mass (g)', message: 'Mass must be greater than 0' },
    ];
    routeApi(mockedApi, {
      'GET /session': () => ok(sessionFor('designer')),
      'POST /heatsinks/import/preview': () => ok(PREVIEW),
      'POST /heatsinks/import': () =>
        httpError(400, {
          error: { code: 'import_failed', message: 'Nothing was imported: 2 problem(s) in the file, the first at row 3, column "Rth (K/W)": "abc" is not a thermal resistance', details },
        }),
    });
    renderApp('/heatsinks/import');

    fireEvent.press(await screen.findByRole('button', { name: 'Choose a CSV file' }));
    expect(await screen.findByText('PV-B')).toBeVisible();
    fireEvent.press(screen.getByRole('button', { name: 'Import 3 rows' }));

    expect(await screen.findByText('Nothing was saved.')).toBeVisible();
    const first = screen.getByTestId('row-error-0');
    expect(within(first).getByText('3')).toBeVisible();
    expect(within(first).getByText('Rth (K/W)')).toBeVisible();
    expect(within(first).getByText('"abc" is not a thermal resistance')).toBeVisible();
    const second = screen.getByTestId('row-error-1');
    expect(within(second).getByText('4')).toBeVisible();
    expect(within(second).getByText('Mass must be greater than 0')).toBeVisible();
    expect(screen.queryByText(/Imported \d/)).toBeNull();

    // The mapping sent is the suggested one, forced-air column included, for the current team.
    const form = mockedApi.post.mock.calls.find(([url]) => url === '/heatsinks/import')![1] as FormData;
    expect(JSON.parse(String(form.get('mapping')))).toEqual({
      name: { column: 'Part' },
      rthKPerW: { column: 'Rth (K/W)', unit: 'K/W' },
      massKg: { column: 'Mass (g)', unit: 'g' },
      forcedAir: [{ column: 'rth_k_per_w_at_2_m_s', airSpeedMPerS: 2 }],
    });
    expect(form.get('teamId')).toBe('1');
    expect(form.get('file')).toBeInstanceOf(Blob);
  });

  it('says how many rows an accepted import saved', async () => {
    routeApi(mockedApi, {
      'GET /session': () => ok(sessionFor('owner')),
      'POST /heatsinks/import/preview': () => ok(PREVIEW),
      'POST /heatsinks/import': () => ok({ imported: 3, teamId: 1 }, 201),
    });
    renderApp('/heatsinks/import');

    fireEvent.press(await screen.findByRole('button', { name: 'Choose a CSV file' }));
    fireEvent.press(await screen.findByRole('button', { name: 'Import 3 rows' }));

    expect(await screen.findByText('Imported 3 heatsinks into Test Lab.')).toBeVisible();
    expect(screen.queryByText('Nothing was saved.')).toBeNull();
  });
});
