/**
 * fastInverse: a block-encoding of (w − A)⁻¹ for a quadratic A = Σ T_ij a_i† a_j whose α ≤ 1/|Im w| does not grow with ‖A‖:
 * orbital rotation to the eigenbasis, reversible arithmetic for E = Σ ε_k n_k, a flag rotation by f(E) = c/(w − E), uncompute.
 */
import { defineConjugatedBlock } from '../circuit/defineBlock.js';
import { call } from '../circuit/ops.js';
import type { UnitaryOp } from '../circuit/types.js';
import { memoiseMatrix, type AncillaRegister, type BlockEncoding } from '../blocks/BlockEncoding.js';
import type { ComplexScalar } from '../linalg/ComplexScalar.js';
import type { ComplexMatrix } from '../linalg/ComplexMatrix.js';
import { oneBodyRotation, type OneBodyRotationOptions } from '../rotations/oneBodyRotation.js';
import { blockGateTotal } from '../circuit/gateCounts.js';
import { energyGrid, type Window } from './internal/energyGrid.js';
import { weightedSumOps } from './internal/energyArithmetic.js';
import { electronWindowOps } from './internal/electronWindowOps.js';
import { exactInverse } from './internal/exactInverse.js';
import { flagRotationOps } from './internal/flagRotationOps.js';

/** Widest register the default flag rotation multiplexes over all 2^m values (beyond it the pruned form is cheaper). */
const MAX_MULTIPLEXED_BITS = 10;
/** Widest register a multiplexed flag rotation may have at all (its angles take O(4^m) work to compute). */
const MAX_EXPLICIT_MULTIPLEXED_BITS = 14;
/** Simulator kernel id of the fast-inverse block (src/sim/kernels/fastInverseKernel.ts; data in Block.kernelData). */
export const FAST_INVERSE_KERNEL = 'fast-inverse';

export interface FastInverseOptions {
  /** Adder of the reversible arithmetic: Draper's QFT adder (default) or Cuccaro's ripple-carry adder. */
  readonly adder?: 'qft' | 'ripple';
  /** Target for the rigorous error bound on the block, max |<0|U|0> − M/α| in operator norm (default 1e-3). */
  readonly precision?: number;
  /** Cap on the energy-register width m (default 16); `bitsCapped` reports when it kept the bound above `precision`. */
  readonly maxBits?: number;
  /** Electron-number window: N, or [Nmin, Nmax]; the encoding is then P (w − A)⁻¹ P. Default: the whole Fock space. */
  readonly electrons?: number | readonly [number, number];
  /**
   * `multiplexed`: one Gray-code multiplexed ry and rz over all 2^m register values (2^{m+1} rotations, exact);
   * `pruned`: one multi-controlled ry/rz per dyadic interval of values (≈ O(1/precision + m) of them, within precision/2).
   * Default: `multiplexed` when every register value stands for one energy (exact encoding) and m ≤ 10, else `pruned`.
   */
  readonly flagRotation?: 'pruned' | 'multiplexed';
  /** Passed to oneBodyRotation (Givens network or fermionic Fourier transform). */
  readonly rotation?: Omit<OneBodyRotationOptions, 'name'>;
  readonly label?: string;
}

export interface FastInverseEncoding extends BlockEncoding {
  readonly w: ComplexScalar;
  /**
   * c = max(|Im w|, g − ρ) with g the distance from w to the hulls of the true energies behind the register values: c never
   * exceeds the distance from w to A's spectrum on the window nor |w − E*(v)|, so ‖c(w − A)⁻¹‖ ≤ 1; α = 1/c ≤ 1/|Im w|.
   */
  readonly c: number;
  /** Energy-register width m. */
  readonly registerBits: number;
  /** Electron-counter width (0 without a window). */
  readonly counterBits: number;
  /**
   * The register's layout: v = Σ_k weights[k]·n_k − sumMin, so v ≈ (E − minEnergy)/step with ε̃_k = modeOffset + step·weights[k];
   * the flag uses the midpoint E*(v) of the true energies behind each value. `commensurate`: every value stands for one energy.
   */
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
  /**
   * Bound on ‖<0_anc|U|0_anc> − M/α‖ (operator norm, hence on every entry): rounding + decomposition + piecewise parts
   * (rigorous) + a stated floating-point term. It is ≤ precision unless `bitsCapped`.
   */
  readonly quantisationBound: number;
  readonly boundParts: {
    /** The register's rounding: true energies sharing a register value get the flag of their midpoint. */
    readonly rounding: number;
    /** ρ/max(|Im w|, g), ρ = N_max · the rotation's residual ‖T − V diag(ε) V†‖ (e.g. T circulant only within tolerance). */
    readonly decomposition: number;
    /** Merging register values into intervals (pruned flag rotation). */
    readonly piecewise: number;
    /** Stated floating-point term, FLOATING_POINT_FACTOR·u·(gates + n²·max(1, n·max|T_ij| / max(|Im w|, g))), u = 2^−53. */
    readonly floatingPoint: number;
  };
  /** The same bound on ‖α<0|U|0> − M‖ = α · quantisationBound. */
  readonly inverseErrorBound: number;
  readonly bitsCapped: boolean;
  readonly window: Window | null;
  readonly flagRotation: 'pruned' | 'multiplexed';
  /** Number of flag rotation pairs. */
  readonly flagRotations: number;
}

/**
 * Rotations already built per matrix object and options: the rotation depends on T alone, not on w or the precision, so
 * repeated encodings of one T (several shifts, re-planned precisions) diagonalise it once. T is not changed after a call.
 */
