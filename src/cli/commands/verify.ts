/**
 * The `verify` command: checks that a user's OpenQASM 3 circuit block-encodes an operator (matrix, Pauli sum, ladder sum
 * or model file) with a given or fitted α on the named registers, and that its clean registers come back to |0>.
 * Exit 0 when within the tolerance, 1 when not, 2 on bad input.
 */
import { readFileSync, statSync } from 'node:fs';
import type { Command } from 'commander';
import { InputError } from '../../core/InputError.js';
import { loadOperatorFile } from '../../operatorFile/loadOperatorFile.js';
import { registerRoles } from '../../verify/registerRoles.js';
import { unitaryQasmCircuit } from '../../verify/unitaryQasmCircuit.js';
import { verifyCircuit, type CircuitVerification } from '../../verify/verifyCircuit.js';
import { parsePositiveInteger, parsePositiveNumber } from '../options.js';
import { jsonHeader } from '../format/jsonHeader.js';
import { VERSION } from '../../core/version.js';

interface VerifyOptions {
  readonly encodes: string;
  readonly alpha?: string;
  readonly system?: string;
  readonly signal?: string;
  readonly clean?: string;
  readonly part?: string;
  readonly probes: string;
  readonly seed: string;
  readonly tolerance: string;
  readonly json?: boolean;
}

/** Largest circuit file read (the same limit as model and operator files). */
const MAX_CIRCUIT_BYTES = 64 * 2 ** 20;

function readCircuitFile(path: string): string {
  try {
    const stat = statSync(path);
    if (stat.isDirectory()) throw new InputError(`${path}: cannot read the circuit file: is a directory`);
    if (stat.size > MAX_CIRCUIT_BYTES) throw new InputError(`${path}: the circuit file is larger than ${MAX_CIRCUIT_BYTES / 2 ** 20} MiB`);
    return readFileSync(path, 'utf8');
  } catch (error) {
    if (error instanceof InputError) throw error;
    const code = (error as NodeJS.ErrnoException).code;
    throw new InputError(`${path}: cannot read the circuit file: ${code === 'ENOENT' ? 'no such file' : (error as Error).message}`);
  }
}

/** `a,b` → ['a', 'b']; every name non-empty. */
function parseRegisterList(option: string, text: string | undefined): string[] | undefined {
  if (text === undefined) return undefined;
  const names = text.split(',').map((name) => name.trim());
  if (names.some((name) => name === '')) throw new InputError(`${option} must be register names separated by commas, got "${text}"`);
  return names;
}

function parseSeed(text: string): number {
  if (!/^-?\d+$/.test(text.trim()) || !Number.isSafeInteger(Number(text))) throw new InputError(`--seed must be an integer, got "${text}"`);
  return Number(text);
}

function parsePart(text: string | undefined): 'A' | 'B' | undefined {
  if (text === undefined || text === 'A' || text === 'B') return text;
  throw new InputError(`--part must be A (the one-body part) or B (the rest), got "${text}"`);
}

function formatText(circuitFile: string, operatorFile: string, result: CircuitVerification): string {
  const e = (value: number) => value.toExponential(2);
  const register = (r: { name: string; qubits: number }) => `${r.name}[${r.qubits}]`;
  const { system, signal, clean } = result.registers;
  const lines = [
    `circuit    ${circuitFile}: system ${register(system)}, signal ${signal.map(register).join(' ') || '(none)'}, clean ${clean.map(register).join(' ') || '(none)'}`,
    `operator   ${operatorFile}`,
    result.mode === 'exhaustive'
      ? `mode       exhaustive: all ${result.checked} system basis columns`
      : `mode       probe: ${result.checked} random states (seed ${result.seed}); the error found is a lower bound`,
    `alpha      ${result.alpha === null ? 'none (no positive α fits)' : Number(result.alpha.toPrecision(12))}${result.alphaFitted ? ' (fitted, least squares)' : ' (given)'}`,
    `max error  ${e(result.maxError)} (‖(<0|U|0> − M/α) x‖ over the checked inputs x), tolerance ${e(result.tolerance)}`,
  ];
  if (result.worstColumn !== null) {
    const bits = result.worstColumn.toString(2).padStart(system.qubits, '0');
    lines.push(`worst      column ${result.worstColumn} = |${bits}>_${system.name}`);
  } else lines.push(`worst      probe ${result.worstProbe}`);
  for (const [name, leak] of Object.entries(result.clean)) lines.push(`clean      ${name}: largest leak out of |0> ${e(leak)}`);
  for (const note of result.notes) lines.push(`note       ${note}`);
  lines.push(`result     ${result.ok ? 'PASS' : 'FAIL'}`);
  return `${lines.join('\n')}\n`;
}

