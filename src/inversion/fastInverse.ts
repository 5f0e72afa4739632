/**
 * fastInverse: a block-encoding of (w − A)⁻¹ for a quadratic A = Σ T_ij a_i† a_j whose α ≤ 1/|Im w| does not grow with ‖A‖:
 * orbital rotation to the eigenbasis, reversible arithmetic for E = Σ ε_k n_k, a flag rotation by f(E) = c/(w − E), uncompute.
 */
import { defineConjugatedBlock } from '../circuit/defineBlock.js';
import { call, gate } from '../circuit/ops.js';
import type { UnitaryOp } from '../circuit/types.js';
import { memoiseMatrix, type AncillaRegister, type BlockEncoding } from '../blocks/BlockEncoding.js';
import type { ComplexScalar } from '../linalg/ComplexScalar.js';
import type { ComplexMatrix } from '../linalg/ComplexMatrix.js';
import { oneBodyRotation, type OneBodyRotationOptions } from '../rotations/oneBodyRotation.js';
import { energyGrid, type Window } from './internal/energyGrid.js';
import { weightedSumOps } from './internal/energyArithmetic.js';
import { exactInverse } from './internal/exactInverse.js';
import { registerEnergies } from './internal/flagAmplitude.js';
import { flagRotationOps } from './internal/flagRotationOps.js';

/** Widest register the default flag rotation multiplexes over all 2^m values (beyond it the pruned form is cheaper). */
const MAX_MULTIPLEXED_BITS = 10;
/** Widest register a multiplexed flag rotation may have at all (its angles take O(4^m) work to compute). */
const MAX_EXPLICIT_MULTIPLEXED_BITS = 14;

export interface FastInverseOptions {
  /** Adder of the reversible arithmetic: Draper's QFT adder (default) or Cuccaro's ripple-carry adder. */
  readonly adder?: 'qft' | 'ripple';
  /** Target for the rigorous error bound on the block, max |<0|U|0> − M/α| in operator norm (default 1e-3). */
  readonly precision?: number;
  /** Cap on the energy-register width m (default 16); `bitsCapped` reports when it was hit. */
  readonly maxBits?: number;
  /** Electron-number window: N, or [Nmin, Nmax]; the encoding is then P (w − A)⁻¹ P. Default: the whole Fock space. */
  readonly electrons?: number | readonly [number, number];
  /**
   * `multiplexed`: one Gray-code multiplexed ry and rz over all 2^m register values (2^{m+1} rotations, exact);
   * `pruned`: one multi-controlled ry/rz per dyadic interval of values (≈ O(1/precision + m) of them, within precision/2).
   * Default: `multiplexed` when the energies are commensurate with the grid (exact encoding) and m ≤ 10, else `pruned`.
   */
  readonly flagRotation?: 'pruned' | 'multiplexed';
  /** Passed to oneBodyRotation (Givens network or fermionic Fourier transform). */
  readonly rotation?: Omit<OneBodyRotationOptions, 'name'>;
  readonly label?: string;
}

export interface FastInverseEncoding extends BlockEncoding {
  readonly w: ComplexScalar;
  /** c = min |w − E| over the energies the register holds in the window; α = 1/c ≤ 1/|Im w|. */
  readonly c: number;
  /** Energy-register width m. */
  readonly registerBits: number;
  /** Electron-counter width (0 without a window). */
  readonly counterBits: number;
  /** Register value v ↦ energy minEnergy + v·step; ε̃_k = modeOffset + step·weights[k]. */
  readonly grid: {
    readonly step: number;
    readonly minEnergy: number;
    readonly modeOffset: number;
    readonly weights: readonly number[];
    readonly values: number;
    readonly commensurate: boolean;
  };
  /** The single-particle energies ε_k of the rotated modes (qubit k). */
  readonly energies: Float64Array;
  /** Rigorous bound on ‖<0_anc|U|0_anc> − M/α‖ (operator norm, hence on every entry): rounding + piecewise parts. */
  readonly quantisationBound: number;
  readonly boundParts: { readonly rounding: number; readonly piecewise: number };
  /** The same bound on ‖α<0|U|0> − M‖ = α · quantisationBound. */
  readonly inverseErrorBound: number;
  readonly bitsCapped: boolean;
  readonly window: Window | null;
  readonly flagRotation: 'pruned' | 'multiplexed';
  /** Number of flag rotation pairs. */
  readonly flagRotations: number;
}

