/**
 * estimateGreen: the gate-level value of G_ij(z) from the synthesized Hadamard-test circuits, averaged over the
 * initial states (a degenerate ground level, equal weights). Exact mode takes each test's P(bit = 0) from one
 * uncontrolled statevector run per part and state (<ψ,0|U|ψ,0> gives the re and the im test at once; no sampling
 * noise) and reports a rigorous error bound; shot mode then draws each test's outcome count binomially (seeded) and
 * reports the standard error.
 */
import { ancillaQubits, type BlockEncoding } from '../blocks/BlockEncoding.js';
import { InputError, isInputError } from '../core/InputError.js';
import { seededRandom } from '../core/seededRandom.js';
import { gateCounts, totalGates, type GateCounts } from '../circuit/gateCounts.js';
import type { ComplexScalar } from '../linalg/ComplexScalar.js';
import type { SimulationOptions } from '../sim/SimulationOptions.js';
import { encodedExpectation } from './encodedExpectation.js';
import { greenParts, type GreenPart, type GreenPartName } from './greenParts.js';
import type { TestComponent } from './hadamardTestCircuit.js';
import { hadamardTests } from './hadamardTests.js';
import type { InitialState } from './InitialState.js';
import { sampleHadamardTest } from './internal/sampleHadamardTest.js';
import type { ResolventFactory } from './ResolventFactory.js';
import { shotsForPrecision, type ShotPlan } from './shotsForPrecision.js';

/**
 * Floating-point allowance per gate on a unit vector, 4·2^−52: the forward error of applying a product of unitaries in
 * double precision grows at most linearly in the number of factors (Higham, Accuracy and Stability of Numerical
 * Algorithms, 2nd ed., §3.5), a few units of rounding per 2×2 (or controlled) update.
 */
const ROUNDING_PER_GATE = 4 * Number.EPSILON;

export interface GreenEstimateOptions {
  readonly modes: number;
  /** Electron number N of the initial states. */
  readonly electrons: number;
  readonly groundEnergy: number;
  /** The ground level's vectors, averaged with equal weights. */
  readonly states: readonly InitialState[];
  readonly pair: readonly [number, number];
  readonly z: ComplexScalar;
  readonly resolvent: ResolventFactory;
  /** Load the states' amplitudes instead of simulating their preparation (default false). */
  readonly loadState?: boolean;
  /** Sample every Hadamard test `count` times (seeded); default: exact expectation. */
  readonly shots?: { readonly count: number; readonly seed: number };
  /** Precision ε for which to report the shots needed (default 1e-3). */
  readonly targetPrecision?: number;
  readonly simulation?: SimulationOptions;
  /** Called after each statevector run. */
  readonly onProgress?: (done: number, total: number, label: string) => void;
}

export interface TestReading {
  readonly name: string;
  readonly part: GreenPartName;
  readonly component: TestComponent;
  readonly stateIndex: number;
  readonly scale: number;
  readonly qubits: number;
  /** Exact P(bit = 0) of the test's circuit (from the statevector). */
  readonly probabilityZero: number;
  /** Shot mode: runs that measured 0; null in exact mode. */
  readonly zeros: number | null;
}

export interface PartEstimate {
  readonly part: GreenPartName;
  readonly sign: 1 | -1;
  readonly w: ComplexScalar;
  readonly electrons: number;
  /** α of a_i·R·a_j† (or a_j†·R·a_i) = α of the resolvent encoding. */
  readonly alpha: number;
  /** The part's encoding error bound (operator norm, of U's block against M/α). */
  readonly encodingErrorBound: number;
  /** The resolvent encoding inside the part (its builder's report may say more). */
  readonly resolvent: BlockEncoding;
  /** sign · <ψ0| M |ψ0> averaged over the states. */
  readonly value: ComplexScalar;
  readonly stdError: ComplexScalar | null;
  /** Qubits of the part's Hadamard-test circuit (system + ancillas + test qubit). */
  readonly qubits: number;
  /** Gate counts of the part's Hadamard-test circuit for the real component (the imaginary one adds one sdg). */
  readonly gates: GateCounts;
}

export interface GreenEstimate {
  readonly pair: readonly [number, number];
  readonly z: ComplexScalar;
  readonly groundEnergy: number;
  readonly states: number;
  readonly value: ComplexScalar;
  readonly parts: readonly PartEstimate[];
  /**
   * Rigorous bound on |value − G_ij(z)| apart from sampling noise: Σ_parts α·errorBound of the encodings (the
   * states' weights sum to 1) plus the floating-point allowance.
   */
  readonly errorBound: number;
  readonly boundParts: { readonly encoding: number; readonly rounding: number };
  /** Shot mode: standard errors of Re and Im; null in exact mode. */
  readonly stdError: ComplexScalar | null;
  readonly shots: number | null;
  readonly readings: readonly TestReading[];
  readonly shotPlan: ShotPlan;
  /** Largest Hadamard-test circuit. */
  readonly qubits: number;
}

