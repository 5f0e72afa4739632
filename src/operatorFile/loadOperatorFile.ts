/**
 * loadOperatorFile: reads an operator file (JSON, at most 64 MiB) from disk and validates it with parseOperatorFile
 * against the system register it is meant for.
 */
import { readFileSync, statSync } from 'node:fs';
import { InputError } from '../core/InputError.js';
import { MAX_MODEL_FILE_BYTES } from '../model/modelLimits.js';
import { parseOperatorFile, type OperatorFileOptions, type SystemRegister } from './parseOperatorFile.js';
import type { TargetOperator } from './TargetOperator.js';

/**
 * @throws InputError naming the file when it cannot be read, is too large or is not JSON (with the parser's
 *         position), and every problem parseOperatorFile finds (`file: field.path: problem`).
 */
export function loadOperatorFile(path: string, system: SystemRegister, options: OperatorFileOptions = {}): TargetOperator {
  let text: string;
  try {
    const stat = statSync(path);
    if (stat.isDirectory()) throw new InputError(`${path}: cannot read the operator file: is a directory`);
    if (stat.size > MAX_MODEL_FILE_BYTES) throw new InputError(`${path}: the operator file is larger than ${MAX_MODEL_FILE_BYTES / 2 ** 20} MiB`);
    text = readFileSync(path, 'utf8');
  } catch (error) {
    if (error instanceof InputError) throw error;
    const code = (error as NodeJS.ErrnoException).code;
    throw new InputError(`${path}: cannot read the operator file: ${code === 'ENOENT' ? 'no such file' : (error as Error).message}`);
  }
  let data: unknown;
  try {
    data = JSON.parse(text.startsWith('\uFEFF') ? text.slice(1) : text);
  } catch (error) {
    throw new InputError(`${path}: invalid JSON: ${(error as Error).message}`);
  }
  return parseOperatorFile(data, path, system, options);
}
