import { fireEvent, screen, waitFor, within } from 'expo-router/testing-library';

import { api } from '@/api/client';
import { invitationSchema } from '@/validation';

import { httpError, ok, routeApi } from './support/http';
import { renderApp } from './support/render-app';
import { MEMBERS, PEOPLE, sessionAs } from './support/teamwork-fixtures';

jest.mock('@/api/client', () => ({
  apiBaseUrl: '/api',
  api: { get: jest.fn(), post: jest.fn(), patch: jest.fn(), delete: jest.fn() },
}));

const mockedApi = api as unknown as Record<'get' | 'post' | 'patch' | 'delete', jest.Mock>;

// Body and message as the team API answers when the last owner would be demoted or removed.
const LAST_OWNER = {
  error: { code: 'last_owner', message: 'A team keeps at least one owner: make someone else owner first' },
};

describe('team screen', () => {
  beforeEach(() => jest.clearAllMocks());

  it('lists the members for a designer without any owner action', async () => {
    routeApi(mockedApi, {
      'GET /session': () => ok(sessionAs('designer')),
      'GET /teams/1/members': () => ok({ members: MEMBERS }),
    });
    renderApp('/team');

    for (const member of MEMBERS) {
      const row = await screen.findByTestId(`member-row-${member.userId}`);
      expect(within(row).getByText(member.email)).toBeVisible();
    }
    expect(screen.getByText('(you)', { exact: false })).toBeVisible();
    expect(screen.getByText(/Only owners change roles and invite members/)).toBeVisible();
    expect(screen.queryAllByRole('radio')).toHaveLength(0);
    expect(screen.queryByRole('button', { name: 'Remove' })).toBeNull();
    expect(screen.queryByRole('button', { name: 'Send invitation' })).toBeNull();
    // The designer's screen never asks for what only owners may read.
    expect(mockedApi.get).not.toHaveBeenCalledWith('/teams/1/invitations');
  });

  it('shows the server’s last-owner message when the only owner steps down', async () => {
    routeApi(mockedApi, {
      'GET /session': () => ok(sessionAs('owner')),
      'GET /teams/1/members': () => ok({ members: MEMBERS }),
      'GET /teams/1/invitations': () => ok({ invitations: [] }),
      [`PATCH /teams/1/members/${PEOPLE.owner.id}`]: () => httpError(409, LAST_OWNER),
    });
    renderApp('/team');

    const ownRow = await screen.findByTestId(`member-row-${PEOPLE.owner.id}`);
    fireEvent.press(within(ownRow).getByRole('radio', { name: 'Designer' }));

    expect(await within(ownRow).findByText(LAST_OWNER.error.message)).toBeVisible();
    expect(mockedApi.patch).toHaveBeenCalledWith(`/teams/1/members/${PEOPLE.owner.id}`, { role: 'designer' });
    // Other rows keep their own controls and no message.
    const otherRow = screen.getByTestId(`member-row-${PEOPLE.designer.id}`);
    expect(within(otherRow).queryByText(LAST_OWNER.error.message)).toBeNull();
    expect(within(otherRow).getByRole('button', { name: 'Remove' })).toBeVisible();
  });

  it('removes a member only after the confirmation', async () => {
    routeApi(mockedApi, {
      'GET /session': () => ok(sessionAs('owner')),
      'GET /teams/1/members': () => ok({ members: MEMBERS }),
      'GET /teams/1/invitations': () => ok({ invitations: [] }),
      [`DELETE /teams/1/members/${PEOPLE.reviewer.id}`]: () => ok(undefined, 204),
    });
    renderApp('/team');

    const row = await screen.findByTestId(`member-row-${PEOPLE.reviewer.id}`);
    fireEvent.press(within(row).getByRole('button', { name: 'Remove' }));
    expect(within(row).getByText(`Remove ${PEOPLE.reviewer.name} from Test Lab? They lose access to its studies and catalogues.`)).toBeVisible();
    expect(mockedApi.delete).not.toHaveBeenCalled();

    fireEvent.press(within(row).getByRole('button', { name: 'Remove member' }));
    await waitFor(() => expect(within(row).queryByRole('button', { name: 'Remove member' })).toBeNull());
    expect(mockedApi.delete).toHaveBeenCalledWith(`/teams/1/members/${PEOPLE.reviewer.id}`);
  });

  it('invites with the shared schema’s clean values and lists the pending invitation', async () => {
    const pending = {
      id: 5,
      email: 'new.person@example.com',
      role: 'reviewer',
      expiresAt: '2030-01-08T09:00:00.000Z',
      createdAt: '2030-01-01T09:00:00.000Z',
      invitedBy: { id: PEOPLE.owner.id, name: PEOPLE.owner.name },
    };
    let invitations: object[] = [];
    routeApi(mockedApi, {
      'GET /session': () => ok(sessionAs('owner')),
      'GET /teams/1/members': () => ok({ members: MEMBERS }),
      'GET /teams/1/invitations': () => ok({ invitations }),
      'POST /teams/1/invitations': () => {
        invitations = [pending];
        return ok({ invitation: pending }, 201);
      },
    });
    renderApp('/team');

    expect(await screen.findByText('No invitation is waiting to be accepted.')).toBeVisible();
    fireEvent.press(screen.getByRole('button', { name: 'Send invitation' }));
    const emailMessage = await invitationSchema.validateAt('email', { email: '' }).catch((e: Error) => e.message);
    expect(await screen.findByText(emailMessage)).toBeVisible();
    expect(mockedApi.post).not.toHaveBeenCalled();

    fireEvent.changeText(screen.getByLabelText('E-mail to invite'), '  New.Person@Example.com ');
    const roles = screen.getByLabelText('Role of the invitee');
    fireEvent.press(within(roles).getByRole('radio', { name: 'Reviewer' }));
    fireEvent.press(screen.getByRole('button', { name: 'Send invitation' }));

    expect(await screen.findByText('Invitation sent to new.person@example.com.')).toBeVisible();
    expect(mockedApi.post).toHaveBeenCalledWith('/teams/1/invitations', { email: 'new.person@example.com', role: 'reviewer' });
    const row = await screen.findByTestId('invitation-row-5');
    expect(within(row).getByText('new.person@example.com')).toBeVisible();
    expect(within(row).getByRole('button', { name: 'Revoke' })).toBeVisible();
  });
});
