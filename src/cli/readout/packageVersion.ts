/** packageVersion: the version field of polewright's package.json (three folders up from dist/cli/readout or src/cli/readout). */
import { readFileSync } from 'node:fs';

export function packageVersion(): string {
  const text = readFileSync(new URL('../../../package.json', import.meta.url), 'utf8');
  return (JSON.parse(text) as { version: string }).version;
}
