import { ErrorNotice } from '../../../components/errors/error-notice';
import { EmptyState } from '../../../components/ui/empty-state';
import { LoadingState } from '../../../components/ui/loading-state';
import { useOverview, type LibraryOverview } from '../api/get-overview';
import { OverviewChart } from './overview-chart';

/** `in_review` → `in review`, the way the state badges write it. */
const stateText = (state: string) => state.replace(/_/g, ' ');

const sum = (values: readonly number[]) => values.reduce((a, b) => a + b, 0);

function Charts({ data }: { data: LibraryOverview }) {
  const growth = data.growthByMonth;
  const bins = data.massHistogram.bins;
  const peakBin = bins.reduce<(typeof bins)[number] | null>((best, b) => (best === null || b.entries > best.entries ? b : best), null);
  const elements = data.elementCoverage.filter((e) => e.entries > 0);
  const turnaround = data.reviewTurnaround;
  const last = turnaround.at(-1);
  return (
    <div className="grid grid-cols-1 gap-4 lg:grid-cols-2">
      <OverviewChart
        title="Entries by state"
        summary={data.entriesByState.map((s) => `${s.entries} ${stateText(s.state)}`).join(', ')}
        note="Entries with a revision in each state; one entry can count in two (published r1, r2 in review)."
        categoryLabel="State"
        categories={data.entriesByState.map((s) => stateText(s.state))}
        series={[{ name: 'Entries', kind: 'bar', tone: 'ink', values: data.entriesByState.map((s) => s.entries) }]}
        yName="entries"
      />
      <OverviewChart
        title="Growth by month"
        summary={growth.length ? `${growth.at(-1)!.cumulativeEntries} entries published by ${growth.at(-1)!.month}, over ${growth.length} months` : 'nothing published yet'}
        note="Bars: entries published for the first time and revisions published that month; line: entries in total."
        categoryLabel="Month"
        categories={growth.map((g) => g.month)}
        series={[
          { name: 'New entries', kind: 'bar', tone: 'ink', values: growth.map((g) => g.newEntries) },
          { name: 'Revisions published', kind: 'bar', tone: 'rule', values: growth.map((g) => g.revisionsPublished) },
          { name: 'Entries in total', kind: 'line', tone: 'copper', values: growth.map((g) => g.cumulativeEntries), rightAxis: true },
        ]}
        yName="per month"
        rightYName="total"
        empty="Nothing has been published yet."
      />
      <OverviewChart
        title={`Nominal mass (bins of ${data.massHistogram.binDa} Da)`}
        summary={peakBin ? `${sum(bins.map((b) => b.entries))} published entries; most between ${peakBin.fromDa} and ${peakBin.fromDa + data.massHistogram.binDa} Da (${peakBin.entries})` : 'no published entries'}
        categoryLabel="From Da"
        categories={bins.map((b) => String(b.fromDa))}
        series={[{ name: 'Entries', kind: 'bar', tone: 'ink', values: bins.map((b) => b.entries) }]}
        yName="entries"
        empty="No published entries yet."
      />
      <OverviewChart
        title="Element coverage"
        summary={elements.map((e) => `${e.element} ${e.entries}`).join(', ') || 'no published entries'}
        note={`Published entries whose formula contains the element (of ${data.publishedEntries}).`}
        categoryLabel="Element"
        categories={elements.map((e) => e.element)}
        series={[{ name: 'Entries', kind: 'bar', tone: 'ink', values: elements.map((e) => e.entries) }]}
        yName="entries"
        empty="No published entries yet."
      />
      <OverviewChart
        title="Consistency checks that warn or fail"
        summary={data.checkProblems.map((c) => `${c.title ?? c.checkId}: ${c.warn} warn, ${c.fail} fail`).join('; ') || 'every published revision passes every check'}
        note="On published revisions, by check."
        categoryLabel="Check"
        categories={data.checkProblems.map((c) => c.title ?? c.checkId)}
        series={[
          { name: 'Warn', kind: 'bar', tone: 'rule', values: data.checkProblems.map((c) => c.warn), stack: 'checks' },
          { name: 'Fail', kind: 'bar', tone: 'copper', values: data.checkProblems.map((c) => c.fail), stack: 'checks' },
        ]}
        yName="revisions"
        horizontal
        heightPx={Math.max(180, 48 + data.checkProblems.length * 30)}
        empty="Every published revision passes every check."
      />
      <OverviewChart
        title="Review turnaround"
        summary={last ? `${last.month}: median ${last.medianHours} h, 90th percentile ${last.p90Hours} h over ${last.decisions} decisions` : 'no decisions yet'}
        note="Hours from sending for review to the decision (publish or return), by month of the decision."
        categoryLabel="Month"
        categories={turnaround.map((t) => t.month)}
        series={[
          { name: 'Median (h)', kind: 'line', tone: 'ink', values: turnaround.map((t) => t.medianHours) },
          { name: '90th percentile (h)', kind: 'line', tone: 'copper', values: turnaround.map((t) => t.p90Hours) },
          { name: 'Decisions', kind: 'bar', tone: 'rule', values: turnaround.map((t) => t.decisions), rightAxis: true },
        ]}
        yName="hours"
        rightYName="decisions"
        empty="No review decision yet."
      />
    </div>
  );
}

/** The overview charts, from one `GET /overview`. */
export function OverviewCharts() {
  const overview = useOverview();
  if (overview.isPending) return <LoadingState label="Counting the library…" />;
  if (overview.isError) return <ErrorNotice title="The overview could not be loaded" error={overview.error} onRetry={() => void overview.refetch()} />;
  if (sum(overview.data.entriesByState.map((s) => s.entries)) === 0) {
    return <EmptyState title="The library is empty">Charts appear once the first entries are submitted and published.</EmptyState>;
  }
  return <Charts data={overview.data} />;
}
