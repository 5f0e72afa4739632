/**
 * writeFolderAtomic: write a set of files as one consistent folder, or nothing. The files go to a temporary sibling
 * folder that then replaces the target in two renames, so a rerun never leaves stale files from an earlier run beside new
 * ones, and a failure or an interruption leaves the earlier folder as it was. With `onlyReplace`, an existing folder is
 * replaced only when it holds nothing but entries of those names (an earlier run's output), so a user's files are never
 * removed; `checkFolderReplaceable` makes the same check up front, before a long computation.
 */
import { existsSync, readdirSync, renameSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { basename, dirname, join, resolve } from 'node:path';
import { ensureDirectory } from './ensureDirectory.js';
import { InputError, isInputError } from './InputError.js';
import { holdTemporaryPath, releaseTemporaryPath } from './temporaryPaths.js';

export interface FolderWriteResult {
  /** True when an existing folder was replaced. */
  readonly replaced: boolean;
}

export interface FolderWriteOptions {
  /** The option or field that named the folder (e.g. "--out"); messages start with it. */
  readonly label?: string;
  /** Top-level entry names this writer may replace; an existing folder holding any other entry is refused. */
  readonly onlyReplace?: readonly string[];
}

/** The top-level entry names of a file map (the first segment of each name): the `onlyReplace` of a writer of `files`. */
export function topLevelNames(files: ReadonlyMap<string, unknown>): string[] {
  return [...new Set([...files.keys()].map((name) => name.split('/')[0]!))];
}

function prefix(options: FolderWriteOptions): string {
  return options.label === undefined ? '' : `${options.label}: `;
}

/**
 * Refuses, as an InputError naming `options.label`, a path that is not valid (a NUL byte), that exists and is not a
 * folder, or (with `onlyReplace`) a folder holding entries of other names.
 */
export function checkFolderReplaceable(folder: string, options: FolderWriteOptions = {}): void {
  if (folder.includes('\0')) throw new InputError(`${prefix(options)}"${JSON.stringify(folder).slice(1, -1)}" is not a valid path: it contains a NUL byte`);
  const target = resolve(folder);
  if (!existsSync(target)) return;
  if (!statSync(target).isDirectory()) throw new InputError(`${prefix(options)}cannot write folder "${folder}": it exists and is not a folder`);
  if (options.onlyReplace === undefined) return;
  const ours = new Set(options.onlyReplace);
  const others = readdirSync(target).filter((name) => !ours.has(name));
  if (others.length > 0) {
    const shown = others.slice(0, 3).join(', ') + (others.length > 3 ? ', …' : '');
    throw new InputError(
      `${prefix(options)}"${folder}" holds files this command does not write (${shown}); the folder is replaced whole, ` +
        'so give a new folder or one an earlier run of this command wrote',
    );
  }
}

/**
 * @param files name (may contain `/` for sub-folders) → content
 * @throws InputError naming the folder (after `options.label`) when it cannot be written or is refused by
 *   checkFolderReplaceable; RangeError when a file name leaves the folder.
 */
export function writeFolderAtomic(
  folder: string,
  files: ReadonlyMap<string, string | Uint8Array>,
  options: FolderWriteOptions = {},
): FolderWriteResult {
  checkFolderReplaceable(folder, options);
  const target = resolve(folder);
  const parent = dirname(target);
  try {
    ensureDirectory(parent);
  } catch (error) {
    if (isInputError(error)) throw new InputError(`${prefix(options)}${error.message}`);
    throw error;
  }
  const replaced = existsSync(target);
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
    if (error instanceof RangeError) throw error;
    const reason = isInputError(error) ? error.message : `cannot write folder "${folder}": ${(error as Error).message}`;
    throw new InputError(`${prefix(options)}${reason}`);
  } finally {
    releaseTemporaryPath(temp);
  }
}
