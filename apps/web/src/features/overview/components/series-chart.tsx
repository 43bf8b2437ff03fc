import { useMemo } from 'react';
import ReactEChartsCore from 'echarts-for-react/esm/core';
import { useThemeColors, type ChartColors } from '../../../components/spectrum/use-theme-colors';
import { echarts } from './echarts-setup';

/** One series of an overview chart; colours are theme tokens, not fixed values. */
export type ChartSeries = {
  name: string;
  kind: 'bar' | 'line';
  values: readonly number[];
  tone: 'ink' | 'copper' | 'rule';
  /** Draw against a second value axis on the right (e.g. a running total beside monthly counts). */
  rightAxis?: boolean;
  stack?: string;
};

export type SeriesChartProps = {
  categories: readonly string[];
  series: readonly ChartSeries[];
  yName: string;
  rightYName?: string;
  heightPx: number;
  horizontal?: boolean;
};

const toneOf = (colors: ChartColors, tone: ChartSeries['tone']) => (tone === 'ink' ? colors.ink : tone === 'copper' ? colors.copper : colors.rule);

/** The ECharts drawing behind an overview chart; load it lazily (see OverviewChart). */
export function SeriesChart({ categories, series, yName, rightYName, heightPx, horizontal = false }: SeriesChartProps) {
  const colors = useThemeColors();
  const option = useMemo(() => {
    const text = { color: colors.inkSoft, fontFamily: 'Lato, system-ui, sans-serif' };
    const axisLine = { lineStyle: { color: colors.rule } };
    const categoryAxis = { type: 'category' as const, data: [...categories], axisLine, axisTick: { lineStyle: { color: colors.rule } },
      // Every label when there are few categories (states, elements, checks); ECharts thins long series.
      axisLabel: { ...text, interval: categories.length <= 12 ? 0 : ('auto' as const), fontSize: 11 },
    };
    const valueAxis = (name: string) => ({
      type: 'value' as const,
      name,
      nameTextStyle: text,
      axisLabel: text,
      axisLine: { show: true, ...axisLine },
      splitLine: { lineStyle: { color: colors.ruleFaint, type: 'dashed' as const } },
    });
    const values = rightYName ? [valueAxis(yName), { ...valueAxis(rightYName), splitLine: { show: false } }] : valueAxis(yName);
    return {
      animation: false,
      textStyle: { fontFamily: 'Lato, system-ui, sans-serif', color: colors.ink },
      grid: { left: horizontal ? 96 : 52, right: rightYName ? 56 : 20, top: series.length > 1 ? 40 : 28, bottom: 36 },
      legend: series.length > 1 ? { top: 0, textStyle: text } : undefined,
      tooltip: {
        trigger: 'axis' as const,
        backgroundColor: colors.paperRaised,
        borderColor: colors.rule,
        textStyle: { color: colors.ink, fontFamily: 'Lato, system-ui, sans-serif' },
      },
      xAxis: horizontal ? valueAxis(yName) : categoryAxis,
      yAxis: horizontal ? { ...categoryAxis, inverse: true } : values,
      series: series.map((s) => ({
        name: s.name,
        type: s.kind,
        data: [...s.values],
        stack: s.stack,
        yAxisIndex: s.rightAxis && !horizontal ? 1 : 0,
        itemStyle: { color: toneOf(colors, s.tone) },
        lineStyle: { color: toneOf(colors, s.tone), width: 2 },
        symbolSize: 5,
        barMaxWidth: 28,
      })),
    };
  }, [colors, categories, series, yName, rightYName, horizontal]);
  return <ReactEChartsCore echarts={echarts} option={option} notMerge style={{ height: heightPx, width: '100%' }} />;
}
