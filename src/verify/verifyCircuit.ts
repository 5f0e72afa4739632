/**
 * verifyCircuit: checks that a user's circuit U block-encodes an operator M, (<0|_anc ⊗ I) U (|0>_anc ⊗ I) = M/α
 * (../shared/CONVENTIONS.md), with the ancillas being the signal and clean registers, by statevector simulation.
 * Up to `exhaustiveLimit` qubits in all, every system basis column is checked; above it, `probes` seeded random system
 * states are, which gives a lower bound on the error. α is given or fitted by least squares over the checked inputs.
 * Clean registers must also come back to |0>: their leak is measured on the same runs plus random inputs over the
 * system and signal qubits.
 */
import type { Circuit, Register } from '../circuit/types.js';
import { InputError } from '../core/InputError.js';
import { randomUnitVector } from '../core/randomUnitVector.js';
import { seededRandom, type RandomSource } from '../core/seededRandom.js';
import { targetAction, type ComplexVector, type TargetAction } from '../operatorFile/targetAction.js';
import { targetSizeProblem, type TargetOperator } from '../operatorFile/TargetOperator.js';
import { applyCircuit } from '../sim/applyCircuit.js';
import type { SimulationOptions } from '../sim/SimulationOptions.js';
import { StateVector } from '../sim/StateVector.js';
import { qubitName, unitaryOps } from './internal/unitaryOps.js';
import { registerRoles, type RegisterRoleNames, type RegisterRoles } from './registerRoles.js';

export interface VerifyCircuitOptions extends SimulationOptions, RegisterRoleNames {
  /** The normalisation α > 0; default: fitted (least squares over the checked inputs). */
  readonly alpha?: number;
  /** Largest accepted error and clean-register leak (default 1e-8). */
  readonly tolerance?: number;
  /** Largest total qubit count checked column by column (default 12). */
  readonly exhaustiveLimit?: number;
  /** Random system states in probe mode, and random inputs of the clean-register check (default 8). */
  readonly probes?: number;
  /** Seed of the random states (default 1). */
  readonly seed?: number;
}

export interface CircuitVerification {
  /** maxError ≤ tolerance, every clean leak ≤ tolerance, and a positive α (given or fitted). */
  readonly ok: boolean;
  /** The α used: given, or fitted; null when no positive α fits (the best real factor was ≤ 0). */
  readonly alpha: number | null;
  readonly alphaFitted: boolean;
  /**
   * Largest ‖(<0|U|0> − M/α) x‖₂ over the checked unit inputs x (basis columns, or random states): at least every
   * entry error of those columns, and a lower bound on the operator-norm error (exhaustive: ‖E‖ ≤ √(2^n) · maxError).
   */
  readonly maxError: number;
  /** Exhaustive mode: the system basis index of the worst column (bit k = qubit k of the system register); probe: null. */
  readonly worstColumn: number | null;
  /** Probe mode: the index of the worst random state (0-based); exhaustive: null. */
  readonly worstProbe: number | null;
  /** `probe`: random states only, so maxError is a lower bound on the error over all inputs. */
  readonly mode: 'exhaustive' | 'probe';
  /** Inputs checked: 2^n columns, or the number of probes. */
  readonly checked: number;
  /** Per clean register: the largest norm found outside its |0> state (a lower bound on the worst case). */
  readonly clean: Readonly<Record<string, number>>;
  readonly tolerance: number;
  readonly seed: number;
  readonly registers: {
    readonly system: { readonly name: string; readonly qubits: number };
    readonly signal: readonly { readonly name: string; readonly qubits: number }[];
    readonly clean: readonly { readonly name: string; readonly qubits: number }[];
  };
  /** What was ignored or could not be decided, one sentence each. */
  readonly notes: readonly string[];
}

const DEFAULT_TOLERANCE = 1e-8;
/** Total qubits up to which every system basis column is checked by default (above: probe mode). */
export const DEFAULT_EXHAUSTIVE_LIMIT = 12;
const DEFAULT_PROBES = 8;
const DEFAULT_SEED = 1;

function checkOptions(options: VerifyCircuitOptions): void {
  const positive = (value: number | undefined, what: string) => {
    if (value !== undefined && !(value > 0 && Number.isFinite(value))) throw new RangeError(`verifyCircuit: ${what} must be a positive finite number, got ${value}`);
  };
  positive(options.alpha, 'alpha');
  positive(options.tolerance, 'tolerance');
  if (options.probes !== undefined && !(Number.isInteger(options.probes) && options.probes >= 1)) throw new RangeError(`verifyCircuit: probes must be a positive integer, got ${options.probes}`);
  if (options.exhaustiveLimit !== undefined && !(Number.isInteger(options.exhaustiveLimit) && options.exhaustiveLimit >= 0)) {
    throw new RangeError(`verifyCircuit: exhaustiveLimit must be a non-negative integer, got ${options.exhaustiveLimit}`);
  }
  if (options.seed !== undefined && !Number.isInteger(options.seed)) throw new RangeError(`verifyCircuit: seed must be an integer, got ${options.seed}`);
}

