/**
 * exactPlots: the two SVG plots of `polewright exact --out`: spectral.svg (A_ii(ω) of the computed
 * diagonal entries) and selfenergy.svg (Re Σ_ii solid, Im Σ_ii dashed, one colour per entry, entries
 * that are zero on the whole grid left out and named in a note). Titles name the model; legend titles
 * say what the series are.
 */
import type { ExactSolution } from '../exact/solveExact.js';
import { spectralFunction } from '../exact/spectralFunction.js';
import { lineChartSvg } from './lineChartSvg.js';

export interface ExactPlots {
  /** Null when no diagonal entry was computed. */
  readonly spectral: string | null;
  /** Null when the self-energy was not computed or is zero everywhere. */
  readonly selfEnergy: string | null;
  /** One line per plot left out or entry not drawn. */
  readonly notes: string[];
}

/** Entries whose largest |value| on the grid is at most this times max(1, largest |Σ| anywhere) count as zero. */
export const ZERO_ENTRY = 1e-12;

/** `modelName` heads both titles. */
export async function exactPlots(s: ExactSolution, modelName: string): Promise<ExactPlots> {
  const notes: string[] = [];
  const diagonal = s.green.filter((e) => e.i === e.j);
  let spectral: string | null = null;
  if (diagonal.length > 0) {
    spectral = await lineChartSvg({
      title: `${modelName}: spectral function A_ii(ω) = −Im G_ii(ω + iη)/π, η = ${s.broadening}`,
      seriesTitle: 'diagonal entry A_ii',
      xTitle: 'ω (model energy units)',
      yTitle: 'A(ω) (1/energy)',
      series: diagonal.map((e) => ({ name: `A_${e.i}${e.i}`, x: s.frequencies, y: spectralFunction(e) })),
    });
  } else {
    notes.push('spectral.svg not written: --pairs selects no diagonal entry');
  }
  let selfEnergy: string | null = null;
  if (s.selfEnergy === null) {
    notes.push('selfenergy.svg not written: the self-energy needs all n² entries of G (drop --pairs)');
  } else {
    const largest = (e: { re: Float64Array; im: Float64Array }): number => {
      let m = 0;
      for (let k = 0; k < e.re.length; k++) m = Math.max(m, Math.abs(e.re[k]!), Math.abs(e.im[k]!));
      return m;
    };
    const scale = Math.max(1, ...s.selfEnergy.map(largest));
    const sigma = s.selfEnergy.filter((e) => e.i === e.j);
    const drawn = sigma.filter((e) => largest(e) > ZERO_ENTRY * scale);
    const zero = sigma.filter((e) => !drawn.includes(e)).map((e) => `Σ_${e.i}${e.i}`);
    if (drawn.length === 0) {
      notes.push('selfenergy.svg not written: every diagonal entry of Σ is zero on the grid (no interaction acts)');
    } else {
      if (zero.length > 0) notes.push(`selfenergy.svg leaves out entries that are zero on the whole grid: ${zero.join(', ')}`);
      selfEnergy = await lineChartSvg({
        title: `${modelName}: self-energy Σ_ii(ω + iη), η = ${s.broadening} (Re solid, Im dashed)`,
        seriesTitle: 'diagonal entry Σ_ii',
        styleTitle: 'part of Σ_ii',
        xTitle: 'ω (model energy units)',
        yTitle: 'Σ(ω + iη) (energy units)',
        styles: ['Re', 'Im'],
        series: drawn.flatMap((e) => [
          { name: `Re Σ_${e.i}${e.i}`, group: `Σ_${e.i}${e.i}`, style: 'Re', x: s.frequencies, y: e.re },
          { name: `Im Σ_${e.i}${e.i}`, group: `Σ_${e.i}${e.i}`, style: 'Im', x: s.frequencies, y: e.im },
        ]),
      });
    }
  }
  return { spectral, selfEnergy, notes };
}
