/**
 * temporaryPaths: the temporary files and folders that atomic writers have in flight, removed when the process is
 * interrupted (SIGINT, SIGTERM) so that a killed run leaves no `*.tmp` behind.
 */
import { rmSync } from 'node:fs';

const inFlight = new Set<string>();
let handlersInstalled = false;

function removeAllAndExit(signal: NodeJS.Signals): void {
  for (const path of inFlight) rmSync(path, { recursive: true, force: true });
  inFlight.clear();
  // Conventional exit status for a process ended by a signal: 128 + its number.
  process.exit(128 + (signal === 'SIGINT' ? 2 : 15));
}

/** Records `path` as in flight until `release` is called with it. */
export function holdTemporaryPath(path: string): void {
  if (!handlersInstalled) {
    process.once('SIGINT', removeAllAndExit);
    process.once('SIGTERM', removeAllAndExit);
    handlersInstalled = true;
  }
  inFlight.add(path);
}

export function releaseTemporaryPath(path: string): void {
  inFlight.delete(path);
}