/** One input of the check: a system basis column, or a random system state. */
type Input = { readonly column: number } | { readonly state: ComplexVector };

/** Runs U on inputs |x>_system |0>_ancillas and reads the ancilla-|0> block and the clean registers' leaks. */
class BlockRunner {
  private readonly state: StateVector;
  private readonly circuit: Circuit;
  private readonly dim: number;

  constructor(
    circuit: Circuit,
    private readonly roles: RegisterRoles,
    private readonly options: SimulationOptions,
  ) {
    const width = circuit.qubitRegisters.reduce((sum, r) => sum + r.size, 0);
    this.state = StateVector.zero(width, options);
    this.circuit = circuit;
    this.dim = 2 ** roles.system.size;
  }

  /** Sets the state to Σ_j x_j |j>_system (a register's qubits are contiguous, so |j> is index j << offset). */
  private prepare(input: Input): void {
    const { re, im } = this.state;
    re.fill(0);
    im.fill(0);
    const offset = this.roles.system.offset;
    if ('column' in input) re[input.column * 2 ** offset] = 1;
    else for (let j = 0; j < this.dim; j++) {
      re[j * 2 ** offset] = input.state.re[j]!;
      im[j * 2 ** offset] = input.state.im[j]!;
    }
  }

  /** (<0|_anc ⊗ I) U |x, 0_anc>. */
  run(input: Input): ComplexVector {
    this.prepare(input);
    applyCircuit(this.state, this.circuit, this.options);
    const re = new Float64Array(this.dim);
    const im = new Float64Array(this.dim);
    const offset = this.roles.system.offset;
    for (let i = 0; i < this.dim; i++) {
      re[i] = this.state.re[i * 2 ** offset]!;
      im[i] = this.state.im[i * 2 ** offset]!;
    }
    return { re, im };
  }

  /** Per clean register of the last run: √(Σ |amplitude|² over indices where the register is not |0…0>). */
  leaks(): number[] {
    return this.roles.clean.map((register) => {
      const mask = (2 ** register.size - 1) * 2 ** register.offset;
      let outside = 0;
      for (let k = 0; k < this.state.re.length; k++) if ((k & mask) !== 0) outside += this.state.re[k]! ** 2 + this.state.im[k]! ** 2;
      return Math.sqrt(outside);
    });
  }

  /** Runs U on a random state of the system and signal qubits with every clean qubit |0>; returns the leaks. */
  leaksOnRandomInput(random: RandomSource): number[] {
    const { re } = this.state;
    let cleanMask = 0;
    for (const register of this.roles.clean) cleanMask |= (2 ** register.size - 1) * 2 ** register.offset;
    randomUnitVector(re.length, random, cleanMask, this.state);
    applyCircuit(this.state, this.circuit, this.options);
    return this.leaks();
  }
}

function expected(action: TargetAction, input: Input): ComplexVector {
  return 'column' in input ? action.column(input.column) : action.apply(input.state);
}

function distance(u: ComplexVector, m: ComplexVector, scale: number): number {
  let sum = 0;
  for (let i = 0; i < u.re.length; i++) sum += (u.re[i]! - scale * m.re[i]!) ** 2 + (u.im[i]! - scale * m.im[i]!) ** 2;
  return Math.sqrt(sum);
}

/**
 * Checks `circuit` against `target`. The circuit may hold barriers and final measurements (ignored, with a note);
 * for an OpenQASM text use unitaryQasmCircuit first, which names the line of a refused statement.
 *
 * @throws InputError naming the register when the roles are wrong (see registerRoles) or the operator does not fit the
 *         system register, when α must be fitted but the operator is zero, or for a mid-circuit measurement or reset.
 * @throws RangeError for invalid options (α, tolerance ≤ 0, negative probes).
 */
