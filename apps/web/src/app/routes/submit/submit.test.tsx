import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { meReply } from '../../../testing/factories';
import { apiError, installFakeFetch, json, type RecordedRequest } from '../../../testing/fake-fetch';
import { renderApp } from '../../../testing/render-app';

// Chlorobenzene C6H5Cl, invented (simulated) peaks: M+1 6.6 % from 6 × 13C at 1.08 %/C and M+2 32 % from
// one 37Cl (SCIENCE.md §1, computed). Monoisotopic mass 6 × 12 + 5 × 1.00782503223 + 34.968852682 =
// 112.0080 u (SCIENCE.md §1 masses, computed).
const chlorobenzenePeaks = '112:100, 113:6.6, 114:32.5, 115:2.1, 77:60, 51:14, 50:9';
const withoutM2 = '112:100, 113:6.6, 77:60, 51:14, 50:9';

const contributor = { id: 'u-contrib', login: 'treyes', displayName: 'Tomas Reyes' };

function makeRevision(overrides: Record<string, unknown> = {}) {
  return {
    id: '5b0c2a86-5d1e-4c43-9f7e-2a4f1c9d0e11',
    accession: 'IF-000042',
    number: 1,
    label: 'IF-000042 r1',
    state: 'draft',
    lockVersion: 3,
    name: 'Chlorobenzene',
    synonyms: [],
    formula: 'C6H5Cl',
    nominalMass: 112,
    monoisotopicMass: 112.008,
    structure: null,
    structureFormat: null,
    casRn: null,
    peaks: [
      [50, 9],
      [51, 14],
      [77, 60],
      [112, 100],
      [113, 6.6],
      [114, 32.5],
    ],
    peakCount: 6,
    basePeakMz: 112,
    conditions: { ionizationEnergyEv: 70 },
    retentionIndex: null,
    sampleNotes: 'Lot QC-2291 (invented), GC purity 99.6 %.',
    changeNote: '',
    simulated: true,
    checks: [],
    checksWorst: 'pass',
    contentSha256: 'x',
    restoredFrom: null,
    author: contributor,
    reviewer: null,
    createdAt: '2026-03-02T09:00:00.000Z',
    updatedAt: '2026-03-02T09:10:00.000Z',
    submittedAt: null,
    decidedAt: null,
    publishedAt: null,
    ...overrides,
  };
}

const baseRoutes = {
  'GET /api/v1/me': meReply('contributor', contributor),
  'GET /api/v1/my/revisions': json({ items: [] }),
};

function field(label: string | RegExp): HTMLInputElement | HTMLTextAreaElement {
  return screen.getByLabelText(label) as HTMLInputElement;
}

function type(label: string | RegExp, value: string) {
  fireEvent.change(field(label), { target: { value } });
}

async function checkItem(id: string): Promise<HTMLElement> {
  const list = await screen.findByRole('list', { name: 'Consistency checks' });
  const item = list.querySelector<HTMLElement>(`[data-check="${id}"]`);
  if (!item) throw new Error(`no check ${id}`);
  return item;
}

