import { useEffect, useRef, useState } from 'react';
import { Link, useSearchParams } from 'react-router-dom';
import { ErrorNotice } from '../../../components/errors/error-notice';
import { PanelErrorBoundary } from '../../../components/errors/error-boundary';
import { peakListText } from '../../../components/spectrum/peak-list-text';
import { Button } from '../../../components/ui/button';
import { PageHeader } from '../../../components/ui/page-header';
import { entryHref, paths } from '../../../config/paths';
import { isApiError } from '../../../lib/api-error';
import { describeErrorDetails } from '../../../lib/describe-error';
import { useEditionLabels } from '../../../features/identify/api/get-edition-labels';
import { useEntrySpectrum } from '../../../features/identify/api/get-entry-spectrum';
import { CautionNote } from '../../../features/identify/components/caution-note';
import { IdentifyResults } from '../../../features/identify/components/identify-results';
import { SearchOptionsFields } from '../../../features/identify/components/search-options-fields';
import { SpectrumSource } from '../../../features/identify/components/spectrum-source';
import { useIdentifySearch } from '../../../features/identify/hooks/use-identify-search';
import { defaultSearchOptions, type SearchOptions } from '../../../features/identify/utils/search-options';

export default function IdentifyPage() {
  const [params] = useSearchParams();
  const from = params.get('from');
  const exclude = params.get('exclude');
  const [text, setText] = useState(() => (params.get('peaks') ?? '').replace(/\s+/g, '\n'));
  const [name, setName] = useState(() => params.get('name') ?? '');
  const [options, setOptions] = useState<SearchOptions>(defaultSearchOptions);
  const editions = useEditionLabels();
  const search = useIdentifySearch();
  const source = useEntrySpectrum(from, null);
  const started = useRef(false);

  // A search handed over from an entry page or a batch row runs once, as soon as its peaks are known.
  useEffect(() => {
    if (started.current) return;
    if (from !== null && source.data) {
      started.current = true;
      const peaks = peakListText(source.data.peaks);
      const queryName = `${source.data.label} · ${source.data.name}`;
      setText(peaks);
      setName(queryName);
      search.run(peaks, queryName, options, exclude);
    } else if (from === null && params.get('peaks')) {
      started.current = true;
      search.run(text, name, options, exclude);
    }
  }, [from, source.data, search, options, exclude, params, text, name]);

  const { identify, asked } = search;
  return (
    <section className="space-y-6">
      <PageHeader
        title="Identify"
        description="Search an unknown's 70 eV EI spectrum against the reviewed library: ranked candidates, the mirror view and the molecular-ion check."
        actions={
          <Link to={paths.batchIdentify.path} className="text-sm underline decoration-rule underline-offset-4" data-print="hide">
            Many unknowns? Batch identify
          </Link>
        }
      />
      {from !== null ? (
        <p className="text-sm text-ink-soft" data-print="hide">
          {source.isPending ? 'Loading the spectrum of ' : 'Searching with the spectrum of '}
          <Link to={entryHref(from)} className="underline decoration-rule underline-offset-4">
            {from}
          </Link>
          {exclude ? `; ${exclude} itself is left out of the candidates.` : '.'}
        </p>
      ) : null}
      {source.isError ? <ErrorNotice title={`The spectrum of ${from} could not be loaded`} error={source.error} /> : null}
      <form
        data-print="hide"
        className="grid gap-5 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]"
        onSubmit={(e) => {
          e.preventDefault();
          search.run(text, name, options, exclude);
        }}
      >
        <div className="grid content-start gap-3">
          <label className="grid gap-1 text-sm">
            <span className="font-bold text-ink">Name of the unknown (for the report)</span>
            <input
              className="rounded-md border border-rule bg-paper-raised px-2.5 py-1.5 text-ink hover:border-ink"
              value={name}
              placeholder="e.g. Lot 24-117, peak at 12.4 min"
              onChange={(e) => setName(e.target.value)}
            />
          </label>
          <SpectrumSource
            text={text}
            error={search.problems.peaks}
            onTextChange={(next) => {
              setText(next);
              search.clearPeakProblem();
            }}
            onSpectrum={(spectrum) => {
              setText(peakListText(spectrum.peaks));
              setName(spectrum.name);
              search.clearPeakProblem();
              if (spectrum.retentionIndex !== undefined) setOptions((o) => ({ ...o, riValue: String(spectrum.retentionIndex) }));
            }}
          />
        </div>
        <div className="grid content-start gap-3">
          <SearchOptionsFields value={options} onChange={setOptions} editions={editions.data ?? []} />
          {search.problems.options.length > 0 ? (
            <ul role="alert" className="grid gap-1 text-sm font-bold text-copper">
              {search.problems.options.map((problem) => (
                <li key={problem}>{problem}</li>
              ))}
            </ul>
          ) : null}
          <Button type="submit" disabled={identify.isPending} className="justify-self-start">
            {identify.isPending ? 'Identifying…' : 'Identify'}
          </Button>
        </div>
      </form>
      {identify.isError ? (
        <div className="grid gap-2">
          <ErrorNotice
            title={
              isApiError(identify.error) && identify.error.status === 429
                ? 'Too many searches in a short time: wait a few seconds, then press Identify again'
                : 'The search failed'
            }
            error={identify.error}
          />
          {describeErrorDetails(identify.error).length > 0 ? (
            <ul className="grid gap-1 text-sm text-copper">
              {describeErrorDetails(identify.error).map((line) => (
                <li key={line}>{line}</li>
              ))}
            </ul>
          ) : null}
        </div>
      ) : null}
      {identify.isSuccess && asked ? (
        <PanelErrorBoundary title="The results">
          <IdentifyResults
            key={identify.submittedAt}
            result={identify.data}
            queryPeaks={asked.peaks}
            queryName={asked.name}
            searchedAt={new Date(identify.submittedAt)}
            excludeAccession={asked.exclude}
            limit={asked.limit}
          />
        </PanelErrorBoundary>
      ) : (
        <CautionNote />
      )}
    </section>
  );
}
