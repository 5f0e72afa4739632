/**
 * checkModelBlocks: builds every block-encoding the pipeline uses for a model — ladder operators, H, A, B, the orbital
 * rotation of A and its inverse, the Slater-determinant preparation, and (B diagonal in the occupation basis) the
 * arithmetic encoding of B − b₀ — and verifies each by simulation against a
 * reference built independently of the circuit (fockOperatorMatrix from the model's fermion terms; the Gaussian unitary
 * of the decomposition's V), skipping with a stated reason what is too large to simulate or to form.
 */
import { call } from '../circuit/ops.js';
import { defineBlock } from '../circuit/defineBlock.js';
import type { ComplexMatrix } from '../linalg/ComplexMatrix.js';
import type { FermionModel } from '../model/FermionModel.js';
import { ancillaQubits, type BlockEncoding } from '../blocks/BlockEncoding.js';
import { ladderEncoding } from '../blocks/builders/ladderEncoding.js';
import { modelEncodings } from '../blocks/builders/modelEncodings.js';
import { oneBodyOfA } from '../inversion/oneBodyOfA.js';
import { oneBodyRotation, type OneBodyRotation } from '../rotations/oneBodyRotation.js';
import { slaterDeterminant } from '../rotations/slaterDeterminant.js';
import { blockCounts, countsToObject, totalGates } from '../circuit/gateCounts.js';
import { MAX_QUBITS, StateVector } from '../sim/StateVector.js';
import { applyUnitaryOps } from '../sim/applyUnitaryOps.js';
import { adjointMatrix } from '../linalg/adjointMatrix.js';
import { diagonalCheckItem } from './diagonalCheckItem.js';
import { encodingCheck, judge, skippedRow, type CheckRow, type CheckThresholds } from './encodingCheck.js';
import type { SimulationOptions } from '../sim/SimulationOptions.js';
import { onZeroAncillas } from './verifyEncoding.js';
import { applyFockOperator, modelFockTerms, type FockTerm } from './internal/fockOperatorMatrix.js';
import type { CheckItem } from './CheckItem.js';
import { fockReference } from './fockReference.js';
import { gaussianUnitaryMatrix, minor } from './internal/gaussianUnitaryMatrix.js';
import { unitaryEncoding } from './unitaryEncoding.js';

/** Widest block (system + ancillas) the check simulates: a state of 2^20 amplitudes. */
export const MAX_SIMULATED_QUBITS = 20;
/** Default for the most amplitude updates (simulated states × 2^width × gates) one row may cost: seconds of simulation. */
export const MAX_SIMULATION_WORK = 2 ** 36;
/** States verifyEncoding simulates for a probe row: 8 probes and 8 power-iteration steps of two simulations each. */
const PROBE_SIMULATIONS = 8 + 2 * 8;
/** Widest block verifyEncoding checks column by column by default. */
const EXHAUSTIVE_LIMIT = 12;
/** Widest register whose Gaussian-unitary reference (2^n × 2^n minors) the orbital-rotation rows form. */
export const MAX_GAUSSIAN_MODES = 10;
/** Widest system whose dense reference an encoding's own exact() may form. */
export const MAX_EXACT_SYSTEM_QUBITS = 12;

export interface CheckModelOptions {
  /** Pass/fail threshold on the error of exact constructions (default 1e-10). */
  readonly tolerance?: number;
  /** Largest accepted error bound of approximate constructions (default 1e-6); a larger bound is inconclusive. */
  readonly precision?: number;
  /** More encodings to check after the standard ones (later stages add theirs). */
  readonly extra?: readonly (BlockEncoding | CheckItem)[];
  /** Rows estimated to cost more amplitude updates than this are skipped (default MAX_SIMULATION_WORK). */
  readonly maxSimulationWork?: number;
  /** How every row is simulated (default: the simulator's defaults; the benchmarks pass the reference path). */
  readonly simulation?: SimulationOptions;
}

/** What a row is judged against, how much simulation it may cost and how it is simulated. */
export interface CheckLimits extends CheckThresholds {
  readonly maxSimulationWork?: number;
  readonly simulation?: SimulationOptions;
}

/**
 * What simulating an encoding's block `simulations` times costs: the qubits the simulator keeps (it leaves idle work
 * qubits out of the state) and the amplitude updates, simulations × 2^stateQubits × gates; `tooWide` when the kept qubits
 * exceed MAX_SIMULATED_QUBITS (the work is then not estimated).
 */
