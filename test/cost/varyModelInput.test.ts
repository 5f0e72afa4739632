// varyModelInput on a continuum file: `points` sets every n_d (the electron number kept), `box` every L_d, `interaction`
// only for a contact interaction; bad values are input errors naming --vary.
import { describe, expect, it } from 'vitest';
import { varyKeys, varyModelInput } from '../../src/cost/varyModelInput.js';

const wire = {
  continuum: { dimension: 1, points: [4], box: [6], interaction: 'coulomb', external: [{ position: [1.5], charge: 1 }] },
  electrons: 2,
};
const plane = { continuum: { dimension: 2, points: [4, 2], box: [3, 5], interaction: { contact: 0.5 } }, electrons: 2 };

describe('varyModelInput(continuum file, key, value)', () => {
  it('offers points and box (and interaction only for a contact g)', () => {
    expect(varyKeys(wire)).toEqual(['points', 'box', 'broadening', 'electrons']);
    expect(varyKeys(plane)).toEqual(['points', 'box', 'interaction', 'broadening', 'electrons']);
  });

  it('points sets n_1 in 1D and every n_d in 2D, keeping the electrons; box sets every L_d; interaction sets g', () => {
    expect(varyModelInput(wire, 'points', 16)).toEqual({ ...wire, continuum: { ...wire.continuum, points: [16] } });
    expect(varyModelInput(plane, 'points', 8)).toEqual({ ...plane, continuum: { ...plane.continuum, points: [8, 8] } });
    expect(varyModelInput(plane, 'box', 2)).toEqual({ ...plane, continuum: { ...plane.continuum, box: [2, 2] } });
    expect(varyModelInput(plane, 'interaction', 3)).toEqual({ ...plane, continuum: { ...plane.continuum, interaction: { contact: 3 } } });
    expect(wire.continuum.points).toEqual([4]);
  });

  it('refuses non-integer or non-positive points, non-positive box lengths and unknown keys, naming --vary', () => {
    expect(() => varyModelInput(wire, 'points', 2.5)).toThrow(/^--vary: points must be positive integers, got 2.5$/);
    expect(() => varyModelInput(wire, 'points', 0)).toThrow(/^--vary: points must be positive integers, got 0$/);
    expect(() => varyModelInput(wire, 'box', -1)).toThrow(/^--vary: box lengths must be positive, got -1$/);
    expect(() => varyModelInput(wire, 'interaction', 1)).toThrow(/^--vary: unknown key "interaction" for this model; use one of points, box, broadening, electrons$/);
  });
});
