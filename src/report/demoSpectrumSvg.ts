/**
 * demoSpectrumSvg: the demo's plot — the exact spectral function as a line with gate-level points overlaid, one colour
 * point shape and size per route — as SVG text, drawn with vega-lite compiled to vega and rendered server side (like
 * lineChartSvg). Same input, same bytes.
 */
import type { TopLevelSpec } from 'vega-lite';
import { renderVegaLiteSvg } from './renderVegaLiteSvg.js';

export interface SpectrumPoints {
  /** Legend entry, e.g. "gate level, preconditioned route". */
  readonly name: string;
  readonly x: ArrayLike<number>;
  readonly y: ArrayLike<number>;
}

export interface DemoSpectrum {
  readonly title: string;
  readonly xTitle: string;
  readonly yTitle: string;
  /** Title of the legend: what tells the curve and the point series apart, e.g. "how the value was computed". */
  readonly seriesTitle: string;
  /** The exact curve. */
  readonly line: SpectrumPoints;
  /** Point series drawn over it (at most three). */
  readonly points: readonly SpectrumPoints[];
}

/** Colour-blind-safe, clearly distinct: blue line, vermilion and bluish-green points, orange for a third series. */
const COLOURS = ['#0072b2', '#d55e00', '#009e73', '#e69f00'];
const SHAPES = ['circle', 'square', 'diamond'];
/** Point sizes, largest first, so that series at the same place stay visible inside each other. */
const SIZES = [220, 70, 30];

export async function demoSpectrumSvg(chart: DemoSpectrum): Promise<string> {
  if (chart.points.length > SHAPES.length) throw new RangeError(`demoSpectrumSvg: at most ${SHAPES.length} point series`);
  const rows = (s: SpectrumPoints): { x: number; y: number; series: string }[] =>
    Array.from({ length: s.x.length }, (_, k) => ({ x: s.x[k]!, y: s.y[k]!, series: s.name }));
  const names = [chart.line.name, ...chart.points.map((p) => p.name)];
  const colour = {
    field: 'series',
    type: 'nominal' as const,
    title: chart.seriesTitle,
    scale: { domain: names, range: COLOURS.slice(0, names.length) },
    legend: { labelLimit: 400, titleLimit: 400 },
  };
  const spec: TopLevelSpec = {
    $schema: 'https://vega.github.io/schema/vega-lite/v6.json',
    title: chart.title,
    width: 640,
    height: 360,
    background: 'white',
    encoding: {
      x: { field: 'x', type: 'quantitative', title: chart.xTitle },
      y: { field: 'y', type: 'quantitative', title: chart.yTitle },
      color: colour,
    },
    layer: [
      { data: { values: rows(chart.line) }, mark: { type: 'line', strokeWidth: 1.5 } },
      {
        data: { values: chart.points.flatMap(rows) },
        mark: { type: 'point', filled: false, strokeWidth: 2, opacity: 1 },
        encoding: {
          shape: { field: 'series', type: 'nominal', scale: { domain: names.slice(1), range: SHAPES.slice(0, chart.points.length) }, legend: null },
          size: { field: 'series', type: 'nominal', scale: { domain: names.slice(1), range: SIZES.slice(0, chart.points.length) }, legend: null },
        },
      },
    ],
  };
  return renderVegaLiteSvg(spec);
}
