import { fireEvent, screen, waitFor, within } from 'expo-router/testing-library';

import { api } from '@/api/client';
import { parseStudy } from '@/core/study';
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

/** Presses one option of a choice row inside the site, life and touch section. */
const choose = (option: string) => fireEvent.press(within(screen.getByTestId('section-site')).getByRole('radio', { name: option }));

describe('study editor: site, life and touch', () => {
  beforeEach(() => {
    jest.clearAllMocks();
    clearDrafts(21);
  });

  it('sets the site altitude, the hours a day and an own touch limit, and saves a document the parser reads', async () => {
    const puts: { document: unknown }[] = [];
    routeApi(mockedApi, {
      'GET /session': () => ok(sessionAs('designer')),
      'GET /studies/21': () => ok({ study: editableStudy() }),
      'PUT /studies/21': (body) => {
        puts.push(body as { document: unknown });
        return ok({ study: { ...editableStudy(4), document: (body as { document: unknown }).document } });
      },
    });
    renderApp('/studies/21/edit');
    await screen.findByText('Editing from version 3');
    fireEvent.press(screen.getByRole('button', { name: /^Site, life and touch/ }));

    choose('At an altitude');
    // SI prefixes (BIPM, The International System of Units, 9th ed., Table 7): k = 10³.
    fireEvent.changeText(screen.getByLabelText('Site altitude (m)'), '2 km');
    choose('Hours a day');
    fireEvent.changeText(screen.getByLabelText('Mission hours a day'), '10');
    choose('Own limit');
    fireEvent.changeText(screen.getByLabelText('Touch limit (°C)'), '55');
    fireEvent.press(screen.getByRole('button', { name: 'Save' }));

    await waitFor(() => expect(puts).toHaveLength(1));
    const doc = puts[0].document as Record<string, unknown>;
    expect(doc.site).toEqual({ altitudeM: 2000 });
    expect(doc.lifetime).toEqual({ mission: { hoursPerDay: 10 } });
    expect(doc.touch).toEqual({ limitC: 55 });
    const parsed = parseStudy(doc);
    expect(parsed.touch!.sinks[parsed.sinks[0].id].limitC).toBe(55);
  });

  it('names a mission of more than 24 hours at its field and keeps what was typed', async () => {
    routeApi(mockedApi, {
      'GET /session': () => ok(sessionAs('designer')),
      'GET /studies/21': () => ok({ study: editableStudy() }),
    });
    renderApp('/studies/21/edit');
    await screen.findByText('Editing from version 3');
    fireEvent.press(screen.getByRole('button', { name: /^Site, life and touch/ }));
    choose('Hours a day');
    fireEvent.changeText(screen.getByLabelText('Mission hours a day'), '30');
    // The study parser's rule (docs/study-format.md, lifetime.mission.hoursPerDay: 0–24 h).
    expect(await screen.findAllByText(/must be at most 24 h, got 30 h/)).not.toHaveLength(0);
    expect(screen.getByTestId('problem-list')).toHaveTextContent(/Mission hours a day: must be at most 24 h, got 30 h/);
    expect(screen.getByLabelText('Mission hours a day')).toHaveProp('aria-invalid', true);
    expect(screen.getByLabelText('Mission hours a day').props.value).toBe('30');
    // Going back to no estimate drops the whole lifetime entry.
    choose('Not estimated');
    await waitFor(() => expect(screen.queryByLabelText('Mission hours a day')).toBeNull());
  });
});
