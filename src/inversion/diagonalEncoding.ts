/**
 * diagonalEncoding: a block-encoding of B' = B − b₀ for a model whose B part is diagonal in the occupation basis,
 * B(x) = b + Σ_p c_p n_p + Σ_{p<q} V_pq n_p n_q (a Hubbard U n↑n↓, a Coulomb interaction, an external potential), with
 * α = β ≥ max|B(x) − b₀| over the electron window — growing with the electron count, not with the number of mode pairs as
 * the Pauli LCU's α does. Reversible arithmetic writes B(x) into a register, a flag rotation puts B(x)/β on |0>, uncompute.
 */
import { defineConjugatedBlock } from '../circuit/defineBlock.js';
import { gate } from '../circuit/ops.js';
import type { UnitaryOp } from '../circuit/types.js';
import { blockGateTotal } from '../circuit/gateCounts.js';
import { memoiseMatrix, type AncillaRegister, type BlockEncoding } from '../blocks/BlockEncoding.js';
import { multiplexedRotation } from '../blocks/multiplexedRotation.js';
import type { ComplexMatrix } from '../linalg/ComplexMatrix.js';
import type { FermionModel } from '../model/FermionModel.js';
import { ladderSumMatrix } from '../operators/ladderSumMatrix.js';
import { modelHamiltonian } from '../operators/modelHamiltonian.js';
import { popcount32 } from '../operators/internal/popcount.js';
import { diagonalBound, type DiagonalBound } from './diagonalBound.js';
import { diagonalGrid } from './internal/diagonalGrid.js';
import { weightedSumOps } from './internal/energyArithmetic.js';
import { electronWindowOps } from './internal/electronWindowOps.js';
import type { Window } from './internal/energyGrid.js';

/** Widest register whose multiplexed flag rotation (2^m angles, O(m·2^m) work to compute) is built. */
const MAX_REGISTER_BITS = 14;
/** Rounding units per gate and per term in the stated floating-point term (as fastInverse's). */
const FLOATING_POINT_FACTOR = 32;

export interface DiagonalEncodingOptions {
  /** Adder of the arithmetic: Draper's QFT adder (default) or Cuccaro's ripple-carry adder. */
  readonly adder?: 'qft' | 'ripple';
  /** Target for the rigorous error bound, max |<0|U|0> − B'/β| in operator norm (default 1e-3). */
  readonly precision?: number;
  /** Cap on the register width m (default 12, at most 14); `bitsCapped` reports when it kept the bound above `precision`. */
  readonly maxBits?: number;
  /** Electron-number window N or [Nmin, Nmax]: the encoding is then P B' P. Default: the whole Fock space. */
  readonly electrons?: number | readonly [number, number];
  /** Test-only: flips the sign of every flag amplitude (encodes −B'/β), a deliberately broken block that checks must reject. */
  readonly negatedForTest?: boolean;
  readonly label?: string;
}

export interface DiagonalEncoding extends BlockEncoding {
  /** b₀: the centre of B's range on the window, taken out of the encoded operator (the caller moves it into its shift). */
  readonly shift: number;
  /** β = α: the half-width of the bounds on B over the window. */
  readonly beta: number;
  readonly range: { readonly low: number; readonly high: number };
  readonly window: Window | null;
  /** Register value v stands for B = constant + step·(v + sumLow). */
  readonly grid: { readonly step: number; readonly single: readonly number[]; readonly pairs: readonly number[]; readonly sumLow: number; readonly sumHigh: number; readonly commensurate: boolean };
  readonly registerBits: number;
  /** AND qubits of the pair terms n_p n_q: 1 (shared by every pair, computed and uncomputed per pair) or 0 without pairs. */
  readonly pairQubits: number;
  readonly counterBits: number;
  /** Number of terms the arithmetic adds (non-zero one-body and pair coefficients). */
  readonly terms: number;
  readonly boundParts: {
    /** rounding/β: each coefficient on the grid within Δ/2, summed over the terms one occupation switches on (rigorous). */
    readonly rounding: number;
    /** Stated floating-point term, FLOATING_POINT_FACTOR·u·(gates + terms + 2^m), u = 2^−53. */
    readonly floatingPoint: number;
  };
  readonly bitsCapped: boolean;
}

