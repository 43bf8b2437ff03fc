import { useMemo } from 'react';
import ReactEChartsCore from 'echarts-for-react/esm/core';
import { echarts } from './echarts-setup';
import { baseChartOption, mzExtent, stickTooltip } from './chart-axes';
import { matchedMz } from './match-peaks';
import type { MirrorSide } from './mirror-side';
import { spectrumLabels } from './spectrum-labels';
import { stickSeries } from './stick-series';
import { useThemeColors } from './use-theme-colors';

export type MirrorPlotChartProps = {
  top: MirrorSide;
  bottom: MirrorSide;
  heightPx?: number | undefined;
};

function labelledOf(side: MirrorSide): Set<number> {
  const labels = spectrumLabels(side.peaks, side.molecularIonMz);
  return new Set([...labels.clusterMz, ...(labels.basePeakMz === null ? [] : [Math.round(labels.basePeakMz)])]);
}

/** The ECharts drawing behind {@link MirrorPlot}; load it lazily, never import it from a page. */
export function MirrorPlotChart({ top, bottom, heightPx = 420 }: MirrorPlotChartProps) {
  const colors = useThemeColors();
  const option = useMemo(() => {
    const matched = new Set(matchedMz(top.peaks, bottom.peaks));
    const base = baseChartOption(colors, mzExtent([...top.peaks, ...bottom.peaks].map(([mz]) => mz)));
    return {
      ...base,
      grid: { ...base.grid, top: 20 },
      tooltip: { ...base.tooltip, formatter: (p: { seriesName?: string; value?: unknown }) => stickTooltip(p.seriesName ?? '', p.value) },
      yAxis: {
        type: 'value' as const,
        // Ticks are counted from min, so min and max must be multiples of the interval for the
        // labels to read 100 … 0 … 100; the band beyond 100 leaves room for the peak labels.
        min: -120,
        max: 120,
        interval: 20,
        axisLabel: { color: colors.inkSoft, formatter: (v: number) => (Math.abs(v) > 100 ? '' : String(Math.abs(v))) },
        axisLine: { show: true, lineStyle: { color: colors.rule } },
        splitLine: { lineStyle: { color: colors.ruleFaint, type: 'dashed' as const } },
      },
      // The axis at 0 carries the m/z scale between the two spectra.
      xAxis: { ...base.xAxis, axisLine: { ...base.xAxis.axisLine, onZero: true } },
      series: [
        stickSeries({
          name: top.label,
          peaks: top.peaks,
          direction: 'up',
          color: colors.ink,
          lineWidthPx: 1.6,
          labelledMz: labelledOf(top),
          labelColor: colors.ink,
          accentMz: matched,
          accentColor: colors.copper,
        }),
        stickSeries({
          name: bottom.label,
          peaks: bottom.peaks,
          direction: 'down',
          color: colors.inkSoft,
          lineWidthPx: 0.9,
          labelledMz: labelledOf(bottom),
          labelColor: colors.inkSoft,
          accentMz: matched,
          accentColor: colors.copper,
        }),
      ],
    };
  }, [colors, top, bottom]);
  return <ReactEChartsCore echarts={echarts} option={option} notMerge style={{ height: heightPx, width: '100%' }} />;
}
