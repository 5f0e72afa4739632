/**
 * lineChartSvg: a line chart of one or more named series as SVG text, drawn with vega-lite compiled
 * to vega and rendered server side (renderer 'none', no canvas). Same input, same bytes.
 */
import * as vega from 'vega';
import { compile, type TopLevelSpec } from 'vega-lite';

export interface LineSeries {
  readonly name: string;
  readonly x: ArrayLike<number>;
  readonly y: ArrayLike<number>;
}

export interface LineChart {
  readonly title: string;
  /** Axis titles, units included, e.g. "ω (energy units)". */
  readonly xTitle: string;
  readonly yTitle: string;
  readonly series: readonly LineSeries[];
  /** Default 640 × 360. */
  readonly width?: number;
  readonly height?: number;
}

/** Renders the chart; the series legend is titled "series". */
export async function lineChartSvg(chart: LineChart): Promise<string> {
  const values: { x: number; y: number; series: string }[] = [];
  for (const s of chart.series) {
    for (let k = 0; k < s.x.length; k++) values.push({ x: s.x[k]!, y: s.y[k]!, series: s.name });
  }
  const spec: TopLevelSpec = {
    $schema: 'https://vega.github.io/schema/vega-lite/v6.json',
    title: chart.title,
    width: chart.width ?? 640,
    height: chart.height ?? 360,
    background: 'white',
    data: { values },
    mark: { type: 'line', strokeWidth: 1.5 },
    encoding: {
      x: { field: 'x', type: 'quantitative', title: chart.xTitle },
      y: { field: 'y', type: 'quantitative', title: chart.yTitle },
      color: { field: 'series', type: 'nominal', title: 'series', sort: chart.series.map((s) => s.name) },
    },
  };
  const view = new vega.View(vega.parse(compile(spec).spec), { renderer: 'none' });
  const svg = await view.toSVG();
  view.finalize();
  return svg;
}