/** Runs `encodedExpectation`, naming the part and the Hadamard-test circuit's size when the simulator refuses it. */
function partExpectation(part: GreenPart, state: InitialState, options: GreenEstimateOptions): ComplexScalar {
  try {
    return encodedExpectation(part.encoding, state, {
      ...(options.loadState === undefined ? {} : { loadState: options.loadState }),
      ...(options.simulation === undefined ? {} : { simulation: options.simulation }),
    });
  } catch (error) {
    if (!isInputError(error)) throw error;
    const qubits = part.encoding.systemQubits + ancillaQubits(part.encoding);
    throw new InputError(`the ${part.part} part's readout (${qubits} qubits, ${qubits + 1} in its Hadamard-test circuit) is too large to simulate: ${error.message}`);
  }
}

/**
 * @throws InputError when a part's circuit is too large to simulate (the simulator checks before it allocates);
 *   RangeError for library misuse (see greenParts, encodedExpectation).
 */
export function estimateGreen(options: GreenEstimateOptions): GreenEstimate {
  const parts = greenParts(options);
  const states = options.states;
  const tests = hadamardTests(parts, states);
  const random = options.shots === undefined ? null : seededRandom(options.shots.seed);
  const total = parts.length * states.length;
  let done = 0;
  const readings: TestReading[] = [];
  const partEstimates: PartEstimate[] = [];
  let rounding = 0;
  let encodingBound = 0;
  for (const part of parts) {
    const mine = tests.filter((t) => t.part === part.part);
    const qubits = part.encoding.systemQubits + ancillaQubits(part.encoding) + 1;
    const gates = gateCounts(mine[0]!.circuit);
    const sum = { re: 0, im: 0 };
    const variance = { re: 0, im: 0 };
    states.forEach((state, stateIndex) => {
      const overlap = partExpectation(part, state, options);
      done += 1;
      options.onProgress?.(done, total, `${part.part} part, ${state.label}`);
      for (const test of mine.filter((t) => t.stateIndex === stateIndex)) {
        const x = test.component === 're' ? overlap.re : overlap.im;
        const probabilityZero = (1 + x) / 2;
        let zeros: number | null = null;
        let estimate = x;
        if (random !== null) {
          const sampled = sampleHadamardTest(probabilityZero, options.shots!.count, Math.floor(random.next() * 2 ** 31));
          zeros = sampled.zeros;
          estimate = sampled.estimate;
          variance[test.component] += (test.scale * sampled.stdError) ** 2;
        }
        sum[test.component] += test.scale * estimate;
        readings.push({ name: test.name, part: test.part, component: test.component, stateIndex, scale: test.scale, qubits, probabilityZero, zeros });
      }
    });
    encodingBound += part.encoding.alpha * part.encoding.errorBound;
    rounding += part.encoding.alpha * ROUNDING_PER_GATE * (totalGates(gates) + 1);
    partEstimates.push({
      part: part.part,
      sign: part.sign,
      w: part.w,
      electrons: part.electrons,
      alpha: part.encoding.alpha,
      encodingErrorBound: part.encoding.errorBound,
      resolvent: part.resolvent,
      value: sum,
      stdError: random === null ? null : { re: Math.sqrt(variance.re), im: Math.sqrt(variance.im) },
      qubits,
      gates,
    });
  }
  const value = partEstimates.reduce((acc, p) => ({ re: acc.re + p.value.re, im: acc.im + p.value.im }), { re: 0, im: 0 });
  const stdError = random === null
    ? null
    : {
        re: Math.hypot(...partEstimates.map((p) => p.stdError!.re)),
        im: Math.hypot(...partEstimates.map((p) => p.stdError!.im)),
      };
  return {
    pair: options.pair,
    z: options.z,
    groundEnergy: options.groundEnergy,
    states: states.length,
    value,
    parts: partEstimates,
    errorBound: encodingBound + rounding,
    boundParts: { encoding: encodingBound, rounding },
    stdError,
    shots: options.shots?.count ?? null,
    readings,
    shotPlan: shotsForPrecision(tests, options.targetPrecision ?? 1e-3),
    qubits: Math.max(0, ...partEstimates.map((p) => p.qubits)),
  };
}
