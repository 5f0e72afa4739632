// A reader that closes stdout early (`… --json | head -c 50`) must end the command quietly: no stack trace, no internal error.
import { spawn } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

const ENTRY = fileURLToPath(new URL('../../dist/cli/main.js', import.meta.url));
const MODEL = fileURLToPath(new URL('../../circuits/hubbard-dimer.json', import.meta.url));

describe('polewright with a closed stdout', () => {
  it('exact --json (megabytes of output) piped into a reader that stops after 50 bytes exits quietly', async () => {
    const child = spawn(process.execPath, [ENTRY, 'exact', MODEL, '--json', '--grid', '-6:6:20001'], { stdio: ['ignore', 'pipe', 'pipe'] });
    let stderr = '';
    child.stderr.on('data', (chunk: Buffer) => (stderr += chunk.toString()));
    let received = 0;
    child.stdout.on('data', (chunk: Buffer) => {
      received += chunk.length;
      if (received >= 50) child.stdout.destroy();
    });
    const code = await new Promise<number | null>((done) => child.on('close', (status) => done(status)));
    expect(stderr).not.toMatch(/internal error|EPIPE|at .*\.js/);
    expect(code).toBe(0);
  });
});
