/**
 * costChartSvg: a log–log chart of cost against one model parameter, one line (with points) per route, drawn with
 * vega-lite compiled to vega and rendered server side like lineChartSvg. Same input, same bytes; every route its own
 * colour (distinctColors).
 */
import type { TopLevelSpec } from 'vega-lite';
import { renderVegaLiteSvg } from './renderVegaLiteSvg.js';
import { distinctColors } from './distinctColors.js';

export interface CostSeries {
  readonly name: string;
  readonly x: readonly number[];
  readonly y: readonly number[];
}

export interface CostChart {
  readonly title: string;
  readonly xTitle: string;
  readonly yTitle: string;
  readonly series: readonly CostSeries[];
}

export async function costChartSvg(chart: CostChart): Promise<string> {
  const routes = chart.series.map((s) => s.name);
  const values = chart.series.flatMap((s) => s.x.map((x, k) => ({ x, y: s.y[k]!, route: s.name })));
  const spec: TopLevelSpec = {
    $schema: 'https://vega.github.io/schema/vega-lite/v6.json',
    title: chart.title,
    width: 640,
    height: 360,
    background: 'white',
    data: { values },
    mark: { type: 'line', point: true, strokeWidth: 1.5 },
    encoding: {
      x: { field: 'x', type: 'quantitative', title: chart.xTitle, scale: { type: 'log' } },
      y: { field: 'y', type: 'quantitative', title: chart.yTitle, scale: { type: 'log' } },
      color: { field: 'route', type: 'nominal', title: 'route', scale: { domain: routes, range: distinctColors(routes.length) } },
    },
  };
  return renderVegaLiteSvg(spec);
}
