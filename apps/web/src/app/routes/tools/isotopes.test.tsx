import { fireEvent, screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { meReply } from '../../../testing/factories';
import { installFakeFetch, json } from '../../../testing/fake-fetch';
import { renderApp } from '../../../testing/render-app';

function percentOfM(mz: number): number {
  return Number(screen.getByTestId(`of-m-${mz}`).textContent);
}

describe('tools · isotope calculator', () => {
  it('for C6H4Cl2, shows M 146 and the Cl2 cluster with M+2 about 64 % and M+4 about 10 % of M', async () => {
    installFakeFetch({ 'GET /api/v1/me': meReply('reader') });
    renderApp('/tools/isotopes');
    const input = await screen.findByRole('textbox', { name: /Formula/ });
    fireEvent.change(input, { target: { value: 'C6H4Cl2' } });

    const table = await screen.findByRole('table', { name: 'Isotope cluster of C6H4Cl2' });
    expect(within(table).getByRole('rowheader', { name: '146' })).toBeTruthy();
    // SCIENCE.md §1 (from the NIST/IUPAC abundances): Cl2 alone is 100 : 64.0 : 10.2; the six carbons and
    // four hydrogens add a few tenths (13C2, 13C·37Cl combinations), computed, so ±0.5 points.
    expect(percentOfM(148)).toBeCloseTo(64.0, 0);
    expect(percentOfM(150)).toBeCloseTo(10.2, 0);
    // M+1 from 13C: 6 × 1.08 % (SCIENCE.md §1 rule of thumb, computed) plus 4 × 0.0115 % for 2H.
    expect(percentOfM(147)).toBeCloseTo(6.5, 0);
    // Monoisotopic mass 6 × 12 + 4 × 1.00782503223 + 2 × 34.968852682 = 145.96901 u (SCIENCE.md §1 masses, computed).
    expect(screen.getByText('145.96901 u')).toBeTruthy();
    expect(screen.getByText('146 Da')).toBeTruthy();
    // RDBE = 6 − (4 + 2)/2 + 1 = 4 (SCIENCE.md §2).
    expect(screen.getByText('RDBE').nextSibling?.textContent).toBe('4');
    expect(screen.getByTestId('nitrogen-rule').textContent).toContain('holds');
  });

  it('when the formula has an unknown element, says so and shows no cluster', async () => {
    installFakeFetch({ 'GET /api/v1/me': meReply('reader') });
    renderApp('/tools/isotopes');
    fireEvent.change(await screen.findByRole('textbox', { name: /Formula/ }), { target: { value: 'C6Xx' } });
    expect((await screen.findByRole('alert')).textContent).toMatch(/Xx/);
    expect(screen.queryByRole('table')).toBeNull();
  });

  it('for the benzyl ion C7H7, says the nitrogen rule does not hold (an even-electron ion)', async () => {
    installFakeFetch({ 'GET /api/v1/me': meReply('reader') });
    renderApp('/tools/isotopes');
    fireEvent.change(await screen.findByRole('textbox', { name: /Formula/ }), { target: { value: 'C7H7' } });
    // RDBE 7 − 7/2 + 1 = 4.5 (SCIENCE.md §2): half-integer, an even-electron ion.
    expect((await screen.findByTestId('nitrogen-rule')).textContent).toContain('does not hold');
    expect(screen.getByText('4.5')).toBeTruthy();
  });

  it('when asked, compares with the server’s answer for the same formula', async () => {
    const network = installFakeFetch({
      'GET /api/v1/me': meReply('reader'),
      'GET /api/v1/formulas/C6H4Cl2': json({
        formula: 'C6H4Cl2',
        nominalMass: 146,
        monoisotopicMass: 145.96901,
        rdbe: 4,
        cluster: [
          { mz: 146, relativeIntensity: 100 },
          { mz: 148, relativeIntensity: 50 },
        ],
      }),
    });
    renderApp('/tools/isotopes');
    fireEvent.click(await screen.findByRole('button', { name: 'Compare with the server' }));
    expect((await screen.findByText(/Server: C6H4Cl2/)).textContent).toContain('differs');
    expect(network.made('GET', '/api/v1/formulas/C6H4Cl2')).toHaveLength(1);
  });
});
