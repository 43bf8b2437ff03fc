import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { meReply } from '../../../testing/factories';
import { installFakeFetch, json } from '../../../testing/fake-fetch';
import { renderApp } from '../../../testing/render-app';

const owner = { id: 'u-reader', login: 'mlindqvist', displayName: 'Maja Lindqvist' };

function makeKey(overrides: Record<string, unknown> = {}) {
  return {
    id: '0b7f3a52-1c1d-4c1e-9a51-6d2b8f0c4e11',
    name: 'GC-MS 2 data system',
    prefix: 'ifk_7Qm2',
    scopes: ['search'],
    owner,
    createdAt: '2026-03-01T09:00:00.000Z',
    lastUsedAt: null,
    revokedAt: null,
    ...overrides,
  };
}

describe('tools · access keys', () => {
  it('when a reader creates a key, posts name and read scopes, shows the secret once, then only its prefix', async () => {
    let keys: unknown[] = [];
    const secret = 'ifk_7Qm2invented000secret111for222tests';
    const network = installFakeFetch({
      'GET /api/v1/me': meReply('reader', owner),
      'GET /api/v1/access-keys': () => json({ keys }),
      'POST /api/v1/access-keys': (request) => {
        const created = makeKey({ name: (request.body as { name: string }).name, scopes: (request.body as { scopes: string[] }).scopes });
        keys = [created];
        return json({ key: created, secret }, 201);
      },
    });
    renderApp('/tools/keys');
    await screen.findByText('No access keys yet');
    // Readers get read scopes only.
    expect((screen.getByRole('checkbox', { name: /submit/ }) as HTMLInputElement).disabled).toBe(true);
    fireEvent.change(screen.getByRole('textbox', { name: 'Name' }), { target: { value: 'GC-MS 2 data system' } });
    fireEvent.click(screen.getByRole('checkbox', { name: /library:read/ }));
    fireEvent.click(screen.getByRole('button', { name: 'Create key' }));

    expect((await screen.findByTestId('key-secret')).textContent).toBe(secret);
    expect(screen.getByText(/shown only once/)).toBeTruthy();
    expect(network.made('POST', '/api/v1/access-keys')[0]?.body).toEqual({ name: 'GC-MS 2 data system', scopes: ['search', 'library:read'] });
    const table = await screen.findByRole('table', { name: 'Access keys' });
    expect(within(table).getByText('ifk_7Qm2…')).toBeTruthy();
    expect(table.textContent).not.toContain(secret);

    fireEvent.click(screen.getByRole('button', { name: 'I have stored it' }));
    await waitFor(() => expect(screen.queryByTestId('key-secret')).toBeNull());
    expect(document.body.textContent).not.toContain(secret);
    expect(screen.getByRole('button', { name: 'Create key' })).toBeTruthy();
  });

  it('when revoking, asks first, then sends DELETE and lists the key as revoked', async () => {
    let keys = [makeKey({ lastUsedAt: '2026-03-02T10:00:00.000Z' })];
    const network = installFakeFetch({
      'GET /api/v1/me': meReply('contributor', owner),
      'GET /api/v1/access-keys': () => json({ keys }),
      'DELETE /api/v1/access-keys/0b7f3a52-1c1d-4c1e-9a51-6d2b8f0c4e11': () => {
        keys = [makeKey({ revokedAt: '2026-03-03T10:00:00.000Z' })];
        return { status: 204 };
      },
    });
    renderApp('/tools/keys');
    fireEvent.click(await screen.findByRole('button', { name: 'Revoke GC-MS 2 data system' }));
    expect(network.requests.filter((r) => r.method === 'DELETE')).toHaveLength(0);
    const confirm = screen.getByRole('group', { name: 'Confirm revoking GC-MS 2 data system' });
    fireEvent.click(within(confirm).getByRole('button', { name: 'Revoke now' }));
    await waitFor(() => expect(screen.getByRole('table', { name: 'Access keys' }).textContent).toContain('revoked'));
    expect(network.requests.filter((r) => r.method === 'DELETE')).toHaveLength(1);
  });

  it('for an admin, /admin/keys lists every key with its owner', async () => {
    const network = installFakeFetch({
      'GET /api/v1/me': meReply('admin'),
      'GET /api/v1/access-keys': json({ keys: [makeKey()] }),
    });
    renderApp('/admin/keys');
    const table = await screen.findByRole('table', { name: 'Access keys' });
    expect(table.textContent).toContain('Maja Lindqvist (mlindqvist)');
    expect(network.made('GET', '/api/v1/access-keys')[0]?.url.searchParams.get('all')).toBe('true');
  });
});
