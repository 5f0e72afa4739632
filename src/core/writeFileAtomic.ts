/**
 * writeFileAtomic: write a whole file or nothing, by writing a sibling temp file and renaming it,
 * so that a failure never leaves a half-written output behind.
 */
import { mkdirSync, renameSync, rmSync, writeFileSync } from 'node:fs';
import { dirname } from 'node:path';
import { InputError } from './InputError.js';

/** @throws InputError naming the path when it cannot be written (permissions, missing device, …). */
export function writeFileAtomic(path: string, content: string | Uint8Array): void {
  const temp = `${path}.${process.pid}.tmp`;
  try {
    mkdirSync(dirname(path), { recursive: true });
    writeFileSync(temp, content);
    renameSync(temp, path);
  } catch (error) {
    rmSync(temp, { force: true });
    throw new InputError(`cannot write "${path}": ${(error as Error).message}`);
  }
}
