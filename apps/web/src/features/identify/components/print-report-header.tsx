import { formatDateTime } from '../../../lib/format-date-time';

type PrintReportHeaderProps = {
  queryName: string;
  method: string;
  edition: string;
  searchedAt: Date;
  candidateCount: number;
};

// The app's header, navigation and footer, and this page's controls, stay off paper.
const printStyles = `@media print {
  body > div header, body > div footer, nav, [data-print="hide"] { display: none !important; }
  main { max-width: none !important; padding: 0 !important; }
  [data-print="keep"] { break-inside: avoid; }
}`;

/** Shown on paper only: what was searched, when, in which edition, by which method and on which scale. */
export function PrintReportHeader({ queryName, method, edition, searchedAt, candidateCount }: PrintReportHeaderProps) {
  return (
    <>
      <style>{printStyles}</style>
      <div className="hidden border-b border-rule pb-3 print:block" data-testid="print-report">
        <p className="text-lg font-bold">Ionfolio identify report — {queryName}</p>
        <p className="text-sm">
          Searched {formatDateTime(searchedAt.toISOString())} ({searchedAt.toISOString()}) · edition {edition} · method {method} ·
          similarity 0–100 (100 = the same spectrum by this method) · {candidateCount} candidates, each cited by accession and revision.
        </p>
      </div>
    </>
  );
}
