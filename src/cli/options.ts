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
