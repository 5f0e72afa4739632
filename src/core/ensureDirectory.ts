/**
 * ensureDirectory: creates a folder and its missing parents one level at a time. Node 20's recursive mkdir can loop
 * forever below pseudo file systems such as /proc; walking the path ourselves fails fast with a clear message instead.
 */
import { mkdirSync, statSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import { InputError } from './InputError.js';

/** @throws InputError naming the folder when it (or a parent) cannot be created or is not a folder. */
export function ensureDirectory(path: string): void {
  const missing: string[] = [];
  let current = resolve(path);
  for (;;) {
    let stats;
    try {
      stats = statSync(current);
    } catch {
      missing.push(current);
      const parent = dirname(current);
      if (parent === current) break;
      current = parent;
      continue;
    }
    if (!stats.isDirectory()) throw new InputError(`cannot create folder "${path}": "${current}" is not a folder`);
    break;
  }
  for (const folder of missing.reverse()) {
    try {
      mkdirSync(folder);
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code === 'EEXIST' && statSync(folder).isDirectory()) continue;
      throw new InputError(`cannot create folder "${path}": ${(error as Error).message}`);
    }
  }
}
