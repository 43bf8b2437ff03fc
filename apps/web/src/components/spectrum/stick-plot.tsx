import { lazy } from 'react';
import { ChartFrame } from './chart-frame';
import type { StickPlotChartProps } from './stick-plot-chart';

const StickPlotChart = lazy(() => import('./stick-plot-chart').then((m) => ({ default: m.StickPlotChart })));

export type StickPlotProps = StickPlotChartProps;

/**
 * One spectrum as thin vertical sticks on the 0–100 scale of its base peak; the base peak and the
 * molecular-ion cluster are labelled (the cluster in the copper accent), the wheel or the slider zooms
 * the m/z axis, and hovering a stick shows its m/z and intensity. ECharts loads on first use.
 */
export function StickPlot(props: StickPlotProps) {
  const heightPx = props.heightPx ?? 320;
  return (
    <ChartFrame description={`Stick plot of ${props.label ?? 'the spectrum'}, ${props.peaks.length} peaks`} heightPx={heightPx}>
      <StickPlotChart {...props} heightPx={heightPx} />
    </ChartFrame>
  );
}
