import { fireEvent, screen, waitFor } from 'expo-router/testing-library';

import { api } from '@/api/client';
import type { CatalogueSink } from '@/features/study-editor/catalogue-copy';
import { clearDrafts } from '@/features/study-editor/draft-storage';

import { editableStudy } from './support/editor-fixtures';
import { ok, routeApi } from './support/http';
import { renderApp } from './support/render-app';
import { sessionAs } from './support/teamwork-fixtures';

jest.mock('@/api/client', () => ({
  apiBaseUrl: '/api',
  api: { get: jest.fn(), post: jest.fn(), put: jest.fn(), delete: jest.fn() },
}));

const mockedApi = api as unknown as Record<'get' | 'post' | 'put' | 'delete', jest.Mock>;

// The editor mounts every field of the study at once; on a busy machine that takes seconds.
jest.setTimeout(20_000);

/** Invented catalogue sinks: one with its own exponent, one with the default (null). */
const entry = (id: number, name: string, convectionExponent: number | null): CatalogueSink => ({
  id,
  name,
  rthKPerW: 1.4,
  referenceRiseK: 75,
  convectionExponent,
  forcedAir: [],
  massKg: 0.15,
  material: 'aluminium',
  capacityJPerK: null,
  isDemo: false,
});
const CATALOGUE = [entry(7, 'Radiating plate', 0.33), entry(8, 'Plain extrusion', null)];

type SavedSink = { id: string; rthKPerW: number; naturalConvection?: { referenceRiseK: number; exponent?: number } };

async function pickAndSave(name: string): Promise<SavedSink> {
  const puts: { document: { sinks: SavedSink[] } }[] = [];
  routeApi(mockedApi, {
    'GET /session': () => ok(sessionAs('designer')),
    'GET /studies/21': () => ok({ study: editableStudy() }),
    'GET /heatsinks': () => ok({ items: CATALOGUE }),
    'PUT /studies/21': (body) => {
      puts.push(body as (typeof puts)[number]);
      return ok({ study: { ...editableStudy(4), document: (body as { document: unknown }).document } });
    },
  });
  renderApp('/studies/21/edit');
  await screen.findByText('Editing from version 3');
  fireEvent.press(screen.getByRole('button', { name: /^Thermal path/ }));
  fireEvent.press(screen.getByRole('button', { name: 'S1 from the heatsink catalogue' }));
  fireEvent.press(await screen.findByRole('button', { name: `Choose ${name}` }));
  fireEvent.press(await screen.findByRole('button', { name: 'Copy into S1' }));
  expect(await screen.findByText(`Copied from “${name}”. Later changes in the catalogue do not reach this study.`)).toBeVisible();
  fireEvent.press(screen.getByRole('button', { name: 'Save' }));
  await waitFor(() => expect(puts).toHaveLength(1));
  return puts[0].document.sinks[0];
}

describe('a catalogue sink picked into the thermal path', () => {
  beforeEach(() => {
    jest.clearAllMocks();
    clearDrafts(21);
  });

  it('writes the catalogue’s convection exponent into the sink’s naturalConvection', async () => {
    // docs/study-format.md, sinks[]: naturalConvection { referenceRiseK, exponent 0…1 }.
    expect(await pickAndSave('Radiating plate')).toMatchObject({ id: 'S1', rthKPerW: 1.4, naturalConvection: { referenceRiseK: 75, exponent: 0.33 } });
  });

  it('lists a catalogue sink’s own exponent in the picker, and none for one at the default', async () => {
    routeApi(mockedApi, {
      'GET /session': () => ok(sessionAs('designer')),
      'GET /studies/21': () => ok({ study: editableStudy() }),
      'GET /heatsinks': () => ok({ items: CATALOGUE }),
    });
    renderApp('/studies/21/edit');
    await screen.findByText('Editing from version 3');
    fireEvent.press(screen.getByRole('button', { name: /^Thermal path/ }));
    fireEvent.press(screen.getByRole('button', { name: 'S1 from the heatsink catalogue' }));
    await screen.findByRole('button', { name: 'Choose Radiating plate' });
    expect(screen.getByText('1.4 K/W at 75 K · n = 0.33 · 150 g aluminium')).toBeVisible();
    expect(screen.getByText('1.4 K/W at 75 K · 150 g aluminium')).toBeVisible();
  });

  it('keeps the sink’s own exponent when the catalogue gives none', async () => {
    // The study fixture's sink states exponent 0.25, the laminar 1/4 (Incropera & DeWitt ch. 9).
    expect(await pickAndSave('Plain extrusion')).toMatchObject({ id: 'S1', rthKPerW: 1.4, naturalConvection: { referenceRiseK: 75, exponent: 0.25 } });
  });
});
