// bench-cost: wall time and peak memory of `polewright cost` (both routes, table output) for Hubbard chains of 8 … 256
// sites (U = 4, t = 1, half filling, η = 0.1), each size in a fresh process: wall seconds, CPU seconds (user + system,
// steadier than wall time on a shared machine) and peak resident memory. Targets: 64 sites ≤ 2 s and ≤ 1 GiB.
// Run with `npx tsx scripts/bench-cost.ts [sizes…]` after `npm run build`.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';

const ENTRY = fileURLToPath(new URL('../dist/cli/main.js', import.meta.url));
const sizes = process.argv.slice(2).map(Number);
const dir = mkdtempSync(join(tmpdir(), 'bench-cost-'));

console.log('sites  modes  seconds  cpu s  peak MiB  status');
for (const sites of sizes.length > 0 ? sizes : [8, 16, 32, 64, 128, 256]) {
  const file = join(dir, `chain${sites}.json`);
  writeFileSync(file, JSON.stringify({ lattice: { shape: 'chain', sites, hopping: 1 }, interaction: 4, electrons: sites, broadening: 0.1 }));
  const start = process.hrtime.bigint();
  const run = spawnSync('/usr/bin/time', ['-f', '%U %S %M', process.execPath, ENTRY, 'cost', file, '--json'], { encoding: 'utf8', maxBuffer: 1 << 26 });
  const seconds = Number(process.hrtime.bigint() - start) / 1e9;
  const [user, system, peakKiB] = run.stderr.trim().split('\n').at(-1)!.split(' ').map(Number) as [number, number, number];
  console.log(`${String(sites).padStart(5)}  ${String(2 * sites).padStart(5)}  ${seconds.toFixed(2).padStart(7)}  ${(user + system).toFixed(2).padStart(5)}  ${(peakKiB / 1024).toFixed(0).padStart(8)}  ${run.status === 0 ? 'ok' : `exit ${run.status}`}`);
}
