/**
 * The `run` command: simulates an OpenQASM 3 program and prints the exact outcome probabilities of
 * its classical registers, or seeded sample counts with --shots, as a table or as one JSON object.
 * Each outcome gives every register's bits, bit 0 first; outcomes are sorted by probability or count.
 */
import { createHash } from 'node:crypto';
import cliProgress from 'cli-progress';
import type { Command } from 'commander';
import { qubitCount } from '../../circuit/CircuitBuilder.js';
import { expandedGateTotal } from '../../circuit/gateCounts.js';
import type { Circuit } from '../../circuit/types.js';
import { InputError } from '../../core/InputError.js';
import { ensureFits, formatBytes } from '../../core/memoryBudget.js';
import { readTextFileLimited } from '../../core/readTextFileLimited.js';
import { parseQasm } from '../../qasm/parseQasm.js';
import { outcomeDistribution } from '../../sim/outcomeDistribution.js';
import type { OutcomeDistribution } from '../../sim/outcomeTypes.js';
import { registerOutcomes, type RegisterOutcome } from '../../sim/registerOutcomes.js';
import { sampleCircuitOutcomes } from '../../sim/sampleCircuitOutcomes.js';
import { MAX_QUBITS, stateVectorBytes } from '../../sim/StateVector.js';
import { formatTable } from '../format/formatTable.js';
import { jsonHeader } from '../format/jsonHeader.js';
import { plural } from '../../core/plural.js';
import { MAX_SHOTS, parseNonNegativeInteger, parsePositiveInteger } from '../options.js';

/** Seed of the shot sampler when --seed is not given. */
export const DEFAULT_SEED = 1;

/**
 * Most primitive gates a program may expand to (gate definitions and pow of user gates multiply them): 2^24 ≈ 16.8M,
 * which runs in minutes on small registers; 2^30 would take over an hour with no progress shown.
 */
export const MAX_RUN_GATES = 2 ** 24;

/** Largest OpenQASM program `run` reads: 4 MiB (parsing takes about 160 bytes of memory per byte of text). */
export const MAX_QASM_FILE_BYTES = 4 * 2 ** 20;

/** Sampling at least this many shots shows a progress bar (when stderr is a terminal). */
const PROGRESS_FROM_SHOTS = 1_000_000;

interface RunOptions {
  readonly shots?: string;
  readonly seed: string;
  readonly json?: boolean;
}

/** Refuses a program the simulator cannot hold or apply in reasonable time, naming the file and the limit. */
function checkSize(file: string, circuit: Circuit): void {
  const qubits = qubitCount(circuit);
  if (qubits > MAX_QUBITS) {
    throw new InputError(
      `${file}: the program needs ${plural(qubits, 'qubit')}; the simulator holds at most ${MAX_QUBITS} ` +
        `(a ${MAX_QUBITS}-qubit state takes ${formatBytes(stateVectorBytes(MAX_QUBITS))})`,
    );
  }
  ensureFits(stateVectorBytes(qubits), `${file}: the program's ${qubits}-qubit state`);
  const total = expandedGateTotal(circuit);
  if (total > MAX_RUN_GATES) {
    throw new InputError(`${file}: the program expands to ${total.toPrecision(3)} gates; run simulates at most 2^24 (${MAX_RUN_GATES}) gates`);
  }
}

function parseSeed(text: string): number {
  return parseNonNegativeInteger('--seed', text, 0xffffffff);
}

/** A progress bar on stderr for long sampling, only when stderr is a terminal; else undefined. */
function shotProgress(shots: number): { onProgress: (done: number, total: number) => void; stop: () => void } | undefined {
  if (!process.stderr.isTTY || shots < PROGRESS_FROM_SHOTS) return undefined;
  const bar = new cliProgress.SingleBar({ stream: process.stderr, format: 'run |{bar}| {value}/{total} shots' }, cliProgress.Presets.shades_classic);
  let started = false;
  return {
    onProgress: (done, total) => {
      if (!started) {
        bar.start(total, 0);
        started = true;
      }
      bar.update(done);
    },
    stop: () => {
      if (started) bar.stop();
    },
  };
}

