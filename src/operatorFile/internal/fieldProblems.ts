// fieldProblems: user mistakes in an operator file located by field path (`pauli[2][2]`), zod issues turned into
// plain-language problems, and the InputError that lists them one per line as `file: field.path: problem`.
import type { z } from 'zod';
import { InputError } from '../../core/InputError.js';

export type FieldPath = readonly (string | number)[];

export interface FieldProblem {
  readonly path: FieldPath;
  readonly message: string;
}

/** `pauli[3][2]`, `ladder[0][2][1][0]`; the empty path is `(top level)`. */
export function formatPath(path: FieldPath): string {
  let text = '';
  for (const key of path) text += typeof key === 'number' ? `[${key}]` : text === '' ? key : `.${key}`;
  return text === '' ? '(top level)' : text;
}

export function problemsError(source: string, problems: readonly FieldProblem[]): InputError {
  return new InputError(problems.map((p) => `${source}: ${formatPath(p.path)}: ${p.message}`).join('\n'));
}

export function zodFieldProblems(error: z.ZodError): FieldProblem[] {
  return error.issues.flatMap((issue): FieldProblem[] => {
    const path = issue.path.filter((k): k is string | number => typeof k !== 'symbol');
    if (issue.code === 'unrecognized_keys') return issue.keys.map((key) => ({ path: [...path, key], message: 'unknown key' }));
    return [{ path, message: describeIssue(issue) }];
  });
}

function describeIssue(issue: z.core.$ZodIssue): string {
  const hasInput = 'input' in issue && issue.input !== undefined;
  const got = hasInput ? `, got ${JSON.stringify(issue.input)}` : '';
  switch (issue.code) {
    case 'invalid_type':
      if (!hasInput) return 'required field is missing';
      return `expected ${issue.expected === 'int' ? 'an integer' : issue.expected}${got}`;
    case 'too_small':
      if (issue.origin === 'array') return `expected at least ${issue.minimum} items`;
      return `must be ${issue.inclusive ? '≥' : '>'} ${issue.minimum}${got}`;
    case 'too_big':
      if (issue.origin === 'array') return `expected at most ${issue.maximum} items`;
      if (issue.origin === 'string') return `must be at most ${issue.maximum} characters`;
      return `must be ${issue.inclusive ? '≤' : '<'} ${issue.maximum}${got}`;
    case 'invalid_value':
      return `expected one of ${issue.values.map((v) => JSON.stringify(v)).join(', ')}${got}`;
    default:
      return `${issue.message}${got}`;
  }
}
