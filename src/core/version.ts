/**
 * version: the tool's version, read once from package.json (two folders up from both src/core and
 * dist/core), so `polewright --version` and every JSON output say the same.
 */
import { readFileSync } from 'node:fs';

function readVersion(): string {
  const text = readFileSync(new URL('../../package.json', import.meta.url), 'utf8');
  const version = (JSON.parse(text) as { version?: unknown }).version;
  if (typeof version !== 'string') throw new RangeError('version: package.json has no "version" string');
  return version;
}

/** The "version" field of package.json, e.g. "0.1.0". */
export const VERSION: string = readVersion();
