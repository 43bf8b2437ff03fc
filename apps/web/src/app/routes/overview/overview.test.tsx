import { fireEvent, screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { meReply } from '../../../testing/factories';
import { apiError, installFakeFetch, json } from '../../../testing/fake-fetch';
import { renderApp } from '../../../testing/render-app';

/** Invented numbers, as `GET /api/v1/overview` answers them. */
const overview = {
  entriesByState: [
    { state: 'draft', entries: 3 },
    { state: 'in_review', entries: 2 },
    { state: 'needs_changes', entries: 1 },
    { state: 'published', entries: 40 },
    { state: 'superseded', entries: 6 },
    { state: 'withdrawn', entries: 1 },
  ],
  publishedEntries: 40,
  growthByMonth: [
    { month: '2026-01', newEntries: 25, revisionsPublished: 25, cumulativeEntries: 25 },
    { month: '2026-02', newEntries: 15, revisionsPublished: 21, cumulativeEntries: 40 },
  ],
  massHistogram: { binDa: 25, bins: [{ fromDa: 125, entries: 12 }, { fromDa: 150, entries: 28 }] },
  elementCoverage: [
    { element: 'C', entries: 40 },
    { element: 'Cl', entries: 4 },
    { element: 'Br', entries: 0 },
  ],
  checkProblems: [{ checkId: 'background-ions', title: 'Background ions', warn: 3, fail: 1 }],
  reviewTurnaround: [{ month: '2026-02', decisions: 21, medianHours: 5.5, p90Hours: 30.2 }],
};

describe('overview page', () => {
  it('shows each chart with a title, a spoken summary and the numbers as a table', async () => {
    installFakeFetch({ 'GET /api/v1/me': meReply('reader'), 'GET /api/v1/overview': json(overview) });
    renderApp('/overview');
    expect(await screen.findByRole('heading', { name: 'Entries by state' })).toBeTruthy();
    for (const title of ['Growth by month', 'Nominal mass (bins of 25 Da)', 'Element coverage', 'Consistency checks that warn or fail', 'Review turnaround']) {
      expect(screen.getByRole('heading', { name: title })).toBeTruthy();
    }
    expect(screen.getByRole('figure', { name: /^Nominal mass.*most between 150 and 175 Da \(28\)/ })).toBeTruthy();
    expect(screen.getByRole('figure', { name: /2026-02: median 5.5 h, 90th percentile 30.2 h over 21 decisions/ })).toBeTruthy();
    const elements = screen.getByRole('table', { name: 'Element coverage' });
    const cells = within(elements).getAllByRole('row').map((row) => row.textContent);
    expect(cells).toEqual(['ElementEntries', 'C40', 'Cl4']);
    fireEvent.click(screen.getAllByText('The numbers')[1]!);
    expect(within(screen.getByRole('table', { name: 'Growth by month' })).getAllByRole('row')[2]?.textContent).toBe('2026-02152140');
  });

  it('when the library is empty, says so instead of drawing empty charts', async () => {
    const empty = { ...overview, entriesByState: overview.entriesByState.map((s) => ({ ...s, entries: 0 })), growthByMonth: [], massHistogram: { binDa: 25, bins: [] } };
    installFakeFetch({ 'GET /api/v1/me': meReply('reader'), 'GET /api/v1/overview': json(empty) });
    renderApp('/overview');
    expect(await screen.findByText('The library is empty')).toBeTruthy();
  });

  it('when the overview fails, shows the error with a retry', async () => {
    installFakeFetch({ 'GET /api/v1/me': meReply('reader'), 'GET /api/v1/overview': apiError(500, 'INTERNAL', 'Something went wrong.') });
    renderApp('/overview');
    expect((await screen.findByRole('alert')).textContent).toContain('The overview could not be loaded');
    expect(screen.getByRole('button', { name: 'Try again' })).toBeTruthy();
  });
});
