/**
 * checkModelBlocks: builds every block-encoding the pipeline uses for a model — ladder operators, H, A, B,
 * the orbital rotation of A and its inverse, the Slater-determinant preparation — and verifies each
 * against its exact operator by simulation.
 */
import { call } from '../circuit/ops.js';
import { defineBlock } from '../circuit/defineBlock.js';
import type { ComplexMatrix } from '../linalg/ComplexMatrix.js';
import type { FermionModel } from '../model/FermionModel.js';
import { ladderEncoding } from '../blocks/builders/ladderEncoding.js';
import { modelEncodings } from '../blocks/builders/modelEncodings.js';
import { oneBodyRotation } from '../rotations/oneBodyRotation.js';
import { slaterDeterminant } from '../rotations/slaterDeterminant.js';
import { blockCounts, countsToObject } from '../circuit/gateCounts.js';
import { StateVector } from '../sim/StateVector.js';
import { applyUnitaryOps } from '../sim/applyUnitaryOps.js';
import { adjointMatrix } from '../linalg/adjointMatrix.js';
import type { BlockEncoding } from '../blocks/BlockEncoding.js';
import { encodingCheck, type CheckRow } from './encodingCheck.js';
import { gaussianUnitaryMatrix, minor } from './internal/gaussianUnitaryMatrix.js';
import { unitaryEncoding } from './unitaryEncoding.js';

export interface CheckModelOptions {
  /** Pass/fail threshold on every error (default 1e-10). */
  readonly tolerance?: number;
  /** More encodings to check after the standard ones (later stages add theirs). */
  readonly extra?: readonly BlockEncoding[];
}

/** T_A = T − (the part of T moved into B). */
export function oneBodyOfA(model: FermionModel): ComplexMatrix {
  const n = model.modes;
  const re = new Float64Array(n * n);
  const im = new Float64Array(n * n);
  for (let e = 0; e < n * n; e++) {
    re[e] = model.oneBody.re[e]! - model.oneBodyInB.re[e]!;
    im[e] = model.oneBody.im[e]! - model.oneBodyInB.im[e]!;
  }
  return { n, re, im };
}

function slaterRow(model: FermionModel, TA: ComplexMatrix, V: ComplexMatrix, occupied: readonly number[], tolerance: number): CheckRow {
  const block = slaterDeterminant({ oneBody: TA }, model.electrons);
  const n = model.modes;
  const state = StateVector.zero(n);
  applyUnitaryOps(state, [call(block, Array.from({ length: n }, (_, k) => k))]);
  // Expected: b†_{k1} ⋯ b†_{kN} |vac> = Σ_S det V[S, occ] |S>.
  let maxError = 0;
  for (let s = 0; s < 2 ** n; s++) {
    const bits: number[] = [];
    for (let q = 0; q < n; q++) if ((s >> q) & 1) bits.push(q);
    const [er, ei] = bits.length === occupied.length ? minor(V, bits, occupied) : [0, 0];
    maxError = Math.max(maxError, Math.hypot(state.re[s]! - er, state.im[s]! - ei));
  }
  return {
    label: 'Slater determinant',
    systemQubits: n,
    ancillaQubits: 0,
    alpha: 1,
    maxError,
    errorBound: 0,
    unitarityDeviation: Math.abs(state.norm() - 1),
    method: 'state',
    gates: countsToObject(blockCounts(block)),
    costNotes: [],
    passed: maxError <= tolerance,
  };
}

export function checkModelBlocks(model: FermionModel, options: CheckModelOptions = {}): CheckRow[] {
  const tolerance = options.tolerance ?? 1e-10;
  const n = model.modes;
  const rows: CheckRow[] = [];
  for (let j = 0; j < n; j++) {
    rows.push(encodingCheck(ladderEncoding(j, false, n), tolerance));
    rows.push(encodingCheck(ladderEncoding(j, true, n), tolerance));
  }
  const { H, A, B } = modelEncodings(model);
  for (const e of [H, A, B]) rows.push(encodingCheck(e, tolerance));
  const TA = oneBodyOfA(model);
  const rotation = oneBodyRotation(TA);
  const qubits = Array.from({ length: n }, (_, k) => k);
  // U(V) has one-particle matrix V†, its inverse V.
  rows.push(encodingCheck(unitaryEncoding('orbital rotation', rotation.block, () => gaussianUnitaryMatrix(adjointMatrix(rotation.V))), tolerance));
  const inverse = defineBlock({ name: 'orbital_rotation_inverse', role: 'inverse orbital rotation U(V)†', qubits: n }, [
    call(rotation.block, qubits, [], { inverse: true }),
  ]);
  rows.push(encodingCheck(unitaryEncoding('orbital rotation inverse', inverse, () => gaussianUnitaryMatrix(rotation.V)), tolerance));
  const occupied = [...rotation.sortedOrder.subarray(0, model.electrons)].sort((a, b) => a - b);
  rows.push(slaterRow(model, TA, rotation.V, occupied, tolerance));
  for (const e of options.extra ?? []) rows.push(encodingCheck(e, tolerance));
  return rows;
}
