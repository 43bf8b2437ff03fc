import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { meReply } from '../../../testing/factories';
import { installFakeFetch, json } from '../../../testing/fake-fetch';
import { renderApp } from '../../../testing/render-app';

// Two invented (simulated) unknowns as concatenated JCAMP-DX blocks (SCIENCE.md §5 labels).
const jcamp = [
  '##TITLE=Unknown A (simulated)',
  '##JCAMP-DX=5.01',
  '##DATA TYPE=MASS SPECTRUM',
  '##PEAK TABLE=(XY..XY)',
  '77,60 112,100 113,6.6 114,32.5',
  '##END=',
  '##TITLE=Unknown B (simulated)',
  '##JCAMP-DX=5.01',
  '##DATA TYPE=MASS SPECTRUM',
  '##PEAK TABLE=(XY..XY)',
  '43,100 58,25',
  '##END=',
].join('\n');

const best = (accession: string, name: string, similarity: number) => ({ accession, revision: 1, name, similarity });
const allResults = [
  { index: 1, name: 'Unknown A (simulated)', best: best('IF-000042', 'Chlorobenzene (simulated)', 96.24), candidates: [best('IF-000042', 'Chlorobenzene (simulated)', 96.24), best('IF-000077', '2-Chlorotoluene (simulated)', 52.1)] },
  { index: 2, name: 'Unknown B (simulated)', best: null, candidates: [] },
];

/** Each poll reports one more unknown done, until both are. */
function progressingJob() {
  let polls = 0;
  return () => {
    polls += 1;
    const done = Math.min(polls - 1, 2);
    return json({
      job: { id: 'b-9', status: done === 2 ? 'done' : 'running', total: 2, done, createdAt: '2026-03-05T08:00:00.000Z' },
      results: allResults.slice(0, done),
    });
  };
}

describe('batch identify', () => {
  it('when a multi-block file is started, posts every unknown, keeps the job in the address and polls to the end', async () => {
    const network = installFakeFetch({
      'GET /api/v1/me': meReply('reader'),
      'GET /api/v1/editions': json({ editions: [] }),
      'POST /api/v1/identify/batch': json({ job: { id: 'b-9', status: 'running', total: 2, done: 0 } }, 202),
      'GET /api/v1/identify/batch/b-9': progressingJob(),
    });
    const { router } = renderApp('/identify/batch');
    const input = (await screen.findByLabelText('Unknowns file')) as HTMLInputElement;
    Object.defineProperty(input, 'files', { value: [new File([jcamp], 'unknowns.jdx')] });
    fireEvent.change(input);
    expect((await screen.findByText(/2 spectra read/)).textContent).toContain('Unknown A (simulated)');
    fireEvent.click(screen.getByRole('button', { name: 'Start the batch' }));

    await waitFor(() => expect(router.state.location.search).toBe('?job=b-9'));
    const [post] = network.made('POST', '/api/v1/identify/batch');
    expect(post?.body).toEqual({
      spectra: [
        { name: 'Unknown A (simulated)', peaks: [[77, 60], [112, 100], [113, 6.6], [114, 32.5]] },
        { name: 'Unknown B (simulated)', peaks: [[43, 100], [58, 25]] },
      ],
      method: 'composite',
      reverse: false,
    });

    const bar = await screen.findByRole('progressbar', { name: 'Unknowns identified' });
    await waitFor(() => expect(bar.getAttribute('aria-valuenow')).toBe('1'), { timeout: 3000 });
    expect(screen.getByTestId('batch-count').textContent).toBe('1 / 2');
    await waitFor(() => expect(bar.getAttribute('aria-valuenow')).toBe('2'), { timeout: 3000 });
    expect(screen.getByRole('status').textContent).toContain('Done');
    const rows = within(screen.getByRole('table', { name: 'Best candidate per unknown' })).getAllByRole('row').slice(1);
    expect(rows).toHaveLength(2);
    expect(within(rows[0] as HTMLElement).getByTestId('batch-similarity').textContent).toBe('96.2');
    expect(rows[1]?.textContent).toContain('no candidate');
    const drill = within(rows[0] as HTMLElement).getByRole('link', { name: 'Open Unknown A (simulated) in Identify' });
    const target = new URL(drill.getAttribute('href') ?? '', 'http://localhost');
    expect(target.pathname).toBe('/identify');
    expect(target.searchParams.get('peaks')).toBe('77:60 112:100 113:6.6 114:32.5');
    expect(screen.getByRole('link', { name: 'Download the results as CSV' }).getAttribute('href')).toBe('/api/v1/identify/batch/b-9/csv');
    const polls = network.made('GET', '/api/v1/identify/batch/b-9').length;
    await new Promise((resolve) => setTimeout(resolve, 900));
    expect(network.made('GET', '/api/v1/identify/batch/b-9')).toHaveLength(polls);
  }, 10_000);

  it('when reloaded with ?job=, follows that job without posting again', async () => {
    const network = installFakeFetch({
      'GET /api/v1/me': meReply('reader'),
      'GET /api/v1/editions': json({ editions: [] }),
      'GET /api/v1/identify/batch/b-9': json({ job: { id: 'b-9', status: 'running', total: 2, done: 1 }, results: allResults.slice(0, 1) }),
    });
    renderApp('/identify/batch?job=b-9');
    const bar = await screen.findByRole('progressbar');
    expect(bar.getAttribute('aria-valuenow')).toBe('1');
    expect(screen.getByText('Chlorobenzene (simulated)', { exact: false })).toBeTruthy();
    // Polling continues while the job runs.
    await waitFor(() => expect(network.made('GET', '/api/v1/identify/batch/b-9').length).toBeGreaterThan(1), { timeout: 2000 });
    expect(network.made('POST', '/api/v1/identify/batch')).toHaveLength(0);
  });

  it('when a CSV block has a bad line, names the file and the line counted from its top', async () => {
    installFakeFetch({ 'GET /api/v1/me': meReply('reader'), 'GET /api/v1/editions': json({ editions: [] }) });
    renderApp('/identify/batch');
    const input = (await screen.findByLabelText('Unknowns file')) as HTMLInputElement;
    Object.defineProperty(input, 'files', { value: [new File(['# first\nmz,intensity\n43,100\n\n# second\n58,25\n71,x\n'], 'two.csv')] })
    fireEvent.change(input);
    expect((await screen.findByRole('alert')).textContent).toContain('two.csv: line 7');
  });
});
