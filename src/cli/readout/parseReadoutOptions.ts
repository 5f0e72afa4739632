/**
 * Option parsers of the readout commands (estimate, build): --pair i,j, --z re,im (options.ts), --route, each throwing an
 * InputError that names the option and the value it got.
 */
import { InputError } from '../../core/InputError.js';
import type { ComplexScalar } from '../../linalg/ComplexScalar.js';
import { parseComplexOption } from '../options.js';

export type Route = 'preconditioned' | 'direct';

/** `--pair i,j` with 0 ≤ i, j < modes. */
export function parsePair(text: string, modes: number): [number, number] {
  const match = /^\s*(\d+)\s*,\s*(\d+)\s*$/.exec(text);
  if (match === null) throw new InputError(`--pair must be two mode indices "i,j", got "${text}"`);
  const pair: [number, number] = [Number(match[1]), Number(match[2])];
  if (pair.some((m) => m >= modes)) throw new InputError(`--pair ${pair.join(',')} is out of range: the model has modes 0…${modes - 1}`);
  return pair;
}

/** `--z re,im` (or `a+bi`) with im > 0. */
export function parseComplexZ(text: string): ComplexScalar {
  return parseComplexOption('--z', text, true);
}

export function parseRoute(text: string): Route {
  if (text === 'preconditioned' || text === 'direct') return text;
  throw new InputError(`--route must be "preconditioned" or "direct", got "${text}"`);
}
