/**
 * mutateJson: one JSON-aware mutation of a model or operator file — drop, duplicate or rename a key, change a value's
 * type, put an extreme number (0, −1, ±1e308, 1e400 written as text, NaN-like text), a huge array, deep nesting,
 * unicode, or a key duplicated in the raw text. Returns the new file text and a short name of the mutation.
 */
import type { FuzzRandom } from './fuzzRandom.js';

type Json = null | boolean | number | string | Json[] | { [key: string]: Json };

export interface Mutation {
  readonly text: string;
  readonly name: string;
}

/** Values JSON can hold directly, chosen to sit on the edges of what a model field accepts. */
const EXTREME_VALUES: readonly Json[] = [
  0, -1, 1, 2, 0.5, -0.5, 1e308, -1e308, 5e-324, 2 ** 31, 2 ** 53, -(2 ** 53), 1e9, 64, 65, 1000,
  '', '1', 'NaN', 'Infinity', 'ring', 'chain', '\u0000', 'ü∂∑🙂', null, true, false, [], {}, [0], [[0, 0, 1]],
];

/** Number-like text that JSON.stringify cannot produce: overflow, NaN and friends, hex, leading zeros. */
const RAW_NUMBERS: readonly string[] = ['1e400', '-1e400', 'NaN', 'Infinity', '-Infinity', '0x10', '007', '1.', '.5', '1e', '--1', '1_000', '4.9e-325'];

/** Paths are followed this deep at most: a file nested deeper by an earlier mutation is not walked to the bottom. */
const DEEPEST_PATH = 40;

/** Only the first items of an array are walked: a huge array from an earlier mutation would make walking slow. */
const WIDEST_WALK = 50;

/** A file longer than this (after a huge-array mutation) gets raw-text mutations only, which are cheap. */
const LONGEST_STRUCTURAL = 2 ** 20;

/** Every path to a value inside the document up to DEEPEST_PATH, the root included. */
function paths(value: Json, prefix: (string | number)[] = [], out: (string | number)[][] = []): (string | number)[][] {
  out.push(prefix);
  if (prefix.length >= DEEPEST_PATH) return out;
  if (Array.isArray(value)) value.slice(0, WIDEST_WALK).forEach((item, k) => paths(item, [...prefix, k], out));
  else if (value !== null && typeof value === 'object') for (const key of Object.keys(value)) paths(value[key]!, [...prefix, key], out);
  return out;
}

function valueAt(root: Json, path: readonly (string | number)[]): Json {
  let node: Json = root;
  for (const step of path) node = (node as Record<string | number, Json>)[step]!;
  return node;
}

/** Replaces the value at a non-empty path (or returns `replacement` for the root). */
function withValue(root: Json, path: readonly (string | number)[], replacement: Json): Json {
  if (path.length === 0) return replacement;
  const copy = structuredClone(root);
  const parent = valueAt(copy, path.slice(0, -1)) as Record<string | number, Json>;
  parent[path[path.length - 1]!] = replacement;
  return copy;
}

/** Stands in for a value written into the text afterwards (nesting too deep for JSON.stringify, or a huge array). */
const PLACEHOLDER = '\u0001nested\u0001';

