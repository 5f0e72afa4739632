/**
 * writeFolderAtomic: writes a whole output folder or nothing — every file into a sibling temp folder, then one rename
 * onto the target, so an error never leaves a half-written folder behind. An existing target is replaced only when it
 * is empty or holds nothing but entries the new folder also has (a previous run's output); anything else is refused,
 * so a user's files are never removed.
 */
import { existsSync, mkdirSync, readdirSync, renameSync, rmSync, statSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { InputError } from '../../core/InputError.js';
import { writeFileAtomic } from '../../core/writeFileAtomic.js';

/** Refuses a target that is not a folder or that holds entries the new folder would not have. */
function checkReplaceable(dir: string, target: string, files: ReadonlyMap<string, string>): void {
  if (!existsSync(target)) return;
  if (!statSync(target).isDirectory()) throw new InputError(`--out: "${dir}" exists and is not a folder`);
  const ours = new Set([...files.keys()].map((name) => name.split('/')[0]!));
  const foreign = readdirSync(target).filter((name) => !ours.has(name));
  if (foreign.length > 0) {
    throw new InputError(`--out: "${dir}" already holds other files (${foreign.slice(0, 3).join(', ')}${foreign.length > 3 ? ', …' : ''}); choose a new or empty folder`);
  }
}

/** `files` maps relative paths (may contain "/") to contents. @throws InputError naming the folder when it cannot be written. */
export function writeFolderAtomic(dir: string, files: ReadonlyMap<string, string>): void {
  const target = resolve(dir);
  checkReplaceable(dir, target, files);
  const temp = `${target}.${process.pid}.tmp`;
  const aside = `${target}.${process.pid}.old`;
  try {
    mkdirSync(dirname(target), { recursive: true });
    rmSync(temp, { recursive: true, force: true });
    mkdirSync(temp);
    for (const [name, content] of files) writeFileAtomic(join(temp, name), content);
    const replacing = existsSync(target);
    if (replacing) renameSync(target, aside);
    renameSync(temp, target);
    if (replacing) rmSync(aside, { recursive: true, force: true });
  } catch (error) {
    rmSync(temp, { recursive: true, force: true });
    if (existsSync(aside) && !existsSync(target)) renameSync(aside, target);
    throw new InputError(`--out: cannot write the folder "${dir}": ${(error as Error).message}`);
  }
}