function windowOf(bound: DiagonalBound): Window | null {
  return bound.window.min === 0 && bound.window.max === bound.terms.modes ? null : bound.window;
}

/** P (B − b₀) P from the model's fermion terms (dense Jordan–Wigner-free ladder matrix), independent of the circuit. */
function exactShifted(model: FermionModel, shift: number, window: Window | null): ComplexMatrix {
  const M = ladderSumMatrix(modelHamiltonian(model, { part: 'B' }), model.modes);
  const dim = 2 ** model.modes;
  const inside = (s: number): boolean => window === null || (popcount32(s) >= window.min && popcount32(s) <= window.max);
  for (let r = 0; r < dim; r++) {
    for (let c = 0; c < dim; c++) {
      const e = r * dim + c;
      if (!inside(r) || !inside(c)) {
        M.re[e] = 0;
        M.im[e] = 0;
      } else if (r === c) M.re[e] = M.re[e]! - shift;
    }
  }
  return M;
}

/**
 * Construction: v = Σ_p a_p n_p + Σ b_pq n_p n_q − sumLow into an m-bit register by controlled constant additions (Draper,
 * arXiv:quant-ph/0008033; Cuccaro et al., arXiv:quant-ph/0410184), each pair term through one shared AND qubit t: ccx(n_p,
 * n_q, t), the addition of b_pq controlled by t, ccx again (inside Fourier space for the QFT adder),
 * so v stands for B̃(x) = b + Δ(v + sumLow) with c_p ≈ Δa_p, V_pq ≈ Δb_pq; with a window, N = Σ n_p into a counter and a
 * window qubit (as fastInverse); then the action, a multiplexed ry on the flag (Möttönen et al., Phys. Rev. Lett. 93, 130502,
 * 2004) with cos(θ_v/2) = clamp((B̃ − b₀)/β, −1, 1) — a signed amplitude, θ_v ∈ [0, 2π] — and the flag sent to |1> outside
 * the window; then everything uncomputed. Compute/action form: a controlled call controls only the flag rotation.
 * Error: |B̃(x) − B(x)| ≤ Σ over the terms x switches on of |c − Δa| ≤ (at most N + N(N−1)/2 terms)·Δ/2, bounded by
 * diagonalRange on the rounding errors; clamping to [b₀ − β, b₀ + β] ∋ B(x) only moves B̃ towards B. The multiplexor is exact.
 * @returns the encoding, or `notDiagonal` with the reason (the caller then uses the Pauli LCU).
 * @throws RangeError for a bad window or options.
 */
