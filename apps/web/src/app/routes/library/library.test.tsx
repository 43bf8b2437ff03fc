import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { meReply } from '../../../testing/factories';
import { installFakeFetch, json, type RecordedRequest } from '../../../testing/fake-fetch';
import { renderApp } from '../../../testing/render-app';

/** Invented rows, as `GET /api/v1/entries` answers them. */
function row(accession: string, name: string, formula: string, nominalMass: number, extra: Record<string, unknown> = {}) {
  return {
    accession,
    revision: 1,
    state: 'published',
    name,
    synonyms: [],
    formula,
    nominalMass,
    basePeakMz: nominalMass,
    peakCount: 24,
    retentionIndex: null,
    author: 'Dana Okafor',
    authorLogin: 'dokafor',
    updatedAt: '2026-03-02T12:00:00.000Z',
    simulated: false,
    ...extra,
  };
}

const rows = [
  row('IF-000001', 'Linalool', 'C10H18O', 154, { synonyms: ['3,7-dimethylocta-1,6-dien-3-ol'], retentionIndex: 1099, simulated: true }),
  row('IF-000002', 'Chlorobenzene', 'C6H5Cl', 112),
  row('IF-000003', 'Geraniol', 'C10H18O', 154, { revision: 2 }),
];

const listed = (request: RecordedRequest) => json({ entries: request.url.searchParams.has('formula') ? [rows[1]] : rows, nextCursor: null });

const bodyRows = () => within(screen.getByRole('grid', { name: 'Library entries' })).getAllByRole('row').slice(1);

