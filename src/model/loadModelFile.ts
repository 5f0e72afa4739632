// loadModelFile: reads a JSON model file from disk (at most MAX_MODEL_FILE_BYTES) and parses it with parseModel.
import { closeSync, fstatSync, openSync, readSync } from 'node:fs';
import { InputError } from '../core/InputError.js';
import type { FermionModel } from './FermionModel.js';
import { findDuplicateKey } from './internal/findDuplicateKey.js';
import { locateJsonError } from './internal/locateJsonError.js';
import { MAX_MODEL_FILE_BYTES } from './modelLimits.js';
import { parseModel } from './parseModel.js';

/**
 * Reads and validates a model file (explicit, Hubbard, Anderson-impurity or continuum form).
 *
 * @throws InputError when the file cannot be read (naming it), is larger than MAX_MODEL_FILE_BYTES
 *         (a regular file by its size, anything else — a device, a pipe — after reading that much),
 *         is not valid JSON or repeats a key in one object (with line and column,
 *         `file:line:column: invalid JSON: reason`), or fails parseModel.
 */
export function loadModelFile(path: string): FermionModel {
  let text = readLimited(path);
  if (text.startsWith('\uFEFF')) text = text.slice(1);
  let data: unknown;
  try {
    data = JSON.parse(text);
  } catch {
    const where = locateJsonError(text) ?? { line: 1, column: 1, reason: 'not valid JSON' };
    throw new InputError(`${path}:${where.line}:${where.column}: invalid JSON: ${where.reason}`);
  }
  const duplicate = findDuplicateKey(text);
  if (duplicate !== undefined) throw new InputError(`${path}:${duplicate.line}:${duplicate.column}: invalid model file: ${duplicate.reason}`);
  return parseModel(data, path);
}

function readLimited(path: string): string {
  const tooLarge = (): InputError =>
    new InputError(`${path}: the model file is larger than ${MAX_MODEL_FILE_BYTES / 2 ** 20} MiB, the most a model file may be`);
  let fd: number;
  try {
    fd = openSync(path, 'r');
  } catch (error) {
    throw unreadable(path, error);
  }
  try {
    const stat = fstatSync(fd);
    if (stat.isDirectory()) throw new InputError(`${path}: cannot read the model file: is a directory`);
    if (stat.isFile() && stat.size > MAX_MODEL_FILE_BYTES) throw tooLarge();
    // A regular file's size is known; anything else grows the buffer by doubling up to the limit.
    let buffer = Buffer.allocUnsafe(stat.isFile() ? stat.size + 1 : 1 << 16);
    let filled = 0;
    for (;;) {
      if (filled === buffer.length) {
        const larger = Buffer.allocUnsafe(Math.min(2 * buffer.length, MAX_MODEL_FILE_BYTES + 1));
        buffer.copy(larger, 0, 0, filled);
        buffer = larger;
      }
      const read = readSync(fd, buffer, filled, buffer.length - filled, null);
      if (read === 0) break;
      filled += read;
      if (filled > MAX_MODEL_FILE_BYTES) throw tooLarge();
    }
    return buffer.toString('utf8', 0, filled);
  } catch (error) {
    if (error instanceof InputError) throw error;
    throw unreadable(path, error);
  } finally {
    closeSync(fd);
  }
}

function unreadable(path: string, error: unknown): InputError {
  const code = (error as NodeJS.ErrnoException).code;
  const why = code === 'ENOENT' ? 'no such file' : code === 'EISDIR' ? 'is a directory' : (error as Error).message;
  return new InputError(`${path}: cannot read the model file: ${why}`);
}
