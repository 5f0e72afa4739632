// parseModel: validates parsed model-file JSON (explicit, Hubbard, Anderson-impurity or continuum form) into a FermionModel.
import { basename } from 'node:path';
import type { z } from 'zod';
import type { FermionModel } from './FermionModel.js';
import { applySplit } from './internal/applySplit.js';
import { buildContinuum } from './internal/buildContinuum.js';
import { buildExplicit } from './internal/buildExplicit.js';
import { buildHubbard } from './internal/buildHubbard.js';
import { buildImpurity } from './internal/buildImpurity.js';
import type { BuiltHamiltonian } from './internal/BuiltHamiltonian.js';
import { checkSpinSector } from './internal/checkSpinSector.js';
import { defaultGrid } from './internal/defaultGrid.js';
import { detectForm } from './internal/detectForm.js';
import { continuumSchema, explicitSchema, hubbardSchema, impuritySchema, type CommonInput } from './internal/modelSchemas.js';
import { problemsError, type Problem } from './internal/Problem.js';
import { energyScale, gridProblem } from './modelLimits.js';
import { zodProblems } from './internal/zodProblems.js';

/** Broadening η used when a model file gives none. */
export const DEFAULT_BROADENING = 0.1;

/**
 * Turns the parsed JSON of a model file into a FermionModel.
 *
 * @param input  the value JSON.parse returned.
 * @param source the file name (or another label) used as the prefix of every message and, through its base
 *               name without `.json`, as the default `name`.
 * @throws InputError listing every problem found, one line each: `source: field.path: what is wrong`.
 */
export function parseModel(input: unknown, source: string): FermionModel {
  const problems: Problem[] = [];
  if (typeof input !== 'object' || input === null || Array.isArray(input)) {
    throw problemsError(source, [{ path: [], message: 'expected a JSON object' }]);
  }
  const kind = detectForm(input, problems);
  if (kind === undefined) throw problemsError(source, problems);

  let common: CommonInput;
  let built: BuiltHamiltonian | undefined;
  let spin: number | undefined;
  if (kind === 'explicit') {
    const data = validated(explicitSchema, input, source);
    common = data;
    built = buildExplicit(data, problems);
  } else if (kind === 'hubbard') {
    const data = validated(hubbardSchema, input, source);
    common = data;
    spin = data.spin;
    built = buildHubbard(data, problems);
  } else if (kind === 'impurity') {
    const data = validated(impuritySchema, input, source);
    common = data;
    spin = data.spin;
    built = buildImpurity(data);
  } else {
    const data = validated(continuumSchema, input, source);
    common = data;
    spin = data.spin;
    built = buildContinuum(data, problems);
  }
  if (built === undefined) throw problemsError(source, problems);

  const { modes, oneBody, twoBody, spinBlocks, form } = built;
  if (common.electrons > modes) {
    problems.push({ path: ['electrons'], message: `${common.electrons} electrons do not fit in ${modes} modes` });
  }
  if (spinBlocks !== undefined && spin !== undefined && common.electrons <= modes) {
    checkSpinSector(common.electrons, spin, spinBlocks.up.length, problems);
  }
  const broadening = common.broadening ?? DEFAULT_BROADENING;
  const grid = common.grid;
  const wrongGrid = grid === undefined ? undefined : gridProblem(grid, energyScale(oneBody, twoBody, broadening));
  if (wrongGrid !== undefined) problems.push({ path: ['grid'], message: wrongGrid });
  const split = 'split' in common ? common.split : undefined;
  const oneBodyInB = built.oneBodyInB ?? applySplit(oneBody, split?.oneBodyInB ?? [], problems);
  if (problems.length > 0) throw problemsError(source, problems);

  return {
    name: common.name ?? basename(source).replace(/\.json$/i, ''),
    form,
    modes,
    electrons: common.electrons,
    ...(spinBlocks === undefined ? {} : { spinBlocks }),
    // Only a `spin` the file gives restricts the ground level to one S_z sector; there is no default.
    ...(spin === undefined ? {} : { spinPolarization: spin }),
    oneBody,
    oneBodyInB,
    twoBody,
    broadening,
    grid: grid ?? defaultGrid(oneBody, twoBody, broadening),
  };
}

function validated<T extends z.ZodType>(schema: T, input: object, source: string): z.infer<T> {
  const result = schema.safeParse(input, { reportInput: true });
  if (!result.success) throw problemsError(source, zodProblems(result.error));
  return result.data;
}
