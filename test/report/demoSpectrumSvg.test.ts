// demoSpectrumSvg: the demo plot titles its legend with what the series are (a fuzz-campaign review found the bare
// word "series"), names every series, and gives the same bytes for the same input.
import { describe, expect, it } from 'vitest';
import { demoSpectrumSvg } from '../../src/report/demoSpectrumSvg.js';

const chart = {
  title: 'test spectrum',
  xTitle: 'ω (model energy units)',
  yTitle: 'A(ω) (1/energy)',
  seriesTitle: 'how the value was computed',
  line: { name: 'exact (Lanczos) A_00', x: [-1, 0, 1], y: [0.1, 0.5, 0.1] },
  points: [{ name: 'gate level, direct route', x: [0], y: [0.49] }],
};

describe('demoSpectrumSvg(chart)', () => {
  it('titles the legend with seriesTitle, not "series", and names the curve and the point series', async () => {
    const svg = await demoSpectrumSvg(chart);
    expect(svg.startsWith('<svg')).toBe(true);
    for (const text of ['how the value was computed', 'exact (Lanczos) A_00', 'gate level, direct route', 'test spectrum']) expect(svg).toContain(text);
    expect(svg).not.toMatch(/>series</);
    expect(await demoSpectrumSvg(chart)).toBe(svg);
  });
});