export function diagonalEncoding(model: FermionModel, options: DiagonalEncodingOptions = {}): DiagonalEncoding | { readonly notDiagonal: string } {
  const adder = options.adder ?? 'qft';
  const precision = options.precision ?? 1e-3;
  const maxBits = options.maxBits ?? 12;
  if (!(precision > 0 && precision < 1)) throw new RangeError(`diagonalEncoding: precision ${precision} is not in (0, 1)`);
  if (!Number.isInteger(maxBits) || maxBits < 1 || maxBits > MAX_REGISTER_BITS) throw new RangeError(`diagonalEncoding: maxBits ${maxBits} is not in 1…${MAX_REGISTER_BITS}`);
  if (adder !== 'qft' && adder !== 'ripple') throw new RangeError(`diagonalEncoding: unknown adder "${String(adder)}"`);
  const bound = diagonalBound(model, options.electrons);
  if ('notDiagonal' in bound) return bound;
  const { terms, shift, beta } = bound;
  if (!(beta > 0)) return { notDiagonal: `B is constant (${shift}) on the electron window: B' = 0 needs no arithmetic` };
  const window = windowOf(bound);
  const grid = diagonalGrid(terms, bound.window, (precision / 2) * beta, maxBits);
  const n = model.modes;
  const m = grid.bits;
  const activeModes = grid.single.flatMap((a, p) => (a === 0 ? [] : [p]));
  const activePairs = grid.pairs.flatMap((b, k) => (b === 0 ? [] : [k]));
  const counterBits = window ? Math.ceil(Math.log2(n + 1)) : 0;
  const system = Array.from({ length: n }, (_, k) => k);
  const flag = n;
  let next = n + 1;
  const take = (size: number): number[] => Array.from({ length: size }, () => next++);
  const register = take(m);
  const ands = take(activePairs.length > 0 ? 1 : 0);
  const counter = take(counterBits);
  const windowQubit = window ? next++ : undefined;
  const scratch = take(adder === 'ripple' ? Math.max(m, counterBits) : 0);
  const carry = adder === 'ripple' ? next++ : -1;
  const pairWeights = {
    pairs: activePairs.map((k) => [terms.pairs[k]!.p, terms.pairs[k]!.q] as const),
    weights: activePairs.map((k) => grid.pairs[k]!),
    and: ands[0] ?? -1,
  };
  const weights = activeModes.map((p) => grid.single[p]!);
  const compute = weightedSumOps(adder, weights, -grid.sumLow, { system: activeModes, register, scratch, carry }, pairWeights);
  if (window) compute.push(...electronWindowOps(adder, window, { system, counter, windowQubit: windowQubit!, scratch, carry }));
  const sign = options.negatedForTest === true ? -1 : 1;
  const thetas = Array.from({ length: 2 ** m }, (_, v) => {
    const value = terms.constant + grid.step * (v + grid.sumLow);
    return 2 * Math.acos(sign * Math.max(-1, Math.min(1, (value - shift) / beta)));
  });
  const gateControls = windowQubit === undefined ? [] : [windowQubit];
  const action: UnitaryOp[] = [
    ...(windowQubit === undefined ? [] : [gate('x', [flag], [], { negControls: [windowQubit] })]),
    multiplexedRotation('y', thetas, register, flag, { controls: gateControls }),
  ];
  const work = [...register, ...ands, ...counter, ...(windowQubit === undefined ? [] : [windowQubit]), ...scratch, ...(adder === 'ripple' ? [carry] : [])];
  const block = defineConjugatedBlock(
    { name: 'diagonal_encoding', role: `block-encoding of B - b0 for a diagonal B by ${m}-bit arithmetic and a signed flag rotation`, qubits: next, workQubits: work },
    compute,
    action,
  );
  // Only the flag is a signal qubit: everything else is computed and uncomputed around the flag rotation, and outside the
  // window the flag itself is sent to |1>.
  const ancillas: AncillaRegister[] = [{ name: 'flag', size: 1, role: 'signal' }, { name: 'value', size: m, role: 'clean' }];
  if (ands.length > 0) ancillas.push({ name: 'pair_and', size: ands.length, role: 'clean' });
  if (window) ancillas.push({ name: 'electron_counter', size: counterBits, role: 'clean' }, { name: 'window', size: 1, role: 'clean' });
  if (adder === 'ripple') ancillas.push({ name: 'adder_scratch', size: scratch.length, role: 'clean' }, { name: 'adder_carry', size: 1, role: 'clean' });
  const termCount = activeModes.length + activePairs.length;
  const rounding = grid.rounding / beta;
  const floatingPoint = FLOATING_POINT_FACTOR * 2 ** -53 * (blockGateTotal(block) + termCount + 2 ** m);
  return {
    label: options.label ?? "B' (diagonal, arithmetic)",
    block,
    systemQubits: n,
    ancillas,
    alpha: beta,
    exact: memoiseMatrix(() => exactShifted(model, shift, window)),
    costNotes: [],
    errorBound: rounding + floatingPoint,
    shift,
    beta,
    range: { low: bound.low, high: bound.high },
    window,
    grid: { step: grid.step, single: grid.single, pairs: grid.pairs, sumLow: grid.sumLow, sumHigh: grid.sumHigh, commensurate: grid.commensurate },
    registerBits: m,
    pairQubits: ands.length,
    counterBits,
    terms: termCount,
    boundParts: { rounding, floatingPoint },
    bitsCapped: grid.capped,
  };
}
