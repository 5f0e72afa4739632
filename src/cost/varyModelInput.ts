/**
 * varyModelInput: a copy of a model file's parsed JSON with one parameter set to a new value, for `cost --vary`. Keys:
 * `hopping` (lattice.hopping), `sites` (lattice.sites of a chain or ring; the electron number is scaled to keep the
 * filling, rounded), `interaction` (Hubbard interaction, impurity.interaction or the continuum's contact g), `broadening`,
 * `chemicalPotential`, `electrons`; continuum files: `points` (sets every n_d of continuum.points to the value, i.e. n_1
 * in 1D; the electron number is kept, since more points refine the same box) and `box` (sets every L_d of continuum.box).
 */
import { InputError } from '../core/InputError.js';

type Json = Record<string, unknown>;

const isObject = (value: unknown): value is Json => typeof value === 'object' && value !== null && !Array.isArray(value);

/** The keys that apply to this model file, in a fixed order. */
export function varyKeys(input: unknown): string[] {
  if (!isObject(input)) return [];
  const keys: string[] = [];
  const lattice = input['lattice'];
  if (isObject(lattice)) {
    keys.push('hopping');
    if (lattice['sites'] !== undefined) keys.push('sites');
    keys.push('interaction');
  }
  if (isObject(input['impurity'])) keys.push('interaction');
  const continuum = input['continuum'];
  if (isObject(continuum)) {
    keys.push('points', 'box');
    if (isObject(continuum['interaction'])) keys.push('interaction');
  }
  keys.push('broadening');
  if (isObject(lattice) || isObject(input['impurity'])) keys.push('chemicalPotential');
  keys.push('electrons');
  return keys;
}

/** @throws InputError naming `--vary` for a key this model does not have, or a value it cannot take. */
export function varyModelInput(input: unknown, key: string, value: number): unknown {
  const keys = varyKeys(input);
  if (!keys.includes(key)) throw new InputError(`--vary: unknown key "${key}" for this model; use one of ${keys.join(', ')}`);
  if (!Number.isFinite(value)) throw new InputError(`--vary: ${key} value ${value} is not a finite number`);
  const copy = structuredClone(input) as Json;
  const lattice = copy['lattice'] as Json | undefined;
  switch (key) {
    case 'hopping':
      lattice!['hopping'] = value;
      break;
    case 'sites': {
      if (!Number.isInteger(value) || value < 1) throw new InputError(`--vary: sites must be positive integers, got ${value}`);
      const before = lattice!['sites'] as number;
      lattice!['sites'] = value;
      if (typeof copy['electrons'] === 'number') copy['electrons'] = Math.round(((copy['electrons'] as number) * value) / before);
      break;
    }
    case 'interaction':
      if (isObject(copy['impurity'])) (copy['impurity'] as Json)['interaction'] = value;
      else if (isObject(copy['continuum'])) (copy['continuum'] as Json)['interaction'] = { contact: value };
      else copy['interaction'] = value;
      break;
    case 'points':
      if (!Number.isInteger(value) || value < 1) throw new InputError(`--vary: points must be positive integers, got ${value}`);
      everyEntry(copy['continuum'] as Json, 'points', value);
      break;
    case 'box':
      if (!(value > 0)) throw new InputError(`--vary: box lengths must be positive, got ${value}`);
      everyEntry(copy['continuum'] as Json, 'box', value);
      break;
    case 'electrons':
      if (!Number.isInteger(value) || value < 0) throw new InputError(`--vary: electrons must be non-negative integers, got ${value}`);
      copy['electrons'] = value;
      break;
    default:
      copy[key] = value;
  }
  return copy;
}

/** Sets every entry of the array `key` of `container` to `value` (a missing or non-array field becomes [value]). */
function everyEntry(container: Json, key: string, value: number): void {
  const current = container[key];
  container[key] = Array.isArray(current) && current.length > 0 ? current.map(() => value) : [value];
}
