/**
 * runFuzzCorpus: runs inputs of the seeded fuzz corpus (mutateInput) through the `polewright` program in a pool of
 * worker threads — in-process speed, yet a stuck input can be stopped — and classifies each: ok, input error (exit 2),
 * reported failure (exit 1 from a failed check), internal error, timeout (no answer within the command's time limit;
 * the worker is then terminated and replaced) or memory (the worker's heap limit hit, or the process's resident memory
 * grew past POLEWRIGHT_MEMORY_LIMIT plus a runtime allowance while the input ran). The inputs of every internal error,
 * timeout and memory case are kept in a folder with the command line that replays them.
 */
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { Worker } from 'node:worker_threads';
import { loadFuzzSeeds, mutateInput, type FuzzInput } from './mutateInput.js';
import type { WorkerReply } from './fuzzWorkerBody.js';

export type FuzzClass = 'ok' | 'input-error' | 'reported-failure' | 'internal-error' | 'timeout' | 'memory';

export const FUZZ_CLASSES: readonly FuzzClass[] = ['ok', 'input-error', 'reported-failure', 'internal-error', 'timeout', 'memory'];

/** The classes the corpus must never produce. */
export const FAILURE_CLASSES: readonly FuzzClass[] = ['internal-error', 'timeout', 'memory'];

export interface FuzzResult {
  readonly input: FuzzInput;
  readonly fuzzClass: FuzzClass;
  readonly exitCode: number | null;
  readonly stderr: string;
  readonly error?: string;
  readonly milliseconds: number;
  /** Largest growth of the process's resident memory while the input ran (other workers' inputs included). */
  readonly peakRssGrowth: number;
  /** Folder holding the input and its replay command, for failures. */
  readonly savedTo?: string;
}

export interface FuzzRunOptions {
  readonly circuitsFolder: string;
  readonly corpusSeed: number;
  readonly count: number;
  readonly workers?: number;
  /** POLEWRIGHT_MEMORY_LIMIT given to the commands, in bytes (default 256 MiB). */
  readonly memoryLimit?: number;
  /** Per-command time limits in milliseconds (defaults in DEFAULT_TIME_LIMITS). */
  readonly timeLimits?: Readonly<Record<string, number>>;
  /** Commands to fuzz (default: every registered command the corpus knows, demo excepted). */
  readonly commands?: readonly string[];
  /** Folder for failing inputs (default: a new folder under the system temp folder). */
  readonly saveFolder?: string;
  /** Called after every input. */
  readonly onResult?: (result: FuzzResult, done: number) => void;
}

export interface FuzzSummary {
  readonly results: readonly FuzzResult[];
  readonly commands: readonly string[];
  readonly saveFolder: string;
  readonly milliseconds: number;
}

export const DEFAULT_TIME_LIMITS: Readonly<Record<string, number>> = {
  run: 15_000,
  exact: 30_000,
  cost: 30_000,
  // The slowest valid check of a seed scenario (anderson-two-bath.json, four QSVT rows) takes 50–140 s on the loaded
  // 2-core machine: a limit below that would count a slow valid run as a hang.
  check: 240_000,
  estimate: 60_000,
  build: 60_000,
  verify: 30_000,
  demo: 600_000,
};

/** Resident memory a command may add beyond the stated limit: the runtime, parsed text, transient garbage. */
const RSS_ALLOWANCE = 192 * 2 ** 20;
/** Heap of a worker: the loaded program plus the stated limit plus the same allowance. */
const BASE_HEAP_MB = 256;

interface PoolWorker {
  worker?: Worker;
  busy?: { input: FuzzInput; folder: string; started: number; rssAtStart: number; peakRss: number; timer: NodeJS.Timeout; settle: (r: FuzzResult) => void };
}

function substitute(args: readonly string[], folder: string): string[] {
  return args.map((arg) =>
    arg.replaceAll('@INPUT', join(folder, 'input')).replaceAll('@SECOND', join(folder, 'operator.json')).replaceAll('@OUT', join(folder, 'out')),
  );
}

function writeInputFiles(input: FuzzInput, folder: string): void {
  mkdirSync(folder, { recursive: true });
  if (input.input !== undefined) writeFileSync(join(folder, 'input'), input.input.text);
  if (input.second !== undefined) writeFileSync(join(folder, 'operator.json'), input.second);
}

function saveFailure(result: FuzzResult, saveFolder: string, corpusSeed: number): string {
  const folder = join(saveFolder, `${String(result.input.index).padStart(6, '0')}-${result.input.command}-${result.fuzzClass}`);
  writeInputFiles(result.input, folder);
  const argv = substitute(result.input.args, folder);
  const shell = ['node', 'dist/cli/main.js', result.input.command, ...argv].map((a) => (/^[\w./:,=+-]+$/.test(a) ? a : `'${a.replaceAll("'", "'\\''")}'`));
  const report = {
    corpusSeed,
    index: result.input.index,
    class: result.fuzzClass,
    command: result.input.command,
    argv,
    description: result.input.description,
    exitCode: result.exitCode,
    stderr: result.stderr,
    error: result.error,
    milliseconds: Math.round(result.milliseconds),
    peakRssGrowth: result.peakRssGrowth,
  };
  writeFileSync(join(folder, 'replay.json'), `${JSON.stringify(report, null, 2)}\n`);
  writeFileSync(join(folder, 'replay.sh'), `POLEWRIGHT_MEMORY_LIMIT=268435456 ${shell.join(' ')}\n`);
  return folder;
}