function structural(random: FuzzRandom, root: Json): Mutation {
  const all = paths(root);
  const path = random.pick(all);
  const target = valueAt(root, path);
  const kind = random.int(9);
  if (kind === 0 && target !== null && typeof target === 'object' && !Array.isArray(target)) {
    const keys = Object.keys(target);
    if (keys.length > 0) {
      const key = random.pick(keys);
      const { [key]: _dropped, ...rest } = target;
      return { text: JSON.stringify(withValue(root, path, rest)), name: `drop key ${key}` };
    }
  }
  if (kind === 1 && target !== null && typeof target === 'object' && !Array.isArray(target)) {
    const keys = Object.keys(target);
    if (keys.length > 0) {
      const key = random.pick(keys);
      const renamed = random.pick([`${key}s`, key.toUpperCase(), `${key} `, `_${key}`, 'extra', '__proto__', 'constructor']);
      const copy: Record<string, Json> = {};
      for (const [k, v] of Object.entries(target)) copy[k === key ? renamed : k] = v;
      return { text: JSON.stringify(withValue(root, path, copy)), name: `rename key ${key}` };
    }
  }
  if (kind === 2 && Array.isArray(target) && target.length > 0) {
    const copy = [...target];
    const at = random.int(copy.length);
    if (random.chance(0.5)) copy.splice(at, 0, structuredClone(copy[at]!));
    else copy.splice(at, 1);
    return { text: JSON.stringify(withValue(root, path, copy)), name: 'duplicate or delete an array item' };
  }
  if (kind === 3) {
    const length = random.pick([1000, 100_000, 1_000_000]);
    const item = JSON.stringify(Array.isArray(target) && target.length > 0 ? target[0]! : random.pick(EXTREME_VALUES));
    const huge = `[${new Array<string>(length).fill(item).join(',')}]`;
    return { text: JSON.stringify(withValue(root, path, PLACEHOLDER)).replace(JSON.stringify(PLACEHOLDER), () => huge), name: `huge array (${length})` };
  }
  if (kind === 4) {
    const depth = random.pick([50, 1000, 20_000]);
    const nested = `${'['.repeat(depth)}${JSON.stringify(target)}${']'.repeat(depth)}`;
    return { text: JSON.stringify(withValue(root, path, PLACEHOLDER)).replace(JSON.stringify(PLACEHOLDER), () => nested), name: `deep nesting (${depth})` };
  }
  if (kind === 5 && typeof target === 'number') {
    const scaled = random.pick([target * 1e6, -target, target + 0.5, Math.round(target * 1000) + 1, target * 1e-12]);
    return { text: JSON.stringify(withValue(root, path, scaled)), name: 'scaled number' };
  }
  const replacement = random.pick(EXTREME_VALUES);
  return { text: JSON.stringify(withValue(root, path, replacement)), name: `value ${JSON.stringify(replacement)}` };
}

/** Raw-text mutations look for numbers and keys in this much of the text only (a huge array holds millions). */
const SEARCHED_PREFIX = 65536;

/** Mutations only expressible in the raw text: overflowing or non-JSON numbers and duplicated keys. */
function rawText(random: FuzzRandom, text: string): Mutation {
  if (random.chance(0.5)) {
    const numbers = [...text.slice(0, SEARCHED_PREFIX).matchAll(/-?\d+(?:\.\d+)?(?:[eE][+-]?\d+)?/g)];
    if (numbers.length > 0) {
      const match = random.pick(numbers);
      const replacement = random.pick(RAW_NUMBERS);
      return { text: text.slice(0, match.index) + replacement + text.slice(match.index + match[0].length), name: `raw number ${replacement}` };
    }
  }
  const keys = [...text.slice(0, SEARCHED_PREFIX).matchAll(/"([^"\\]+)"\s*:/g)];
  if (keys.length === 0) return { text: `${text}}`, name: 'unbalanced brace' };
  const match = random.pick(keys);
  const duplicate = `"${match[1]}": ${random.pick(['0', '-1', '"x"', 'null', '[]', '1e308'])}, `;
  return { text: text.slice(0, match.index) + duplicate + text.slice(match.index), name: `duplicated key ${match[1]}` };
}

export function mutateJson(random: FuzzRandom, text: string): Mutation {
  if (text.length > LONGEST_STRUCTURAL) return rawText(random, text);
  let root: Json;
  try {
    root = JSON.parse(text) as Json;
  } catch {
    return rawText(random, text);
  }
  if (random.chance(0.2)) return rawText(random, text);
  try {
    return structural(random, root);
  } catch (error) {
    // A document nested too deeply for structuredClone or JSON.stringify gets a raw-text mutation instead.
    if (error instanceof RangeError) return rawText(random, text);
    throw error;
  }
}
