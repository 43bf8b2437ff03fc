import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { meReply } from '../../../testing/factories';
import { apiError, installFakeFetch, json, type FakeRoutes } from '../../../testing/fake-fetch';
import { renderApp } from '../../../testing/render-app';
import { makeEntry, makeRevision, publishedRevision } from './review-fixtures';

const revision = makeRevision();
const revisionPath = `/api/v1/revisions/${revision.id}`;

function routes(extra: FakeRoutes = {}): FakeRoutes {
  return {
    'GET /api/v1/me': meReply('curator'),
    [`GET ${revisionPath}`]: json({ revision }),
    'GET /api/v1/entries/IF-000042': json(makeEntry(publishedRevision, [publishedRevision, revision])),
    [`GET ${revisionPath}/comments`]: json({ comments: [] }),
    'GET /api/v1/review-queue': json({ items: [], counts: { in_review: 0, needs_changes: 0, draft: 0 } }),
    ...extra,
  };
}

describe('review desk · one revision', () => {
  it('when a revision changes the formula and peaks, the diff marks the formula and lists added and removed peaks', async () => {
    installFakeFetch(routes());
    renderApp(`/review/${revision.id}`);

    const diff = await screen.findByRole('table', { name: 'Field-by-field differences' });
    const formulaRow = diff.querySelector('tr[data-field="formula"]') as HTMLElement;
    expect(formulaRow.dataset.changed).toBe('true');
    expect(formulaRow.textContent).toContain('C8H7BrO2');
    expect(formulaRow.textContent).toContain('C8H7ClO2');
    expect(formulaRow.textContent).toContain('changed');
    expect((diff.querySelector('tr[data-field="name"]') as HTMLElement).dataset.changed).toBe('false');
    expect(within(diff).getByRole('columnheader', { name: 'Published r1' })).toBeTruthy();
    expect(within(diff).getByRole('columnheader', { name: 'This revision r2' })).toBeTruthy();

    const peaks = screen.getByRole('table', { name: 'Peak changes' });
    const byChange = (change: string) =>
      [...peaks.querySelectorAll(`tr[data-change="${change}"] th`)].map((cell) => cell.textContent);
    expect(byChange('added')).toEqual(['75']);
    expect(byChange('removed')).toEqual(['172']);
    expect(byChange('changed')).toEqual(['170']);
    expect(screen.getByTestId('peak-change-summary').textContent).toBe('1 added · 1 removed · 1 changed');
    expect(screen.getByRole('figure', { name: 'Mirror view: This revision r2 above, Published r1 below' })).toBeTruthy();
    expect(screen.getByText('Formula mass vs cluster')).toBeTruthy();
  });

  it('when Publish is pressed, sends the decision with the comment and lock version, then returns to the queue', async () => {
    const network = installFakeFetch(
      routes({ [`POST ${revisionPath}/decision`]: json({ revision: { ...revision, state: 'published', lockVersion: 4 } }) }),
    );
    const { router } = renderApp(`/review/${revision.id}`);

    fireEvent.change(await screen.findByLabelText('Comment to the author'), { target: { value: 'Clean cluster, thanks.' } });
    fireEvent.click(screen.getByRole('button', { name: 'Publish r2' }));

    await waitFor(() => expect(router.state.location.pathname).toBe('/review'));
    const [decision] = network.made('POST', `${revisionPath}/decision`);
    expect(decision?.body).toEqual({ decision: 'publish', comment: 'Clean cluster, thanks.', lockVersion: 3 });
    expect(decision?.headers.get('X-Requested-With')).toBe('ionfolio');
    expect(await screen.findByText('IF-000042 r2 is published.')).toBeTruthy();
  });

  it('when Return is pressed without a comment, says one is needed and sends nothing', async () => {
    const network = installFakeFetch(routes());
    renderApp(`/review/${revision.id}`);

    fireEvent.click(await screen.findByRole('button', { name: 'Return with comment' }));

    expect(screen.getByRole('alert').textContent).toBe('Say what needs to change before returning the revision.');
    expect(network.made('POST', `${revisionPath}/decision`)).toHaveLength(0);
  });

  it('when another curator decided first (409 STALE_REVISION), shows the stale message and reloads the revision', async () => {
    let loads = 0;
    const network = installFakeFetch(
      routes({
        [`POST ${revisionPath}/decision`]: apiError(409, 'STALE_REVISION', 'The revision changed since you loaded it.'),
        // The reload shows what the other curator did.
        [`GET ${revisionPath}`]: () => json({ revision: (loads += 1) === 1 ? revision : { ...revision, state: 'published', lockVersion: 4 } }),
      }),
    );
    renderApp(`/review/${revision.id}`);

    fireEvent.change(await screen.findByLabelText('Comment to the author'), { target: { value: 'Please add the RI.' } });
    fireEvent.click(screen.getByRole('button', { name: 'Return with comment' }));

    const alert = await screen.findByRole('alert');
    expect(alert.textContent).toContain('Someone decided or changed it first — reload');
    expect(network.made('POST', `${revisionPath}/decision`)[0]?.body).toEqual({
      decision: 'needs_changes',
      comment: 'Please add the RI.',
      lockVersion: 3,
    });
    await waitFor(() => expect(network.made('GET', revisionPath)).toHaveLength(2));
    expect(await screen.findByText(/Only a revision in review can be published/)).toBeTruthy();
    expect(screen.getByRole('alert').textContent).toContain('Someone decided or changed it first — reload');
  });

  it('when the curator is the author (403 SELF_REVIEW), says another curator must decide', async () => {
    installFakeFetch(
      routes({ [`POST ${revisionPath}/decision`]: apiError(403, 'SELF_REVIEW', 'Authors do not decide their own revisions.') }),
    );
    renderApp(`/review/${revision.id}`);

    fireEvent.click(await screen.findByRole('button', { name: 'Publish r2' }));
    const alert = await screen.findByRole('alert');
    expect(alert.textContent).toContain('You cannot decide your own revision');
    expect(alert.textContent).toContain('Authors do not decide their own revisions.');
  });

  it('when comments have replies, threads them under their parent and posts a reply with its parentId', async () => {
    const parentId = '0d7c2a10-8f8e-4a51-9a44-3f1e2d3c4b5a';
    const network = installFakeFetch(
      routes({
        [`GET ${revisionPath}/comments`]: json({
          comments: [
            { id: parentId, parentId: null, author: { id: 'u-c', login: 'dokafor', displayName: 'Dana Okafor' }, body: 'Is M+2 clipped?', kind: 'comment', createdAt: '2026-03-02T11:00:00.000Z' },
            { id: 'c2', parentId, author: { id: 'u-contrib', login: 'plindqvist', displayName: 'Pia Lindqvist' }, body: '<b>No</b>, checked.', kind: 'comment', createdAt: '2026-03-02T11:30:00.000Z' },
          ],
        }),
        [`POST ${revisionPath}/comments`]: json({ comment: { id: 'c3', parentId, author: 'Dana Okafor', body: 'Thanks', kind: 'comment', createdAt: '2026-03-02T12:00:00.000Z' } }, 201),
      }),
    );
    renderApp(`/review/${revision.id}`);

    const reply = await screen.findByText('<b>No</b>, checked.');
    const parent = document.querySelector(`li[data-comment="${parentId}"]`) as HTMLElement;
    expect(parent.contains(reply)).toBe(true);
    fireEvent.click(within(parent).getAllByRole('button', { name: 'Reply' })[0] as HTMLElement);
    fireEvent.change(screen.getByLabelText('Reply to Dana Okafor'), { target: { value: 'Thanks' } });
    fireEvent.click(screen.getByRole('button', { name: 'Send reply' }));

    await waitFor(() => expect(network.made('POST', `${revisionPath}/comments`)).toHaveLength(1));
    expect(network.made('POST', `${revisionPath}/comments`)[0]?.body).toEqual({ body: 'Thanks', parentId });
    await waitFor(() => expect(network.made('GET', `${revisionPath}/comments`)).toHaveLength(2));
  });

  it('when the entry is published, withdrawing needs a reason and then posts it', async () => {
    const network = installFakeFetch(routes({ 'POST /api/v1/entries/IF-000042/withdraw': json({ entry: { accession: 'IF-000042' } }) }));
    const { router } = renderApp(`/review/${revision.id}`);

    fireEvent.click(await screen.findByRole('button', { name: 'Withdraw IF-000042…' }));
    fireEvent.click(screen.getByRole('button', { name: 'Withdraw IF-000042' }));
    expect(screen.getByRole('alert').textContent).toContain('Give a reason');
    expect(network.made('POST', '/api/v1/entries/IF-000042/withdraw')).toHaveLength(0);
    fireEvent.change(screen.getByLabelText('Why is IF-000042 withdrawn?'), { target: { value: 'Standard was mislabelled' } });
    fireEvent.click(screen.getByRole('button', { name: 'Withdraw IF-000042' }));

    await waitFor(() => expect(router.state.location.pathname).toBe('/review'));
    expect(network.made('POST', '/api/v1/entries/IF-000042/withdraw')[0]?.body).toEqual({ reason: 'Standard was mislabelled' });
  });
});
