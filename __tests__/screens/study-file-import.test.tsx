import { fireEvent, screen, waitFor, within } from 'expo-router/testing-library';

import { api } from '@/api/client';
import type { Study } from '@/features/studies/types';

import { sessionFor, STUDIES } from './support/fixtures';
import { ok, routeApi } from './support/http';
import { renderApp } from './support/render-app';

jest.mock('@/api/client', () => ({
  apiBaseUrl: '/api',
  api: { get: jest.fn(), post: jest.fn(), delete: jest.fn() },
}));
// Screens run on the native preset here, which has no file chooser: a button hands over the file.
const mockPicked = { name: 'study.json', size: 0, text: '' };
const mockRead = jest.fn(async () => mockPicked.text);
jest.mock('@/features/study-file/components/study-file-picker', () => {
  const { createElement } = jest.requireActual('react');
  const { Button } = jest.requireActual('@/components/ui');
  return {
    StudyFilePicker: ({ label, onPick }: { label: string; onPick: (file: unknown) => void }) =>
      createElement(Button, { label, onPress: () => onPick({ name: mockPicked.name, size: mockPicked.size, read: mockRead }) }),
  };
});

const mockedApi = api as unknown as Record<'get' | 'post' | 'delete', jest.Mock>;

/** The "Full example" of the study format reference (docs/study-format.md), one pass of its profile. */
const GOOD = {
  format: 'junctura-study',
  version: 1,
  title: 'Pass transistor on a small sink (demo data)',
  description: 'Demo data: invented values.',
  marginK: 20,
  ambient: { temperatureC: 40 },
  sinks: [{ id: 'S1', rthKPerW: 1.1, massKg: 0.2, material: 'aluminium' }],
  devices: [
    {
      id: 'Q1',
      name: 'pass transistor',
      tjMaxC: 150,
      sink: 'S1',
      package: { kind: 'foster', terms: [{ rKPerW: 0.2, tauS: 0.001 }, { rKPerW: 0.5, tauS: 0.05 }] },
      interface: { rthKPerW: 0.3, material: 'silicone pad' },
    },
  ],
  profile: { segments: [{ label: 'warm-up', durationS: 10, powerW: { Q1: 20 } }] },
};

/** A second device whose first Foster term has a negative time constant. */
const BAD = {
  ...GOOD,
  devices: [GOOD.devices[0], { ...GOOD.devices[0], id: 'Q2', package: { kind: 'foster', terms: [{ rKPerW: 0.2, tauS: -0.002 }] } }],
};

function pickFile(content: unknown, size?: number) {
  mockPicked.text = typeof content === 'string' ? content : JSON.stringify(content, null, 2);
  mockPicked.size = size ?? mockPicked.text.length;
  fireEvent.press(screen.getByRole('button', { name: 'Import study file' }));
}

async function openList(role: 'designer' | 'reviewer' = 'designer', extra = {}) {
  routeApi(mockedApi, {
    'GET /session': () => ok(sessionFor(role)),
    'GET /studies': () => ok({ studies: STUDIES }),
    ...extra,
  });
  const app = renderApp('/');
  await screen.findByText(STUDIES[0].title);
  return app;
}

describe('study file import', () => {
  beforeEach(() => jest.clearAllMocks());

  it('refuses a file with a bad field, names the field and creates nothing', async () => {
    await openList();
    pickFile(BAD);

    const panel = await screen.findByTestId('import-study');
    // The message format is the one the study format reference documents for this field.
    expect(await within(panel).findByText('devices[1].package.terms[0].tauS: must be greater than zero, got -0.002 s')).toBeVisible();
    expect(within(panel).getByText('The study file has an error. Nothing was created.')).toBeVisible();
    expect(within(panel).queryByRole('button', { name: 'Create study from file' })).toBeNull();
    expect(mockedApi.post).not.toHaveBeenCalled();
  });

  it('refuses files of another format or version with a plain message', async () => {
    await openList();
    pickFile({ format: 'spreadsheet-export', version: 1, title: 'Not a study' });
    expect(
      await screen.findByText('This is not a Junctura study file: it has "format": "spreadsheet-export", where a study file has "format": "junctura-study".'),
    ).toBeVisible();

    pickFile({ ...GOOD, version: 2 });
    expect(await screen.findByText('This study file is version 2; Junctura reads study files of version 1 only.')).toBeVisible();

    pickFile('{ "format": "junctura-study", ');
    expect(await screen.findByText(/^The file is not JSON: /)).toBeVisible();
    expect(mockedApi.post).not.toHaveBeenCalled();
  });

  it('refuses a file over 2 MB without reading it', async () => {
    await openList();
    pickFile(GOOD, 3 * 1024 * 1024);

    expect(await screen.findByText('The file is 3 MB; a study file can be at most 2 MB.')).toBeVisible();
    expect(mockRead).not.toHaveBeenCalled();
    expect(mockedApi.post).not.toHaveBeenCalled();
  });

  it('previews a good file, creates it in the current team and opens it', async () => {
    const created: Study = { ...STUDIES[0], id: 31, title: GOOD.title, description: GOOD.description, version: 1, document: GOOD, approval: null };
    const app = await openList('designer', {
      'POST /studies': () => ok({ study: created }, 201),
      'GET /studies/31': () => ok({ study: created }),
      'GET /studies/31/reviews': () => ok({ reviews: [] }),
      'GET /studies/31/comments': () => ok({ comments: [] }),
      'GET /studies/31/revisions': () => ok({ revisions: [] }),
    });
    pickFile(GOOD);

    const preview = await screen.findByTestId('import-study-preview');
    expect(within(preview).getByText(GOOD.title)).toBeVisible();
    expect(within(preview).getByText(GOOD.description)).toBeVisible();
    expect(within(preview).getByText('1 pass device entry, 1 sink, 1 profile segment')).toBeVisible();
    expect(mockedApi.post).not.toHaveBeenCalled();

    fireEvent.press(screen.getByRole('button', { name: 'Create study from file' }));
    await waitFor(() =>
      expect(mockedApi.post).toHaveBeenCalledWith('/studies', { title: GOOD.title, description: GOOD.description, document: GOOD, teamId: 1 }),
    );
    await waitFor(() => expect(app.getPathname()).toBe('/studies/31'));
    expect(await screen.findByRole('heading', { name: GOOD.title })).toBeVisible();
  });

  it('is not offered to a reviewer', async () => {
    await openList('reviewer');
    expect(screen.queryByRole('button', { name: 'Import study file' })).toBeNull();
  });
});
