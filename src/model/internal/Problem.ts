// Problem: one user-input mistake in a model file, located by its field path, and the error that lists them all.
import { InputError } from '../../core/InputError.js';

export type FieldPath = readonly (string | number)[];

export interface Problem {
  readonly path: FieldPath;
  readonly message: string;
}

/** `oneBody[3][1]`, `lattice.size[0]`; the empty path is `(top level)`. */
export function formatPath(path: FieldPath): string {
  let text = '';
  for (const key of path) {
    if (typeof key === 'number') text += `[${key}]`;
    else text += text === '' ? key : `.${key}`;
  }
  return text === '' ? '(top level)' : text;
}

/** One InputError whose message has one line `source: path: message` per problem. */
export function problemsError(source: string, problems: readonly Problem[]): InputError {
  return new InputError(problems.map((p) => `${source}: ${formatPath(p.path)}: ${p.message}`).join('\n'));
}
