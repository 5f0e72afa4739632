/**
 * StateVector: the amplitudes of an n-qubit pure state in two Float64Arrays (real and imaginary
 * parts), index bit q = qubit q. Memory is checked against the budget before anything is allocated.
 */
import { ensureFits } from '../core/memoryBudget.js';
import { InputError } from '../core/InputError.js';
import { AMPLITUDE_PADDING_BYTES, allocateAmplitudes } from './internal/allocateAmplitudes.js';

/** Largest supported qubit count: basis indices must stay below 2^31 for the kernels' bit arithmetic. */
export const MAX_QUBITS = 30;

export interface StateVectorOptions {
  /** Byte limit for the allocation; default: POLEWRIGHT_MEMORY_LIMIT or the machine's available memory. */
  readonly memoryLimitBytes?: number;
}

/** Bytes needed for an n-qubit state: two Float64Arrays of 2^n entries (plus a little padding). */
export function stateVectorBytes(qubits: number): number {
  return 16 * 2 ** qubits + AMPLITUDE_PADDING_BYTES;
}

function checkQubits(qubits: number, what: string, options: StateVectorOptions): void {
  if (!Number.isInteger(qubits) || qubits < 0) throw new RangeError(`${what}: qubit count ${qubits} is not a non-negative integer`);
  if (qubits > MAX_QUBITS) throw new InputError(`${what}: ${qubits} qubits exceed the simulator's maximum of ${MAX_QUBITS}`);
  ensureFits(stateVectorBytes(qubits), `a ${qubits}-qubit state vector`, options.memoryLimitBytes);
}

export class StateVector {
  /** Number of qubits n; the arrays have 2^n entries. */
  readonly qubits: number;
  /** Real parts of the amplitudes, indexed by basis state. */
  readonly re: Float64Array;
  /** Imaginary parts of the amplitudes, indexed by basis state. */
  readonly im: Float64Array;

  private constructor(qubits: number, re: Float64Array, im: Float64Array) {
    this.qubits = qubits;
    this.re = re;
    this.im = im;
  }

  /**
   * |0…0> on `qubits` qubits. Throws InputError when 16·2^n bytes exceed the memory limit
   * (options.memoryLimitBytes, else the process-wide budget) or n exceeds MAX_QUBITS.
   */
  static zero(qubits: number, options: StateVectorOptions = {}): StateVector {
    checkQubits(qubits, 'StateVector.zero', options);
    const state = new StateVector(qubits, ...allocateAmplitudes(2 ** qubits));
    state.re[0] = 1;
    return state;
  }

  /** The computational basis state |index> on `qubits` qubits. */
  static basis(qubits: number, index: number, options: StateVectorOptions = {}): StateVector {
    checkQubits(qubits, 'StateVector.basis', options);
    const size = 2 ** qubits;
    if (!Number.isInteger(index) || index < 0 || index >= size) throw new RangeError(`StateVector.basis: index ${index} out of range 0..${size - 1}`);
    const state = new StateVector(qubits, ...allocateAmplitudes(size));
    state.re[index] = 1;
    return state;
  }

  /** A state holding copies of the given amplitudes; the length must be a power of two. */
  static fromAmplitudes(re: ArrayLike<number>, im: ArrayLike<number>): StateVector {
    if (re.length !== im.length) throw new RangeError('StateVector.fromAmplitudes: re and im differ in length');
    const qubits = Math.log2(re.length);
    if (!Number.isInteger(qubits)) throw new RangeError(`StateVector.fromAmplitudes: length ${re.length} is not a power of two`);
    checkQubits(qubits, 'StateVector.fromAmplitudes', {});
    const state = new StateVector(qubits, ...allocateAmplitudes(re.length));
    state.re.set(re);
    state.im.set(im);
    return state;
  }

  /** An independent copy (memory checked first). */
  clone(options: StateVectorOptions = {}): StateVector {
    ensureFits(stateVectorBytes(this.qubits), `a copy of a ${this.qubits}-qubit state vector`, options.memoryLimitBytes);
    const copy = new StateVector(this.qubits, ...allocateAmplitudes(this.re.length));
    copy.re.set(this.re);
    copy.im.set(this.im);
    return copy;
  }

  /** The 2-norm sqrt(Σ |amplitude|²). */
  norm(): number {
    const re = this.re;
    const im = this.im;
    let sum = 0;
    for (let i = 0; i < re.length; i++) sum += re[i]! * re[i]! + im[i]! * im[i]!;
    return Math.sqrt(sum);
  }
}
