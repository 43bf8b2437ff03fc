import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { meReply } from '../../../testing/factories';
import { apiError, installFakeFetch, json } from '../../../testing/fake-fetch';
import { renderApp } from '../../../testing/render-app';
import { makeQueueItem } from './review-fixtures';

const counts = { in_review: 2, needs_changes: 1, draft: 4 };

describe('review desk · queue', () => {
  it('when a curator opens the desk, shows the counts per state and one row per revision in review', async () => {
    installFakeFetch({
      'GET /api/v1/me': meReply('curator'),
      'GET /api/v1/review-queue': json({
        items: [
          makeQueueItem(),
          makeQueueItem({ revisionId: 'r-2', label: 'IF-000077 r1', name: '2-Bromothiophene', formula: 'C4H3BrS', checksWorst: 'fail', hasPublished: false, author: 'Ole Brandt' }),
        ],
        counts,
      }),
    });
    renderApp('/review');

    const table = await screen.findByRole('table', { name: 'In review: open revisions' });
    expect(screen.getByTestId('count-in_review').textContent).toBe('2');
    expect(screen.getByTestId('count-needs_changes').textContent).toBe('1');
    expect(screen.getByTestId('count-draft').textContent).toBe('4');
    const rows = within(table).getAllByRole('row').slice(1);
    expect(rows).toHaveLength(2);
    expect(rows[0]?.textContent).toContain('IF-000042 r2');
    expect(rows[0]?.textContent).toContain('C8H7ClO2');
    expect(rows[0]?.textContent).toContain('warn');
    expect(rows[1]?.textContent).toContain('fail');
    expect(rows[1]?.textContent).toContain('new entry');
    expect(rows[1]?.textContent).toContain('Ole Brandt');
    expect(within(rows[0] as HTMLElement).getByRole('link', { name: 'IF-000042 r2' }).getAttribute('href')).toBe(
      '/review/5b0c1b52-6f1e-4c3a-9d7e-0a1b2c3d4e01',
    );
  });

  it('when a tab and filters are chosen, asks the queue for that state, author and text', async () => {
    const network = installFakeFetch({
      'GET /api/v1/me': meReply('curator'),
      'GET /api/v1/review-queue': json({ items: [], counts }),
    });
    renderApp('/review');

    fireEvent.click(await screen.findByRole('link', { name: /Returned/ }));
    await waitFor(() => expect(network.made('GET', '/api/v1/review-queue').at(-1)?.url.searchParams.get('state')).toBe('needs_changes'));
    fireEvent.change(screen.getByLabelText('Author (login)'), { target: { value: 'plindqvist' } });
    fireEvent.change(screen.getByLabelText('Name, formula or accession'), { target: { value: 'chloro' } });
    fireEvent.click(screen.getByRole('button', { name: 'Filter' }));

    await waitFor(() => {
      const params = network.made('GET', '/api/v1/review-queue').at(-1)?.url.searchParams;
      expect(params?.get('author')).toBe('plindqvist');
      expect(params?.get('q')).toBe('chloro');
      expect(params?.get('state')).toBe('needs_changes');
    });
    expect(await screen.findByText('Nothing matches these filters')).toBeTruthy();
  });

  it('when the queue is empty, says nothing is waiting', async () => {
    installFakeFetch({
      'GET /api/v1/me': meReply('curator'),
      'GET /api/v1/review-queue': json({ items: [], counts: { in_review: 0, needs_changes: 0, draft: 0 } }),
    });
    renderApp('/review');
    expect(await screen.findByText('The queue is empty')).toBeTruthy();
  });

  it('when the queue cannot be loaded, shows the error with its code', async () => {
    installFakeFetch({
      'GET /api/v1/me': meReply('curator'),
      'GET /api/v1/review-queue': apiError(500, 'INTERNAL', 'Something failed on the server.'),
    });
    renderApp('/review');
    const alert = await screen.findByRole('alert');
    expect(alert.textContent).toContain('The queue could not be loaded');
    expect(alert.textContent).toContain('INTERNAL');
  });

  it('when a contributor opens the desk, is refused and no queue is fetched', async () => {
    const network = installFakeFetch({ 'GET /api/v1/me': meReply('contributor') });
    renderApp('/review');
    expect(await screen.findByText('This page is not available to you')).toBeTruthy();
    expect(network.made('GET', '/api/v1/review-queue')).toHaveLength(0);
  });
});