export function simulationWork(encoding: BlockEncoding, simulations: number, simulation: SimulationOptions): { width: number; stateQubits: number; work: number; tooWide: boolean } {
  const width = encoding.systemQubits + ancillaQubits(encoding);
  const stateQubits = width > MAX_QUBITS ? width : onZeroAncillas(encoding, simulation).stateQubits;
  const tooWide = stateQubits > MAX_SIMULATED_QUBITS;
  const work = tooWide ? Number.POSITIVE_INFINITY : simulations * 2 ** stateQubits * Math.max(1, totalGates(blockCounts(encoding.block)));
  return { width, stateQubits, work, tooWide };
}

/** The row for an item: skipped when too wide or too costly to simulate or when its reference cannot be formed, else verified. */
export function checkItem(item: CheckItem, thresholds: CheckLimits): CheckRow {
  const { encoding } = item;
  const simulation = thresholds.simulation ?? {};
  const width = encoding.systemQubits + ancillaQubits(encoding);
  const simulations = item.columns?.length ?? (width <= EXHAUSTIVE_LIMIT ? 2 ** encoding.systemQubits : PROBE_SIMULATIONS);
  const { stateQubits, work, tooWide } = simulationWork(encoding, simulations, simulation);
  if (tooWide) {
    return skippedRow(encoding, `${stateQubits} simulated qubits (of ${width}) exceed the simulation limit of ${MAX_SIMULATED_QUBITS}`);
  }
  if (item.reference === undefined && encoding.systemQubits > MAX_EXACT_SYSTEM_QUBITS) {
    return skippedRow(encoding, `no reference operator above ${MAX_EXACT_SYSTEM_QUBITS} system qubits`);
  }
  const limit = thresholds.maxSimulationWork ?? MAX_SIMULATION_WORK;
  if (work > limit) return skippedRow(encoding, `simulation work ${work.toExponential(1)} amplitude updates exceeds the limit ${limit.toExponential(1)}`);
  return encodingCheck(encoding, { tolerance: thresholds.tolerance, precision: thresholds.precision }, {
    ...simulation,
    ...(item.reference ? { reference: item.reference() } : {}),
    ...(item.columns ? { columns: item.columns } : {}),
  });
}

/** Largest |(V†TV)_ij − δ_ij ε_i|: how far the decomposition's V is from diagonalising T. */
function diagonalisationError(T: ComplexMatrix, rotation: OneBodyRotation): number {
  const n = T.n;
  const { V } = rotation;
  let worst = 0;
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      let re = 0;
      let im = 0;
      for (let a = 0; a < n; a++) {
        for (let b = 0; b < n; b++) {
          // conj(V_ai) T_ab V_bj
          const xr = V.re[a * n + i]!;
          const xi = -V.im[a * n + i]!;
          const tr = T.re[a * n + b]!;
          const ti = T.im[a * n + b]!;
          const yr = V.re[b * n + j]!;
          const yi = V.im[b * n + j]!;
          const pr = xr * tr - xi * ti;
          const pi = xr * ti + xi * tr;
          re += pr * yr - pi * yi;
          im += pr * yi + pi * yr;
        }
      }
      worst = Math.max(worst, Math.hypot(re - (i === j ? rotation.energies[i]! : 0), im));
    }
  }
  return worst;
}

function scaleOf(T: ComplexMatrix): number {
  let largest = 1;
  for (let e = 0; e < T.n * T.n; e++) largest = Math.max(largest, Math.hypot(T.re[e]!, T.im[e]!));
  return largest;
}

/** Applies a side check to a verified row: a failed side check turns a pass or an inconclusive row into a failure. */
function withSideCheck(row: CheckRow, ok: boolean, reason: string): CheckRow {
  if (ok || row.verdict === 'skipped' || row.verdict === 'fail') return row;
  return { ...row, verdict: 'fail', passed: false, reason };
}

function orbitalRows(T: ComplexMatrix, rotation: OneBodyRotation, thresholds: CheckLimits): CheckRow[] {
  const n = T.n;
  const qubits = Array.from({ length: n }, (_, k) => k);
  // U(V) has one-particle matrix V†, its inverse V.
  const forward = unitaryEncoding('orbital rotation', rotation.block, () => gaussianUnitaryMatrix(adjointMatrix(rotation.V)));
  const inverseBlock = defineBlock({ name: 'orbital_rotation_inverse', role: 'inverse orbital rotation U(V)†', qubits: n }, [
    call(rotation.block, qubits, [], { inverse: true }),
  ]);
  const inverse = unitaryEncoding('orbital rotation inverse', inverseBlock, () => gaussianUnitaryMatrix(rotation.V));
  const diagonal = diagonalisationError(T, rotation) <= thresholds.tolerance * scaleOf(T);
  const reason = `V†TV is not diagonal within ${thresholds.tolerance} (relative)`;
  return [forward, inverse].map((e) => {
    if (n > MAX_GAUSSIAN_MODES) return skippedRow(e, `the Gaussian-unitary reference is formed up to ${MAX_GAUSSIAN_MODES} modes`);
    return withSideCheck(checkItem({ encoding: e }, thresholds), diagonal, reason);
  });
}