function windowOf(electrons: FastInverseOptions['electrons'], n: number): Window | null {
  if (electrons === undefined) return null;
  const [min, max] = typeof electrons === 'number' ? [electrons, electrons] : electrons;
  if (!Number.isInteger(min) || !Number.isInteger(max) || min < 0 || max > n || min > max) {
    throw new RangeError(`fastInverse: electron window ${JSON.stringify(electrons)} is not within 0…${n}`);
  }
  return min === 0 && max === n ? null : { min, max };
}

/**
 * Block-encoding of (w − A)⁻¹ (or P (w − A)⁻¹ P on an electron-number window) with α = 1/c. Construction:
 * U(V) to the eigenbasis (oneBodyRotation; A = U† (Σ ε_k n_k) U); v = Σ_k a_k n_k − sumMin into an m-bit register
 * (offset encoding E(v) = E_min + vΔ, ε̃_k = Δ a_k) by controlled constant additions (Draper, arXiv:quant-ph/0008033;
 * Cuccaro et al., arXiv:quant-ph/0410184); with a window, N = Σ n_k into a counter and a window qubit; then the action,
 * a flag rotation putting f = c/(w − E(v)) on |0> (Möttönen et al., Phys. Rev. Lett. 93, 130502, 2004, multiplexed or
 * pruned to dyadic intervals); then everything uncomputed. Compute/action form: a controlled call controls only the flag.
 * Error: with δ = the sum of the N_max largest |ε_k − ε̃_k| ≥ |E − Ẽ|, |c/(w−E) − c/(w−Ẽ)| = cδ/(|w−E||w−Ẽ|)
 * ≤ δ / max(|Im w|, c − δ), since |w − Ẽ| ≥ c; the pruned flag adds at most each interval's bound (flagIntervals).
 * @throws RangeError for Im w = 0, a bad window or options, a multiplexed flag rotation over more than 14 bits, or a non-Hermitian T.
 */
