type ReadingNotesProps = { notes: readonly string[]; label?: string };

/** Notes beside a molecular-ion check (disagreements, caveats), each marked with the copper rule. */
export function ReadingNotes({ notes, label }: ReadingNotesProps) {
  if (notes.length === 0) return null;
  return (
    <ul aria-label={label} className="grid gap-1 text-sm">
      {notes.map((note) => (
        <li key={note} className="border-l-2 border-copper pl-3 text-ink">
          {note}
        </li>
      ))}
    </ul>
  );
}

type ReadingEvidenceProps = { evidence: readonly { label: string; value: string }[] };

/** Every number behind a molecular-ion check, folded away until asked for. */
export function ReadingEvidence({ evidence }: ReadingEvidenceProps) {
  return (
    <details className="text-sm">
      <summary className="cursor-pointer font-bold text-ink">Evidence ({evidence.length} numbers)</summary>
      <dl className="mt-2 grid gap-1">
        {evidence.map((item, index) => (
          <div key={`${item.label}-${index}`} className="grid gap-x-3 sm:grid-cols-[12rem_1fr]">
            <dt className="text-ink-soft">{item.label}</dt>
            <dd className="tabular-nums text-ink">{item.value}</dd>
          </div>
        ))}
      </dl>
    </details>
  );
}
