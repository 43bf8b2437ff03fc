import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { meReply } from '../../../testing/factories';
import { apiError, installFakeFetch, json } from '../../../testing/fake-fetch';
import { renderApp } from '../../../testing/render-app';

const messages = [
  {
    id: 'm1',
    createdAt: '2026-03-02T10:00:00.000Z',
    toAddress: 'pia.lindqvist@example.test',
    subject: 'Ionfolio: IF-000042 r2 returned',
    status: 'sent',
    attempts: 1,
    lastError: null,
    sentAt: '2026-03-02T10:00:05.000Z',
  },
  {
    id: 'm2',
    createdAt: '2026-03-02T11:00:00.000Z',
    toAddress: 'dana.okafor@example.test',
    subject: 'Ionfolio: new submission <IF-000077 r1>',
    status: 'failed',
    attempts: 3,
    lastError: 'connect ECONNREFUSED 127.0.0.1:2525',
    sentAt: null,
  },
];

describe('admin · outbox', () => {
  it('when an admin opens it, lists each mail with created, to, subject, status, attempts, last error and sent', async () => {
    installFakeFetch({ 'GET /api/v1/me': meReply('admin'), 'GET /api/v1/admin/outbox': json({ messages }) });
    renderApp('/admin/outbox');

    const table = await screen.findByRole('table', { name: 'Outbox' });
    const [sent, failed] = within(table).getAllByRole('row').slice(1) as HTMLElement[];
    expect(within(sent as HTMLElement).getAllByRole('cell').map((cell) => cell.textContent)).toEqual([
      expect.stringMatching(/^2026-03-02 \d\d:\d\d$/),
      'pia.lindqvist@example.test',
      'Ionfolio: IF-000042 r2 returned',
      'sent',
      '1',
      '—',
      expect.stringMatching(/^2026-03-02 \d\d:\d\d$/),
    ]);
    expect(failed?.textContent).toContain('new submission <IF-000077 r1>');
    expect(failed?.textContent).toContain('connect ECONNREFUSED 127.0.0.1:2525');
    expect(within(failed as HTMLElement).getAllByRole('cell').at(-1)?.textContent).toBe('—');
    expect(screen.getByRole('navigation', { name: 'Admin' }).textContent).toContain('Users');
  });

  it('when the outbox is empty, says no e-mail was queued yet', async () => {
    installFakeFetch({ 'GET /api/v1/me': meReply('admin'), 'GET /api/v1/admin/outbox': json({ messages: [] }) });
    renderApp('/admin/outbox');
    expect(await screen.findByText('No e-mail yet')).toBeTruthy();
  });

  it('when a curator opens it, sees the not-allowed page and nothing is fetched', async () => {
    const network = installFakeFetch({ 'GET /api/v1/me': meReply('curator') });
    renderApp('/admin/outbox');
    expect(await screen.findByText('This page is not available to you')).toBeTruthy();
    expect(network.made('GET', '/api/v1/admin/outbox')).toHaveLength(0);
  });

  it('when the outbox cannot be read, shows the error', async () => {
    installFakeFetch({ 'GET /api/v1/me': meReply('admin'), 'GET /api/v1/admin/outbox': apiError(500, 'INTERNAL', 'Database unavailable.') });
    renderApp('/admin/outbox');
    expect((await screen.findByRole('alert')).textContent).toContain('Database unavailable.');
  });
});
