import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { meReply } from '../../../testing/factories';
import { installFakeFetch, json } from '../../../testing/fake-fetch';
import { renderApp } from '../../../testing/render-app';

const job = {
  id: 'job-7',
  status: 'running',
  total: 3,
  done: 0,
  imported: 0,
  rejected: 0,
  fileName: 'raw-materials.jdx',
  createdAt: '2026-03-05T08:00:00.000Z',
};

const results = [
  { block: 1, title: 'Vanillin (simulated)', status: 'imported', accession: 'IF-000201' },
  { block: 2, title: 'Block two', status: 'rejected', reason: 'line 14: ##PEAK TABLE value "x" is not a number' },
  { block: 3, title: 'Eugenol (simulated)', status: 'imported', accession: 'IF-000202' },
];

/** Each poll reports one more block done, until all three are. */
function progressingJob() {
  let polls = 0;
  return () => {
    polls += 1;
    const done = Math.min(polls, 3);
    const shown = results.slice(0, done);
    return json({
      job: {
        ...job,
        status: done === 3 ? 'done' : 'running',
        done,
        imported: shown.filter((r) => r.status === 'imported').length,
        rejected: shown.filter((r) => r.status === 'rejected').length,
      },
      results: shown,
    });
  };
}

describe('review desk · bulk import', () => {
  it('when a file is sent, posts it as multipart with the target, keeps the job in the address and polls to the end', async () => {
    const network = installFakeFetch({
      'GET /api/v1/me': meReply('curator'),
      'POST /api/v1/imports': json({ job }, 202),
      'GET /api/v1/imports/job-7': progressingJob(),
    });
    const sentBodies: unknown[] = [];
    const fakeFetch = globalThis.fetch;
    globalThis.fetch = (input, init) => {
      sentBodies.push(init?.body);
      return fakeFetch(input, init);
    };
    const { router } = renderApp('/review/import');

    const input = (await screen.findByLabelText('JCAMP-DX file')) as HTMLInputElement;
    const file = new File(['##TITLE=demo\n##END=\n'], 'raw-materials.jdx', { type: 'chemical/x-jcamp-dx' });
    Object.defineProperty(input, 'files', { value: [file] });
    fireEvent.change(input);
    fireEvent.click(screen.getByLabelText('in review (straight onto the desk)'));
    fireEvent.click(screen.getByRole('button', { name: 'Start the import' }));

    await waitFor(() => expect(router.state.location.search).toBe('?job=job-7'));
    const [post] = network.made('POST', '/api/v1/imports');
    expect(post?.url.searchParams.get('target')).toBe('in_review');
    expect(post?.headers.get('X-Requested-With')).toBe('ionfolio');
    expect(post?.headers.get('Content-Type')).toBeNull();
    const form = sentBodies.find((body) => body instanceof FormData) as FormData;
    expect((form.get('file') as File).name).toBe('raw-materials.jdx');

    const bar = await screen.findByRole('progressbar', { name: 'Blocks processed' });
    await waitFor(() => expect(bar.getAttribute('aria-valuenow')).toBe('3'), { timeout: 4000 });
    expect(screen.getByTestId('import-count').textContent).toBe('3 / 3');
    expect(screen.getByRole('status').textContent).toContain('Done · 2 imported · 1 rejected');
    const table = screen.getByRole('table', { name: 'Result per block' });
    const rows = within(table).getAllByRole('row').slice(1);
    expect(rows).toHaveLength(3);
    expect(within(rows[0] as HTMLElement).getByRole('link', { name: 'IF-000201' }).getAttribute('href')).toBe('/entries/IF-000201');
    expect(rows[1]?.textContent).toContain('line 14: ##PEAK TABLE value "x" is not a number');
    const polls = network.made('GET', '/api/v1/imports/job-7').length;
    expect(polls).toBe(3);
    // Once done, nothing more is asked.
    await new Promise((resolve) => setTimeout(resolve, 900));
    expect(network.made('GET', '/api/v1/imports/job-7')).toHaveLength(polls);
  }, 10_000);

  it('when the page is reloaded with ?job=, follows that job without uploading again', async () => {
    const network = installFakeFetch({
      'GET /api/v1/me': meReply('curator'),
      'GET /api/v1/imports/job-7': json({ job: { ...job, status: 'failed', done: 1, rejected: 1 }, results: [results[1]] }),
    });
    renderApp('/review/import?job=job-7');

    await screen.findByRole('progressbar');
    expect(screen.getByRole('status').textContent).toContain('Failed · 0 imported · 1 rejected');
    expect(network.made('POST', '/api/v1/imports')).toHaveLength(0);
  });

  it('when no file is chosen, says so and sends nothing', async () => {
    const network = installFakeFetch({ 'GET /api/v1/me': meReply('curator') });
    renderApp('/review/import');
    fireEvent.click(await screen.findByRole('button', { name: 'Start the import' }));
    expect(screen.getByText('Choose a file first.')).toBeTruthy();
    expect(network.made('POST', '/api/v1/imports')).toHaveLength(0);
  });
});
