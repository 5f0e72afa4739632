// lineChartSvg: server-side SVG with axis titles and a legend, same bytes for the same input, one colour
// per group (never shared) and Re/Im told apart by dash pattern.
import { describe, expect, it } from 'vitest';
import { distinctColors } from '../../src/report/distinctColors.js';
import { lineChartSvg } from '../../src/report/lineChartSvg.js';

const chart = {
  title: 'test chart',
  xTitle: 'ω (model energy units)',
  yTitle: 'A(ω) (1/energy)',
  seriesTitle: 'diagonal entry A_ii',
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

  it('titles the colour legend with seriesTitle and the style legend with styleTitle', async () => {
    const series = [
      { name: 'Re Σ_0', group: 'Σ_0', style: 'Re', x: [0, 1], y: [0, 1] },
      { name: 'Im Σ_0', group: 'Σ_0', style: 'Im', x: [0, 1], y: [1, 0] },
    ];
    const svg = await lineChartSvg({ ...chart, series, styles: ['Re', 'Im'], seriesTitle: 'diagonal entry Σ_ii', styleTitle: 'part of Σ_ii' });
    expect(svg).toContain('diagonal entry Σ_ii');
    expect(svg).toContain('part of Σ_ii');
    expect(svg).not.toContain('>series<');
  });

  it('is deterministic: the same chart gives the same bytes', async () => {
    expect(await lineChartSvg(chart)).toBe(await lineChartSvg(chart));
  });

  it('gives twelve groups twelve different line colours and tells the styles apart by dash pattern', async () => {
    const x = [0, 1, 2];
    const series = Array.from({ length: 12 }, (_, g) => [
      { name: `Re Σ_${g}`, group: `Σ_${g}`, style: 'Re', x, y: [g, g + 1, g] },
      { name: `Im Σ_${g}`, group: `Σ_${g}`, style: 'Im', x, y: [-g, -g - 1, -g] },
    ]).flat();
    const svg = await lineChartSvg({ ...chart, series, styles: ['Re', 'Im'] });
    // Line marks are <path> elements with a stroke colour and a dash array.
    const lines = [...svg.matchAll(/<path[^>]*stroke="(#[0-9a-f]{6})"[^>]*stroke-dasharray="([^"]+)"/g)].map((m) => [m[1]!, m[2]!]);
    const colours = new Set(lines.map(([c]) => c));
    expect(colours.size).toBe(12);
    for (const c of distinctColors(12)) expect(colours.has(c)).toBe(true);
    expect(new Set(lines.map(([, dash]) => dash))).toEqual(new Set(['1,0', '6,3']));
  });
});

describe('distinctColors(count)', () => {
  it('never repeats a colour, for any count up to 500', () => {
    for (let count = 1; count <= 500; count += count < 30 ? 1 : 37) {
      const colours = distinctColors(count);
      expect(colours).toHaveLength(count);
      expect(new Set(colours).size).toBe(count);
      for (const c of colours) expect(c).toMatch(/^#[0-9a-f]{6}$/);
    }
  });
});
