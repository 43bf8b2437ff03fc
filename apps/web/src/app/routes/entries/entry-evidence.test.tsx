import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { installFakeFetch, json, type RecordedRequest } from '../../../testing/fake-fetch';
import { renderApp } from '../../../testing/render-app';
import { entryReply, r1, revision, routes } from './entry-fixtures';

// A chlorobenzene-like spectrum, C6H5Cl (nominal 112), invented for the page: M+1 6.6 % (13C, about 1.08 %
// per C × 6, SCIENCE.md §1, computed), M+2 32.5 % (37Cl 32.0 % of M per Cl, SCIENCE.md §1), M+3 2.1 %
// (13C with 37Cl, computed from the same table), C6H5+ at m/z 77 (M−35, loss of Cl; Lange's §7.8).
const chlorobenzenePeaks = [
  [50, 14],
  [51, 11],
  [77, 42],
  [112, 100],
  [113, 6.6],
  [114, 32.5],
  [115, 2.1],
];

function chlorobenzene(overrides: Record<string, unknown> = {}) {
  return revision(1, 'published', {
    name: 'Chlorobenzene',
    synonyms: [],
    formula: 'C6H5Cl',
    nominalMass: 112,
    monoisotopicMass: 112.0080,
    structure: 'Clc1ccccc1',
    peaks: chlorobenzenePeaks,
    basePeakMz: 112,
    ...overrides,
  });
}

function singleEntry(shown: ReturnType<typeof revision>, extra: Record<string, unknown> = {}) {
  return routes('reader', {
    'GET /api/v1/entries/IF-000012': (request: RecordedRequest) => entryReply(request, extra, [shown]),
    'GET /api/v1/revisions/00000000-0000-4000-8000-000000000001/comments': json({ comments: [] }),
  });
}

