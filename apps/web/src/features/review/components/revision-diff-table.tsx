import type { FieldDiff } from '../utils/diff-revisions';
import { bodyCell, headCell, rowBase, tableBase, tableFrame } from './table-styles';

type RevisionDiffTableProps = {
  fields: FieldDiff[];
  afterLabel: string;
  beforeLabel: string | null;
};

/** Field by field: the published value, this revision's value, and a mark where they differ. */
export function RevisionDiffTable({ fields, afterLabel, beforeLabel }: RevisionDiffTableProps) {
  return (
    <div className={tableFrame}>
      <table className={tableBase}>
        <caption className="sr-only">Field-by-field differences</caption>
        <thead className="border-b border-rule bg-paper-sunk">
          <tr>
            <th scope="col" className={headCell}>Field</th>
            {beforeLabel ? <th scope="col" className={headCell}>{beforeLabel}</th> : null}
            <th scope="col" className={headCell}>{afterLabel}</th>
            <th scope="col" className={headCell}>
              <span className="sr-only">Difference</span>
            </th>
          </tr>
        </thead>
        <tbody>
          {fields.map((field) => (
            <tr key={field.field} data-field={field.field} data-changed={field.changed} className={`${rowBase} ${field.changed ? 'bg-copper-soft/50' : ''}`}>
              <th scope="row" className={`${bodyCell} whitespace-nowrap text-left font-bold text-ink`}>{field.label}</th>
              {beforeLabel ? (
                <td className={`${bodyCell} whitespace-pre-wrap break-words text-ink-soft`}>{field.before ?? '—'}</td>
              ) : null}
              <td className={`${bodyCell} whitespace-pre-wrap break-words ${field.changed ? 'font-bold text-ink' : 'text-ink'}`}>
                {field.after ?? '—'}
              </td>
              <td className={`${bodyCell} whitespace-nowrap text-xs font-bold uppercase tracking-wider text-copper`}>
                {field.changed ? (beforeLabel ? 'changed' : 'new') : ''}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
