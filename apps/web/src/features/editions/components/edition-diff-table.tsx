import { Link } from 'react-router-dom';
import { entryRevisionHref } from '../../../config/paths';
import type { EditionDiffItem } from '../api/get-edition';
import { bodyCell, headCell, rowBase, tableBase, tableFrame } from './table-styles';

type EditionDiffTableProps = {
  title: string;
  items: EditionDiffItem[];
  /** Changed rows show the revision before and after; added and withdrawn only one. */
  showPrevious: boolean;
  emptyNote: string;
};

/** One kind of difference from the previous edition, each row linking to the revision it names. */
export function EditionDiffTable({ title, items, showPrevious, emptyNote }: EditionDiffTableProps) {
  const id = `diff-${title.toLowerCase()}`;
  return (
    <section aria-labelledby={id}>
      <h3 id={id} className="mb-2 font-bold text-ink">
        {title} <span className="font-normal tabular-nums text-ink-soft">({items.length})</span>
      </h3>
      {items.length === 0 ? (
        <p className="text-sm text-ink-soft">{emptyNote}</p>
      ) : (
        <div className={tableFrame}>
          <table className={tableBase}>
            <caption className="sr-only">{title}</caption>
            <thead className="border-b border-rule bg-paper-sunk">
              <tr>
                <th scope="col" className={headCell}>Entry</th>
                <th scope="col" className={headCell}>Name</th>
                <th scope="col" className={headCell}>Formula</th>
                {showPrevious ? <th scope="col" className={headCell}>Before</th> : null}
                <th scope="col" className={headCell}>{showPrevious ? 'Now' : 'Revision'}</th>
              </tr>
            </thead>
            <tbody>
              {items.map((item) => (
                <tr key={item.accession} className={rowBase}>
                  <th scope="row" className={`${bodyCell} text-left font-bold`}>{item.accession}</th>
                  <td className={bodyCell}>{item.name}</td>
                  <td className={`${bodyCell} font-mono text-[0.8125rem]`}>{item.formula}</td>
                  {showPrevious ? (
                    <td className={bodyCell}>
                      {item.previousRevision ? (
                        <Link
                          to={entryRevisionHref(item.accession, item.previousRevision)}
                          className="underline decoration-rule underline-offset-4 hover:decoration-ink"
                        >
                          {item.accession} r{item.previousRevision}
                        </Link>
                      ) : (
                        '—'
                      )}
                    </td>
                  ) : null}
                  <td className={bodyCell}>
                    <Link
                      to={entryRevisionHref(item.accession, item.revision)}
                      className="underline decoration-rule underline-offset-4 hover:decoration-ink"
                    >
                      {item.accession} r{item.revision}
                    </Link>
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </section>
  );
}
