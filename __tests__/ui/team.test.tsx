import { Dimensions } from 'react-native';
import { fireEvent, renderRouter, screen, waitFor, within } from 'expo-router/testing-library';

import { admin, chemist, errorBody, mockApi, person, sentBodies, type Routes } from './helpers';

const phone = Dimensions.get('window');
const signedInAdmin: Routes = { '/api/me': { status: 200, body: admin } };
const people = [
  person(admin, { lastSignInAt: '2026-03-02T08:30:00.000Z' }),
  person(chemist),
  person({ id: 'u-gone', email: 'old@shop.test', name: 'Otto Gone', roles: ['technician'] }, { active: false }),
];
const invitation = {
  id: 'inv-1',
  email: 'new@shop.test',
  roles: ['technician'],
  invitedBy: 'Ada Ferro',
  createdAt: '2026-03-01T10:00:00.000Z',
  expiresAt: '2026-03-08T10:00:00.000Z',
};

function teamRoutes(extra: Routes = {}): Routes {
  return {
    ...signedInAdmin,
    '/api/team/people': { status: 200, body: people },
    '/api/team/invitations': { status: 200, body: [] },
    ...extra,
  };
}

afterEach(() => {
  Dimensions.set({ window: phone, screen: phone });
});

describe('Team screen', () => {
  it('tells a non-admin that it needs the admin role', async () => {
    const fetchMock = mockApi();
    renderRouter('./app', { initialUrl: '/account/team' });
    expect(await screen.findByText('Needs the admin role')).toBeOnTheScreen();
    expect(fetchMock.mock.calls.some(([p]) => String(p).startsWith('/api/team'))).toBe(false);
  });

  it('shows loading, then an error with retry', async () => {
    mockApi(teamRoutes({ '/api/team/people': 'pending' }));
    renderRouter('./app', { initialUrl: '/account/team' });
    expect(await screen.findByText('Loading the team…')).toBeOnTheScreen();

    mockApi(teamRoutes({ '/api/team/people': { status: 500, body: errorBody('internal', 'Something broke on the server.') } }));
    renderRouter('./app', { initialUrl: '/account/team' });
    expect(await screen.findByText('Something broke on the server.')).toBeOnTheScreen();
    mockApi(teamRoutes());
    fireEvent.press(screen.getByRole('button', { name: 'Retry' }));
    expect(await screen.findByText('Cora Quill')).toBeOnTheScreen();
  });

  it('lists people as cards on a phone, with you, status and last sign-in', async () => {
    mockApi(teamRoutes());
    renderRouter('./app', { initialUrl: '/account/team' });
    expect(await screen.findByText('Ada Ferro (you)')).toBeOnTheScreen();
    const cora = within(screen.getByTestId('person-u-chem'));
    expect(cora.getByText('cora@shop.test')).toBeOnTheScreen();
    expect(cora.getByText('Active')).toBeOnTheScreen();
    expect(cora.getByText('Last signed in: Never')).toBeOnTheScreen();
    expect(cora.getByRole('checkbox', { name: 'Chemist role for Cora Quill', checked: true })).toBeOnTheScreen();
    expect(cora.getByRole('checkbox', { name: 'Admin role for Cora Quill', checked: false })).toBeOnTheScreen();
    expect(within(screen.getByTestId('person-u-gone')).getByText('Deactivated')).toBeOnTheScreen();
    expect(screen.queryByText('Last sign-in')).toBeNull();
  });

  it('lists people as a table on a wide screen', async () => {
    Dimensions.set({ window: { width: 1280, height: 800, scale: 1, fontScale: 1 }, screen: { width: 1280, height: 800, scale: 1, fontScale: 1 } });
    mockApi(teamRoutes());
    renderRouter('./app', { initialUrl: '/account/team' });
    expect(await screen.findByText('Last sign-in')).toBeOnTheScreen();
    expect(within(screen.getByTestId('person-u-chem')).getByText('Never')).toBeOnTheScreen();
  });

  it('saves changed roles with PATCH and can undo a draft', async () => {
    const fetchMock = mockApi(
      teamRoutes({ 'PATCH /api/team/people/u-chem': (body) => ({ status: 200, body: { ...people[1], ...(body as object) } }) }),
    );
    renderRouter('./app', { initialUrl: '/account/team' });
    const cora = within(await screen.findByTestId('person-u-chem'));
    fireEvent.press(cora.getByRole('checkbox', { name: 'Reviewer role for Cora Quill' }));
    fireEvent.press(cora.getByRole('button', { name: 'Undo role changes for Cora Quill' }));
    expect(cora.getByRole('checkbox', { name: 'Reviewer role for Cora Quill', checked: false })).toBeOnTheScreen();

    fireEvent.press(cora.getByRole('checkbox', { name: 'Reviewer role for Cora Quill' }));
    fireEvent.press(cora.getByRole('button', { name: 'Save roles of Cora Quill' }));
    expect(await cora.findByText('Roles saved')).toBeOnTheScreen();
    expect(sentBodies(fetchMock, 'PATCH', '/api/team/people/u-chem')).toEqual([{ roles: ['chemist', 'reviewer'] }]);
    expect(cora.queryByRole('button', { name: 'Save roles of Cora Quill' })).toBeNull();
  });

  it('does not offer an admin to drop their own admin role or deactivate themselves', async () => {
    mockApi(teamRoutes({}));
    renderRouter('./app', { initialUrl: '/account/team' });
    const ada = within(await screen.findByTestId('person-u-admin'));
    expect(ada.getByRole('checkbox', { name: 'Admin role for Ada Ferro' })).toBeDisabled();
    expect(ada.queryByRole('button', { name: 'Deactivate Ada Ferro' })).toBeNull();
  });

  it('shows the server’s refusal beside the person', async () => {
    const refusal = 'Cora Quill cannot be changed right now.';
    mockApi(teamRoutes({ 'PATCH /api/team/people/u-chem': { status: 409, body: errorBody('conflict', refusal) } }));
    renderRouter('./app', { initialUrl: '/account/team' });
    const cora = within(await screen.findByTestId('person-u-chem'));
    fireEvent.press(cora.getByRole('checkbox', { name: 'Reviewer role for Cora Quill' }));
    fireEvent.press(cora.getByRole('button', { name: 'Save roles of Cora Quill' }));
    expect(await cora.findByText(refusal)).toBeOnTheScreen();
  });

  it('deactivates and reactivates after a confirmation', async () => {
    const fetchMock = mockApi(
      teamRoutes({
        'PATCH /api/team/people/u-chem': (body) => ({ status: 200, body: { ...people[1], ...(body as object) } }),
        'PATCH /api/team/people/u-gone': (body) => ({ status: 200, body: { ...people[2], ...(body as object) } }),
      }),
    );
    renderRouter('./app', { initialUrl: '/account/team' });
    const cora = within(await screen.findByTestId('person-u-chem'));
    fireEvent.press(cora.getByRole('button', { name: 'Deactivate Cora Quill' }));
    expect(cora.getByText(/Deactivate Cora Quill\? They are signed out at once/)).toBeOnTheScreen();
    fireEvent.press(cora.getByRole('button', { name: 'Cancel' }));
    expect(sentBodies(fetchMock, 'PATCH', '/api/team/people/u-chem')).toHaveLength(0);

    fireEvent.press(cora.getByRole('button', { name: 'Deactivate Cora Quill' }));
    fireEvent.press(cora.getByRole('button', { name: 'Deactivate' }));
    expect(await cora.findByText('Deactivated', { exact: true })).toBeOnTheScreen();
    expect(sentBodies(fetchMock, 'PATCH', '/api/team/people/u-chem')).toEqual([{ active: false }]);

    const otto = within(screen.getByTestId('person-u-gone'));
    fireEvent.press(otto.getByRole('button', { name: 'Reactivate Otto Gone' }));
    fireEvent.press(otto.getByRole('button', { name: 'Reactivate' }));
    await waitFor(() => expect(sentBodies(fetchMock, 'PATCH', '/api/team/people/u-gone')).toEqual([{ active: true }]));
    expect(await otto.findByText('Active')).toBeOnTheScreen();
  });
});

