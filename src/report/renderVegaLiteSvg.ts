/**
 * renderVegaLiteSvg: a vega-lite spec compiled to vega and rendered server side to SVG text (renderer 'none', no canvas).
 * vega and vega-lite are loaded on the first call, not when the module is imported: together they take about half a
 * second to load, and every command imports the chart modules while only the plotting ones draw.
 */
import type { TopLevelSpec } from 'vega-lite';

export async function renderVegaLiteSvg(spec: TopLevelSpec): Promise<string> {
  const [vega, { compile }] = await Promise.all([import('vega'), import('vega-lite')]);
  const view = new vega.View(vega.parse(compile(spec).spec), { renderer: 'none' });
  const svg = await view.toSVG();
  view.finalize();
  return svg;
}
