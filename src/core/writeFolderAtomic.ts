/**
 * writeFolderAtomic: write a set of files as one consistent folder, or nothing. The files go to a temporary sibling
 * folder that then replaces the target in two renames, so a rerun never leaves stale files from an earlier run beside new
 * ones, and a failure or an interruption leaves the earlier folder as it was.
 */
import { existsSync, renameSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { basename, dirname, join, resolve } from 'node:path';
import { ensureDirectory } from './ensureDirectory.js';
import { InputError, isInputError } from './InputError.js';
import { holdTemporaryPath, releaseTemporaryPath } from './temporaryPaths.js';

export interface FolderWriteResult {
  /** True when an existing folder was replaced. */
  readonly replaced: boolean;
}

/**
 * @param files name (may contain `/` for sub-folders) → content
 * @throws InputError naming the folder when it cannot be written, or when `folder` exists and is not a folder.
 */
export function writeFolderAtomic(folder: string, files: ReadonlyMap<string, string | Uint8Array>): FolderWriteResult {
  const target = resolve(folder);
  const parent = dirname(target);
  ensureDirectory(parent);
  const replaced = existsSync(target);
  if (replaced && !statSync(target).isDirectory()) throw new InputError(`cannot write folder "${folder}": it exists and is not a folder`);
  const temp = join(parent, `.${basename(target)}.${process.pid}.tmp`);
  const old = join(parent, `.${basename(target)}.${process.pid}.old`);
  holdTemporaryPath(temp);
  try {
    rmSync(temp, { recursive: true, force: true });
    for (const [name, content] of files) {
      const path = join(temp, name);
      if (!resolve(path).startsWith(temp + '/')) throw new RangeError(`writeFolderAtomic: file name "${name}" leaves the folder`);
      ensureDirectory(dirname(path));
      writeFileSync(path, content);
    }
    if (replaced) renameSync(target, old);
    renameSync(temp, target);
    if (replaced) rmSync(old, { recursive: true, force: true });
    return { replaced };
  } catch (error) {
    rmSync(temp, { recursive: true, force: true });
    if (replaced && !existsSync(target) && existsSync(old)) renameSync(old, target);
    if (isInputError(error) || error instanceof RangeError) throw error;
    throw new InputError(`cannot write folder "${folder}": ${(error as Error).message}`);
  } finally {
    releaseTemporaryPath(temp);
  }
}
