import { lazy } from 'react';
import { ChartFrame } from './chart-frame';
import type { MirrorPlotChartProps } from './mirror-plot-chart';

const MirrorPlotChart = lazy(() => import('./mirror-plot-chart').then((m) => ({ default: m.MirrorPlotChart })));

export type MirrorPlotProps = MirrorPlotChartProps;

/**
 * The mirror view: `top` above the axis in heavier ink sticks, `bottom` below it in thinner soft-ink
 * sticks, each named by its label beside the chart; m/z present in both are drawn in the copper accent.
 * ECharts loads on first use.
 */
export function MirrorPlot(props: MirrorPlotProps) {
  const heightPx = props.heightPx ?? 420;
  return (
    <div>
      <p className="mb-1 text-sm">
        <span className="font-bold text-ink">Above: {props.top.label}</span>
        <span className="text-ink-soft"> · heavier sticks</span>
      </p>
      <ChartFrame description={`Mirror view: ${props.top.label} above, ${props.bottom.label} below`} heightPx={heightPx}>
        <MirrorPlotChart {...props} heightPx={heightPx} />
      </ChartFrame>
      <p className="mt-1 text-sm">
        <span className="text-ink-soft">Below: </span>
        <span className="text-ink-soft">{props.bottom.label} · thinner sticks</span>
        <span className="text-ink-soft"> · m/z found in both are marked in </span>
        <span className="font-bold text-copper">copper</span>
      </p>
    </div>
  );
}