describe('submit page', () => {
  it('when a formula and pasted peaks are typed, shows masses and the live checks; without M+2 the isotope check fails', async () => {
    installFakeFetch(baseRoutes);
    renderApp('/submit');

    await screen.findByRole('form', { name: 'Revision' });
    type('Formula', 'C6H5Cl');
    expect(screen.getByTestId('formula-masses').textContent).toBe(
      'C6H5Cl · nominal mass 112 Da · monoisotopic 112.0080 Da · RDBE 4',
    );
    type('Peaks', chlorobenzenePeaks);

    await waitFor(async () => expect((await checkItem('isotope-cluster')).dataset.status).toBe('pass'));
    expect((await checkItem('molecular-ion-mass')).dataset.status).toBe('pass');
    expect((await checkItem('isotope-cluster')).textContent).toContain('observed 32.5 vs theoretical 32.2');
    // happy-dom has no canvas: the chart stays a placeholder (charts are checked in the browser).
    expect(screen.getByRole('figure', { name: 'Stick plot of this spectrum, 7 peaks' })).toBeTruthy();
    expect(screen.getByTestId('chart-placeholder').textContent).toContain('cannot draw the chart');

    type('Peaks', withoutM2);
    await waitFor(async () => expect((await checkItem('isotope-cluster')).dataset.status).toBe('fail'));
    expect((await checkItem('isotope-cluster')).textContent).toContain('at m/z 114: observed 0 vs theoretical 32.2');
  });

  it('when the pasted peaks do not parse, shows the error with its line and runs no checks', async () => {
    installFakeFetch(baseRoutes);
    renderApp('/submit');

    await screen.findByRole('form', { name: 'Revision' });
    type('Formula', 'C6H5Cl');
    type('Peaks', '112 100\n114 abc');

    expect(await screen.findByText('line 2, column 5: "abc" is not a number (expected an intensity)')).toBeTruthy();
    expect(screen.queryByRole('list', { name: 'Consistency checks' })).toBeNull();
    expect(field('Peaks').getAttribute('aria-invalid')).toBe('true');
  });

  it('when Save draft is pressed on a new entry, posts the revision content and opens the saved draft', async () => {
    const saved = makeRevision({ lockVersion: 1 });
    const network = installFakeFetch({
      ...baseRoutes,
      'POST /api/v1/entries': json({ revision: saved }, 201),
      [`GET /api/v1/revisions/${saved.id}`]: json({ revision: saved }),
    });
    const { router } = renderApp('/submit');

    await screen.findByRole('form', { name: 'Revision' });
    type('Name', 'Chlorobenzene');
    type('Synonyms', 'phenyl chloride\n\n monochlorobenzene ');
    type('Formula', 'C6H5Cl');
    type('CAS RN', '108-90-7');
    type('Peaks', '112 100\n114 32\n77 60');
    type('Source temperature (°C)', '230');
    type('Retention index', '846');
    type('Sample notes', 'Lot QC-2291 (invented).');
    fireEvent.click(screen.getByRole('button', { name: 'Save draft' }));

    await waitFor(() => expect(router.state.location.pathname).toBe(`/submit/${saved.id}`));
    const [post] = network.made('POST', '/api/v1/entries');
    expect(post?.body).toEqual({
      name: 'Chlorobenzene',
      synonyms: ['phenyl chloride', 'monochlorobenzene'],
      formula: 'C6H5Cl',
      structure: null,
      structureFormat: null,
      casRn: '108-90-7',
      peaks: [
        [112, 100],
        [114, 32],
        [77, 60],
      ],
      conditions: { ionizationEnergyEv: 70, sourceTemperatureC: 230 },
      retentionIndex: { value: 846, column: 'non-polar' },
      sampleNotes: 'Lot QC-2291 (invented).',
      changeNote: '',
    });
    expect(post?.headers.get('X-Requested-With')).toBe('ionfolio');
    expect(await screen.findByText('Draft saved.')).toBeTruthy();
  });

  it('when required fields are missing, lists the problems by field and sends nothing', async () => {
    const network = installFakeFetch(baseRoutes);
    renderApp('/submit');

    await screen.findByRole('form', { name: 'Revision' });
    type('Formula', 'C6H5Xx');
    fireEvent.click(screen.getByRole('button', { name: 'Save draft' }));

    const alert = await screen.findByRole('alert', { name: 'Problems to fix' });
    const lines = within(alert).getAllByRole('listitem').map((li) => li.textContent);
    expect(lines).toContain('Name: a name is required');
    expect(lines.some((line) => line?.startsWith('Formula: '))).toBe(true);
    expect(lines).toContain('Peaks: a spectrum needs at least one peak');
    expect(network.made('POST', '/api/v1/entries')).toHaveLength(0);
  });

  it('when an own draft is sent for review, patches it at its lock version and submits with the new one', async () => {
    const draft = makeRevision();
    const network = installFakeFetch({
      ...baseRoutes,
      [`GET /api/v1/revisions/${draft.id}`]: json({ revision: draft }),
      [`PATCH /api/v1/revisions/${draft.id}`]: (request: RecordedRequest) =>
        json({ revision: { ...draft, ...(request.body as object), lockVersion: 4 } }),
      [`POST /api/v1/revisions/${draft.id}/submit`]: json({ revision: { ...draft, lockVersion: 5, state: 'in_review' } }),
    });
    renderApp(`/submit/${draft.id}`);

    await screen.findByRole('form', { name: 'Revision' });
    expect(field('Name').value).toBe('Chlorobenzene');
    type('Change note', 'First recording.');
    fireEvent.click(screen.getByRole('button', { name: 'Send for review' }));

    expect(await screen.findByText(/Sent for review\./)).toBeTruthy();
    const [patch] = network.made('PATCH', `/api/v1/revisions/${draft.id}`);
    expect(patch?.body).toMatchObject({ lockVersion: 3, name: 'Chlorobenzene', changeNote: 'First recording.', formula: 'C6H5Cl' });
    const [submit] = network.made('POST', `/api/v1/revisions/${draft.id}/submit`);
    expect(submit?.body).toEqual({ lockVersion: 4 });
    // In review: the form is read-only and offers no save buttons.
    expect(screen.queryByRole('button', { name: 'Save draft' })).toBeNull();
  });

  it('when someone saved the revision meanwhile (409 STALE_REVISION), says so and reloads on request', async () => {
    const draft = makeRevision();
    let current = draft;
    const network = installFakeFetch({
      ...baseRoutes,
      [`GET /api/v1/revisions/${draft.id}`]: () => json({ revision: current }),
      [`PATCH /api/v1/revisions/${draft.id}`]: () => {
        current = { ...draft, lockVersion: 4, name: 'Chlorobenzene (renamed elsewhere)' };
        return apiError(409, 'STALE_REVISION', 'This revision was saved by someone else after you loaded it.');
      },
    });
    renderApp(`/submit/${draft.id}`);

    await screen.findByRole('form', { name: 'Revision' });
    type('Name', 'Chlorobenzene, redistilled');
    fireEvent.click(screen.getByRole('button', { name: 'Save draft' }));

    const alert = await screen.findByRole('alert');
    expect(alert.textContent).toContain('Not saved: this revision changed since you opened it');
    expect(alert.textContent).toContain('This revision was saved by someone else after you loaded it.');
    fireEvent.click(within(alert).getByRole('button', { name: 'Reload the revision' }));

    await waitFor(() => expect(field('Name').value).toBe('Chlorobenzene (renamed elsewhere)'));
    expect(network.made('GET', `/api/v1/revisions/${draft.id}`).length).toBeGreaterThanOrEqual(2);
  });

  it('when the API answers 400 VALIDATION, lists its details by field', async () => {
    installFakeFetch({
      ...baseRoutes,
      'POST /api/v1/entries': apiError(400, 'VALIDATION', 'Invalid request at casRn: the CAS RN check digit does not match', [
        { path: 'casRn', message: 'the CAS RN check digit does not match', code: 'custom' },
      ]),
    });
    renderApp('/submit');

    await screen.findByRole('form', { name: 'Revision' });
    type('Name', 'Chlorobenzene');
    type('Formula', 'C6H5Cl');
    type('Peaks', '112 100');
    fireEvent.click(screen.getByRole('button', { name: 'Save draft' }));

    const alert = await screen.findByRole('alert', { name: 'Problems to fix' });
    expect(within(alert).getByRole('listitem').textContent).toBe('CAS RN: the CAS RN check digit does not match');
  });

  it('when an uploaded file holds two spectra, lets the person choose one and fills the form from it', async () => {
    const network = installFakeFetch({
      ...baseRoutes,
      'POST /api/v1/uploads/spectra': json({
        fileName: 'two-standards.jdx',
        format: 'jcamp',
        blocks: [
          { index: 0, title: 'Toluene (simulated)', peaks: [[91, 100], [92, 60]], formula: 'C 7 H 8' },
          { index: 1, title: 'Chlorobenzene (simulated)', peaks: [[77, 60], [112, 100], [114, 32]], formula: 'C 6 H 5 Cl', ionizationEnergyEv: 70, inlet: 'GC' },
        ],
      }),
    });
    renderApp('/submit');

    await screen.findByRole('form', { name: 'Revision' });
    const file = new File(['##TITLE=…'], 'two-standards.jdx', { type: 'chemical/x-jcamp-dx' });
    fireEvent.change(screen.getByLabelText('Upload a spectrum file'), { target: { files: [file] } });

    const chooser = await screen.findByRole('group', { name: 'Choose a spectrum from the file' });
    expect(chooser.textContent).toContain('two-standards.jdx holds 2 spectra');
    fireEvent.click(within(chooser).getByLabelText(/Chlorobenzene \(simulated\)/));
    fireEvent.click(within(chooser).getByRole('button', { name: 'Use this spectrum' }));

    await waitFor(() => expect(field('Peaks').value).toBe('77 60\n112 100\n114 32'));
    expect(field('Formula').value).toBe('C6H5Cl');
    expect(field('Name').value).toBe('Chlorobenzene (simulated)');
    expect(field('Inlet').value).toBe('GC');
    expect(screen.getByText('From two-standards.jdx: peaks, name, formula, inlet.')).toBeTruthy();
    const [upload] = network.made('POST', '/api/v1/uploads/spectra');
    expect(upload?.headers.get('X-Requested-With')).toBe('ionfolio');
    expect(upload?.headers.get('Content-Type')).toBeNull();
  });

  it('when a revision came back with changes needed, shows the review comments and sends a reply', async () => {
    const returned = makeRevision({ state: 'needs_changes' });
    const decision = {
      id: '9d7e8f10-1111-4a2b-8c3d-000000000001',
      parentId: null,
      author: { id: 'u-cur', login: 'dokafor', displayName: 'Dana Okafor' },
      body: 'M+2 looks low for one chlorine; please re-check the 114 intensity.',
      kind: 'decision',
      createdAt: '2026-03-03T10:00:00.000Z',
    };
    const network = installFakeFetch({
      ...baseRoutes,
      [`GET /api/v1/revisions/${returned.id}`]: json({ revision: returned }),
      [`GET /api/v1/revisions/${returned.id}/comments`]: json({ comments: [decision] }),
      [`POST /api/v1/revisions/${returned.id}/comments`]: (request: RecordedRequest) =>
        json({ comment: { ...decision, id: 'c2', kind: 'comment', author: contributor, ...(request.body as object) } }, 201),
    });
    renderApp(`/submit/${returned.id}`);

    const thread = await screen.findByRole('region', { name: 'Review comments' });
    expect(await within(thread).findByText(decision.body)).toBeTruthy();
    expect(within(thread).getByText('Dana Okafor')).toBeTruthy();
    fireEvent.change(within(thread).getByLabelText('Reply'), { target: { value: 'Re-integrated; 114 is now 32.4.' } });
    fireEvent.click(within(thread).getByRole('button', { name: 'Send reply' }));

    await waitFor(() => expect(network.made('POST', `/api/v1/revisions/${returned.id}/comments`)).toHaveLength(1));
    expect(network.made('POST', `/api/v1/revisions/${returned.id}/comments`)[0]?.body).toEqual({
      body: 'Re-integrated; 114 is now 32.4.',
      parentId: decision.id,
    });
    expect(screen.getByRole('button', { name: 'Save draft' })).toBeTruthy();
  });

  it('lists my open revisions with their state and a link to continue', async () => {
    installFakeFetch({
      ...baseRoutes,
      'GET /api/v1/my/revisions': json({
        items: [
          { revisionId: 'r-1', accession: 'IF-000042', number: 1, label: 'IF-000042 r1', state: 'needs_changes', name: 'Chlorobenzene', formula: 'C6H5Cl', checksWorst: 'warn', author: 'Tomas Reyes', submittedAt: null, updatedAt: '2026-03-03T10:00:00.000Z', hasPublished: false, simulated: true },
          { revisionId: 'r-2', accession: 'IF-000043', number: 2, label: 'IF-000043 r2', state: 'in_review', name: 'Anisole', formula: 'C7H8O', checksWorst: 'pass', author: 'Tomas Reyes', submittedAt: '2026-03-03T11:00:00.000Z', updatedAt: '2026-03-03T11:00:00.000Z', hasPublished: true, simulated: true },
        ],
      }),
    });
    renderApp('/submit');

    const table = await screen.findByRole('table', { name: 'My open revisions' });
    const rows = within(table).getAllByRole('row').slice(1);
    expect(rows).toHaveLength(2);
    expect(within(rows[0]!).getByText('needs changes')).toBeTruthy();
    expect(within(rows[0]!).getByRole('link', { name: 'Answer and fix' }).getAttribute('href')).toBe('/submit/r-1');
    expect(within(rows[1]!).getByRole('link', { name: 'View' }).getAttribute('href')).toBe('/entries/IF-000043?revision=2');
  });
});
