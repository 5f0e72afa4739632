/**
 * Option parsers shared by the commands: each turns a string into a checked value or throws an
 * InputError that names the option and the value it got.
 */
import { InputError } from '../core/InputError.js';

/** What an unparsable or out-of-range number was: the text as written, and why a finite-looking one is out of reach. */
function written(text: string): string {
  const value = Number(text.trim());
  const beyond = text.trim() !== '' && Number.isNaN(value) === false && !Number.isFinite(value) ? ' (beyond the double range, ±1.8e308)' : '';
  return `"${text}"${beyond}`;
}

/**
 * A whole number from `min` to `max` (both inclusive; max at most 2^53 − 1, the default), written in decimal
 * digits. The message states the range and what was written: `--shots must be a whole number from 1 to
 * 1000000000, got "-1"`; without a stated max, a value too small reads `--shots must be at least 1 (a whole
 * number), got "0"`.
 */
export function parseIntegerInRange(option: string, text: string, min: number, max?: number): number {
  const value = /^\d+$/.test(text.trim()) ? Number(text) : Number.NaN;
  const high = max ?? Number.MAX_SAFE_INTEGER;
  if (value >= min && value <= high) return value;
  if (max === undefined && !(value > high)) throw new InputError(`${option} must be at least ${min} (a whole number), got ${written(text)}`);
  throw new InputError(`${option} must be a whole number from ${min} to ${high}, got ${written(text)}`);
}

export function parseNonNegativeInteger(option: string, text: string, max?: number): number {
  return parseIntegerInRange(option, text, 0, max);
}

export function parsePositiveInteger(option: string, text: string, max?: number): number {
  return parseIntegerInRange(option, text, 1, max);
}

export function parseFiniteNumber(option: string, text: string): number {
  const trimmed = text.trim();
  const value = trimmed === '' ? Number.NaN : Number(trimmed);
  if (!Number.isFinite(value)) throw new InputError(`${option} must be a finite number, got ${written(text)}`);
  return value;
}

export function parsePositiveNumber(option: string, text: string): number {
  const value = parseFiniteNumber(option, text);
  if (!(value > 0)) throw new InputError(`${option} must be greater than 0, got "${text}"`);
  return value;
}

/** A number from `min` to `max` (both inclusive); the message states the range and what was written. */
export function parseNumberInRange(option: string, text: string, min: number, max: number): number {
  const trimmed = text.trim();
  const value = trimmed === '' ? Number.NaN : Number(trimmed);
  if (!(value >= min && value <= max)) throw new InputError(`${option} must lie from ${min} to ${max}, got ${written(text)}`);
  return value;
}

const UNSIGNED = String.raw`(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?`;
/** a, a±bi, a±i, bi, ±i (spaces allowed around the sign). */
const ALGEBRAIC = new RegExp(String.raw`^(?:([+-]?${UNSIGNED})(?:\s*([+-])\s*(${UNSIGNED})?\s*i)?|([+-]?)\s*(${UNSIGNED})?\s*i)$`);

/**
 * A complex number written `re,im` or `a+bi` (also `a-bi`, `bi`, `a`, `i`, `-i`) → { re, im }, both finite;
 * with `upperHalfPlane`, im > 0 is required (z = ω + iη, η > 0).
 */
export function parseComplexOption(option: string, text: string, upperHalfPlane = false): { re: number; im: number } {
  const trimmed = text.trim();
  let re: number;
  let im: number;
  if (trimmed.includes(',')) {
    const parts = trimmed.split(',');
    [re, im] = parts.map((p) => (p.trim() === '' ? Number.NaN : Number(p))) as [number, number];
    if (parts.length !== 2) re = Number.NaN;
  } else {
    const m = ALGEBRAIC.exec(trimmed);
    if (m === null) {
      re = Number.NaN;
      im = Number.NaN;
    } else if (m[1] !== undefined) {
      re = Number(m[1]);
      im = m[2] === undefined ? 0 : (m[2] === '-' ? -1 : 1) * Number(m[3] ?? '1');
    } else {
      re = 0;
      im = (m[4] === '-' ? -1 : 1) * Number(m[5] ?? '1');
    }
  }
  if (!Number.isFinite(re) || !Number.isFinite(im)) {
    throw new InputError(`${option} must be a complex number "re,im" or "a+bi" with finite parts, got "${text}"`);
  }
  if (upperHalfPlane && !(im > 0)) {
    throw new InputError(`${option} needs a positive imaginary part (z = ω + iη, η > 0), got "${text}"`);
  }
  return { re, im };
}

/**
 * Most shots any sampling option accepts (`run --shots`, `estimate --shots`): 10^9, under a minute when an exact
 * distribution is sampled; shot-by-shot trajectories take longer and show progress.
 */
export const MAX_SHOTS = 1_000_000_000;