describe('library page', () => {
  it('shows the loaded entries in one grid, with their state, revision and a simulated mark', async () => {
    installFakeFetch({ 'GET /api/v1/me': meReply('reader'), 'GET /api/v1/entries': listed });
    renderApp('/library');
    await screen.findByRole('grid', { name: 'Library entries' });
    const [linalool, , geraniol] = bodyRows();
    expect(bodyRows()).toHaveLength(3);
    expect(linalool?.textContent).toContain('IF-000001');
    expect(linalool?.textContent).toContain('C10H18O');
    expect(linalool?.textContent).toContain('1099');
    expect(within(linalool!).getByText('simulated')).toBeTruthy();
    expect(geraniol?.textContent).toContain('r2');
    expect(within(geraniol!).queryByText('simulated')).toBeNull();
    expect(screen.getByText('3 entries')).toBeTruthy();
  });

  it('when filters are applied, puts them in the address and in the request; the CSV link carries them', async () => {
    const network = installFakeFetch({ 'GET /api/v1/me': meReply('reader'), 'GET /api/v1/entries': listed });
    const { router } = renderApp('/library');
    await screen.findByRole('grid', { name: 'Library entries' });
    fireEvent.change(screen.getByLabelText(/^Formula/), { target: { value: 'C6 Cl1-3' } });
    fireEvent.change(screen.getByLabelText('Mass from'), { target: { value: '100' } });
    fireEvent.change(screen.getByLabelText('Contains elements'), { target: { value: 'Cl' } });
    fireEvent.click(screen.getByRole('button', { name: 'Filter' }));

    await waitFor(() => expect(bodyRows()).toHaveLength(1));
    const sent = network.made('GET', '/api/v1/entries').at(-1)!.url.searchParams;
    expect(sent.get('formula')).toBe('C6 Cl1-3');
    expect(sent.get('minMass')).toBe('100');
    expect(sent.get('elements')).toBe('Cl');
    const address = new URLSearchParams(router.state.location.search);
    expect(address.get('formula')).toBe('C6 Cl1-3');
    expect(address.get('minMass')).toBe('100');
    const csv = screen.getByRole('link', { name: 'Export CSV' }).getAttribute('href')!;
    expect(new URL(csv, 'http://x').searchParams.get('formula')).toBe('C6 Cl1-3');
    expect(csv.startsWith('/api/v1/entries.csv?')).toBe(true);
  });

  it('when an address carries filters, asks for them at once; a header click sorts on the server', async () => {
    const network = installFakeFetch({ 'GET /api/v1/me': meReply('reader'), 'GET /api/v1/entries': listed });
    const { router } = renderApp('/library?q=linalol&hasRetentionIndex=true');
    await screen.findByRole('grid', { name: 'Library entries' });
    const first = network.made('GET', '/api/v1/entries')[0]!.url.searchParams;
    expect(first.get('q')).toBe('linalol');
    expect(first.get('hasRetentionIndex')).toBe('true');
    expect((screen.getByLabelText(/^Name or synonym/) as HTMLInputElement).value).toBe('linalol');

    fireEvent.click(screen.getByRole('button', { name: /Nominal mass/ }));
    await waitFor(() => expect(network.made('GET', '/api/v1/entries')).toHaveLength(2));
    const sorted = network.made('GET', '/api/v1/entries')[1]!.url.searchParams;
    expect(sorted.get('sort')).toBe('nominalMass');
    expect(sorted.get('order')).toBe('asc');
    expect(sorted.get('q')).toBe('linalol');
    expect(new URLSearchParams(router.state.location.search).get('sort')).toBe('nominalMass');
    await screen.findByRole('grid', { name: 'Library entries' });
    fireEvent.click(screen.getByRole('button', { name: /Nominal mass/ }));
    await waitFor(() => expect(network.made('GET', '/api/v1/entries')).toHaveLength(3));
    expect(network.made('GET', '/api/v1/entries')[2]!.url.searchParams.get('order')).toBe('desc');
  });

  it('quick find narrows the loaded rows without asking the server, and says so', async () => {
    const network = installFakeFetch({ 'GET /api/v1/me': meReply('reader'), 'GET /api/v1/entries': listed });
    renderApp('/library');
    await screen.findByRole('grid', { name: 'Library entries' });
    fireEvent.change(screen.getByLabelText(/Quick find/), { target: { value: 'dimethylocta' } });
    await waitFor(() => expect(bodyRows()).toHaveLength(1));
    expect(bodyRows()[0]?.textContent).toContain('Linalool');
    expect(screen.getByText('Quick find: 1 of the 3 loaded rows')).toBeTruthy();
    fireEvent.change(screen.getByLabelText(/Quick find/), { target: { value: 'chlorbenzene' } });
    await waitFor(() => expect(bodyRows()[0]?.textContent).toContain('Chlorobenzene'));
    expect(network.made('GET', '/api/v1/entries')).toHaveLength(1);
  });

  it('arrow keys move the current row and Enter opens its entry', async () => {
    installFakeFetch({ 'GET /api/v1/me': meReply('reader'), 'GET /api/v1/entries': listed });
    const { router } = renderApp('/library');
    const grid = await screen.findByRole('grid', { name: 'Library entries' });
    fireEvent.focus(grid);
    fireEvent.keyDown(grid, { key: 'ArrowDown' });
    await waitFor(() => expect(bodyRows()[1]?.getAttribute('aria-selected')).toBe('true'));
    expect(grid.getAttribute('aria-activedescendant')).toBe(bodyRows()[1]?.id);
    fireEvent.keyDown(grid, { key: 'Enter' });
    // The entry page is a lazily loaded chunk: give it time on a busy machine.
    await waitFor(() => expect(router.state.location.pathname).toBe('/entries/IF-000002'), { timeout: 5000 });
  });

  it('when a page follows, asks for it with the cursor of the last one', async () => {
    const many = Array.from({ length: 30 }, (_, i) => row(`IF-${String(i + 1).padStart(6, '0')}`, `Compound ${i + 1}`, 'C10H18O', 154));
    const network = installFakeFetch({
      'GET /api/v1/me': meReply('reader'),
      'GET /api/v1/entries': (request) =>
        request.url.searchParams.get('cursor') === 'page-2'
          ? json({ entries: [row('IF-000031', 'Compound 31', 'C6H6', 78)], nextCursor: null })
          : json({ entries: many, nextCursor: 'page-2' }),
    });
    renderApp('/library');
    await screen.findByRole('grid', { name: 'Library entries' });
    await waitFor(() => expect(network.made('GET', '/api/v1/entries')).toHaveLength(2));
    expect(network.made('GET', '/api/v1/entries')[1]!.url.searchParams.get('cursor')).toBe('page-2');
    expect(await screen.findByText('31 entries')).toBeTruthy();
  });

  it('a SMILES search posts the fragment and lists the entries that contain it', async () => {
    const network = installFakeFetch({
      'GET /api/v1/me': meReply('reader'),
      'GET /api/v1/entries': listed,
      'POST /api/v1/structure-search': json({
        entries: [{ accession: 'IF-000002', revision: 1, name: 'Chlorobenzene', formula: 'C6H5Cl', nominalMass: 112, simulated: false, structure: 'Clc1ccccc1' }],
        screened: 4,
        truncated: false,
        tookMs: 3,
      }),
    });
    const { router } = renderApp('/library');
    await screen.findByRole('grid', { name: 'Library entries' });
    fireEvent.change(screen.getByLabelText('Structure (SMILES)'), { target: { value: 'c1ccccc1' } });
    fireEvent.click(screen.getByRole('button', { name: 'Search structures' }));
    const matches = await screen.findByRole('list', { name: 'Structure matches' });
    expect(within(matches).getByRole('link', { name: 'IF-000002' })).toBeTruthy();
    expect(network.made('POST', '/api/v1/structure-search')[0]!.body).toEqual({ smiles: 'c1ccccc1', mode: 'substructure', limit: 200 });
    expect(new URLSearchParams(router.state.location.search).get('smiles')).toBe('c1ccccc1');
  });

  it('when nothing matches, says so and offers to clear the filters', async () => {
    installFakeFetch({ 'GET /api/v1/me': meReply('reader'), 'GET /api/v1/entries': json({ entries: [], nextCursor: null }) });
    renderApp('/library?formula=C99');
    expect(await screen.findByText('No entry matches these filters')).toBeTruthy();
    expect(screen.getByRole('button', { name: 'Clear filters' })).toBeTruthy();
  });
});