describe('Team screen: invitations', () => {
  it('says when no invitations are waiting', async () => {
    mockApi(teamRoutes());
    renderRouter('./app', { initialUrl: '/account/team' });
    expect(await screen.findByText('No invitations waiting')).toBeOnTheScreen();
  });

  it('asks for an address and at least one role, then invites', async () => {
    let sent = false;
    const fetchMock = mockApi(
      teamRoutes({
        '/api/team/invitations': () => ({ status: 200, body: sent ? [invitation] : [] }),
        'POST /api/team/invitations': () => {
          sent = true;
          return { status: 201, body: invitation };
        },
      }),
    );
    renderRouter('./app', { initialUrl: '/account/team' });
    const form = within(await screen.findByTestId('invite-card'));
    fireEvent.press(form.getByRole('button', { name: 'Send invitation' }));
    expect(await form.findByText('Is not an e-mail address (for example name@example.com)')).toBeOnTheScreen();
    expect(form.getByText('Give at least one role')).toBeOnTheScreen();

    fireEvent.changeText(form.getByLabelText('E-mail of the person to invite'), 'New@Shop.test');
    fireEvent.press(form.getByRole('checkbox', { name: 'Technician' }));
    fireEvent.press(form.getByRole('button', { name: 'Send invitation' }));
    expect(await form.findByText('Invitation sent to new@shop.test')).toBeOnTheScreen();
    expect(sentBodies(fetchMock, 'POST', '/api/team/invitations')).toEqual([{ email: 'new@shop.test', roles: ['technician'] }]);
    expect(await screen.findByTestId('invitation-inv-1')).toBeOnTheScreen();
  });

  it('shows the server’s answer when the person is already on the team', async () => {
    mockApi(teamRoutes({ 'POST /api/team/invitations': { status: 409, body: errorBody('conflict', 'cora@shop.test is already on the team.') } }));
    renderRouter('./app', { initialUrl: '/account/team' });
    const form = within(await screen.findByTestId('invite-card'));
    fireEvent.changeText(form.getByLabelText('E-mail of the person to invite'), 'cora@shop.test');
    fireEvent.press(form.getByRole('checkbox', { name: 'Chemist' }));
    fireEvent.press(form.getByRole('button', { name: 'Send invitation' }));
    expect(await form.findByText('cora@shop.test is already on the team.')).toBeOnTheScreen();
  });

  it('sends an invitation again and withdraws one after a confirmation', async () => {
    let withdrawn = false;
    const fetchMock = mockApi(
      teamRoutes({
        '/api/team/invitations': () => ({ status: 200, body: withdrawn ? [] : [invitation] }),
        'POST /api/team/invitations/inv-1/resend': { status: 200, body: invitation },
        'DELETE /api/team/invitations/inv-1': () => {
          withdrawn = true;
          return { status: 204 };
        },
      }),
    );
    renderRouter('./app', { initialUrl: '/account/team' });
    const item = within(await screen.findByTestId('invitation-inv-1'));
    expect(item.getByText('Technician')).toBeOnTheScreen();
    expect(item.getByText(/Invited by Ada Ferro/)).toBeOnTheScreen();
    fireEvent.press(item.getByRole('button', { name: 'Send the invitation to new@shop.test again' }));
    expect(await item.findByText(/Sent again to new@shop.test/)).toBeOnTheScreen();
    expect(sentBodies(fetchMock, 'POST', '/api/team/invitations/inv-1/resend')).toHaveLength(1);

    fireEvent.press(item.getByRole('button', { name: 'Withdraw the invitation to new@shop.test' }));
    fireEvent.press(item.getByRole('button', { name: 'Withdraw' }));
    expect(await screen.findByText('No invitations waiting')).toBeOnTheScreen();
    expect(sentBodies(fetchMock, 'DELETE', '/api/team/invitations/inv-1')).toHaveLength(1);
  });
});
