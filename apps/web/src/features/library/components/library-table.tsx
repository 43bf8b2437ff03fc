import { useEffect, useId, useRef, useState, type KeyboardEvent, type ReactNode } from 'react';
import { Link, useNavigate } from 'react-router-dom';
import { observeElementRect, useVirtualizer, type Virtualizer } from '@tanstack/react-virtual';
import { RevisionStateBadge } from '../../../components/spectrum/revision-state-badge';
import { entryHref } from '../../../config/paths';
import { formatDateTime } from '../../../lib/format-date-time';
import type { LibraryRow } from '../api/get-entries';
import { effectiveSort, type LibrarySort, type SortOrder } from '../utils/library-filter';

/** Every row is this tall, so the virtualizer never measures and 100,000 rows scroll evenly. */
export const ROW_HEIGHT_PX = 36;

type Column = {
  label: string;
  width: string;
  sort?: LibrarySort;
  numeric?: boolean;
  cell: (row: LibraryRow) => ReactNode;
};

const COLUMNS: Column[] = [
  {
    label: 'Accession',
    width: '7.5rem',
    sort: 'accession',
    cell: (row) => (
      <Link to={entryHref(row.accession)} tabIndex={-1} className="font-bold text-ink hover:underline">
        {row.accession}
      </Link>
    ),
  },
  {
    label: 'Name',
    width: 'minmax(14rem, 3fr)',
    sort: 'name',
    cell: (row) => (
      <span className="flex min-w-0 items-center gap-2">
        <span className="truncate" title={row.synonyms.length ? `${row.name} (${row.synonyms.join('; ')})` : row.name}>
          {row.name}
        </span>
        {row.simulated ? (
          <span className="shrink-0 rounded border border-copper/60 px-1 text-[0.6875rem] font-bold uppercase tracking-wider text-copper" title="simulated — demo only">
            simulated
          </span>
        ) : null}
      </span>
    ),
  },
  { label: 'Formula', width: 'minmax(6.5rem, 1fr)', cell: (row) => <span className="truncate">{row.formula}</span> },
  { label: 'Nominal mass', width: '6.5rem', sort: 'nominalMass', numeric: true, cell: (row) => row.nominalMass },
  { label: 'Base peak', width: '5rem', numeric: true, cell: (row) => Math.round(row.basePeakMz * 10) / 10 },
  { label: 'Peaks', width: '4rem', numeric: true, cell: (row) => row.peakCount },
  { label: 'RI', width: '4.5rem', numeric: true, cell: (row) => (row.retentionIndex === null ? '—' : Math.round(row.retentionIndex)) },
  { label: 'State', width: '8.5rem', cell: (row) => <RevisionStateBadge state={row.state} /> },
  { label: 'Rev.', width: '3.5rem', numeric: true, cell: (row) => `r${row.revision}` },
  { label: 'Contributor', width: 'minmax(8rem, 1fr)', cell: (row) => <span className="truncate" title={row.authorLogin}>{row.author}</span> },
  {
    label: 'Last change',
    width: '9.5rem',
    sort: 'updatedAt',
    cell: (row) => <time dateTime={row.updatedAt}>{formatDateTime(row.updatedAt)}</time>,
  },
];

const GRID = { gridTemplateColumns: COLUMNS.map((c) => c.width).join(' ') };
/** Below this the columns would crush each other: the table scrolls sideways instead (tablets). */
const MIN_WIDTH = '68rem';
/** Where a DOM cannot measure (tests), the viewport the virtualizer assumes. */
const FALLBACK_RECT = { width: 1200, height: 640 };

type LibraryTableProps = {
  rows: readonly LibraryRow[];
  sort: ReturnType<typeof effectiveSort>;
  onSort: (sort: LibrarySort) => void;
  /** Called when the person nears the end of the loaded rows (the page fetches the next one). */
  onNearEnd?: () => void;
  footer?: ReactNode;
};

const ariaSort = (column: Column, sort: { sort: LibrarySort; order: SortOrder }) =>
  column.sort === sort.sort ? (sort.order === 'asc' ? 'ascending' : 'descending') : column.sort ? 'none' : undefined;

/**
 * The library as one dense grid: only the rows in view exist in the DOM. Arrow keys, Page Up/Down,
 * Home and End move the current row; Enter or a click opens its entry.
 */
