import { Link } from 'react-router-dom';
import { entryRevisionHref } from '../../../config/paths';
import type { Candidate, Reading } from '../api/identify-schemas';
import { formulaDisagreements } from '../utils/formula-disagreement';
import { bodyCell, headCell, rowBase, tableBase, tableFrame } from './table-styles';

type CandidatesTableProps = {
  candidates: readonly Candidate[];
  reading: Reading | null;
  selectedIndex: number | null;
  onSelect: (index: number) => void;
  showReverse: boolean;
};

/** The ranked candidates; choosing a row opens its mirror view. */
export function CandidatesTable({ candidates, reading, selectedIndex, onSelect, showReverse }: CandidatesTableProps) {
  return (
    <div className={tableFrame}>
      <table className={tableBase}>
        <caption className="sr-only">Candidates</caption>
        <thead className="border-b border-rule bg-paper-sunk">
          <tr>
            <th scope="col" className={headCell}>#</th>
            <th scope="col" className={headCell}>Similarity</th>
            {showReverse ? <th scope="col" className={headCell}>Reverse</th> : null}
            <th scope="col" className={headCell}>Revision</th>
            <th scope="col" className={headCell}>Name</th>
            <th scope="col" className={headCell}>Formula</th>
            <th scope="col" className={`${headCell} text-right`}>Nominal mass</th>
            <th scope="col" className={`${headCell} text-right`}>Matched</th>
            <th scope="col" className={headCell}>Molecular-ion check</th>
            <th scope="col" className={headCell}><span className="sr-only">Mirror view</span></th>
          </tr>
        </thead>
        <tbody>
          {candidates.map((candidate, index) => {
            const disagreements = formulaDisagreements(candidate, reading);
            const selected = index === selectedIndex;
            const label = `${candidate.accession} r${candidate.revision}`;
            return (
              <tr
                key={`${candidate.accession}-${candidate.revision}`}
                aria-selected={selected}
                data-accession={candidate.accession}
                className={`${rowBase} ${selected ? 'bg-paper-sunk' : 'hover:bg-paper-sunk/60'}`}
              >
                <td className={`${bodyCell} tabular-nums text-ink-soft`}>{index + 1}</td>
                <td className={`${bodyCell} font-bold tabular-nums`} data-testid="similarity">{candidate.similarity.toFixed(1)}</td>
                {showReverse ? (
                  <td className={`${bodyCell} tabular-nums`}>{candidate.reverseSimilarity === undefined ? '—' : candidate.reverseSimilarity.toFixed(1)}</td>
                ) : null}
                <td className={`${bodyCell} whitespace-nowrap`}>
                  <Link to={entryRevisionHref(candidate.accession, candidate.revision)} className="underline decoration-rule underline-offset-4 hover:decoration-ink">
                    {label}
                  </Link>
                </td>
                <th scope="row" className={`${bodyCell} text-left font-bold text-ink`}>{candidate.name}</th>
                <td className={bodyCell}>{candidate.formula}</td>
                <td className={`${bodyCell} text-right tabular-nums`}>{candidate.nominalMass}</td>
                <td className={`${bodyCell} text-right tabular-nums`}>{candidate.matchedPeaks.length}</td>
                <td className={bodyCell}>
                  {disagreements.length > 0 ? (
                    <span
                      data-testid="formula-flag"
                      title={disagreements.join('; ')}
                      className="inline-flex rounded border border-copper bg-copper-soft px-1.5 text-xs font-bold text-copper"
                    >
                      disagrees: {disagreements.join('; ')}
                    </span>
                  ) : (
                    <span className="text-ink-soft">—</span>
                  )}
                </td>
                <td className={bodyCell}>
                  <button
                    type="button"
                    aria-pressed={selected}
                    data-print="hide"
                    aria-label={`Mirror view of ${label}`}
                    onClick={() => onSelect(index)}
                    className={`rounded border px-2 text-xs font-bold ${selected ? 'border-ink bg-ink text-paper-raised' : 'border-rule text-ink hover:border-ink'}`}
                  >
                    {selected ? 'shown' : 'show'}
                  </button>
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
