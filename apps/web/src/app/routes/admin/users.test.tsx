import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { makeManagedUser, meReply } from '../../../testing/factories';
import { apiError, installFakeFetch, json, type RecordedRequest } from '../../../testing/fake-fetch';
import { renderApp } from '../../../testing/render-app';

const admin = makeManagedUser({
  id: 'u-admin',
  login: 'rhalvorsen',
  displayName: 'Ruth Halvorsen',
  email: 'ruth.halvorsen@example.test',
  role: 'admin',
});
const reader = makeManagedUser({
  id: 'u-reader',
  login: 'tmbeki',
  displayName: 'Thabo Mbeki-Lund',
  email: null,
  role: 'reader',
  lastSignInAt: null,
});

function rowOf(login: string): HTMLElement {
  const row = screen.getByRole('rowheader', { name: new RegExp(`^${login}`) }).closest('tr');
  if (!row) throw new Error(`no row for ${login}`);
  return row;
}

describe('admin · users', () => {
  it('when an admin opens the page, lists every user with login, name, e-mail, role and dates', async () => {
    installFakeFetch({
      'GET /api/v1/me': meReply('admin', { id: 'u-admin', displayName: 'Ruth Halvorsen' }),
      'GET /api/v1/admin/users': json({ users: [admin, reader] }),
    });
    renderApp('/admin/users');

    await screen.findByRole('table', { name: 'Users and their roles' });
    expect(screen.getAllByRole('row')).toHaveLength(3);
    const adminRow = rowOf('rhalvorsen');
    expect(within(adminRow).getByText('(you)')).toBeTruthy();
    expect(within(adminRow).getByText('Ruth Halvorsen')).toBeTruthy();
    expect(within(adminRow).getByText('ruth.halvorsen@example.test')).toBeTruthy();
    expect((within(adminRow).getByRole('combobox', { name: 'Role of rhalvorsen' }) as HTMLSelectElement).value).toBe('admin');
    expect(adminRow.querySelector('time')?.getAttribute('dateTime')).toBe('2026-01-12T08:30:00.000Z');
    expect(adminRow.textContent).toMatch(/2026-01-1\d \d\d:\d\d/);
    const readerRow = rowOf('tmbeki');
    expect(within(readerRow).getByText('—')).toBeTruthy();
    expect(within(readerRow).getByText('never')).toBeTruthy();
    expect((within(readerRow).getByRole('combobox') as HTMLSelectElement).value).toBe('reader');
  });

  it('when a role is chosen, sends the PATCH with that role and shows the saved list', async () => {
    let users = [admin, reader];
    const network = installFakeFetch({
      'GET /api/v1/me': meReply('admin', { id: 'u-admin' }),
      'GET /api/v1/admin/users': () => json({ users }),
      'PATCH /api/v1/admin/users/u-reader': (request: RecordedRequest) => {
        const saved = { ...reader, role: (request.body as { role: typeof reader.role }).role };
        users = [admin, saved];
        return json({ user: saved });
      },
    });
    renderApp('/admin/users');

    await screen.findByRole('table');
    fireEvent.change(screen.getByRole('combobox', { name: 'Role of tmbeki' }), { target: { value: 'curator' } });

    await waitFor(() => expect(network.made('GET', '/api/v1/admin/users')).toHaveLength(2));
    const [patch] = network.made('PATCH', '/api/v1/admin/users/u-reader');
    expect(patch?.body).toEqual({ role: 'curator' });
    expect(patch?.headers.get('Content-Type')).toBe('application/json');
    expect(patch?.headers.get('X-Requested-With')).toBe('ionfolio');
    await waitFor(() =>
      expect((screen.getByRole('combobox', { name: 'Role of tmbeki' }) as HTMLSelectElement).value).toBe('curator'),
    );
    expect(screen.queryByRole('alert')).toBeNull();
  });

  it('when the API refuses to demote the last admin, shows its message and keeps the role', async () => {
    installFakeFetch({
      'GET /api/v1/me': meReply('admin', { id: 'u-admin' }),
      'GET /api/v1/admin/users': json({ users: [admin, reader] }),
      'PATCH /api/v1/admin/users/u-admin': apiError(409, 'LAST_ADMIN', 'Ionfolio needs at least one admin.'),
    });
    renderApp('/admin/users');

    await screen.findByRole('table');
    fireEvent.change(screen.getByRole('combobox', { name: 'Role of rhalvorsen' }), { target: { value: 'reader' } });

    const alert = await screen.findByRole('alert');
    expect(alert.textContent).toContain('Not saved: Ionfolio needs at least one admin.');
    expect(within(rowOf('rhalvorsen')).getByRole('alert')).toBe(alert);
    expect((screen.getByRole('combobox', { name: 'Role of rhalvorsen' }) as HTMLSelectElement).value).toBe('admin');
  });

  it('when the API answers 400 with details, lists them under the message', async () => {
    installFakeFetch({
      'GET /api/v1/me': meReply('admin', { id: 'u-admin' }),
      'GET /api/v1/admin/users': json({ users: [admin, reader] }),
      'PATCH /api/v1/admin/users/u-reader': apiError(400, 'VALIDATION', 'The request body is not valid.', [
        { path: ['role'], message: 'Invalid option' },
      ]),
    });
    renderApp('/admin/users');

    await screen.findByRole('table');
    fireEvent.change(screen.getByRole('combobox', { name: 'Role of tmbeki' }), { target: { value: 'contributor' } });

    const alert = await screen.findByRole('alert');
    expect(alert.textContent).toContain('The request body is not valid.');
    expect(within(alert).getByRole('listitem').textContent).toBe('role: Invalid option');
  });

  it('when nobody is listed, says so', async () => {
    installFakeFetch({
      'GET /api/v1/me': meReply('admin', { id: 'u-admin' }),
      'GET /api/v1/admin/users': json({ users: [] }),
    });
    renderApp('/admin/users');

    expect(await screen.findByText('No one has signed in yet')).toBeTruthy();
  });

  it('when the API forbids the list, shows its message in the panel and keeps the header', async () => {
    installFakeFetch({
      'GET /api/v1/me': meReply('admin', { id: 'u-admin' }),
      'GET /api/v1/admin/users': apiError(403, 'FORBIDDEN', 'Only admins may list users.'),
    });
    renderApp('/admin/users');

    const alert = await screen.findByRole('alert');
    expect(alert.textContent).toContain('The users could not be loaded');
    expect(alert.textContent).toContain('Only admins may list users.');
    expect(alert.textContent).toContain('FORBIDDEN');
    expect(screen.getByTestId('current-role').textContent).toBe('admin');
  });
});