export function LibraryTable({ rows, sort, onSort, onNearEnd, footer }: LibraryTableProps) {
  const scrollRef = useRef<HTMLDivElement>(null);
  const navigate = useNavigate();
  const [active, setActive] = useState(-1);
  const idPrefix = useId();
  const virtualizer: Virtualizer<HTMLDivElement, Element> = useVirtualizer({
    count: rows.length,
    getScrollElement: () => scrollRef.current,
    estimateSize: () => ROW_HEIGHT_PX,
    overscan: 12,
    initialRect: FALLBACK_RECT,
    observeElementRect: (instance, callback) =>
      observeElementRect(instance, (rect) => callback(rect.height === 0 ? FALLBACK_RECT : rect)),
  });
  const items = virtualizer.getVirtualItems();
  const lastIndex = items.at(-1)?.index ?? -1;

  useEffect(() => {
    if (onNearEnd && rows.length > 0 && lastIndex >= rows.length - 40) onNearEnd();
  }, [lastIndex, rows.length, onNearEnd]);

  const move = (to: number) => {
    const next = Math.max(0, Math.min(rows.length - 1, to));
    setActive(next);
    virtualizer.scrollToIndex(next, { align: 'auto' });
  };
  const pageRows = Math.max(1, Math.floor((scrollRef.current?.clientHeight || FALLBACK_RECT.height) / ROW_HEIGHT_PX) - 1);
  const onKeyDown = (event: KeyboardEvent) => {
    const keys: Record<string, () => void> = {
      ArrowDown: () => move(active + 1),
      ArrowUp: () => move(active - 1),
      PageDown: () => move(active + pageRows),
      PageUp: () => move(active - pageRows),
      Home: () => move(0),
      End: () => move(rows.length - 1),
      Enter: () => {
        const row = rows[active];
        if (row) void navigate(entryHref(row.accession));
      },
    };
    const action = keys[event.key];
    if (action) {
      event.preventDefault();
      action();
    }
  };
  const rowId = (index: number) => `${idPrefix}-row-${index}`;

  return (
    <div className="overflow-x-auto rounded-lg border border-rule-faint bg-paper-raised has-[[role=grid]:focus-visible]:border-focus has-[[role=grid]:focus-visible]:ring-1 has-[[role=grid]:focus-visible]:ring-focus">
      <div
        role="grid"
        aria-label="Library entries"
        aria-rowcount={rows.length + 1}
        aria-colcount={COLUMNS.length}
        aria-activedescendant={active >= 0 ? rowId(active) : undefined}
        tabIndex={0}
        onKeyDown={onKeyDown}
        onFocus={(event) => {
          // Start from the first row in view, not from the top of a list scrolled far down.
          if (event.target === event.currentTarget && active < 0 && rows.length > 0) {
            setActive(Math.min(rows.length - 1, Math.ceil((scrollRef.current?.scrollTop ?? 0) / ROW_HEIGHT_PX)));
          }
        }}
        className="text-sm focus-visible:outline-none"
        style={{ minWidth: MIN_WIDTH }}
      >
        <div role="row" aria-rowindex={1} className="grid border-b border-rule bg-paper-sunk" style={GRID}>
          {COLUMNS.map((column) => (
            <div
              key={column.label}
              role="columnheader"
              aria-sort={ariaSort(column, sort)}
              className={`px-2.5 py-2 text-xs font-bold uppercase tracking-wider text-ink-soft ${column.numeric ? 'text-right' : 'text-left'}`}
            >
              {column.sort ? (
                <button
                  type="button"
                  onClick={() => onSort(column.sort!)}
                  className="inline-flex items-center gap-1 uppercase tracking-wider hover:text-ink"
                  title={`Sort by ${column.label.toLowerCase()}`}
                >
                  {column.label}
                  <span aria-hidden="true">{column.sort === sort.sort ? (sort.order === 'asc' ? '▲' : '▼') : ''}</span>
                </button>
              ) : (
                column.label
              )}
            </div>
          ))}
        </div>
        <div ref={scrollRef} className="h-[calc(100vh-24rem)] min-h-[22rem] overflow-y-auto" data-testid="library-scroll">
          <div className="relative w-full" style={{ height: virtualizer.getTotalSize() }}>
            {items.map((item) => {
              const row = rows[item.index]!;
              const isActive = item.index === active;
              return (
                <div
                  key={row.accession}
                  id={rowId(item.index)}
                  role="row"
                  aria-rowindex={item.index + 2}
                  aria-selected={isActive}
                  onClick={() => {
                    setActive(item.index);
                    void navigate(entryHref(row.accession));
                  }}
                  className={`absolute left-0 top-0 grid w-full cursor-pointer items-center border-b border-rule-faint tabular-nums ${
                    isActive ? 'bg-copper-soft' : item.index % 2 ? 'bg-paper' : ''
                  } hover:bg-paper-sunk`}
                  style={{ ...GRID, height: ROW_HEIGHT_PX, transform: `translateY(${item.start}px)` }}
                >
                  {COLUMNS.map((column) => (
                    <div
                      key={column.label}
                      role="gridcell"
                      className={`min-w-0 overflow-hidden whitespace-nowrap px-2.5 ${column.numeric ? 'text-right' : ''}`}
                    >
                      {column.cell(row)}
                    </div>
                  ))}
                </div>
              );
            })}
          </div>
          {footer}
        </div>
      </div>
    </div>
  );
}
