import { fireEvent, screen } from 'expo-router/testing-library';

import { api } from '@/api/client';

import { STUDIES } from './support/fixtures';
import { httpError, ok, routeApi } from './support/http';
import { renderApp } from './support/render-app';
import { MEMBERS, PEOPLE, sessionAs } from './support/teamwork-fixtures';

jest.mock('@/api/client', () => ({
  apiBaseUrl: '/api',
  api: { get: jest.fn(), post: jest.fn(), delete: jest.fn() },
}));

const mockedApi = api as unknown as Record<'get' | 'post' | 'delete', jest.Mock>;

/** Shaped like `GET /api/outbox`; the link carries the server's APP_URL, another host than this app's. */
const MESSAGE = {
  id: 3,
  to: 'dana@example.com',
  subject: 'You are invited to Test Lab on Junctura',
  text: 'Al Owner invites you to join the team "Test Lab" as designer.\n\nAccept the invitation: http://localhost:8080/invitations/tok42\n\n\n\n— Junctura',
  html: '',
  links: ['http://localhost:8080/invitations/tok42'],
  createdAt: '2025-05-01T09:00:00.000Z',
};

describe('outbox screen', () => {
  beforeEach(() => jest.clearAllMocks());

  it('lists the messages and opens this app’s links inside the app', async () => {
    routeApi(mockedApi, {
      'GET /session': () => ok(sessionAs('owner')),
      'GET /outbox': () => ok({ messages: [MESSAGE] }),
      'GET /invitations/tok42': () => ok({ invitation: { teamName: 'Test Lab', role: 'designer', email: 'dana@example.com', invitedBy: 'Al Owner', expiresAt: '2030-01-01T00:00:00.000Z', accountExists: false } }),
    });
    const app = renderApp('/outbox');

    expect(await screen.findByText(MESSAGE.subject)).toBeVisible();
    expect(screen.getByText(`To ${MESSAGE.to}`)).toBeVisible();
    fireEvent.press(screen.getByText(MESSAGE.links[0]));

    expect(await screen.findByText('Join Test Lab')).toBeVisible();
    expect(app.getPathname()).toBe('/invitations/tok42');
  });

  it('says that real mail is configured when the outbox answers 404', async () => {
    routeApi(mockedApi, {
      'GET /session': () => ok(sessionAs('owner')),
      'GET /outbox': () => httpError(404, { error: { code: 'not_found', message: 'Outbox not found' } }),
    });
    renderApp('/outbox');

    expect(await screen.findByText('Mail goes to a real mail server')).toBeVisible();
    expect(screen.queryByRole('button', { name: 'Try again' })).toBeNull();
  });
});

describe('activity screen', () => {
  beforeEach(() => jest.clearAllMocks());

  it('tells the log in sentences with the study titles and member names of the team', async () => {
    const study = STUDIES[0];
    routeApi(mockedApi, {
      'GET /session': () => ok(sessionAs('owner')),
      'GET /studies': () => ok({ studies: STUDIES }),
      'GET /teams/1/members': () => ok({ members: MEMBERS }),
      // Shaped like `GET /api/teams/:teamId/activity`, newest first.
      'GET /teams/1/activity': () =>
        ok({
          events: [
            { id: 3, action: 'member.role_changed', actor: { id: PEOPLE.owner.id, name: PEOPLE.owner.name }, subjectType: 'user', subjectId: PEOPLE.reviewer.id, details: { from: 'reviewer', to: 'designer' }, createdAt: '2025-05-03T09:00:00.000Z' },
            { id: 2, action: 'study.reviewed', actor: { id: PEOPLE.reviewer.id, name: PEOPLE.reviewer.name }, subjectType: 'study', subjectId: study.id, details: { revision: 2, decision: 'changes_requested' }, createdAt: '2025-05-02T09:00:00.000Z' },
            { id: 1, action: 'study.submitted', actor: { id: PEOPLE.designer.id, name: PEOPLE.designer.name }, subjectType: 'study', subjectId: study.id, details: { revision: 2 }, createdAt: '2025-05-01T09:00:00.000Z' },
          ],
        }),
    });
    renderApp('/activity');

    expect(await screen.findByText(`${PEOPLE.designer.name} submitted “${study.title}” revision 2 for review`)).toBeVisible();
    expect(screen.getByText(`${PEOPLE.reviewer.name} asked for changes to “${study.title}” revision 2`)).toBeVisible();
    expect(screen.getByText(`${PEOPLE.owner.name} changed the role of ${PEOPLE.reviewer.name} from reviewer to designer`)).toBeVisible();
  });

  it('is not offered to a designer and asks the server for nothing', async () => {
    routeApi(mockedApi, {
      'GET /session': () => ok(sessionAs('designer')),
      'GET /studies': () => ok({ studies: STUDIES }),
    });
    renderApp('/activity');

    expect(await screen.findByText('Only team owners read the activity log')).toBeVisible();
    expect(mockedApi.get).not.toHaveBeenCalledWith('/teams/1/activity');
    expect(screen.queryByRole('link', { name: 'Activity' })).toBeNull();
  });
});
