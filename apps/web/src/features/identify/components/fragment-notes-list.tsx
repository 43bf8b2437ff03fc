import { fragmentNotes, type FragmentNote, type PeakList } from '@ionfolio/chem';
import { useMemo } from 'react';

type FragmentNotesListProps = {
  peaks: PeakList;
  molecularIonMz: number | null;
  /** The selected candidate's formula: explanations needing atoms it lacks are left out. */
  formula?: string | undefined;
};

function notesFor(peaks: PeakList, molecularIonMz: number | null, formula: string | undefined): FragmentNote[] {
  try {
    return fragmentNotes(peaks, {
      ...(molecularIonMz === null ? {} : { molecularIonMz }),
      ...(formula ? { formula } : {}),
    });
  } catch {
    // A candidate formula the chemistry package cannot read: notes without the formula filter.
    try {
      return fragmentNotes(peaks, molecularIonMz === null ? {} : { molecularIonMz });
    } catch {
      return [];
    }
  }
}

/** Common neutral losses from M and common low-mass ions found in the query (Lange's Handbook, §7.8). */
export function FragmentNotesList({ peaks, molecularIonMz, formula }: FragmentNotesListProps) {
  const notes = useMemo(() => notesFor(peaks, molecularIonMz, formula), [peaks, molecularIonMz, formula]);
  if (notes.length === 0) return <p className="text-sm text-ink-soft">No common loss or common ion found.</p>;
  return (
    <div>
      <ul className="grid gap-0.5 text-sm" aria-label="Fragment notes">
        {notes.map((note, index) => (
          <li key={`${note.mz}-${note.kind}-${index}`} className="flex gap-3">
            <span className="w-14 shrink-0 tabular-nums text-ink-soft">{note.relIntensity.toFixed(0)} %</span>
            <span className="text-ink">{note.label}</span>
          </li>
        ))}
      </ul>
      <p className="mt-1 text-xs text-ink-soft">Source: {notes[0]?.source}. Hints to weigh, not assignments.</p>
    </div>
  );
}
