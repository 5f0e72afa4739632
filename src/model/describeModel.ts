// describeModel: a one-line human summary of a model for CLI output.
import type { FermionModel } from './FermionModel.js';

/**
 * E.g. `hubbard-dimer: Hubbard chain of 2 sites, 4 modes, 2 electrons (spin 0 fixed), η = 0.1`, or
 * `wire: continuum 1D grid of 4 points, box 6 bohr, 8 modes, …`; a preset that fixes no spin says `(all S_z)`.
 */
export function describeModel(model: FermionModel): string {
  const form = model.form;
  let kind = 'model';
  if (form?.kind === 'explicit') kind = 'explicit model';
  else if (form?.kind === 'hubbard') {
    kind = form.shape === 'grid' ? `Hubbard grid of ${form.size.join('×')} sites` : `Hubbard ${form.shape} of ${form.size[0]} sites`;
  } else if (form?.kind === 'impurity') {
    kind = `Anderson impurity with ${form.bathLevels} bath level${form.bathLevels === 1 ? '' : 's'}`;
  } else if (form?.kind === 'continuum') {
    const count = form.points.reduce((a, b) => a * b, 1);
    kind = `continuum ${form.dimension}D grid of ${form.points.join('×')} point${count === 1 ? '' : 's'}, box ${form.box.join('×')} bohr`;
  }
  const spin = model.spinPolarization !== undefined ? ` (spin ${model.spinPolarization} fixed)` : model.spinBlocks !== undefined ? ' (all S_z)' : '';
  return `${model.name}: ${kind}, ${model.modes} modes, ${model.electrons} electron${model.electrons === 1 ? '' : 's'}${spin}, η = ${model.broadening}`;
}
