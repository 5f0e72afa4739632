// loadModelFile: reads a JSON model file from disk and parses it with parseModel.
import { readFileSync } from 'node:fs';
import { InputError } from '../core/InputError.js';
import type { FermionModel } from './FermionModel.js';
import { locateJsonError } from './internal/locateJsonError.js';
import { parseModel } from './parseModel.js';

/**
 * Reads and validates a model file (explicit, Hubbard or Anderson-impurity form).
 *
 * @throws InputError when the file cannot be read (naming it), is not valid JSON (with line and column,
 *         `file:line:column: invalid JSON: reason`), or fails parseModel.
 */
export function loadModelFile(path: string): FermionModel {
  let text: string;
  try {
    text = readFileSync(path, 'utf8');
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code;
    const why = code === 'ENOENT' ? 'no such file' : code === 'EISDIR' ? 'is a directory' : (error as Error).message;
    throw new InputError(`${path}: cannot read the model file: ${why}`);
  }
  if (text.startsWith('\uFEFF')) text = text.slice(1);
  let data: unknown;
  try {
    data = JSON.parse(text);
  } catch {
    const where = locateJsonError(text) ?? { line: 1, column: 1, reason: 'not valid JSON' };
    throw new InputError(`${path}:${where.line}:${where.column}: invalid JSON: ${where.reason}`);
  }
  return parseModel(data, path);
}
