import { lazy, Suspense, useId, type ReactNode } from 'react';
import { canDrawCharts } from '../../../components/spectrum/chart-frame';
import { PanelErrorBoundary } from '../../../components/errors/error-boundary';
import type { SeriesChartProps } from './series-chart';

const SeriesChart = lazy(() => import('./series-chart').then((m) => ({ default: m.SeriesChart })));

type OverviewChartProps = Omit<SeriesChartProps, 'heightPx'> & {
  title: string;
  /** One sentence with the gist of the numbers, read out in place of the canvas. */
  summary: string;
  /** Header of the first column of the numbers table. */
  categoryLabel: string;
  heightPx?: number;
  empty?: string;
  note?: ReactNode;
};

/**
 * One chart of the overview: a title, the chart (ECharts, loaded on first use), and the same
 * numbers as a small table for screen readers, for copying and for browsers without a canvas.
 */
export function OverviewChart({ title, summary, categoryLabel, heightPx = 260, empty, note, ...chart }: OverviewChartProps) {
  const headingId = useId();
  const hasData = chart.categories.length > 0;
  const placeholder = (text: string) => (
    <div data-testid="chart-placeholder" className="flex items-center justify-center rounded-md border border-dashed border-rule-faint text-sm text-ink-soft" style={{ height: heightPx }}>
      {text}
    </div>
  );
  return (
    <section aria-labelledby={headingId} className="rounded-lg border border-rule-faint bg-paper-raised p-4">
      <h2 id={headingId} className="text-base font-bold text-ink">
        {title}
      </h2>
      {note ? <p className="mt-0.5 text-xs text-ink-soft">{note}</p> : null}
      <figure role="figure" aria-label={`${title}: ${summary}`} className="m-0 mt-2">
        <PanelErrorBoundary title={title}>
          {!hasData
            ? placeholder(empty ?? 'Nothing to show yet.')
            : canDrawCharts()
              ? (
                  <Suspense fallback={placeholder('Drawing the chart…')}>
                    <SeriesChart {...chart} heightPx={heightPx} />
                  </Suspense>
                )
              : placeholder('This browser cannot draw the chart; the numbers are listed below.')}
        </PanelErrorBoundary>
      </figure>
      {hasData ? (
        <details className="mt-2 text-sm">
          <summary className="cursor-pointer text-ink-soft hover:text-ink">The numbers</summary>
          <div className="mt-1 max-h-56 overflow-auto">
            <table className="w-full border-collapse tabular-nums">
              <caption className="sr-only">{title}</caption>
              <thead>
                <tr className="border-b border-rule">
                  <th scope="col" className="px-2 py-1 text-left text-xs font-bold text-ink-soft">
                    {categoryLabel}
                  </th>
                  {chart.series.map((s) => (
                    <th key={s.name} scope="col" className="px-2 py-1 text-right text-xs font-bold text-ink-soft">
                      {s.name}
                    </th>
                  ))}
                </tr>
              </thead>
              <tbody>
                {chart.categories.map((category, i) => (
                  <tr key={category} className="border-b border-rule-faint last:border-b-0">
                    <th scope="row" className="px-2 py-0.5 text-left font-normal">
                      {category}
                    </th>
                    {chart.series.map((s) => (
                      <td key={s.name} className="px-2 py-0.5 text-right">
                        {s.values[i]}
                      </td>
                    ))}
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        </details>
      ) : null}
    </section>
  );
}
