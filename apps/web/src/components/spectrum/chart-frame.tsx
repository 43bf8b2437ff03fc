import { Suspense, type ReactNode } from 'react';
import { PanelErrorBoundary } from '../errors/error-boundary';

let canvasSupport: boolean | undefined;

/** True when this browser can give a 2D canvas (ECharts draws on one; test DOMs cannot). */
export function canDrawCharts(): boolean {
  if (canvasSupport === undefined) {
    try {
      canvasSupport = document.createElement('canvas').getContext('2d') !== null;
    } catch {
      canvasSupport = false;
    }
  }
  return canvasSupport;
}

type ChartFrameProps = {
  /** What the chart shows, for screen readers and for the error notice. */
  description: string;
  heightPx: number;
  children: ReactNode;
};

/**
 * Holds a lazily loaded chart: a quiet placeholder while ECharts loads, the chart's own error
 * boundary, and a plain note where no canvas exists (the peak table carries the same numbers).
 */
export function ChartFrame({ description, heightPx, children }: ChartFrameProps) {
  const placeholder = (note: string) => (
    <div
      data-testid="chart-placeholder"
      className="flex items-center justify-center rounded-md border border-dashed border-rule-faint text-sm text-ink-soft"
      style={{ height: heightPx }}
    >
      {note}
    </div>
  );
  return (
    <figure role="figure" aria-label={description} className="m-0">
      <PanelErrorBoundary title="The chart">
        {canDrawCharts() ? (
          <Suspense fallback={placeholder('Drawing the spectrum…')}>{children}</Suspense>
        ) : (
          placeholder('This browser cannot draw the chart; the peak table lists every peak.')
        )}
      </PanelErrorBoundary>
    </figure>
  );
}
