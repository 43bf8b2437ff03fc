// ECharts assembled from the parts the spectrum charts use; only the lazily loaded chart modules
// import this file, so none of it lands in the first bundle.
import * as echarts from 'echarts/core';
import { CustomChart } from 'echarts/charts';
import { DataZoomComponent, GridComponent, TooltipComponent } from 'echarts/components';
import { CanvasRenderer } from 'echarts/renderers';

echarts.use([CustomChart, GridComponent, TooltipComponent, DataZoomComponent, CanvasRenderer]);

export { echarts };
