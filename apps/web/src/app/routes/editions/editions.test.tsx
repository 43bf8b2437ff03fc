import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { meReply } from '../../../testing/factories';
import { apiError, installFakeFetch, json } from '../../../testing/fake-fetch';
import { renderApp } from '../../../testing/render-app';

const editions = [
  { label: '2026.12', notes: 'Year-end set <script>x</script>', revisionCount: 148, createdAt: '2026-12-18T09:00:00.000Z', createdBy: 'Dana Okafor' },
  { label: '2026.06', notes: '', revisionCount: 131, createdAt: '2026-06-20T09:00:00.000Z', createdBy: { login: 'dokafor', displayName: 'Dana Okafor' } },
];

describe('editions', () => {
  it('when a reader opens the list, shows label, notes as text, size, date and who froze it, and no freeze form', async () => {
    installFakeFetch({ 'GET /api/v1/me': meReply('reader'), 'GET /api/v1/editions': json({ editions }) });
    renderApp('/editions');

    const table = await screen.findByRole('table', { name: 'Editions' });
    const rows = within(table).getAllByRole('row').slice(1);
    expect(rows).toHaveLength(2);
    expect(within(rows[0] as HTMLElement).getByRole('link', { name: '2026.12' }).getAttribute('href')).toBe('/editions/2026.12');
    expect(rows[0]?.textContent).toContain('Year-end set <script>x</script>');
    expect(rows[0]?.querySelector('script')).toBeNull();
    expect(rows[0]?.textContent).toContain('148');
    expect(rows[1]?.textContent).toContain('Dana Okafor');
    expect(screen.queryByRole('form', { name: 'Freeze an edition' })).toBeNull();
  });

  it('when a curator freezes an edition, posts the label and notes and opens the new edition', async () => {
    const network = installFakeFetch({
      'GET /api/v1/me': meReply('curator'),
      'GET /api/v1/editions': json({ editions }),
      'POST /api/v1/editions': json({ edition: { ...editions[0], label: '2027.03', notes: 'Spring' } }, 201),
      'GET /api/v1/editions/2027.03': json({
        edition: { ...editions[0], label: '2027.03', notes: 'Spring' },
        previous: '2026.12',
        diff: { added: [], changed: [], withdrawn: [] },
      }),
    });
    const { router } = renderApp('/editions');

    const form = await screen.findByRole('form', { name: 'Freeze an edition' });
    fireEvent.change(within(form).getByLabelText('Label'), { target: { value: '2027.03' } });
    fireEvent.change(within(form).getByLabelText('Notes'), { target: { value: 'Spring' } });
    fireEvent.click(within(form).getByRole('button', { name: 'Freeze' }));

    await waitFor(() => expect(router.state.location.pathname).toBe('/editions/2027.03'));
    expect(network.made('POST', '/api/v1/editions')[0]?.body).toEqual({ label: '2027.03', notes: 'Spring' });
  });

  it('when the label is not valid, says so and posts nothing; when it exists, shows the 409 message', async () => {
    const network = installFakeFetch({
      'GET /api/v1/me': meReply('curator'),
      'GET /api/v1/editions': json({ editions }),
      'POST /api/v1/editions': apiError(409, 'EDITION_EXISTS', 'Edition 2026.12 exists already.'),
    });
    renderApp('/editions');

    const form = await screen.findByRole('form', { name: 'Freeze an edition' });
    fireEvent.change(within(form).getByLabelText('Label'), { target: { value: '2026 12' } });
    fireEvent.click(within(form).getByRole('button', { name: 'Freeze' }));
    expect(within(form).getByText(/letters, digits, dot, dash or underscore/)).toBeTruthy();
    expect(network.made('POST', '/api/v1/editions')).toHaveLength(0);

    fireEvent.change(within(form).getByLabelText('Label'), { target: { value: '2026.12' } });
    fireEvent.click(within(form).getByRole('button', { name: 'Freeze' }));
    expect((await screen.findByRole('alert')).textContent).toBe('Not frozen: Edition 2026.12 exists already.');
  });

  it('when an edition is opened, shows its size, the previous edition, the three difference tables and export links', async () => {
    installFakeFetch({
      'GET /api/v1/me': meReply('reader'),
      'GET /api/v1/editions/2026.12': json({
        edition: editions[0],
        previous: '2026.06',
        diff: {
          added: [{ accession: 'IF-000150', name: 'Isoamyl acetate', formula: 'C7H14O2', revision: 1 }],
          changed: [{ accession: 'IF-000042', name: 'Methyl 4-chlorobenzoate', formula: 'C8H7ClO2', revision: 3, previousRevision: 2 }],
          withdrawn: [],
        },
      }),
    });
    renderApp('/editions/2026.12');

    expect(await screen.findByRole('heading', { level: 1, name: 'Edition 2026.12' })).toBeTruthy();
    expect(screen.getByText(/published revisions, frozen/).textContent).toContain('148');
    expect(within(screen.getByTestId('previous-edition')).getByRole('link', { name: '2026.06' }).getAttribute('href')).toBe('/editions/2026.06');
    const added = screen.getByRole('table', { name: 'Added' });
    expect(within(added).getByRole('link', { name: 'IF-000150 r1' }).getAttribute('href')).toBe('/entries/IF-000150?revision=1');
    const changed = screen.getByRole('table', { name: 'Changed' });
    expect(within(changed).getByRole('link', { name: 'IF-000042 r2' }).getAttribute('href')).toBe('/entries/IF-000042?revision=2');
    expect(within(changed).getByRole('link', { name: 'IF-000042 r3' }).getAttribute('href')).toBe('/entries/IF-000042?revision=3');
    expect(screen.queryByRole('table', { name: 'Withdrawn' })).toBeNull();
    expect(screen.getByText('No entry was withdrawn.')).toBeTruthy();
    expect(screen.getByRole('link', { name: 'JCAMP-DX' }).getAttribute('href')).toBe('/api/v1/editions/2026.12/jcamp');
    expect(screen.getByRole('link', { name: 'CSV' }).getAttribute('href')).toBe('/api/v1/editions/2026.12/csv');
  });

  it('when there are no editions, says none has been frozen', async () => {
    installFakeFetch({ 'GET /api/v1/me': meReply('reader'), 'GET /api/v1/editions': json({ editions: [] }) });
    renderApp('/editions');
    expect(await screen.findByText('No edition has been frozen yet')).toBeTruthy();
  });

  it('when the edition does not exist, shows the API message', async () => {
    installFakeFetch({
      'GET /api/v1/me': meReply('reader'),
      'GET /api/v1/editions/1999.01': apiError(404, 'NOT_FOUND', 'Edition 1999.01 not found'),
    });
    renderApp('/editions/1999.01');
    expect((await screen.findByRole('alert')).textContent).toContain('Edition 1999.01 not found');
  });
});
