// zodProblems: turns zod issues into Problems with plain-language messages (missing, wrong type, unknown key, range).
import type { z } from 'zod';
import { MAX_BROADENING, MAX_CHARGE, MAX_ENERGY, MAX_GRID_POINTS, MAX_LENGTH, MAX_MODES, MIN_BROADENING } from '../modelLimits.js';
import type { Problem } from './Problem.js';

export function zodProblems(error: z.ZodError): Problem[] {
  const problems: Problem[] = [];
  for (const issue of error.issues) {
    const path = issue.path.filter((k): k is string | number => typeof k !== 'symbol');
    if (issue.code === 'unrecognized_keys') {
      for (const key of issue.keys) problems.push({ path: [...path, key], message: 'unknown key' });
    } else {
      problems.push({ path, message: describeIssue(issue) });
    }
  }
  return problems;
}

/** Longest shown form of an offending value; a huge array is cut, not printed whole. */
const LONGEST_SHOWN = 80;

/**
 * The range modelLimits.ts gives a field, by its key (or by its dotted path of keys where a key means different
 * things in different forms), for messages about values that are not numbers at all.
 */
const FIELD_LIMITS: ReadonlyMap<string, string> = new Map([
  ...['hopping', 'interaction', 'chemicalPotential', 'level', 'coupling', 'contact'].map((key): [string, string] => [key, `±${MAX_ENERGY}`]),
  ['continuum.points', `1 … ${MAX_MODES / 2}`],
  ['dimension', '1 … 3'],
  ['box', `0 … ${MAX_LENGTH} (exclusive of 0)`],
  ['position', `±${MAX_LENGTH}`],
  ['charge', `±${MAX_CHARGE}`],
  ['broadening', `${MIN_BROADENING} … ${MAX_BROADENING}`],
  ['points', `1 … ${MAX_GRID_POINTS}`],
  ['modes', `1 … ${MAX_MODES}`],
  ['electrons', `0 … ${MAX_MODES}`],
]);

/** The value as JSON for a message, cut to LONGEST_SHOWN characters; a value too deeply nested to stringify is named so. */
function shown(value: unknown): string {
  if (typeof value === 'number' && !Number.isFinite(value)) {
    return Number.isNaN(value) ? 'a number that is not a number (NaN)' : 'a number beyond the double range (±1.8e308)';
  }
  let text: string;
  try {
    text = JSON.stringify(value);
  } catch (error) {
    if (error instanceof RangeError) return 'a value nested too deeply to show';
    throw error;
  }
  return text.length > LONGEST_SHOWN ? `${text.slice(0, LONGEST_SHOWN - 1)}…` : text;
}

/** ", which must lie within …" for a field whose range modelLimits.ts gives, else "". */
function limitOf(path: readonly (string | number)[]): string {
  const keys = path.filter((k): k is string => typeof k === 'string');
  const key = keys[keys.length - 1];
  const limit = FIELD_LIMITS.get(keys.join('.')) ?? (key === undefined ? undefined : FIELD_LIMITS.get(key));
  return limit === undefined ? '' : ` (the field must lie within ${limit})`;
}

function describeIssue(issue: z.core.$ZodIssue): string {
  const hasInput = 'input' in issue && issue.input !== undefined;
  const got = hasInput ? `, got ${shown(issue.input)}` : '';
  switch (issue.code) {
    case 'invalid_type':
      if (!hasInput) return 'required field is missing';
      if (typeof issue.input === 'number' && !Number.isFinite(issue.input)) return `expected a finite number${got}${limitOf(issue.path.filter((k) => typeof k !== 'symbol'))}`;
      return `expected ${issue.expected === 'int' ? 'an integer' : issue.expected}${got}`;
    case 'too_small':
      if (issue.origin === 'array') return `expected at least ${issue.minimum} items`;
      if (issue.origin === 'string') return 'must not be empty';
      return `must be ${issue.inclusive ? '≥' : '>'} ${issue.minimum}${got}`;
    case 'too_big':
      if (issue.origin === 'array') return `expected at most ${issue.maximum} items`;
      return `must be ${issue.inclusive ? '≤' : '<'} ${issue.maximum}${got}`;
    case 'invalid_value':
      return `expected one of ${issue.values.map((v) => JSON.stringify(v)).join(', ')}${got}`;
    default:
      return `${issue.message}${got}`;
  }
}
