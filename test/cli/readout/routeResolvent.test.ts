// routeResolvent: a resolvent the construction cannot reach (QSVT degree beyond its cap) is an InputError naming w,
// the route and the ways around it — a fuzz finding, where it escaped as an internal error from estimate and build.
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { isInputError } from '../../../src/core/InputError.js';
import { loadModelFile } from '../../../src/model/loadModelFile.js';
import { routeResolvent, unreachableResolventError } from '../../../src/cli/readout/routeResolvent.js';

const DIMER = fileURLToPath(new URL('../../../circuits/hubbard-dimer.json', import.meta.url));

describe('routeResolvent', () => {
  it('turns a QSVT degree beyond the cap at w = −4.83 + 0.1i (η = 0.1, ε = 1e-6) into an InputError with advice', () => {
    const model = loadModelFile(DIMER);
    let caught: unknown;
    try {
      routeResolvent(model, 'preconditioned', 1e-6).factory({ re: -4.82843, im: 0.1 }, model.electrons + 1);
    } catch (error) {
      caught = error;
    }
    expect(isInputError(caught)).toBe(true);
    const message = (caught as Error).message;
    expect(message).toMatch(/^cannot build the resolvent \(w − H\)⁻¹ at w = -4\.82843 \+ 0\.100000i by the preconditioned route/);
    expect(message).toContain('beyond the cap 20000');
    expect(message).toMatch(/larger Im z.*--route direct.*coarser --precision.*polewright cost/);
  });

  it('unreachableResolventError does not suggest --route direct when the route already is direct', () => {
    const error = unreachableResolventError({ re: 1, im: -0.5 }, 'direct', 1e-3, 'reason');
    expect(isInputError(error)).toBe(true);
    expect(error.message).toContain('at w = 1.00000 - 0.500000i by the direct route at precision 0.001: reason;');
    expect(error.message).not.toContain('--route direct');
  });
});