export async function runFuzzCorpus(options: FuzzRunOptions): Promise<FuzzSummary> {
  const started = performance.now();
  const seeds = loadFuzzSeeds(options.circuitsFolder);
  const memoryLimit = options.memoryLimit ?? 256 * 2 ** 20;
  const timeLimits = { ...DEFAULT_TIME_LIMITS, ...options.timeLimits };
  const scratch = mkdtempSync(join(tmpdir(), 'polewright-fuzz-run-'));
  const saveFolder = options.saveFolder ?? mkdtempSync(join(tmpdir(), 'polewright-fuzz-failures-'));
  const heapMb = BASE_HEAP_MB + Math.ceil((memoryLimit + RSS_ALLOWANCE) / 2 ** 20);
  const workerCount = options.workers ?? 2;
  const pool: PoolWorker[] = [];
  let commands: ReadonlySet<string> = new Set();

  const finish = (slot: PoolWorker, fuzzClass: FuzzClass, reply: { exitCode: number | null; stderr: string; error?: string }): void => {
    const busy = slot.busy;
    if (busy === undefined) return;
    clearTimeout(busy.timer);
    slot.busy = undefined;
    const peakRssGrowth = Math.max(0, busy.peakRss - busy.rssAtStart);
    const memoryClass = peakRssGrowth > memoryLimit + RSS_ALLOWANCE && fuzzClass !== 'timeout' ? 'memory' : fuzzClass;
    let result: FuzzResult = {
      input: busy.input,
      fuzzClass: memoryClass,
      exitCode: reply.exitCode,
      stderr: reply.stderr,
      ...(reply.error === undefined ? {} : { error: reply.error }),
      milliseconds: performance.now() - busy.started,
      peakRssGrowth,
    };
    if (FAILURE_CLASSES.includes(memoryClass)) result = { ...result, savedTo: saveFailure(result, saveFolder, options.corpusSeed) };
    rmSync(busy.folder, { recursive: true, force: true });
    busy.settle(result);
  };

  const workerEnded = (slot: PoolWorker, error: Error & { code?: string }): void => {
    const fuzzClass = error.code === 'ERR_WORKER_OUT_OF_MEMORY' ? 'memory' : 'internal-error';
    finish(slot, fuzzClass, { exitCode: 1, stderr: `worker ended: ${error.message}`, error: error.stack ?? error.message });
  };

  /** Starts a worker in `slot`; resolves when it has loaded the program and named its commands. */
  const start = (slot: PoolWorker): Promise<void> =>
    new Promise((resolve, reject) => {
      const worker = new Worker(new URL('./fuzzWorker.mjs', import.meta.url), {
        env: { ...process.env, POLEWRIGHT_MEMORY_LIMIT: String(memoryLimit) },
        resourceLimits: { maxOldGenerationSizeMb: heapMb },
        stdout: true,
        stderr: true,
      });
      worker.stdout.resume();
      worker.stderr.resume();
      slot.worker = worker;
      worker.on('message', (message: WorkerReply | { ready: readonly string[] }) => {
        if ('ready' in message) {
          commands = new Set(message.ready);
          resolve();
        } else finish(slot, message.outcome, message);
      });
      worker.on('error', (error: Error & { code?: string }) => {
        if (slot.busy === undefined) reject(error);
        else workerEnded(slot, error);
      });
      worker.on('exit', (code) => {
        if (slot.worker === worker && slot.busy !== undefined) workerEnded(slot, new Error(`the worker exited with code ${code}`));
      });
    });

  const runOn = (slot: PoolWorker, input: FuzzInput): Promise<FuzzResult> =>
    new Promise((settle) => {
      const folder = join(scratch, String(input.index));
      writeInputFiles(input, folder);
      const rss = process.memoryUsage.rss();
      const limit = timeLimits[input.command] ?? 60_000;
      const timer = setTimeout(() => {
        finish(slot, 'timeout', { exitCode: null, stderr: `no answer within ${limit} ms` });
      }, limit);
      slot.busy = { input, folder, started: performance.now(), rssAtStart: rss, peakRss: rss, timer, settle };
      slot.worker!.postMessage({ index: input.index, argv: [input.command, ...substitute(input.args, folder)] });
    });

  const sampler = setInterval(() => {
    const rss = process.memoryUsage.rss();
    for (const slot of pool) if (slot.busy !== undefined && rss > slot.busy.peakRss) slot.busy.peakRss = rss;
  }, 20);

  const results: FuzzResult[] = [];
  try {
    for (let k = 0; k < workerCount; k++) {
      const slot: PoolWorker = {};
      await start(slot);
      pool.push(slot);
    }
    const fuzzed = options.commands === undefined ? commands : new Set(options.commands.filter((c) => commands.has(c)));
    let next = 0;
    const lane = async (slot: PoolWorker): Promise<void> => {
      while (next < options.count) {
        const input = mutateInput(seeds, options.corpusSeed, next++, fuzzed);
        const result = await runOn(slot, input);
        results.push(result);
        options.onResult?.(result, results.length);
        // A stopped or failed worker may hold broken state: the next input gets a fresh one.
        if (FAILURE_CLASSES.includes(result.fuzzClass)) {
          await slot.worker!.terminate();
          await start(slot);
        }
      }
    };
    await Promise.all(pool.map(lane));
  } finally {
    clearInterval(sampler);
    await Promise.all(pool.map((slot) => slot.worker?.terminate()));
    rmSync(scratch, { recursive: true, force: true });
  }
  results.sort((a, b) => a.input.index - b.input.index);
  return { results, commands: [...commands].sort(), saveFolder, milliseconds: performance.now() - started };
}
