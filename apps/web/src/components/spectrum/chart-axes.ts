import type { ChartColors } from './use-theme-colors';

/** The m/z range a chart opens on: a little room either side of the peaks. */
export function mzExtent(mzValues: readonly number[]): { min: number; max: number } {
  if (mzValues.length === 0) return { min: 0, max: 100 };
  const low = Math.min(...mzValues);
  const high = Math.max(...mzValues);
  const pad = Math.max(5, (high - low) * 0.04);
  return { min: Math.max(0, Math.floor(low - pad)), max: Math.ceil(high + pad) };
}

/** Axis, zoom and tooltip settings shared by the stick plot and the mirror view. */
export function baseChartOption(colors: ChartColors, extent: { min: number; max: number }) {
  const axisLine = { lineStyle: { color: colors.rule } };
  const axisLabel = { color: colors.inkSoft, fontFamily: 'Lato, system-ui, sans-serif' };
  return {
    animation: false,
    textStyle: { fontFamily: 'Lato, system-ui, sans-serif', color: colors.ink },
    grid: { left: 48, right: 20, top: 28, bottom: 64 },
    xAxis: {
      type: 'value' as const,
      name: 'm/z',
      nameLocation: 'end' as const,
      nameTextStyle: axisLabel,
      min: extent.min,
      max: extent.max,
      axisLine,
      axisTick: { lineStyle: { color: colors.rule } },
      axisLabel,
      splitLine: { show: false },
    },
    dataZoom: [
      { type: 'inside' as const, xAxisIndex: 0, filterMode: 'none' as const },
      {
        type: 'slider' as const,
        xAxisIndex: 0,
        filterMode: 'none' as const,
        height: 18,
        bottom: 12,
        borderColor: colors.ruleFaint,
        fillerColor: 'rgba(141,153,176,0.18)',
        dataBackground: { lineStyle: { color: colors.rule }, areaStyle: { color: colors.ruleFaint } },
        textStyle: axisLabel,
      },
    ],
    tooltip: {
      trigger: 'item' as const,
      backgroundColor: colors.paperRaised,
      borderColor: colors.rule,
      textStyle: { color: colors.ink, fontFamily: 'Lato, system-ui, sans-serif' },
    },
  };
}

const htmlEscapes: Record<string, string> = { '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' };

/** ECharts tooltips are HTML: a label typed by a person must not become markup. */
export function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (ch) => htmlEscapes[ch] ?? ch);
}

/** A tooltip line for one stick: `m/z 112 · 100.0 %` (the sign of a mirrored stick dropped). */
export function stickTooltip(seriesName: string, value: unknown): string {
  const [mz, rel] = Array.isArray(value) ? value : [];
  const mzText = typeof mz === 'number' ? String(Math.round(mz * 10) / 10) : '?';
  const relText = typeof rel === 'number' ? Math.abs(rel).toFixed(1) : '?';
  return `${escapeHtml(seriesName)}<br/>m/z ${mzText} · ${relText} %`;
}