export function fastInverse(T: ComplexMatrix, w: ComplexScalar, options: FastInverseOptions = {}): FastInverseEncoding {
  const adder = options.adder ?? 'qft';
  const precision = options.precision ?? 1e-3;
  const maxBits = options.maxBits ?? 16;
  if (!Number.isFinite(w.re) || !Number.isFinite(w.im) || w.im === 0) throw new RangeError('fastInverse: w must be finite with Im w ≠ 0');
  if (!(precision > 0 && precision < 1)) throw new RangeError(`fastInverse: precision ${precision} is not in (0, 1)`);
  if (!Number.isInteger(maxBits) || maxBits < 1 || maxBits > 24) throw new RangeError(`fastInverse: maxBits ${maxBits} is not in 1…24`);
  if (adder !== 'qft' && adder !== 'ripple') throw new RangeError(`fastInverse: unknown adder "${String(adder)}"`);
  const n = T.n;
  const window = windowOf(options.electrons, n);
  const sector = window ?? { min: 0, max: n };
  const eta = Math.abs(w.im);
  const rotation = oneBodyRotation(T, options.rotation ?? {});
  const grid = energyGrid(rotation.energies, sector, precision, eta, maxBits);
  const m = grid.bits;
  const counterBits = window ? Math.ceil(Math.log2(n + 1)) : 0;
  const system = Array.from({ length: n }, (_, k) => k);
  const flag = n;
  const register = Array.from({ length: m }, (_, k) => n + 1 + k);
  const counter = Array.from({ length: counterBits }, (_, k) => n + 1 + m + k);
  const windowQubit = window ? n + 1 + m + counterBits : undefined;
  let next = n + 1 + m + counterBits + (window ? 1 : 0);
  const scratchSize = adder === 'ripple' ? Math.max(m, counterBits) : 0;
  const scratch = Array.from({ length: scratchSize }, (_, k) => next + k);
  next += scratchSize;
  const carry = adder === 'ripple' ? next++ : -1;
  const compute: UnitaryOp[] = [call(rotation.block, system)];
  compute.push(...weightedSumOps(adder, grid.weights, -grid.sumMin, { system, register, scratch, carry }));
  if (window) {
    compute.push(...weightedSumOps(adder, system.map(() => 1), 0, { system, register: counter, scratch, carry }));
    for (let N = window.min; N <= window.max; N++) {
      const controls = counter.filter((_, b) => Math.floor(N / 2 ** b) % 2 === 1);
      const negControls = counter.filter((_, b) => Math.floor(N / 2 ** b) % 2 === 0);
      compute.push(gate('x', [windowQubit!], [], { controls, negControls }));
    }
  }
  const minEnergy = grid.modeOffset * sector.min + grid.step * grid.sumMin;
  const energies = registerEnergies(minEnergy, grid.step, grid.sumMax - grid.sumMin, w);
  const mode = options.flagRotation ?? (grid.commensurate && m <= MAX_MULTIPLEXED_BITS ? 'multiplexed' : 'pruned');
  if (mode === 'multiplexed' && m > MAX_EXPLICIT_MULTIPLEXED_BITS) {
    throw new RangeError(`fastInverse: a multiplexed flag rotation over ${m} bits is too large (at most ${MAX_EXPLICIT_MULTIPLEXED_BITS}); use "pruned"`);
  }
  const flagOps = flagRotationOps(mode, energies, register, flag, windowQubit, precision / 2);
  const delta = grid.roundingDelta;
  const rounding = delta === 0 ? 0 : delta / Math.max(eta, energies.c - delta);
  const quantisationBound = rounding + flagOps.piecewiseError;
  // Only the flag is a signal qubit: the arithmetic registers are computed and uncomputed around the flag rotation, and
  // outside the window the flag itself is sent to |1>.
  const ancillas: AncillaRegister[] = [{ name: 'flag', size: 1, role: 'signal' }, { name: 'energy', size: m, role: 'clean' }];
  if (window) ancillas.push({ name: 'electron_counter', size: counterBits, role: 'clean' }, { name: 'window', size: 1, role: 'clean' });
  if (adder === 'ripple') ancillas.push({ name: 'adder_scratch', size: scratchSize, role: 'clean' }, { name: 'adder_carry', size: 1, role: 'clean' });
  const label = options.label ?? 'fast inverse';
  const block = defineConjugatedBlock(
    { name: 'fast_inverse', role: `block-encoding of (w - A)^-1 by orbital rotation, ${m}-bit energy arithmetic and a flag rotation`, qubits: next },
    compute,
    flagOps.ops,
  );
  return {
    label,
    block,
    systemQubits: n,
    ancillas,
    alpha: 1 / energies.c,
    exact: memoiseMatrix(() => exactInverse(T, w, sector)),
    costNotes: [],
    errorBound: quantisationBound,
    w,
    c: energies.c,
    registerBits: m,
    counterBits,
    grid: { step: grid.step, minEnergy, modeOffset: grid.modeOffset, weights: grid.weights, values: grid.sumMax - grid.sumMin + 1, commensurate: grid.commensurate },
    energies: rotation.energies,
    quantisationBound,
    boundParts: { rounding, piecewise: flagOps.piecewiseError },
    inverseErrorBound: quantisationBound / energies.c,
    bitsCapped: grid.capped,
    window,
    flagRotation: mode,
    flagRotations: flagOps.rotations,
  };
}
