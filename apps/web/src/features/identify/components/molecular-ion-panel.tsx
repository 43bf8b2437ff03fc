import type { ReactNode } from 'react';
import type { Reading } from '../api/identify-schemas';
import { bodyCell, headCell, rowBase, tableBase, tableFrame } from './table-styles';
import { ReadingEvidence, ReadingNotes } from '../../../components/spectrum/reading-evidence';

function Fact({ label, children }: { label: string; children: ReactNode }) {
  return (
    <div className="flex justify-between gap-4 border-b border-rule-faint py-1 last:border-b-0">
      <dt className="text-ink-soft">{label}</dt>
      <dd className="text-right font-bold tabular-nums text-ink">{children}</dd>
    </div>
  );
}

/** The molecular-ion check of the query: the reading, every number behind it, and formula suggestions. */
export function MolecularIonPanel({ reading }: { reading: Reading | null }) {
  if (reading === null) {
    return (
      <p className="text-sm text-ink-soft">
        No cluster could be read from this spectrum, so there is no molecular-ion check.
      </p>
    );
  }
  const carbon = reading.carbonRange;
  return (
    <div className="grid gap-4" data-testid="molecular-ion-check">
      <dl className="rounded-lg border border-rule-faint bg-paper-raised px-4 py-2 text-sm">
        <Fact label="Molecular ion">
          {reading.likelyAbsent || reading.molecularIonMz === null ? (
            <span className="text-copper">
              likely absent (highest cluster starts at m/z {reading.clusterStartMz ?? '?'})
            </span>
          ) : (
            <>likely M = m/z {reading.molecularIonMz}</>
          )}
        </Fact>
        <Fact label="Chlorine · bromine">
          Cl {reading.chlorine} · Br {reading.bromine}
        </Fact>
        <Fact label="Sulfur · silicon">
          S {reading.sulfurLikely ? 'likely' : 'not indicated'} · Si{' '}
          {reading.siliconLikely ? 'likely' : 'not indicated'}
        </Fact>
        <Fact label="Carbon (from M+1)">
          {carbon ? (
            <>
              C{carbon.min}–C{carbon.max}{' '}
              <span className="font-normal text-ink-soft">(about {carbon.estimate.toFixed(1)}, ±2σ)</span>
            </>
          ) : (
            'no usable M+1'
          )}
        </Fact>
        <Fact label="Nitrogen rule">
          {reading.nitrogenParity === null
            ? 'not applied (M unknown)'
            : reading.nitrogenParity === 'odd'
              ? 'odd number of N'
              : 'even number of N (possibly none)'}
        </Fact>
      </dl>
      <ReadingNotes notes={reading.notes} />
      <ReadingEvidence evidence={reading.evidence} />
      <div>
        <h4 className="mb-1 text-sm font-bold text-ink">Formula suggestions for M</h4>
        {reading.suggestions.length === 0 ? (
          <p className="text-sm text-ink-soft">None{reading.likelyAbsent ? ': M is likely absent.' : '.'}</p>
        ) : (
          <div className={tableFrame}>
            <table className={tableBase}>
              <caption className="sr-only">Formula suggestions</caption>
              <thead className="border-b border-rule bg-paper-sunk">
                <tr>
                  <th scope="col" className={headCell}>
                    Formula
                  </th>
                  <th scope="col" className={`${headCell} text-right`}>
                    Monoisotopic (u)
                  </th>
                  <th scope="col" className={`${headCell} text-right`}>
                    RDBE
                  </th>
                  <th scope="col" className={`${headCell} text-right`}>
                    Cluster agreement
                  </th>
                  <th scope="col" className={headCell}>
                    Rules passed
                  </th>
                </tr>
              </thead>
              <tbody>
                {reading.suggestions.map((s) => (
                  <tr key={s.formula} className={rowBase}>
                    <th scope="row" className={`${bodyCell} text-left font-bold`}>
                      {s.formula}
                    </th>
                    <td className={`${bodyCell} text-right tabular-nums`}>
                      {s.monoisotopicMass === undefined ? '—' : s.monoisotopicMass.toFixed(4)}
                    </td>
                    <td className={`${bodyCell} text-right tabular-nums`}>{s.rdbe}</td>
                    <td className={`${bodyCell} text-right tabular-nums`}>
                      {s.agreement === null || s.agreement === undefined
                        ? '—'
                        : `${(s.agreement * 100).toFixed(0)} %`}
                    </td>
                    <td
                      className={`${bodyCell} text-xs leading-5 text-ink-soft`}
                      title={s.rulesPassed?.join(', ')}
                    >
                      {s.rulesPassed ? `${s.rulesPassed.length} rules` : '—'}
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        )}
      </div>
    </div>
  );
}
