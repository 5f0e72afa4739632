/**
 * Option parsers shared by the commands: each turns a string into a checked value or throws an
 * InputError that names the option and the value it got.
 */
import { InputError } from '../core/InputError.js';

export function parseNonNegativeInteger(option: string, text: string): number {
  if (!/^\d+$/.test(text.trim())) {
    throw new InputError(`${option} must be a non-negative integer, got "${text}"`);
  }
  const value = Number(text);
  if (!Number.isSafeInteger(value)) throw new InputError(`${option} is too large: "${text}"`);
  return value;
}

export function parsePositiveInteger(option: string, text: string): number {
  const value = parseNonNegativeInteger(option, text);
  if (value === 0) throw new InputError(`${option} must be at least 1, got "${text}"`);
  return value;
}

export function parseFiniteNumber(option: string, text: string): number {
  const trimmed = text.trim();
  const value = trimmed === '' ? Number.NaN : Number(trimmed);
  if (!Number.isFinite(value)) throw new InputError(`${option} must be a finite number, got "${text}"`);
  return value;
}

export function parsePositiveNumber(option: string, text: string): number {
  const value = parseFiniteNumber(option, text);
  if (!(value > 0)) throw new InputError(`${option} must be greater than 0, got "${text}"`);
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
