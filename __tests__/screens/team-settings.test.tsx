import { fireEvent, screen, waitFor, within } from 'expo-router/testing-library';

import { api } from '@/api/client';
import { clearDrafts } from '@/features/study-editor/draft-storage';
import { EMPTY_STUDY_DEFAULTS, type StudyDefaults } from '@/core/study';

import { httpError, ok, routeApi } from './support/http';
import { renderApp } from './support/render-app';
import { editableStudy } from './support/editor-fixtures';
import { PEOPLE, sessionAs } from './support/teamwork-fixtures';

jest.mock('@/api/client', () => ({
  apiBaseUrl: '/api',
  api: { get: jest.fn(), post: jest.fn(), put: jest.fn(), patch: jest.fn(), delete: jest.fn() },
}));

const mockedApi = api as unknown as Record<'get' | 'post' | 'put' | 'patch' | 'delete', jest.Mock>;

const settingsBody = (settings: Partial<StudyDefaults>, version = 1) => ({
  teamId: 1,
  settings: { ...EMPTY_STUDY_DEFAULTS, ...settings },
  version,
  updatedAt: '2025-03-04T10:00:00.000Z',
  updatedBy: { id: PEOPLE.owner.id, name: PEOPLE.owner.name },
});

describe('team settings screen', () => {
  beforeEach(() => jest.clearAllMocks());

  it('is reached from the team screen', async () => {
    routeApi(mockedApi, {
      'GET /session': () => ok(sessionAs('designer')),
      'GET /teams/1/members': () => ok({ members: [] }),
    });
    renderApp('/team');
    expect(await screen.findByText('Team settings (read-only)')).toBeVisible();
  });

  it('shows a designer every default read-only with its source', async () => {
    routeApi(mockedApi, {
      'GET /session': () => ok(sessionAs('designer')),
      'GET /teams/1/settings': () => ok(settingsBody({ marginK: 25, marginSource: 'lab design rule 4', touchMaterial: 'plastic', touchContact: 'short', touchSource: 'enclosure spec (demo data)' })),
    });
    renderApp('/team-settings');

    expect(await screen.findByText(/Only owners change the team settings/)).toBeVisible();
    const margin = screen.getByTestId('default-marginK');
    expect(within(margin).getByText('25 K')).toBeVisible();
    expect(within(margin).getByText('Team default · lab design rule 4')).toBeVisible();
    // Unset: the built-in LESIT fit, A = 640 (Held et al. 1997, from memory, as src/core/reliability/constants.ts cites it).
    const coefficient = screen.getByTestId('default-cyclingCoefficient');
    expect(within(coefficient).getByText('640')).toBeVisible();
    expect(within(coefficient).getByText(/built in: LESIT fit, Held et al\. 1997/)).toBeVisible();
    // IEC 62368-1 TS1, plastic held up to 1 min: 60 °C (from memory, docs/study-format.md).
    expect(within(screen.getByTestId('default-touch')).getByText('Plastic, up to 1 min: 60 °C')).toBeVisible();
    expect(screen.getByText(/Changing them later does not change studies already started/)).toBeVisible();
    expect(screen.queryByRole('button', { name: 'Save team settings' })).toBeNull();
  });

  it('lets an owner set a margin with its unit and refuses a negative one naming the reason', async () => {
    routeApi(mockedApi, {
      'GET /session': () => ok(sessionAs('owner')),
      'GET /teams/1/settings': () => ok({ ...settingsBody({}, 0), updatedAt: null, updatedBy: null }),
      'PUT /teams/1/settings': (body) => ok(settingsBody(body as StudyDefaults, 1)),
    });
    renderApp('/team-settings');

    const margin = await screen.findByLabelText('Margin (K)');
    expect(screen.getByText(/No owner has changed them yet/)).toBeVisible();
    fireEvent.changeText(margin, '-3');
    fireEvent.press(screen.getByRole('button', { name: 'Save team settings' }));
    // The study parser's own rule for marginK (docs/study-format.md: number ≥ 0).
    expect(await screen.findByText('must not be negative, got -3 K')).toBeVisible();
    expect(mockedApi.put).not.toHaveBeenCalled();

    fireEvent.changeText(margin, '25 K');
    fireEvent.changeText(screen.getAllByLabelText('Source')[0], 'lab design rule 4');
    fireEvent.press(screen.getByRole('button', { name: 'Save team settings' }));
    await waitFor(() => expect(mockedApi.put).toHaveBeenCalledTimes(1));
    expect(mockedApi.put.mock.calls[0][0]).toBe('/teams/1/settings');
    expect(mockedApi.put.mock.calls[0][1]).toMatchObject({ marginK: 25, marginSource: 'lab design rule 4', siteAltitudeM: null, lifetimeInNewStudies: false });
    expect(await screen.findByText(/Saved\. Studies started from now on take these defaults/)).toBeVisible();
  });

  it('shows another owner’s earlier save beside the typed changes and saves them on top when asked', async () => {
    // Optimistic concurrency (common practice): the form names the version it read; a 409 keeps what was typed.
    let puts = 0;
    routeApi(mockedApi, {
      'GET /session': () => ok(sessionAs('owner')),
      'GET /teams/1/settings': () => ok(settingsBody({}, 3)),
      'PUT /teams/1/settings': (body) =>
        ++puts === 1
          ? httpError(409, {
              error: { code: 'version_conflict', message: 'Another owner saved the team settings first (now version 4); your changes are not saved yet' },
              current: { ...settingsBody({ marginK: 30, marginSource: 'plant rule (demo data)' }, 4), updatedBy: { id: 99, name: 'Dana Other' } },
            })
          : ok(settingsBody(body as StudyDefaults, 5)),
    });
    renderApp('/team-settings');

    fireEvent.changeText(await screen.findByLabelText('Margin (K)'), '25');
    fireEvent.press(screen.getByRole('button', { name: 'Save team settings' }));
    const conflict = await screen.findByTestId('team-settings-conflict');
    expect(within(conflict).getByText(/^Dana Other saved the team settings first \(now version 4\)\. Your changes are still in the form/)).toBeVisible();
    expect(within(conflict).getByText(/30 K/)).toBeVisible();
    expect(mockedApi.put.mock.calls[0][1]).toMatchObject({ marginK: 25, baseVersion: 3 });
    // What was typed stays.
    expect(screen.getByLabelText('Margin (K)').props.value).toBe('25');

    fireEvent.press(within(conflict).getByRole('button', { name: 'Save mine over theirs' }));
    await waitFor(() => expect(mockedApi.put).toHaveBeenCalledTimes(2));
    expect(mockedApi.put.mock.calls[1][1]).toMatchObject({ marginK: 25, baseVersion: 4 });
    expect(await screen.findByText(/Saved\. Studies started from now on take these defaults/)).toBeVisible();
    expect(screen.queryByTestId('team-settings-conflict')).toBeNull();
  });

  it('takes the other owner’s values into the form when asked', async () => {
    routeApi(mockedApi, {
      'GET /session': () => ok(sessionAs('owner')),
      'GET /teams/1/settings': () => ok(settingsBody({}, 3)),
      'PUT /teams/1/settings': () =>
        httpError(409, { error: { code: 'version_conflict', message: 'Another owner saved first' }, current: settingsBody({ marginK: 30 }, 4) }),
    });
    renderApp('/team-settings');

    fireEvent.changeText(await screen.findByLabelText('Margin (K)'), '25');
    fireEvent.press(screen.getByRole('button', { name: 'Save team settings' }));
    const conflict = await screen.findByTestId('team-settings-conflict');
    fireEvent.press(within(conflict).getByRole('button', { name: 'Take their values' }));
    await waitFor(() => expect(screen.queryByTestId('team-settings-conflict')).toBeNull());
    expect(screen.getByLabelText('Margin (K)').props.value).toMatch(/^30/);
    expect(mockedApi.put).toHaveBeenCalledTimes(1);
  });

  it('asks for the source of a life-model value and shows the server’s field error', async () => {
    routeApi(mockedApi, {
      'GET /session': () => ok(sessionAs('owner')),
      'GET /teams/1/settings': () => ok(settingsBody({})),
      'PUT /teams/1/settings': () =>
        httpError(400, { error: { code: 'validation_failed', message: 'siteAltitudeM: must be at most about 11,000 m', details: [{ path: 'siteAltitudeM', message: 'must be at most about 11,000 m' }] } }),
    });
    renderApp('/team-settings');

    fireEvent.changeText(await screen.findByLabelText('Exponent α'), '4.5');
    fireEvent.press(screen.getByRole('button', { name: 'Save team settings' }));
    expect(await screen.findByText('say where this value comes from (a datasheet, a report, a test)')).toBeVisible();
    expect(mockedApi.put).not.toHaveBeenCalled();

    fireEvent.changeText(screen.getByLabelText('Source of α'), 'maker report (demo data)');
    fireEvent.changeText(screen.getByLabelText('Altitude (m)'), '2 km');
    fireEvent.press(screen.getByRole('button', { name: 'Save team settings' }));
    await waitFor(() => expect(mockedApi.put).toHaveBeenCalledTimes(1));
    expect(mockedApi.put.mock.calls[0][1]).toMatchObject({ cyclingExponent: 4.5, cyclingExponentSource: 'maker report (demo data)', siteAltitudeM: 2000 });
    expect(await screen.findByText('must be at most about 11,000 m')).toBeVisible();
    // What was typed stays.
    expect(screen.getByLabelText('Source of α').props.value).toBe('maker report (demo data)');
  });

  it('starts a new study’s editor from the defaults it was created with and notes them', async () => {
    clearDrafts(21);
    const teamDefaults = {
      document: { marginK: 25, site: { altitudeM: 1500 } },
      sources: { marginK: 'lab design rule 4', 'site.altitudeM': 'plant survey (demo data)' },
    };
    routeApi(mockedApi, {
      'GET /session': () => ok(sessionAs('designer')),
      'GET /studies/21': () => ok({ study: editableStudy(1, { document: null, teamDefaults }) }),
    });
    renderApp('/studies/21/edit');
    await screen.findByText('Editing from version 1');
    fireEvent.press(screen.getByRole('button', { name: /^Study and margin/ }));

    const margin = await screen.findByLabelText('Margin below Tj,max (K)');
    expect(margin.props.value).toBe('25 K');
    expect(screen.getByText(/^From team defaults \(lab design rule 4\)/)).toBeVisible();
    expect(within(screen.getByTestId('team-defaults-note')).getByText(/margin, site altitude .*does not change it/)).toBeVisible();

    // Once the value is changed it is the study's own: the field's note goes.
    fireEvent.changeText(margin, '22');
    await waitFor(() => expect(screen.queryByText(/^From team defaults \(lab design rule 4\)/)).toBeNull());
  });
});
