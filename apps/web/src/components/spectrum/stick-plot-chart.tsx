import { useMemo } from 'react';
import ReactEChartsCore from 'echarts-for-react/esm/core';
import type { PeakList } from '@ionfolio/chem';
import { echarts } from './echarts-setup';
import { baseChartOption, mzExtent, stickTooltip } from './chart-axes';
import { spectrumLabels } from './spectrum-labels';
import { stickSeries } from './stick-series';
import { useThemeColors } from './use-theme-colors';

export type StickPlotChartProps = {
  peaks: PeakList;
  /** Nominal mass of the formula when known; otherwise the molecular-ion reading picks M. */
  molecularIonMz?: number | null | undefined;
  label?: string | undefined;
  heightPx?: number | undefined;
};

/** The ECharts drawing behind {@link StickPlot}; load it lazily, never import it from a page. */
export function StickPlotChart({ peaks, molecularIonMz, label = 'spectrum', heightPx = 320 }: StickPlotChartProps) {
  const colors = useThemeColors();
  const option = useMemo(() => {
    const labels = spectrumLabels(peaks, molecularIonMz);
    const labelled = new Set([...labels.clusterMz, ...(labels.basePeakMz === null ? [] : [Math.round(labels.basePeakMz)])]);
    const base = baseChartOption(colors, mzExtent(peaks.map(([mz]) => mz)));
    return {
      ...base,
      tooltip: { ...base.tooltip, formatter: (p: { seriesName?: string; value?: unknown }) => stickTooltip(p.seriesName ?? '', p.value) },
      yAxis: {
        type: 'value' as const,
        min: 0,
        max: 110,
        interval: 25,
        axisLabel: { color: colors.inkSoft, formatter: (v: number) => (v > 100 ? '' : String(v)) },
        axisLine: { show: true, lineStyle: { color: colors.rule } },
        splitLine: { lineStyle: { color: colors.ruleFaint, type: 'dashed' as const } },
      },
      series: [
        stickSeries({
          name: label,
          peaks,
          direction: 'up',
          color: colors.ink,
          lineWidthPx: 1.2,
          labelledMz: labelled,
          labelColor: colors.ink,
          accentMz: new Set(labels.clusterMz),
          accentColor: colors.copper,
        }),
      ],
    };
  }, [colors, peaks, molecularIonMz, label]);
  return <ReactEChartsCore echarts={echarts} option={option} notMerge style={{ height: heightPx, width: '100%' }} />;
}
