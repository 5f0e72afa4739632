/**
 * writeFileAtomic: write a whole file or nothing, by writing a sibling temp file and renaming it,
 * so that a failure never leaves a half-written output behind.
 */
import { renameSync, rmSync, writeFileSync } from 'node:fs';
import { dirname } from 'node:path';
import { ensureDirectory } from './ensureDirectory.js';
import { InputError, isInputError } from './InputError.js';
import { holdTemporaryPath, releaseTemporaryPath } from './temporaryPaths.js';

/** @throws InputError naming the path when it cannot be written (permissions, missing device, …). */
export function writeFileAtomic(path: string, content: string | Uint8Array): void {
  ensureDirectory(dirname(path));
  const temp = `${path}.${process.pid}.tmp`;
  holdTemporaryPath(temp);
  try {
    writeFileSync(temp, content);
    renameSync(temp, path);
  } catch (error) {
    rmSync(temp, { force: true });
    if (isInputError(error)) throw error;
    throw new InputError(`cannot write "${path}": ${(error as Error).message}`);
  } finally {
    releaseTemporaryPath(temp);
  }
}
