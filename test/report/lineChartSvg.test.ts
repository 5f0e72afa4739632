// lineChartSvg: server-side SVG with axis titles and a legend, same bytes for the same input.
import { describe, expect, it } from 'vitest';
import { lineChartSvg } from '../../src/report/lineChartSvg.js';

const chart = {
  title: 'test chart',
  xTitle: 'ω (model energy units)',
  yTitle: 'A(ω) (1/energy)',
  series: [
    { name: 'A_00', x: [0, 1, 2], y: [1, 3, 2] },
    { name: 'A_11', x: [0, 1, 2], y: [2, 1, 0] },
  ],
};

describe('lineChartSvg(chart)', () => {
  it('renders an SVG document with both axis titles and every series name', async () => {
    const svg = await lineChartSvg(chart);
    expect(svg.startsWith('<svg')).toBe(true);
    for (const text of ['ω (model energy units)', 'A(ω) (1/energy)', 'A_00', 'A_11', 'test chart']) expect(svg).toContain(text);
  });

  it('is deterministic: the same chart gives the same bytes', async () => {
    expect(await lineChartSvg(chart)).toBe(await lineChartSvg(chart));
  });
});
