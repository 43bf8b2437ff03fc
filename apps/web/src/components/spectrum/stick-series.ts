import type { PeakList } from '@ionfolio/chem';
import type { CustomSeriesOption } from 'echarts/charts';

/** One set of sticks drawn by a custom series: above the axis (`up`) or mirrored below it (`down`). */
export type StickSeriesInput = {
  name: string;
  peaks: PeakList;
  direction: 'up' | 'down';
  color: string;
  lineWidthPx: number;
  /** m/z (nominal) whose stick carries its m/z as text. */
  labelledMz: ReadonlySet<number>;
  labelColor: string;
  /** m/z (nominal) drawn in the accent colour instead, e.g. peaks matched in the mirror view. */
  accentMz?: ReadonlySet<number>;
  accentColor?: string;
};

const LABEL = 1;
const ACCENT = 2;
/** Half the width of the invisible hover target around each stick, so a 1 px stick is easy to point at. */
const HIT_HALF_WIDTH_PX = 4;

/** Intensities on the 0–100 scale of the base peak (the scale of library spectra). */
export function toRelative(peaks: PeakList): [number, number][] {
  const max = peaks.reduce((best, [, intensity]) => Math.max(best, intensity), 0);
  if (max <= 0) return [];
  return peaks.filter(([, intensity]) => intensity > 0).map(([mz, intensity]) => [mz, (intensity / max) * 100]);
}

/** The ECharts custom series that draws `input.peaks` as thin sticks with optional labels. */
export function stickSeries(input: StickSeriesInput): CustomSeriesOption {
  const sign = input.direction === 'up' ? 1 : -1;
  const data = toRelative(input.peaks).map(([mz, rel]) => {
    const nominal = Math.round(mz);
    const flags = (input.labelledMz.has(nominal) ? LABEL : 0) | (input.accentMz?.has(nominal) ? ACCENT : 0);
    return [mz, sign * rel, flags];
  });
  return {
    type: 'custom',
    name: input.name,
    data,
    encode: { x: 0, y: 1 },
    clip: true,
    renderItem: (_params, api) => {
      const mz = Number(api.value(0));
      const rel = Number(api.value(1));
      const flags = Number(api.value(2));
      const [x0 = 0, y0 = 0] = api.coord([mz, 0]);
      const [, y1 = 0] = api.coord([mz, rel]);
      const accent = (flags & ACCENT) !== 0;
      const stroke = accent && input.accentColor ? input.accentColor : input.color;
      const children: NonNullable<Extract<ReturnType<NonNullable<CustomSeriesOption['renderItem']>>, { type: 'group' }>['children']> = [
        {
          type: 'rect',
          shape: { x: x0 - HIT_HALF_WIDTH_PX, y: Math.min(y0, y1), width: HIT_HALF_WIDTH_PX * 2, height: Math.abs(y1 - y0) },
          style: { fill: 'rgba(0,0,0,0)' },
        },
        {
          type: 'line',
          shape: { x1: x0, y1: y0, x2: x0, y2: y1 },
          style: { stroke, lineWidth: accent ? input.lineWidthPx + 0.6 : input.lineWidthPx },
        },
      ];
      if ((flags & LABEL) !== 0) {
        children.push({
          type: 'text',
          style: {
            text: String(Math.round(mz * 10) / 10),
            x: x0,
            y: y1 - sign * 3,
            fill: accent && input.accentColor ? input.accentColor : input.labelColor,
            font: '11px Lato, system-ui, sans-serif',
            align: 'center',
            verticalAlign: sign > 0 ? 'bottom' : 'top',
          },
          silent: true,
        });
      }
      return { type: 'group', children };
    },
  };
}
