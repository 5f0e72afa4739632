/**
 * fuzz-cli: runs the seeded fuzz corpus of the `polewright` CLI (test/fuzz/mutateInput.ts, from the seed files in
 * circuits/) in-process on worker threads, prints counts per class and per command, lists every internal error,
 * timeout and memory case with the folder holding its input and replay command, and exits 1 if there is any.
 *
 *   npx tsx scripts/fuzz-cli.ts [count = 10000] [seed = 1] [--workers N] [--memory-limit BYTES]
 */
import { fileURLToPath } from 'node:url';
import { FAILURE_CLASSES, FUZZ_CLASSES, runFuzzCorpus, type FuzzResult } from '../test/fuzz/runFuzzCorpus.js';

function numberArgument(name: string, text: string | undefined, fallback: number): number {
  if (text === undefined) return fallback;
  const value = Number(text);
  if (!Number.isSafeInteger(value) || value < 0) throw new RangeError(`fuzz-cli: ${name} must be a non-negative integer, got "${text}"`);
  return value;
}

const positional = process.argv.slice(2).filter((arg, k, all) => !arg.startsWith('--') && !all[k - 1]?.startsWith('--'));
const flag = (name: string): string | undefined => {
  const at = process.argv.indexOf(name);
  return at < 0 ? undefined : process.argv[at + 1];
};
const count = numberArgument('count', positional[0], 10_000);
const corpusSeed = numberArgument('seed', positional[1], 1);
const workers = numberArgument('--workers', flag('--workers'), 2);
const memoryLimit = numberArgument('--memory-limit', flag('--memory-limit'), 256 * 2 ** 20);

const started = performance.now();
const summary = await runFuzzCorpus({
  circuitsFolder: fileURLToPath(new URL('../circuits', import.meta.url)),
  corpusSeed,
  count,
  workers,
  memoryLimit,
  onResult: (result, done) => {
    if (FAILURE_CLASSES.includes(result.fuzzClass)) {
      process.stderr.write(`\n#${result.input.index} ${result.input.command}: ${result.fuzzClass}: ${result.stderr.trim().split('\n').pop()}\n`);
    }
    if (done % 250 === 0) process.stderr.write(`${done}/${count} inputs, ${((performance.now() - started) / 1000).toFixed(0)} s\r`);
  },
});

const table = (rows: readonly (readonly string[])[]): string => {
  const widths = rows[0]!.map((_, c) => Math.max(...rows.map((row) => row[c]!.length)));
  return rows.map((row) => row.map((cell, c) => (c === 0 ? cell.padEnd(widths[c]!) : cell.padStart(widths[c]!))).join('  ')).join('\n');
};
const countOf = (results: readonly FuzzResult[], fuzzClass: string): string => String(results.filter((r) => r.fuzzClass === fuzzClass).length);
const byCommand = summary.commands
  .map((command) => [command, summary.results.filter((r) => r.input.command === command)] as const)
  .filter(([, results]) => results.length > 0);
process.stdout.write(
  `\nfuzz corpus: ${summary.results.length} inputs, seed ${corpusSeed}, ${workers} workers, ` +
    `POLEWRIGHT_MEMORY_LIMIT ${memoryLimit} bytes, ${(summary.milliseconds / 1000).toFixed(1)} s\n\n` +
    `${table([
      ['command', 'inputs', ...FUZZ_CLASSES],
      ...byCommand.map(([command, results]) => [command, String(results.length), ...FUZZ_CLASSES.map((c) => countOf(results, c))]),
      ['total', String(summary.results.length), ...FUZZ_CLASSES.map((c) => countOf(summary.results, c))],
    ])}\n`,
);
const failures = summary.results.filter((r) => FAILURE_CLASSES.includes(r.fuzzClass));
for (const failure of failures) {
  process.stdout.write(
    `\n#${failure.input.index} ${failure.input.command} ${failure.fuzzClass} (${Math.round(failure.milliseconds)} ms)\n` +
      `  input: ${failure.input.description.join('; ')}\n  message: ${failure.stderr.trim().split('\n').pop()}\n  replay: ${failure.savedTo}/replay.sh\n`,
  );
}
process.stdout.write(failures.length === 0 ? '\nno internal errors, timeouts or memory overruns\n' : `\n${failures.length} failures, inputs under ${summary.saveFolder}\n`);
process.exitCode = failures.length === 0 ? 0 : 1;