export function verifyCircuit(circuit: Circuit, target: TargetOperator, options: VerifyCircuitOptions = {}): CircuitVerification {
  checkOptions(options);
  const roles = registerRoles(circuit, options);
  const system = roles.system;
  const sizeProblem = targetSizeProblem(target, system.size);
  if (sizeProblem !== undefined) throw new InputError(`the operator does not fit the system register '${system.name}' (${system.size} qubits): ${sizeProblem}`);
  const systemQubits = new Set(Array.from({ length: system.size }, (_, k) => system.offset + k));
  const unitary = unitaryOps(circuit, systemQubits, (q) => qubitName(circuit.qubitRegisters, q));
  if ('problem' in unitary) throw new InputError(unitary.problem.message);
  const notes: string[] = [];
  if (unitary.droppedMeasurements > 0) notes.push(`${unitary.droppedMeasurements} final measurement${unitary.droppedMeasurements === 1 ? '' : 's'} ignored`);
  if (unitary.droppedResets > 0) notes.push(`${unitary.droppedResets} reset${unitary.droppedResets === 1 ? '' : 's'} of fresh ancilla qubits ignored`);

  const tolerance = options.tolerance ?? DEFAULT_TOLERANCE;
  const seed = options.seed ?? DEFAULT_SEED;
  const probes = options.probes ?? DEFAULT_PROBES;
  const dim = 2 ** system.size;
  const total = circuit.qubitRegisters.reduce((sum, r) => sum + r.size, 0);
  const mode = total <= (options.exhaustiveLimit ?? DEFAULT_EXHAUSTIVE_LIMIT) ? 'exhaustive' : 'probe';
  const unitaryCircuit: Circuit = { qubitRegisters: circuit.qubitRegisters, bitRegisters: [], ops: unitary.ops };
  const runner = new BlockRunner(unitaryCircuit, roles, options);
  const action = targetAction(target, system.size);
  // The inputs are regenerated from the seed for each pass, so none has to be stored.
  const inputs = function* (): Generator<Input> {
    if (mode === 'exhaustive') for (let column = 0; column < dim; column++) yield { column };
    else {
      const random = seededRandom(seed);
      for (let p = 0; p < probes; p++) yield { state: randomUnitVector(dim, random) };
    }
  };

  let scale: number;
  const alphaFitted = options.alpha === undefined;
  if (options.alpha !== undefined) scale = 1 / options.alpha;
  else {
    // Least squares over the checked inputs: min_β Σ ‖u − β m‖² at β = Σ Re<m, u> / Σ ‖m‖², α = 1/β.
    let overlap = 0;
    let weight = 0;
    for (const input of inputs()) {
      const u = runner.run(input);
      const m = expected(action, input);
      for (let i = 0; i < dim; i++) {
        overlap += m.re[i]! * u.re[i]! + m.im[i]! * u.im[i]!;
        weight += m.re[i]! ** 2 + m.im[i]! ** 2;
      }
    }
    if (weight === 0) throw new InputError('cannot fit α: the operator is zero on every checked input; give α (--alpha)');
    scale = overlap / weight;
    if (!(scale > 0)) {
      notes.push(`no positive α fits: the best real factor 1/α is ${scale.toExponential(3)} (does the circuit encode −M, or a different operator?)`);
      scale = Math.max(scale, 0);
    }
  }

  let maxError = 0;
  let worst = 0;
  const leak = roles.clean.map(() => 0);
  const addLeaks = (found: readonly number[]) => found.forEach((value, r) => (leak[r] = Math.max(leak[r]!, value)));
  let index = 0;
  for (const input of inputs()) {
    const error = distance(runner.run(input), expected(action, input), scale);
    addLeaks(runner.leaks());
    if (index === 0 || error > maxError) {
      maxError = error;
      worst = index;
    }
    index++;
  }
  if (roles.clean.length > 0) {
    const random = seededRandom(seed + 1);
    for (let p = 0; p < probes; p++) addLeaks(runner.leaksOnRandomInput(random));
  }
  if (mode === 'probe') notes.push(`probe mode: ${probes} random states, so the error found is a lower bound on the error over all inputs`);

  const alpha = scale > 0 ? 1 / scale : null;
  const clean = Object.fromEntries(roles.clean.map((register, r) => [register.name, leak[r]!]));
  const ok = alpha !== null && maxError <= tolerance && leak.every((value) => value <= tolerance);
  const describe = (register: Register) => ({ name: register.name, qubits: register.size });
  return {
    ok,
    alpha,
    alphaFitted,
    maxError,
    worstColumn: mode === 'exhaustive' ? worst : null,
    worstProbe: mode === 'probe' ? worst : null,
    mode,
    checked: mode === 'exhaustive' ? dim : probes,
    clean,
    tolerance,
    seed,
    registers: { system: describe(system), signal: roles.signal.map(describe), clean: roles.clean.map(describe) },
    notes,
  };
}
