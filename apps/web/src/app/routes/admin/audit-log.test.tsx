import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { meReply } from '../../../testing/factories';
import { apiError, installFakeFetch, json, type RecordedRequest } from '../../../testing/fake-fetch';
import { renderApp } from '../../../testing/render-app';

const firstPage = {
  events: [
    {
      id: 'e2',
      occurredAt: '2026-03-02T12:00:00.000Z',
      actor: { login: 'dokafor', displayName: 'Dana Okafor' },
      action: 'revision.published',
      subjectType: 'revision',
      subjectId: 'IF-000042 r2',
      data: { before: { state: 'in_review' }, after: { state: 'published' } },
    },
    {
      id: 'e1',
      occurredAt: '2026-03-02T10:00:00.000Z',
      actor: null,
      action: 'comment.added',
      subjectType: 'revision',
      subjectId: 'IF-000042 r2',
      data: { note: '<img src=x onerror=alert(1)>' },
    },
  ],
  nextCursor: 'cur-2',
};

const secondPage = {
  events: [
    {
      id: 'e0',
      occurredAt: '2026-03-01T09:00:00.000Z',
      actor: { login: 'rhalvorsen', displayName: 'Ruth Halvorsen' },
      action: 'user.role_changed',
      subjectType: 'user',
      subjectId: 'plindqvist',
      data: { before: { role: 'reader' }, after: { role: 'contributor' } },
    },
  ],
  nextCursor: null,
};

function pages(request: RecordedRequest) {
  return json(request.url.searchParams.get('cursor') === 'cur-2' ? secondPage : firstPage);
}

describe('audit log', () => {
  it('when a curator opens it, shows when, who, action, subject and details as text, with Admin tabs their role allows', async () => {
    installFakeFetch({ 'GET /api/v1/me': meReply('curator'), 'GET /api/v1/audit': pages });
    renderApp('/admin/audit');

    const table = await screen.findByRole('table', { name: 'Audit events' });
    const [published, comment] = within(table).getAllByRole('row').slice(1) as HTMLElement[];
    expect(published?.textContent).toContain('Dana Okafor');
    expect(published?.textContent).toContain('revision.published');
    expect(published?.textContent).toContain('IF-000042 r2');
    expect(published?.textContent).toContain('before.state=in_review after.state=published');
    expect(comment?.textContent).toContain('system');
    expect(comment?.textContent).toContain('note="<img src=x onerror=alert(1)>"');
    expect(comment?.querySelector('img')).toBeNull();
    const tabs = within(screen.getByRole('navigation', { name: 'Admin' })).getAllByRole('link');
    expect(tabs.map((tab) => tab.textContent)).toEqual(['Audit log']);
  });

  it('when filters are applied, asks for that action and subject; Load more follows nextCursor with the same filters', async () => {
    const network = installFakeFetch({ 'GET /api/v1/me': meReply('admin'), 'GET /api/v1/audit': pages });
    const { router } = renderApp('/admin/audit');

    await screen.findByRole('table', { name: 'Audit events' });
    expect(within(screen.getByRole('navigation', { name: 'Admin' })).getAllByRole('link')).toHaveLength(4);
    fireEvent.change(screen.getByLabelText('Action'), { target: { value: 'revision.published' } });
    fireEvent.change(screen.getByLabelText('Subject'), { target: { value: 'IF-000042 r2' } });
    fireEvent.click(screen.getByRole('button', { name: 'Filter' }));

    await waitFor(() => expect(network.made('GET', '/api/v1/audit')).toHaveLength(2));
    const filtered = network.made('GET', '/api/v1/audit')[1]?.url.searchParams;
    expect(filtered?.get('action')).toBe('revision.published');
    expect(filtered?.get('subject')).toBe('IF-000042 r2');
    expect(filtered?.has('cursor')).toBe(false);
    expect(new URLSearchParams(router.state.location.search).get('action')).toBe('revision.published');

    fireEvent.click(await screen.findByRole('button', { name: 'Load more' }));
    expect(await screen.findByText('user.role_changed')).toBeTruthy();
    const more = network.made('GET', '/api/v1/audit')[2]?.url.searchParams;
    expect(more?.get('cursor')).toBe('cur-2');
    expect(more?.get('action')).toBe('revision.published');
    expect(within(screen.getByRole('table', { name: 'Audit events' })).getAllByRole('row')).toHaveLength(4);
    expect(screen.queryByRole('button', { name: 'Load more' })).toBeNull();
  });

  it('when Load more fails, keeps the events shown and says the older ones could not be loaded', async () => {
    installFakeFetch({
      'GET /api/v1/me': meReply('curator'),
      'GET /api/v1/audit': (request) =>
        request.url.searchParams.has('cursor') ? apiError(400, 'BAD_CURSOR', 'The cursor is not valid.') : json(firstPage),
    });
    renderApp('/admin/audit');

    fireEvent.click(await screen.findByRole('button', { name: 'Load more' }));
    expect((await screen.findByRole('alert')).textContent).toBe('Older events could not be loaded: The cursor is not valid.');
    expect(within(screen.getByRole('table', { name: 'Audit events' })).getAllByRole('row')).toHaveLength(3);
  });

  it('when a reader opens it, is refused and nothing is fetched', async () => {
    const network = installFakeFetch({ 'GET /api/v1/me': meReply('reader') });
    renderApp('/admin/audit');
    expect(await screen.findByText('This page is not available to you')).toBeTruthy();
    expect(screen.getByText(/needs the/).textContent).toMatch(/needs the curator role; you are signed in as a reader/);
    expect(network.made('GET', '/api/v1/audit')).toHaveLength(0);
  });

  it('when nothing matches, says so', async () => {
    installFakeFetch({ 'GET /api/v1/me': meReply('curator'), 'GET /api/v1/audit': json({ events: [], nextCursor: null }) });
    renderApp('/admin/audit?action=edition.frozen');
    expect(await screen.findByText('No event matches these filters')).toBeTruthy();
  });
});