/**
 * Adds `verify CIRCUIT.qasm --encodes OPERATOR [--alpha α] [--system REG] [--signal REG,…] [--clean REG,…]
 * [--part A|B] [--probes N] [--seed S] [--tolerance τ] [--json]` to the program.
 */
export function registerVerifyCommand(program: Command): void {
  program
    .command('verify')
    .description('check that an OpenQASM 3 circuit block-encodes an operator, by simulation')
    .argument('<circuit>', 'OpenQASM 3 program (unitary; final measurements are ignored)')
    .requiredOption('--encodes <operator>', 'operator file (JSON): "matrix", "pauli", "ladder", or a model file')
    .option('--alpha <alpha>', 'the normalisation α (default: fitted by least squares)')
    .option('--system <register>', 'register the operator acts on (default: the first declared)')
    .option('--signal <registers>', 'comma-separated registers projected on |0> (default: all others)')
    .option('--clean <registers>', 'comma-separated work registers that must return to |0> (checked and reported)')
    .option('--part <part>', 'model files only: A (one-body part) or B (the rest) instead of H')
    .option('--probes <n>', 'random states above 12 qubits, and for the clean-register check', '8')
    .option('--seed <s>', 'seed of the random states', '1')
    .option('--tolerance <tau>', 'largest accepted error and clean-register leak', '1e-8')
    .option('--json', 'print one JSON object instead of the text report')
    .action((circuitFile: string, options: VerifyOptions) => {
      const alpha = options.alpha === undefined ? undefined : parsePositiveNumber('--alpha', options.alpha);
      const probes = parsePositiveInteger('--probes', options.probes);
      const seed = parseSeed(options.seed);
      const tolerance = parsePositiveNumber('--tolerance', options.tolerance);
      const part = parsePart(options.part);
      const signal = parseRegisterList('--signal', options.signal);
      const clean = parseRegisterList('--clean', options.clean);
      const { circuit, notes } = unitaryQasmCircuit(readCircuitFile(circuitFile), circuitFile, options.system);
      const roles = registerRoles(circuit, { system: options.system, signal, clean });
      const target = loadOperatorFile(options.encodes, { name: roles.system.name, qubits: roles.system.size }, { part });
      const verification = verifyCircuit(circuit, target, { system: roles.system.name, signal, clean, alpha, probes, seed, tolerance });
      const result = { ...verification, notes: [...notes, ...verification.notes] };
      if (options.json) {
        const inputs = { circuit: circuitFile, operator: options.encodes, ...(part === undefined ? {} : { part }), probes };
        const header = jsonHeader('verify', {
          ...inputs, alpha: alpha ?? null, system: options.system ?? null, signal: signal ?? null, clean: clean ?? null, seed, tolerance,
        });
        const { ok, ...figures } = result;
        process.stdout.write(`${JSON.stringify({ ...header, ok, version: VERSION, ...inputs, ...figures }, null, 2)}\n`);
      } else process.stdout.write(formatText(circuitFile, options.encodes, result));
      if (!result.ok) process.exitCode = 1;
    });
}