// First finds wait up to 5 s: the lazily loaded route takes longer than the 1 s default on a busy machine.
describe('entry page evidence', () => {
  it('when the spectrum has a one-chlorine cluster, the molecular-ion check reads M 112 with Cl 1 and overlays the C6H5Cl cluster', async () => {
    installFakeFetch(singleEntry(chlorobenzene()));
    renderApp('/entries/IF-000012');

    const check = await screen.findByTestId('molecular-ion-check', {}, { timeout: 5000 });
    const reading = check.querySelector('dl[aria-label="Molecular-ion reading"]');
    expect(reading).not.toBeNull();
    const facts = Object.fromEntries(
      within(reading as HTMLElement)
        .getAllByRole('term')
        .map((dt) => [dt.textContent, dt.nextElementSibling?.textContent]),
    );
    expect(facts['Molecular ion']).toBe('likely M = m/z 112');
    // M+2/M 32.5 % is one 37Cl (32.0 % per Cl, SCIENCE.md §1).
    expect(facts['Chlorine']).toBe('Cl 1');
    expect(facts['Bromine']).toBe('Br 0');
    expect(facts['Sulfur']).toBe('not indicated');
    // As readMolecularIon reports it: ±2σ of M+1/M around 6.6/1.08 ≈ 6 carbons (SCIENCE.md §1).
    expect(facts['Carbon (from M+1)']).toMatch(/^C4–C6 \(about 6\.0;/);
    expect(facts['Nitrogen rule']).toBe('even number of N (possibly none)');
    // The formula and the reading agree, so no disagreement is listed.
    expect(within(check).queryByRole('list', { name: 'Reading notes' })).toBeNull();
    expect(within(check).getByText(/Evidence \(\d+ numbers\)/)).toBeTruthy();

    const overlay = within(check).getByRole('table', { name: 'Isotope cluster, observed against theoretical, % of M' });
    const rows = within(overlay)
      .getAllByRole('row')
      .slice(1)
      .map((row) => within(row).getAllByRole('cell').slice(0, 3).map((c) => c.textContent));
    // Theoretical C6H5Cl, % of M: M+1 6.5, M+2 32.2, M+3 2.1 (isotope table of SCIENCE.md §1, computed).
    expect(rows).toEqual([
      ['112', '100.0', '100.0'],
      ['113', '6.6', '6.5'],
      ['114', '32.5', '32.2'],
      ['115', '2.1', '2.1'],
    ]);

    // RDBE of C6H5Cl = 6 − (5 + 1)/2 + 1 = 4 (SCIENCE.md §2).
    const compound = screen.getByRole('region', { name: 'Compound' });
    expect(within(compound).getByText('RDBE').nextElementSibling?.textContent).toBe('4');

    const notes = within(screen.getByRole('region', { name: 'Fragment notes' })).getByRole('table', { name: 'Fragment notes' });
    const noteRows = within(notes).getAllByRole('row').map((row) => row.textContent);
    expect(noteRows).toContain('7742M−35: loss of Cl');
    expect(within(screen.getByRole('region', { name: 'Fragment notes' })).getByText(/Lange's Handbook of Chemistry, 15th ed\., §7\.8/)).toBeTruthy();
  });

  it('when the stated formula lacks the chlorine the cluster shows, lists the disagreement', async () => {
    installFakeFetch(singleEntry(chlorobenzene({ formula: 'C6H6', nominalMass: 78 })));
    renderApp('/entries/IF-000012');

    const notes = await screen.findByRole('list', { name: 'Reading notes' }, { timeout: 5000 });
    expect(notes.textContent).toContain('The formula puts M at m/z 78; the spectrum reads M at m/z 112.');
    expect(notes.textContent).toContain('The formula has Cl 0; the cluster reads Cl 1.');
  });

  it('when r2 is shown, compares it with r1 by default: an added peak, a changed field and the cosine similarity', async () => {
    const first = revision(1, 'superseded');
    const second = revision(2, 'published', {
      peaks: [...(r1.peaks as number[][]), [63, 12]].sort((a, b) => (a[0] as number) - (b[0] as number)),
      conditions: { ionizationEnergyEv: 70, inlet: 'GC', sourceTemperatureC: 250 },
    });
    const network = installFakeFetch(
      routes('reader', {
        'GET /api/v1/entries/IF-000012': (request: RecordedRequest) => entryReply(request, {}, [first, second]),
        'GET /api/v1/revisions/00000000-0000-4000-8000-000000000002/comments': json({ comments: [] }),
      }),
    );
    renderApp('/entries/IF-000012?revision=2');

    const diff = await screen.findByTestId('revision-diff', {}, { timeout: 5000 });
    expect(network.made('GET', '/api/v1/entries/IF-000012').map((r) => r.url.searchParams.get('revision'))).toEqual(['2', '1']);
    expect((screen.getByLabelText('Compare') as HTMLSelectElement).value).toBe('1');
    expect((screen.getByLabelText('with') as HTMLSelectElement).value).toBe('2');

    const fields = within(diff).getByRole('table', { name: 'Fields that differ' });
    const changed = within(fields)
      .getAllByRole('row')
      .slice(1)
      .map((row) => [...row.children].map((c) => c.textContent));
    expect(changed).toEqual([
      ['Source temperature', '230 °C', '250 °C'],
      ['Change note', 'First recording.', 'Re-run 2.'],
    ]);
    const added = within(diff).getByRole('table', { name: 'Peaks added' });
    expect(within(added).getAllByRole('row').slice(1).map((row) => row.textContent)).toEqual(['63—12']);
    expect(within(diff).queryByRole('table', { name: 'Peaks removed' })).toBeNull();
    expect(within(diff).getByText('5 peaks the same (intensities within 0.1 % of the base peak).')).toBeTruthy();
    // Cosine (SCIENCE.md §3) of r1 with r1 plus a 12 % peak: Σ r1² = 15557, so √(15557 / 15701) = 0.9954.
    expect(within(diff).getByLabelText('Cosine similarity').textContent).toBe('99.5');
    expect(within(diff).getByRole('figure', { name: 'Mirror view: r2 above, r1 below' })).toBeTruthy();
  });

  it('when another pair is chosen, fetches both revisions and keeps the pair in the address', async () => {
    const network = installFakeFetch(
      routes('reader', {
        'GET /api/v1/revisions/00000000-0000-4000-8000-000000000002/comments': json({ comments: [] }),
      }),
    );
    const { router } = renderApp('/entries/IF-000012');

    await screen.findByTestId('revision-diff', {}, { timeout: 5000 });
    fireEvent.change(screen.getByLabelText('Compare'), { target: { value: '1' } });

    await waitFor(() => expect(router.state.location.search).toBe('?compare=1&to=3'));
    await waitFor(() => expect(network.made('GET', '/api/v1/entries/IF-000012').some((r) => r.url.searchParams.get('revision') === '1')).toBe(true));
    expect(await screen.findByText('The same in both: Name, Formula, Structure, CAS RN, Ionization energy, Instrument type, Inlet, Source temperature, Column, Scan range, Retention index, Sample notes.')).toBeTruthy();
  });

  it('when the entry has one revision, says there is nothing to compare', async () => {
    installFakeFetch(singleEntry(chlorobenzene()));
    renderApp('/entries/IF-000012');
    expect(await screen.findByText('This entry has one revision so far: there is nothing to compare it with.', {}, { timeout: 5000 })).toBeTruthy();
  });

  it('lists the editions that hold the entry with links, and offers a library search with this spectrum', async () => {
    installFakeFetch(
      routes('reader', {
        'GET /api/v1/entries/IF-000012': (request: RecordedRequest) =>
          entryReply(request, {
            editions: [
              { label: '2026.06', revision: 3, createdAt: '2026-06-30T12:00:00.000Z' },
              { label: '2026.02', revision: 2, createdAt: '2026-02-28T12:00:00.000Z' },
            ],
          }),
      }),
    );
    renderApp('/entries/IF-000012');

    const list = await screen.findByRole('list', { name: 'Editions that contain this entry' }, { timeout: 5000 });
    const items = within(list).getAllByRole('listitem');
    expect(items.map((li) => within(li).getByRole('link').getAttribute('href'))).toEqual(['/editions/2026.06', '/editions/2026.02']);
    expect(items[1]?.textContent).toContain('r2');
    expect(screen.getByRole('link', { name: 'Search the library with this spectrum' }).getAttribute('href')).toBe('/identify?from=IF-000012&exclude=IF-000012');
  });

  it('when no edition holds the entry yet, says so', async () => {
    installFakeFetch(routes('reader'));
    renderApp('/entries/IF-000012');
    expect(await screen.findByText('No frozen edition holds this entry yet.', {}, { timeout: 5000 })).toBeTruthy();
  });

  it('when the server sends no editions field, the page still opens and says the editions are not listed', async () => {
    installFakeFetch(
      routes('reader', {
        'GET /api/v1/entries/IF-000012': (request: RecordedRequest) => entryReply(request, { editions: undefined }),
      }),
    );
    renderApp('/entries/IF-000012');
    expect(await screen.findByText('This server does not list the editions of an entry.', {}, { timeout: 5000 })).toBeTruthy();
    expect(screen.getByRole('heading', { level: 1, name: '4-Chloroanisole' })).toBeTruthy();
  });
});
