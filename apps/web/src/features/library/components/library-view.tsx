import { useCallback, useId, useState } from 'react';
import { ErrorNotice } from '../../../components/errors/error-notice';
import { EmptyState } from '../../../components/ui/empty-state';
import { LoadingState } from '../../../components/ui/loading-state';
import { buttonClasses } from '../../../components/ui/button';
import { describeError } from '../../../lib/describe-error';
import { entriesCsvHref, useLibraryEntries } from '../api/get-entries';
import { useQuickFind } from '../hooks/use-quick-find';
import { effectiveSort, isFiltered, type LibraryFilter, type LibrarySort } from '../utils/library-filter';
import { LibraryTable } from './library-table';

type LibraryViewProps = {
  filter: LibraryFilter;
  onSort: (sort: LibrarySort) => void;
};

/** The rows the filters select, loaded as the person scrolls, with quick find over what is loaded. */
export function LibraryView({ filter, onSort }: LibraryViewProps) {
  const list = useLibraryEntries(filter);
  const [find, setFind] = useState('');
  const findId = useId();
  const loaded = list.data?.pages.flatMap((page) => page.entries) ?? [];
  const rows = useQuickFind(loaded, find);
  const { hasNextPage, isFetchingNextPage, isFetchNextPageError, fetchNextPage } = list;
  const finding = find.trim() !== '';
  const onNearEnd = useCallback(() => {
    if (!finding && hasNextPage && !isFetchingNextPage && !isFetchNextPageError) void fetchNextPage();
  }, [finding, hasNextPage, isFetchingNextPage, isFetchNextPageError, fetchNextPage]);

  const toolbar = (
    <div className="flex flex-wrap items-end justify-between gap-3">
      <div className="flex flex-col gap-1">
        <label htmlFor={findId} className="text-xs font-bold text-ink-soft">
          Quick find <span className="font-normal">· in loaded rows only</span>
        </label>
        <input
          id={findId}
          type="search"
          value={find}
          placeholder="name, synonym or formula"
          onChange={(event) => setFind(event.target.value)}
          className="w-72 rounded-md border border-rule bg-paper-raised px-2.5 py-1.5 text-sm text-ink hover:border-ink"
        />
      </div>
      <p className="text-sm text-ink-soft" aria-live="polite">
        {list.data === undefined
          ? ''
          : finding
            ? `Quick find: ${rows.length} of the ${loaded.length} loaded rows${hasNextPage ? ' (more rows on the server: scroll or use the filters)' : ''}`
            : `${loaded.length}${hasNextPage ? '+' : ''} ${loaded.length === 1 ? 'entry' : 'entries'}${hasNextPage ? ' so far — more load as you scroll' : ''}`}
      </p>
      <a href={entriesCsvHref(filter)} className={buttonClasses('secondary')} download>
        Export CSV
      </a>
    </div>
  );

  let body;
  if (list.isPending) body = <LoadingState label="Loading the library…" />;
  else if (list.isError && (!isFetchNextPageError || list.data === undefined)) {
    body = <ErrorNotice title="The library could not be loaded" error={list.error} onRetry={() => void list.refetch()} />;
  } else if (loaded.length === 0) {
    body = (
      <EmptyState title={isFiltered(filter) ? 'No entry matches these filters' : 'The library has no published entries yet'}>
        {isFiltered(filter)
          ? 'Widen the mass range, check the formula, or clear the filters.'
          : 'Entries appear here once a curator publishes them from the review desk.'}
      </EmptyState>
    );
  } else if (rows.length === 0) {
    body = <EmptyState title="Quick find matches none of the loaded rows">Use the name filter above to search the whole library.</EmptyState>;
  } else {
    body = (
      <LibraryTable
        key={`${filter.sort}${filter.order}${find}`}
        rows={rows}
        sort={effectiveSort(filter)}
        onSort={onSort}
        onNearEnd={onNearEnd}
        footer={
          isFetchingNextPage ? (
            <p className="px-3 py-2 text-sm text-ink-soft">Loading more rows…</p>
          ) : isFetchNextPageError ? (
            <p role="alert" className="px-3 py-2 text-sm text-copper">
              More rows could not be loaded: {describeError(list.error)}{' '}
              <button type="button" className="underline" onClick={() => void fetchNextPage()}>
                Try again
              </button>
            </p>
          ) : null
        }
      />
    );
  }
  return (
    <div className="space-y-3">
      {toolbar}
      {body}
    </div>
  );
}
