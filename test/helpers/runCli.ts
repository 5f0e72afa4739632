// runCli: runs the built `polewright` entry (dist/cli/main.js, produced by the build step of `npm test`) as a child process.
import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';

const ENTRY = fileURLToPath(new URL('../../dist/cli/main.js', import.meta.url));

export interface CliResult {
  readonly status: number | null;
  readonly stdout: string;
  readonly stderr: string;
}

export function runCli(args: readonly string[], options: { cwd?: string } = {}): CliResult {
  const result = spawnSync(process.execPath, [ENTRY, ...args], { encoding: 'utf8', cwd: options.cwd, timeout: 120_000 });
  return { status: result.status, stdout: result.stdout, stderr: result.stderr };
}
