import { fragmentNotes, type FragmentNote, type PeakList } from '@ionfolio/chem';
import { useMemo } from 'react';

function notesFor(peaks: PeakList, formula: string, molecularIonMz: number): FragmentNote[] | string {
  try {
    return fragmentNotes(peaks, { formula, molecularIonMz });
  } catch (error) {
    return error instanceof Error ? error.message : 'the notes could not be computed';
  }
}

type EntryFragmentNotesProps = { peaks: PeakList; formula: string; molecularIonMz: number };

/** Common losses from M and common low-mass ions in this spectrum, with the formula's atoms as a filter. */
export function EntryFragmentNotes({ peaks, formula, molecularIonMz }: EntryFragmentNotesProps) {
  const notes = useMemo(() => notesFor(peaks, formula, molecularIonMz), [peaks, formula, molecularIonMz]);
  if (typeof notes === 'string') return <p role="alert" className="text-sm text-copper">No fragment notes: {notes}</p>;
  if (notes.length === 0) return <p className="text-sm text-ink-soft">No common loss from M and no common low-mass ion in this spectrum.</p>;
  return (
    <div>
      <table className="w-full border-collapse text-sm leading-6">
        <caption className="sr-only">Fragment notes</caption>
        <thead className="border-b border-rule">
          <tr>
            <th scope="col" className="py-1 pr-3 text-left text-xs font-bold uppercase tracking-wider text-ink-soft">m/z</th>
            <th scope="col" className="py-1 pr-3 text-right text-xs font-bold uppercase tracking-wider text-ink-soft">% base</th>
            <th scope="col" className="py-1 text-left text-xs font-bold uppercase tracking-wider text-ink-soft">Note</th>
          </tr>
        </thead>
        <tbody>
          {notes.map((note, index) => (
            <tr key={`${note.mz}-${note.kind}-${index}`} className="border-b border-rule-faint last:border-b-0">
              <td className="py-0.5 pr-3 tabular-nums">{note.mz}</td>
              <td className="py-0.5 pr-3 text-right tabular-nums text-ink-soft">{note.relIntensity.toFixed(0)}</td>
              <td className="py-0.5">{note.label}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <p className="mt-2 text-xs text-ink-soft">
        Source: {[...new Set(notes.map((n) => n.source))].join('; ')}. Hints to weigh, not assignments.
      </p>
    </div>
  );
}
