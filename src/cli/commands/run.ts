/**
 * The `run` command: simulates an OpenQASM 3 program and prints the exact outcome probabilities of
 * its classical bits, or seeded sample counts with --shots, as a table or as one JSON object.
 */
import { readFileSync } from 'node:fs';
import type { Command } from 'commander';
import { expandedGateTotal } from '../../circuit/gateCounts.js';
import type { Circuit } from '../../circuit/types.js';
import { InputError } from '../../core/InputError.js';
import { parseQasm } from '../../qasm/parseQasm.js';
import { outcomeDistribution } from '../../sim/outcomeDistribution.js';
import type { OutcomeDistribution } from '../../sim/outcomeTypes.js';
import { sampleCircuitOutcomes } from '../../sim/sampleCircuitOutcomes.js';
import { parseNonNegativeInteger, parsePositiveInteger } from '../options.js';

/** Seed of the shot sampler when --seed is not given. */
export const DEFAULT_SEED = 1;

/** Most primitive gates a program may expand to (gate definitions and pow of user gates multiply them). */
export const MAX_RUN_GATES = 2 ** 30;

interface RunOptions {
  readonly shots?: string;
  readonly seed: string;
  readonly json?: boolean;
}

function readSource(file: string): string {
  try {
    return readFileSync(file, 'utf8');
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code;
    const reason = code === 'ENOENT' ? 'no such file' : code === 'EISDIR' ? 'it is a directory' : (error as Error).message;
    throw new InputError(`cannot read "${file}": ${reason}`);
  }
}

/** Refuses a program whose gate definitions expand to more gates than the simulator can apply in reasonable time. */
function checkSize(file: string, circuit: Circuit): void {
  const total = expandedGateTotal(circuit);
  if (total > MAX_RUN_GATES) {
    throw new InputError(`${file}: the program expands to ${total.toPrecision(3)} gates; run simulates at most 2^30 (${MAX_RUN_GATES}) gates`);
  }
}

function parseSeed(text: string): number {
  const seed = parseNonNegativeInteger('--seed', text);
  if (seed > 0xffffffff) throw new InputError(`--seed must be below 2^32, got "${text}"`);
  return seed;
}

/** The classical bits from most to least significant, e.g. "c[1] c[0]". */
function bitLayout(circuit: Circuit): string {
  const names: string[] = [];
  for (const register of circuit.bitRegisters) {
    for (let k = 0; k < register.size; k++) names.push(`${register.name}[${k}]`);
  }
  return names.reverse().join(' ');
}

/** The JSON form; written by hand because JavaScript objects put integer-like keys ("10") first. */
function formatJson(result: OutcomeDistribution): string {
  const lines = [...result.outcomes].map(([key, value]) => `    ${JSON.stringify(key)}: ${JSON.stringify(value)}`);
  const body = lines.length > 0 ? `{\n${lines.join(',\n')}\n  }` : '{}';
  return `{\n  "qubits": ${result.qubits},\n  "outcomes": ${body}\n}\n`;
}

function formatTable(file: string, circuit: Circuit, result: OutcomeDistribution, shots: number | undefined, seed: number): string {
  const heading = shots === undefined ? 'probability' : 'count';
  const width = Math.max('outcome'.length, result.bits);
  const rows = [...result.outcomes].map(([key, value]) => `${(key === '' ? '(none)' : key).padEnd(width)}  ${value}`);
  const source = shots === undefined ? 'exact probabilities' : `${shots} shots, seed ${seed}`;
  const layout = result.bits > 0 ? `bits, left to right: ${bitLayout(circuit)}` : 'no classical bits';
  return [`${file}: ${result.qubits} qubits, ${source}`, layout, `${'outcome'.padEnd(width)}  ${heading}`, ...rows, ''].join('\n');
}

/** Adds `run FILE.qasm [--shots N] [--seed S] [--json]` to the program. */
export function registerRunCommand(program: Command): void {
  program
    .command('run')
    .description('simulate an OpenQASM 3 program; print the exact outcome probabilities of its classical bits, or counts with --shots')
    .argument('<file>', 'OpenQASM 3 program (stdgates.inc gates, gate definitions, measure, reset, barrier)')
    .option('--shots <n>', 'sample N runs with a seeded generator and print counts')
    .option('--seed <s>', 'seed of the sampler, an integer in 0 … 2^32−1', String(DEFAULT_SEED))
    .option('--json', 'print { "qubits": n, "outcomes": { "<bitstring>": value } } instead of a table')
    .addHelpText(
      'after',
      '\nOutcome bitstrings: classical bit k of a register is bit k of the outcome, registers are\n' +
        'concatenated in declaration order (the first declared least significant), and the string is\n' +
        'written most-significant bit first. Unmeasured bits read 0. Probabilities are printed as full\n' +
        'doubles; outcomes below 1e-24 are treated as zero and left out.\n',
    )
    .action((file: string, options: RunOptions) => {
      const shots = options.shots === undefined ? undefined : parsePositiveInteger('--shots', options.shots);
      const seed = parseSeed(options.seed);
      const circuit = parseQasm(readSource(file), file);
      checkSize(file, circuit);
      const result = shots === undefined ? outcomeDistribution(circuit) : sampleCircuitOutcomes(circuit, shots, seed);
      process.stdout.write(options.json ? formatJson(result) : formatTable(file, circuit, result, shots, seed));
    });
}