/** The JSON form: header, qubits, register names, and the outcomes with "probability" or "count". */
function formatJson(file: string, source: string, circuit: Circuit, result: OutcomeDistribution, shots: number | undefined, seed: number): string {
  const key = shots === undefined ? 'probability' : 'count';
  const inputs = {
    file,
    sha256: createHash('sha256').update(source).digest('hex'),
    shots: shots ?? null,
    seed: shots === undefined ? null : seed,
  };
  const head = { ...jsonHeader('run', inputs), qubits: result.qubits, registers: circuit.bitRegisters.map((r) => r.name) };
  const outcomes = registerOutcomes(result, circuit.bitRegisters).map((o) => `    ${JSON.stringify({ bits: o.bits, [key]: o.value })}`);
  // One outcome per line: the object is indented as usual, the outcomes list kept compact.
  const list = outcomes.length === 0 ? '[]' : `[\n${outcomes.join(',\n')}\n  ]`;
  return `${JSON.stringify(head, null, 2).slice(0, -2)},\n  "outcomes": ${list}\n}\n`;
}

function formatText(file: string, circuit: Circuit, result: OutcomeDistribution, shots: number | undefined, seed: number): string {
  const heading = shots === undefined ? 'probability' : 'count';
  const source = shots === undefined ? 'exact probabilities' : `${plural(shots, 'shot')}, seed ${seed}`;
  const registers = circuit.bitRegisters;
  const rows = registerOutcomes(result, registers).map((o: RegisterOutcome) => [...registers.map((r) => o.bits[r.name]!), String(o.value)]);
  const layout =
    registers.length === 0
      ? 'no classical bits: the one outcome is the empty one'
      : `one column per classical register, its bits written bit 0 first (e.g. ${registers[0]!.name}[0] leftmost); ` +
        `sorted by ${heading}`;
  const table = formatTable([...registers.map((r) => r.name), heading], rows, [...registers.map(() => 'left' as const), 'left']);
  return [`${file}: ${plural(result.qubits, 'qubit')}, ${source}`, layout, table, ''].join('\n');
}

/** Adds `run FILE.qasm [--shots N] [--seed S] [--json]` to the program. */
export function registerRunCommand(program: Command): void {
  program
    .command('run')
    .description('simulate an OpenQASM 3 program; print the exact outcome probabilities of its classical registers, or counts with --shots')
    .argument('<file>', `OpenQASM 3 program of at most ${MAX_QASM_FILE_BYTES / 2 ** 20} MiB (stdgates.inc gates, gate definitions, measure, reset, barrier)`)
    .option('--shots <n>', `sample N runs (1 … ${MAX_SHOTS}) with a seeded generator and print counts`)
    .option('--seed <s>', 'seed of the sampler, an integer in 0 … 2^32−1', String(DEFAULT_SEED))
    .option('--json', 'print { "qubits": n, "registers": [...], "outcomes": [{ "bits": { "<register>": "<bit 0 first>" }, "probability" | "count" }] }')
    .addHelpText(
      'after',
      '\nOutcomes: each outcome gives every classical register (in declaration order) as a string of its\n' +
        'bits written bit 0 first, so c[0] is the first character of c. Outcomes are sorted by probability\n' +
        '(or count) from the largest, then by those strings. Unmeasured bits read 0. Probabilities are\n' +
        'printed as full doubles; outcomes below 1e-24 are treated as zero and left out.\n',
    )
    .action((file: string, options: RunOptions) => {
      const shots = options.shots === undefined ? undefined : parsePositiveInteger('--shots', options.shots, MAX_SHOTS);
      const seed = parseSeed(options.seed);
      const source = readTextFileLimited(file, MAX_QASM_FILE_BYTES, 'OpenQASM program');
      const circuit = parseQasm(source, file);
      checkSize(file, circuit);
      let result: OutcomeDistribution;
      if (shots === undefined) {
        result = outcomeDistribution(circuit);
      } else {
        const progress = shotProgress(shots);
        try {
          result = sampleCircuitOutcomes(circuit, shots, seed, progress === undefined ? {} : { onProgress: progress.onProgress });
        } finally {
          progress?.stop();
        }
      }
      process.stdout.write(options.json ? formatJson(file, source, circuit, result, shots, seed) : formatText(file, circuit, result, shots, seed));
    });
}
