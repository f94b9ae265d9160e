import { fireEvent, renderRouter, screen, within } from 'expo-router/testing-library';

import { ACTION_WORDS, actionWords, payloadWords, subjectWords } from '@/components/screens/activity/audit-words';

import { admin, errorBody, mockApi, type Routes } from './helpers';

const signedInAdmin: Routes = { '/api/me': { status: 200, body: admin } };

function entry(id: number, action: string, extra: Record<string, unknown> = {}) {
  return { id, at: '2026-03-02T08:30:00.000Z', actor: 'user:u-admin', actorName: 'Ada Ferro', action, subject: null, payload: {}, ...extra };
}

describe('audit words', () => {
  it.each([
    ['auth.sign_in', 'Signed in'],
    ['auth.sign_in_failed', 'Failed to sign in'],
    ['team.invited', 'Invited someone'],
    ['team.roles_changed', 'Changed roles'],
    ['team.deactivated', 'Deactivated someone'],
    ['team.reactivated', 'Reactivated someone'],
    ['auth.password_reset_requested', 'Asked for a password reset link'],
    ['auth.password_reset', 'Set a new password through a reset link'],
    ['auth.password_changed', 'Changed their password'],
    ['auth.invitation_accepted', 'Accepted an invitation and joined'],
    ['auth.signed_out_everywhere', 'Signed out on every device'],
    ['bath.archived', 'bath.archived'],
  ])('%s reads "%s"', (code, words) => {
    expect(actionWords(code)).toBe(words);
  });

  it('covers every code the brief names', () => {
    expect(Object.keys(ACTION_WORDS).length).toBeGreaterThanOrEqual(11);
  });

  it('lists simple payload values and skips nested ones and the e-mail', () => {
    expect(payloadWords({ roles: ['chemist', 'admin'], active: false, nested: { a: 1 }, email: 'x@shop.test' })).toBe(
      'roles: chemist, admin · active: false',
    );
  });

  it('names the subject by its e-mail when the entry has one', () => {
    const base = { id: 1, at: '', actor: 'a', actorName: null, action: 'x' };
    expect(subjectWords({ ...base, subject: 'user:u-1', payload: { email: 'cora@shop.test' } })).toBe('cora@shop.test');
    expect(subjectWords({ ...base, subject: 'user:u-1', payload: {} })).toBe('user:u-1');
  });
});

describe('Activity screen', () => {
  it('tells a non-admin that it needs the admin role', async () => {
    mockApi();
    renderRouter('./app', { initialUrl: '/account/activity' });
    expect(await screen.findByText('Needs the admin role')).toBeOnTheScreen();
  });

  it('shows loading, then an empty log', async () => {
    mockApi({ ...signedInAdmin, '/api/team/audit?limit=50': 'pending' });
    renderRouter('./app', { initialUrl: '/account/activity' });
    expect(await screen.findByText('Loading activity…')).toBeOnTheScreen();

    mockApi({ ...signedInAdmin, '/api/team/audit?limit=50': { status: 200, body: { entries: [], nextBefore: null } } });
    renderRouter('./app', { initialUrl: '/account/activity' });
    expect(await screen.findByText('Nothing recorded yet')).toBeOnTheScreen();
  });

  it('shows an error with a retry', async () => {
    mockApi({ ...signedInAdmin, '/api/team/audit?limit=50': { status: 503, body: errorBody('db_unavailable', 'The database is not answering.') } });
    renderRouter('./app', { initialUrl: '/account/activity' });
    expect(await screen.findByText('The database is not answering.')).toBeOnTheScreen();
    expect(screen.getByRole('button', { name: 'Retry' })).toBeOnTheScreen();
  });

  it('reads entries in words and loads older pages with before=', async () => {
    const fetchMock = mockApi({
      ...signedInAdmin,
      '/api/team/audit?limit=50': {
        status: 200,
        body: {
          entries: [
            entry(9, 'team.roles_changed', { subject: 'cora@shop.test', payload: { roles: ['chemist', 'reviewer'] } }),
            entry(8, 'auth.sign_in_failed', { actor: 'anonymous', actorName: null, subject: 'who@shop.test' }),
          ],
          nextBefore: 8,
        },
      },
      '/api/team/audit?limit=50&before=8': {
        status: 200,
        body: { entries: [entry(3, 'bath.archived')], nextBefore: null },
      },
    });
    renderRouter('./app', { initialUrl: '/account/activity' });
    const first = within(await screen.findByTestId('audit-9'));
    expect(first.getByText('Ada Ferro')).toBeOnTheScreen();
    expect(first.getByText(/Changed roles · cora@shop.test/)).toBeOnTheScreen();
    expect(first.getByText('roles: chemist, reviewer')).toBeOnTheScreen();
    const second = within(screen.getByTestId('audit-8'));
    expect(second.getByText('anonymous')).toBeOnTheScreen();
    expect(second.getByText(/Failed to sign in · who@shop.test/)).toBeOnTheScreen();

    fireEvent.press(screen.getByRole('button', { name: 'Load more' }));
    expect(await screen.findByText(/bath.archived/)).toBeOnTheScreen();
    expect(fetchMock).toHaveBeenCalledWith('/api/team/audit?limit=50&before=8', expect.anything());
    expect(screen.queryByRole('button', { name: 'Load more' })).toBeNull();
    expect(screen.getByText('That is the beginning of the log.')).toBeOnTheScreen();
  });
});
