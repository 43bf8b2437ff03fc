import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { meReply } from '../../../testing/factories';
import { apiError, installFakeFetch, json } from '../../../testing/fake-fetch';
import { renderApp } from '../../../testing/render-app';
import { caution, entryReply, identifyAnswer, unknownPeaks, unknownText } from './identify-fixtures';

function baseRoutes() {
  return {
    'GET /api/v1/me': meReply('reader'),
    'GET /api/v1/editions': json({ editions: [{ label: '2026.12', revisionCount: 150, createdAt: '2026-12-01T00:00:00.000Z' }] }),
    'GET /api/v1/entries/IF-000042': json(entryReply('IF-000042', 2, 'Chlorobenzene (simulated)', 'C6H5Cl', unknownPeaks)),
  };
}

async function pasteAndIdentify(text: string) {
  const box = await screen.findByRole('textbox', { name: /Peak list/ });
  fireEvent.change(box, { target: { value: text } });
  fireEvent.click(screen.getByRole('button', { name: 'Identify' }));
}

describe('identify', () => {
  it('when peaks are pasted and Identify pressed, posts them with the chosen options and shows ranked candidates with the caution', async () => {
    const network = installFakeFetch({ ...baseRoutes(), 'POST /api/v1/identify': json(identifyAnswer()) });
    renderApp('/identify');
    await screen.findByRole('option', { name: 'Edition 2026.12' });
    fireEvent.click(screen.getByRole('radio', { name: /Cosine/ }));
    fireEvent.click(screen.getByRole('checkbox', { name: /Reverse search/ }));
    fireEvent.change(screen.getByRole('combobox', { name: 'Edition' }), { target: { value: '2026.12' } });
    fireEvent.change(screen.getByRole('spinbutton', { name: 'Candidates' }), { target: { value: '5' } });
    fireEvent.change(screen.getByRole('textbox', { name: /Retention index/ }), { target: { value: '985' } });
    fireEvent.change(screen.getByRole('textbox', { name: /Lowest nominal mass/ }), { target: { value: '100' } });
    await pasteAndIdentify(unknownText);

    const table = await screen.findByRole('table', { name: 'Candidates' });
    const [post] = network.made('POST', '/api/v1/identify');
    expect(post?.body).toEqual({
      peaks: unknownPeaks,
      method: 'cosine',
      reverse: true,
      limit: 5,
      edition: '2026.12',
      retentionIndex: { value: 985, column: 'non-polar', tolerance: 20 },
      minMass: 100,
    });
    expect(post?.headers.get('X-Requested-With')).toBe('ionfolio');
    const rows = within(table).getAllByRole('row').slice(1);
    expect(rows).toHaveLength(3);
    // Similarity 0–100 with one decimal, in rank order.
    expect(within(table).getAllByTestId('similarity').map((cell) => cell.textContent)).toEqual(['97.8', '61.3', '40.1']);
    expect(within(rows[0] as HTMLElement).getByRole('link', { name: 'IF-000042 r2' }).getAttribute('href')).toBe('/entries/IF-000042?revision=2');
    expect(screen.getByRole('complementary', { name: 'Caution' }).textContent).toContain(caution);
    expect(screen.getByTestId('molecular-ion-check').textContent).toContain('likely M = m/z 112');
  });

  it('when a candidate’s nominal mass differs from the M the query reads, flags it in copper; one that agrees has no flag', async () => {
    installFakeFetch({ ...baseRoutes(), 'POST /api/v1/identify': json(identifyAnswer()) });
    renderApp('/identify');
    await pasteAndIdentify(unknownText);
    const table = await screen.findByRole('table', { name: 'Candidates' });
    const [agreeing, heavier, bromo] = within(table).getAllByRole('row').slice(1) as HTMLElement[];
    expect(within(agreeing as HTMLElement).queryByTestId('formula-flag')).toBeNull();
    expect(within(heavier as HTMLElement).getByTestId('formula-flag').textContent).toContain("nominal mass 126, the query's M reads 112");
    // C6H5Br: one Br and no Cl against a cluster read as Cl1 Br0.
    const flag = within(bromo as HTMLElement).getByTestId('formula-flag').textContent ?? '';
    expect(flag).toContain('Cl0 in the formula, the cluster reads Cl1');
    expect(flag).toContain('Br1 in the formula, the cluster reads Br0');
  });

  it('when a pasted line is not a peak, shows the error with its line and sends nothing', async () => {
    const network = installFakeFetch({ ...baseRoutes(), 'POST /api/v1/identify': json(identifyAnswer()) });
    renderApp('/identify');
    await pasteAndIdentify('77 60\n112 100\n114 x32');
    const alert = await screen.findByRole('alert');
    expect(alert.textContent).toContain('Line 3, column 5');
    expect(alert.textContent).toContain('“114 x32”');
    expect(network.made('POST', '/api/v1/identify')).toHaveLength(0);
  });

  it('when the API rejects the search, shows its message and each detail', async () => {
    installFakeFetch({
      ...baseRoutes(),
      'POST /api/v1/identify': apiError(400, 'VALIDATION', 'The request is not valid.', [{ path: ['edition'], message: 'unknown edition 1999.1' }]),
    });
    renderApp('/identify');
    await pasteAndIdentify(unknownText);
    expect(await screen.findByText('The request is not valid.')).toBeTruthy();
    expect(screen.getByText('edition: unknown edition 1999.1')).toBeTruthy();
  });

  it('when Download CSV is pressed, the file cites accession, revision, similarity, method and edition per candidate', async () => {
    installFakeFetch({ ...baseRoutes(), 'POST /api/v1/identify': json(identifyAnswer()) });
    const blobs: Blob[] = [];
    const create = vi.spyOn(URL, 'createObjectURL').mockImplementation((blob) => {
      blobs.push(blob as Blob);
      return 'blob:csv';
    });
    const revoke = vi.spyOn(URL, 'revokeObjectURL').mockImplementation(() => undefined);
    try {
      renderApp('/identify');
      await pasteAndIdentify(unknownText);
      fireEvent.click(await screen.findByRole('button', { name: 'Download CSV' }));
      expect(blobs).toHaveLength(1);
      const lines = (await (blobs[0] as Blob).text()).trimEnd().split('\r\n');
      expect(lines[0]).toBe(
        'rank,accession,revision,name,formula,nominal_mass,similarity_0_100,reverse_similarity_0_100,matched_peaks,formula_disagrees,method,edition,searched_at',
      );
      expect(lines).toHaveLength(4);
      expect(lines[1]).toMatch(/^1,IF-000042,2,Chlorobenzene \(simulated\),C6H5Cl,112,97\.8,,6,,composite,current,\d{4}-\d\d-\d\dT/);
      // A field with a comma is quoted (RFC 4180).
      expect(lines[2]).toContain('2,IF-000077,1,2-Chlorotoluene (simulated),C7H7Cl,126,61.3,,2,"nominal mass 126, the query\'s M reads 112",composite,current,');
    } finally {
      create.mockRestore();
      revoke.mockRestore();
    }
  });

  it('when opened from an entry with ?from= and ?exclude=, searches with that entry’s spectrum and leaves the entry out', async () => {
    const network = installFakeFetch({
      ...baseRoutes(),
      'GET /api/v1/entries/IF-000123': json(entryReply('IF-000123', 3, 'Bromobenzene (simulated)', 'C6H5Br', unknownPeaks)),
      'POST /api/v1/identify': json(identifyAnswer()),
    });
    renderApp('/identify?from=IF-000123&exclude=IF-000123');
    const table = await screen.findByRole('table', { name: 'Candidates' });
    const [post] = network.made('POST', '/api/v1/identify');
    expect(post?.body).toMatchObject({ peaks: unknownPeaks, limit: 11 });
    expect(within(table).queryByText('IF-000123 r3')).toBeNull();
    expect(within(table).getAllByRole('row')).toHaveLength(3);
    expect(screen.getByText(/IF-000123 left out/)).toBeTruthy();
  });

  it('when a candidate is chosen, loads its revision for the mirror view labelled query above and candidate below', async () => {
    const network = installFakeFetch({
      ...baseRoutes(),
      'GET /api/v1/entries/IF-000077': json(entryReply('IF-000077', 1, '2-Chlorotoluene (simulated)', 'C7H7Cl', [[91, 100], [126, 30], [128, 10]])),
      'POST /api/v1/identify': json(identifyAnswer()),
    });
    renderApp('/identify');
    await pasteAndIdentify(unknownText);
    fireEvent.click(await screen.findByRole('button', { name: 'Mirror view of IF-000077 r1' }));
    const figure = await screen.findByRole('figure', { name: /Mirror view: Unknown \(query\) above, IF-000077 r1 · 2-Chlorotoluene/ });
    expect(figure).toBeTruthy();
    await waitFor(() => expect(network.made('GET', '/api/v1/entries/IF-000077')[0]?.url.searchParams.get('revision')).toBe('1'));
    // The query's cluster against the theoretical cluster of C7H7Cl, aligned from M: the query's M+2 at
    // m/z 114 (32.5) beside the formula's at m/z 128, about 32 % for one 37Cl (SCIENCE.md §1).
    const cluster = screen.getByRole('table', { name: 'Isotope cluster: query against candidate formula' });
    const m2 = within(cluster).getByRole('rowheader', { name: 'M+2' }).closest('tr') as HTMLElement;
    const [, observed, theoretical] = Array.from(m2.children).map((cell) => cell.textContent ?? '');
    expect(observed).toBe('11432.5');
    expect(theoretical?.startsWith('128')).toBe(true);
    expect(Number(theoretical?.slice(3))).toBeCloseTo(32.0, 0);
  });
  it('when opened from a batch row with ?peaks= and ?name=, fills the box and searches with those peaks', async () => {
    const network = installFakeFetch({ ...baseRoutes(), 'POST /api/v1/identify': json(identifyAnswer()) });
    renderApp('/identify?peaks=77%3A60%20112%3A100%20114%3A32.5&name=Unknown%20A');
    await screen.findByRole('table', { name: 'Candidates' });
    expect(network.made('POST', '/api/v1/identify')[0]?.body).toMatchObject({ peaks: [[77, 60], [112, 100], [114, 32.5]], limit: 10 });
    expect((screen.getByRole('textbox', { name: /Name of the unknown/ }) as HTMLInputElement).value).toBe('Unknown A');
  });
  it('when the rate limit answers 429, says to wait and try again', async () => {
    installFakeFetch({ ...baseRoutes(), 'POST /api/v1/identify': apiError(429, 'RATE_LIMITED', 'At most 30 searches a minute; try again in 12 s.') });
    renderApp('/identify');
    await pasteAndIdentify(unknownText);
    expect(await screen.findByText(/Too many searches in a short time/)).toBeTruthy();
    expect(screen.getByText('At most 30 searches a minute; try again in 12 s.')).toBeTruthy();
  });
});
