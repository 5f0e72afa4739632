/**
 * lineChartSvg: a line chart of one or more named series as SVG text, drawn with vega-lite compiled
 * to vega and rendered server side (renderer 'none', no canvas). Same input, same bytes. Every colour
 * group gets its own colour (distinctColors), never one shared with another group of the chart;
 * series of one group are told apart by line style.
 */
import type { TopLevelSpec } from 'vega-lite';
import { renderVegaLiteSvg } from './renderVegaLiteSvg.js';
import { distinctColors } from './distinctColors.js';

export interface LineSeries {
  readonly name: string;
  readonly x: ArrayLike<number>;
  readonly y: ArrayLike<number>;
  /** Colour group (legend "series"); default: the name. */
  readonly group?: string;
  /** Line style (legend "part"), one of the chart's `styles`; default: solid. */
  readonly style?: string;
}

export interface LineChart {
  readonly title: string;
  /** Axis titles, units included, e.g. "ω (energy units)". */
  readonly xTitle: string;
  readonly yTitle: string;
  readonly series: readonly LineSeries[];
  /** Line styles in legend order, e.g. ['Re', 'Im']: the first is solid, the next ones dashed ever shorter. */
  readonly styles?: readonly string[];
  /** Title of the colour legend, saying what the series are, e.g. "entry A_ii". */
  readonly seriesTitle: string;
  /** Title of the line-style legend when there are styles, e.g. "part of Σ". */
  readonly styleTitle?: string;
  /** Default 640 × 360. */
  readonly width?: number;
  readonly height?: number;
}

const DASHES: readonly (readonly number[])[] = [[1, 0], [6, 3], [2, 2], [8, 3, 2, 3]];

/** Renders the chart; the colour legend is titled `seriesTitle`, the style legend `styleTitle` (default "line style"). */
export async function lineChartSvg(chart: LineChart): Promise<string> {
  const styles = chart.styles ?? [];
  if (styles.length > DASHES.length) throw new RangeError(`lineChartSvg: at most ${DASHES.length} line styles, got ${styles.length}`);
  const groups = [...new Set(chart.series.map((s) => s.group ?? s.name))];
  const values: { x: number; y: number; series: string; group: string; style: string }[] = [];
  for (const s of chart.series) {
    const style = s.style ?? styles[0] ?? '';
    if (styles.length > 0 && !styles.includes(style)) throw new RangeError(`lineChartSvg: unknown style "${style}"`);
    for (let k = 0; k < s.x.length; k++) values.push({ x: s.x[k]!, y: s.y[k]!, series: s.name, group: s.group ?? s.name, style });
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
      color: { field: 'group', type: 'nominal', title: chart.seriesTitle, scale: { domain: groups, range: distinctColors(groups.length) } },
      detail: { field: 'series', type: 'nominal' },
      ...(styles.length === 0
        ? {}
        : {
            strokeDash: {
              field: 'style',
              type: 'nominal',
              title: chart.styleTitle ?? 'line style',
              scale: { domain: [...styles], range: DASHES.slice(0, styles.length).map((d) => [...d]) },
            },
          }),
    },
  };
  return renderVegaLiteSvg(spec);
}