const rotationCache = new WeakMap<ComplexMatrix, Map<string, ReturnType<typeof oneBodyRotation>>>();

function memoisedRotation(T: ComplexMatrix, options: Omit<OneBodyRotationOptions, 'name'>): ReturnType<typeof oneBodyRotation> {
  let byOptions = rotationCache.get(T);
  if (!byOptions) rotationCache.set(T, (byOptions = new Map()));
  const key = JSON.stringify(options);
  let rotation = byOptions.get(key);
  if (!rotation) byOptions.set(key, (rotation = oneBodyRotation(T, options)));
  return rotation;
}

/** Rounding units per simulated gate and per matrix entry in the floating-point term of the bound. */
const FLOATING_POINT_FACTOR = 32;

/**
 * A stated (not proven) model of floating-point rounding: each gate applied in double precision moves an amplitude by a
 * few units u = 2^−53, and the energies ε_k carry about n·u·max|T_ij| each, which c/(w − E) turns into that over the
 * distance to the spectrum (Higham, Accuracy and Stability of Numerical Algorithms, 2002, ch. 3).
 */
function floatingPointTerm(gates: number, T: ComplexMatrix, gap: number): number {
  let largest = 0;
  for (let e = 0; e < T.n * T.n; e++) largest = Math.max(largest, Math.hypot(T.re[e]!, T.im[e]!));
  return FLOATING_POINT_FACTOR * 2 ** -53 * (gates + T.n * T.n * Math.max(1, (T.n * largest) / gap));
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
 * a flag rotation putting f = c/(w − E*(v)) on |0> (Möttönen et al., Phys. Rev. Lett. 93, 130502, 2004, multiplexed or
 * pruned to dyadic intervals), E*(v) the midpoint of the true energies Σ ε_k n_k of the window's occupations with value v
 * (registerHull); then everything uncomputed. Compute/action form: a controlled call controls only the flag.
 * Error (flagAmplitude): each occupation is off by at most half its value's energy spread, seen through c/(w − E); ρ =
 * N_max·residual covers an inexact diagonalisation; the pruned flag adds at most each interval's bound (flagIntervals).
 * The grid is refined until rounding + decomposition ≤ precision/2 (pruning gets precision/2) or maxBits stops it.
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
  const rotation = memoisedRotation(T, options.rotation ?? {});
  // ‖Σ X_ij a_i† a_j‖ ≤ N_max‖X‖₂ on the window (its eigenvalues are sums of N ≤ N_max eigenvalues of X).
  const rho = sector.max * rotation.residual;
  const grid = energyGrid(rotation.energies, sector, { budget: precision / 2, w, maxBits, rho });
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
  if (window) compute.push(...electronWindowOps(adder, window, { system, counter, windowQubit: windowQubit!, scratch, carry }));
  const minEnergy = grid.modeOffset * sector.min + grid.step * grid.sumMin;
  const energies = grid.values;
  const mode = options.flagRotation ?? (grid.commensurate && m <= MAX_MULTIPLEXED_BITS ? 'multiplexed' : 'pruned');
  if (mode === 'multiplexed' && m > MAX_EXPLICIT_MULTIPLEXED_BITS) {
    throw new RangeError(`fastInverse: a multiplexed flag rotation over ${m} bits is too large (at most ${MAX_EXPLICIT_MULTIPLEXED_BITS}); use "pruned"`);
  }
  const flagOps = flagRotationOps(mode, energies, register, flag, windowQubit, precision / 2);
  // Only the flag is a signal qubit: the arithmetic registers are computed and uncomputed around the flag rotation, and
  // outside the window the flag itself is sent to |1>.
  const ancillas: AncillaRegister[] = [{ name: 'flag', size: 1, role: 'signal' }, { name: 'energy', size: m, role: 'clean' }];
  if (window) ancillas.push({ name: 'electron_counter', size: counterBits, role: 'clean' }, { name: 'window', size: 1, role: 'clean' });
  if (adder === 'ripple') ancillas.push({ name: 'adder_scratch', size: scratchSize, role: 'clean' }, { name: 'adder_carry', size: 1, role: 'clean' });
  const label = options.label ?? 'fast inverse';
  const block = defineConjugatedBlock(
    {
      name: 'fast_inverse', role: `block-encoding of (w - A)^-1 by orbital rotation, ${m}-bit energy arithmetic and a flag rotation`, qubits: next,
      nativeKernel: FAST_INVERSE_KERNEL,
      kernelData: {
        system, flag: [flag], register, weights: grid.weights, offset: [-grid.sumMin], counter,
        window: window ? [windowQubit!, window.min, window.max] : [], adder: [adder === 'ripple' ? 1 : 0], scratch,
        carry: adder === 'ripple' ? [carry] : [], simulatedCompute: [1],
      },
      workQubits: [...register, ...counter, ...(window ? [windowQubit!] : []), ...scratch, ...(adder === 'ripple' ? [carry] : [])],
    },
    compute,
    flagOps.ops,
  );
  const floatingPoint = floatingPointTerm(blockGateTotal(block), T, energies.gap);
  const quantisationBound = energies.rounding + energies.decomposition + flagOps.piecewiseError + floatingPoint;
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
    boundParts: { rounding: energies.rounding, decomposition: energies.decomposition, piecewise: flagOps.piecewiseError, floatingPoint },
    inverseErrorBound: quantisationBound / energies.c,
    bitsCapped: grid.capped,
    window,
    flagRotation: mode,
    flagRotations: flagOps.rotations,
  };
}