function slaterRow(model: FermionModel, TA: ComplexMatrix, rotation: OneBodyRotation, thresholds: CheckLimits): CheckRow {
  const n = model.modes;
  const block = slaterDeterminant({ oneBody: TA }, model.electrons);
  const base = {
    label: 'Slater determinant',
    systemQubits: n,
    ancillaQubits: 0,
    alpha: 1,
    errorBound: 0,
    gates: countsToObject(blockCounts(block)),
    costNotes: [],
  };
  if (n > MAX_SIMULATED_QUBITS) {
    const reason = `${n} qubits exceed the simulation limit of ${MAX_SIMULATED_QUBITS}`;
    return { ...base, maxError: null, unitarityDeviation: null, method: 'skipped', verdict: 'skipped', passed: false, reason };
  }
  const occupied = [...rotation.sortedOrder.subarray(0, model.electrons)].sort((a, b) => a - b);
  const state = StateVector.zero(n);
  applyUnitaryOps(state, [call(block, Array.from({ length: n }, (_, k) => k))], thresholds.simulation);
  // Expected: b†_{k1} ⋯ b†_{kN} |vac> = Σ_S det V[S, occ] |S> (the decomposition's own V).
  let maxError = 0;
  for (let s = 0; s < 2 ** n; s++) {
    const bits: number[] = [];
    for (let q = 0; q < n; q++) if ((s >> q) & 1) bits.push(q);
    const [er, ei] = bits.length === occupied.length ? minor(rotation.V, bits, occupied) : [0, 0];
    maxError = Math.max(maxError, Math.hypot(state.re[s]! - er, state.im[s]! - ei));
  }
  // Ground state of A on the N-electron sector: A|ψ> = (sum of the N lowest ε_k)|ψ>, A from the model's fermion terms.
  const energy = rotation.sortedEnergies.subarray(0, model.electrons).reduce((sum, e) => sum + e, 0);
  const image = applyFockOperator(modelFockTerms(model, 'A'), n, state.re, state.im);
  let residual = 0;
  for (let s = 0; s < 2 ** n; s++) residual += (image.re[s]! - energy * state.re[s]!) ** 2 + (image.im[s]! - energy * state.im[s]!) ** 2;
  const unitarityDeviation = Math.abs(state.norm() - 1);
  const { verdict, reason } = judge(maxError, 0, unitarityDeviation, thresholds);
  const row: CheckRow = { ...base, maxError, unitarityDeviation, method: 'state', verdict, passed: verdict === 'pass', ...(reason ? { reason } : {}) };
  const eigen = Math.sqrt(residual) <= thresholds.tolerance * scaleOf(TA) * Math.max(1, model.electrons);
  return withSideCheck(row, eigen, `‖A|ψ> − (Σ lowest ε)|ψ>‖ = ${Math.sqrt(residual).toExponential(2)}: not the ground state of A`);
}

export function checkModelBlocks(model: FermionModel, options: CheckModelOptions = {}): CheckRow[] {
  const thresholds: CheckLimits = {
    tolerance: options.tolerance ?? 1e-10,
    precision: options.precision ?? 1e-6,
    ...(options.maxSimulationWork === undefined ? {} : { maxSimulationWork: options.maxSimulationWork }),
    ...(options.simulation === undefined ? {} : { simulation: options.simulation }),
  };
  const n = model.modes;
  const rows: CheckRow[] = [];
  for (let j = 0; j < n; j++) {
    for (const dagger of [false, true]) {
      const terms: FockTerm[] = [{ factors: [2 * j + (dagger ? 1 : 0)], re: 1, im: 0 }];
      rows.push(checkItem({ encoding: ladderEncoding(j, dagger, n), reference: () => fockReference(terms, n) }, thresholds));
    }
  }
  const { H, A, B } = modelEncodings(model);
  for (const [e, part] of [[H, 'all'], [A, 'A'], [B, 'B']] as const) {
    rows.push(checkItem({ encoding: e, reference: () => fockReference(modelFockTerms(model, part), n) }, thresholds));
  }
  const diagonal = diagonalCheckItem(model, thresholds.precision);
  if (diagonal !== null) rows.push(checkItem(diagonal, thresholds));
  const TA = oneBodyOfA(model);
  const rotation = oneBodyRotation(TA);
  rows.push(...orbitalRows(TA, rotation, thresholds));
  rows.push(slaterRow(model, TA, rotation, thresholds));
  for (const extra of options.extra ?? []) rows.push(checkItem('encoding' in extra ? extra : { encoding: extra }, thresholds));
  return rows;
}
