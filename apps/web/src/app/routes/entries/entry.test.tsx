import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { meReply } from '../../../testing/factories';
import { apiError, installFakeFetch, json, type RecordedRequest } from '../../../testing/fake-fetch';
import { renderApp } from '../../../testing/render-app';
import { entryReply, revision, routes } from './entry-fixtures';

// First finds wait up to 5 s: the lazily loaded route takes longer than the 1 s default on a busy machine.
describe('entry page', () => {
  it('when a reader opens an entry, shows the simulated marker, the timeline with the current revision marked, and no actions', async () => {
    const network = installFakeFetch(routes('reader'));
    renderApp('/entries/IF-000012');

    expect(await screen.findByRole('heading', { level: 1, name: '4-Chloroanisole' }, { timeout: 5000 })).toBeTruthy();
    expect(screen.getByTestId('simulated-marker').textContent).toBe('simulated — demo only');
    const timeline = screen.getByRole('list', { name: 'Revision timeline' });
    const items = within(timeline).getAllByRole('listitem');
    expect(items.map((li) => within(li).getByRole('link').textContent)).toEqual(['IF-000012 r3', 'IF-000012 r2', 'IF-000012 r1']);
    expect(items[0]?.getAttribute('aria-current')).toBe('true');
    expect(items[1]?.getAttribute('aria-current')).toBeNull();
    expect(within(items[2]!).getByRole('link').getAttribute('href')).toBe('/entries/IF-000012?revision=1');
    expect(within(items[2]!).getByText('First recording.')).toBeTruthy();
    expect(screen.getByRole('link', { name: 'Export JCAMP-DX' }).getAttribute('href')).toBe('/api/v1/entries/IF-000012/jcamp?revision=3');
    expect(screen.getByText('1142 (non-polar column)')).toBeTruthy();
    expect(screen.getByRole('list', { name: 'Consistency checks' }).textContent).toContain('Cluster agrees with C7H7ClO.');
    expect(screen.getByRole('table', { name: 'Peaks of IF-000012 r3' })).toBeTruthy();

    expect(screen.queryByRole('button', { name: 'Start a new revision' })).toBeNull();
    expect(screen.queryByRole('button', { name: 'Withdraw entry' })).toBeNull();
    expect(screen.queryByRole('button', { name: "Restore this revision's content" })).toBeNull();
    // Readers get the SMILES as text: the drawing endpoint is for contributors.
    expect(screen.getByText('SMILES COc1ccc(Cl)cc1')).toBeTruthy();
    expect(network.made('POST', '/api/v1/structures/preview')).toHaveLength(0);
  });

  it('when ?revision=1 is asked for, loads that revision and marks it in the timeline with its comments', async () => {
    const network = installFakeFetch(routes('reader'));
    renderApp('/entries/IF-000012?revision=1');

    expect(await screen.findByText('IF-000012 r1', { selector: 'span' }, { timeout: 5000 })).toBeTruthy();
    expect(network.made('GET', '/api/v1/entries/IF-000012')[0]?.url.searchParams.get('revision')).toBe('1');
    const items = within(screen.getByRole('list', { name: 'Revision timeline' })).getAllByRole('listitem');
    expect(items[2]?.getAttribute('aria-current')).toBe('true');
    expect(items[0]?.getAttribute('aria-current')).toBeNull();
    expect(await screen.findByText('Published as recorded.')).toBeTruthy();
    expect(screen.getByRole('link', { name: 'Export JCAMP-DX' }).getAttribute('href')).toBe('/api/v1/entries/IF-000012/jcamp?revision=1');
  });

  it('when a curator restores an old revision, asks for a draft from it and opens that draft', async () => {
    const draftId = '11111111-2222-4333-8444-555555555555';
    const network = installFakeFetch(
      routes('curator', {
        'POST /api/v1/entries/IF-000012/revisions': json({ revision: { ...revision(4, 'draft'), id: draftId } }, 201),
        [`GET /api/v1/revisions/${draftId}`]: json({ revision: { ...revision(4, 'draft'), id: draftId } }),
        [`GET /api/v1/revisions/${draftId}/comments`]: json({ comments: [] }),
        'GET /api/v1/my/revisions': json({ items: [] }),
      }),
    );
    const { router } = renderApp('/entries/IF-000012?revision=1');

    fireEvent.click(await screen.findByRole('button', { name: "Restore this revision's content" }, { timeout: 5000 }));

    await waitFor(() => expect(router.state.location.pathname).toBe(`/submit/${draftId}`));
    expect(network.made('POST', '/api/v1/entries/IF-000012/revisions')[0]?.body).toEqual({
      fromRevision: 1,
      changeNote: 'Restores the content of IF-000012 r1.',
    });
  });

  it('when a curator withdraws the entry, wants a reason, sends it and shows the withdrawn entry', async () => {
    let withdrawn = false;
    const network = installFakeFetch(
      routes('curator', {
        'GET /api/v1/entries/IF-000012': (request: RecordedRequest) =>
          entryReply(request, withdrawn ? { withdrawnAt: '2026-04-01T09:00:00.000Z', withdrawnReason: 'Standard found to be a mixture.' } : {}),
        'POST /api/v1/entries/IF-000012/withdraw': () => {
          withdrawn = true;
          return json({ entry: { accession: 'IF-000012' } });
        },
      }),
    );
    renderApp('/entries/IF-000012');

    fireEvent.click(await screen.findByRole('button', { name: 'Withdraw entry' }, { timeout: 5000 }));
    const dialog = screen.getByRole('dialog', { name: 'Withdraw entry' });
    fireEvent.click(within(dialog).getByRole('button', { name: 'Withdraw' }));
    expect(within(dialog).getByRole('alert').textContent).toBe('give a reason');
    expect(network.made('POST', '/api/v1/entries/IF-000012/withdraw')).toHaveLength(0);

    fireEvent.change(within(dialog).getByLabelText('Reason'), { target: { value: 'Standard found to be a mixture.' } });
    fireEvent.click(within(dialog).getByRole('button', { name: 'Withdraw' }));

    const note = await screen.findByRole('note', { name: 'Withdrawn' });
    expect(note.textContent).toContain('Reason: Standard found to be a mixture.');
    expect(network.made('POST', '/api/v1/entries/IF-000012/withdraw')[0]?.body).toEqual({ reason: 'Standard found to be a mixture.' });
    expect(screen.queryByRole('button', { name: 'Withdraw entry' })).toBeNull();
  });

  it('when a contributor starts a new revision and one is already open, shows the server message', async () => {
    installFakeFetch(
      routes('contributor', {
        'POST /api/v1/entries/IF-000012/revisions': apiError(409, 'OPEN_REVISION_EXISTS', 'IF-000012 r4 is already open; finish it first.'),
      }),
    );
    renderApp('/entries/IF-000012');

    fireEvent.click(await screen.findByRole('button', { name: 'Start a new revision' }, { timeout: 5000 }));

    expect((await screen.findByRole('alert')).textContent).toBe('IF-000012 r4 is already open; finish it first.');
    expect(screen.queryByRole('button', { name: 'Withdraw entry' })).toBeNull();
    // Contributors may draw structures: the drawing is an image from a data URL.
    const img = await screen.findByRole('img', { name: 'Structure drawing, C7H7ClO' });
    expect(img.getAttribute('src')?.startsWith('data:image/svg+xml;charset=utf-8,')).toBe(true);
  });

  it('when the entry does not exist, says there is no such page', async () => {
    installFakeFetch({
      'GET /api/v1/me': meReply('reader'),
      'GET /api/v1/entries/IF-000999': apiError(404, 'NOT_FOUND', 'No entry IF-000999'),
    });
    renderApp('/entries/IF-000999');
    expect(await screen.findByText('There is no page at this address', {}, { timeout: 5000 })).toBeTruthy();
  });
});
