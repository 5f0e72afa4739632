// bench-resolvent: the inverse block-encodings of (w − H)⁻¹ for the 4-mode Hubbard dimer (t = 1, U = 2, μ = U/2, N = 2) at
// the particle shift w = iη + E0, both routes: degree, qubits, gate counts, build time, and the simulation time of one
// sector column (one state-vector run of the whole circuit). Run: npx tsx scripts/bench-resolvent.ts [eta ...]
import { blockCounts, totalGates } from '../src/circuit/gateCounts.js';
import { call } from '../src/circuit/ops.js';
import { hermitianEigen } from '../src/linalg/hermitianEigen.js';
import type { ComplexMatrix } from '../src/linalg/ComplexMatrix.js';
import type { FermionModel } from '../src/model/FermionModel.js';
import { ladderSumMatrix } from '../src/operators/ladderSumMatrix.js';
import { modelHamiltonian } from '../src/operators/modelHamiltonian.js';
import { resolventEncoding } from '../src/resolvent/resolventEncoding.js';
import { StateVector } from '../src/sim/StateVector.js';
import { applyUnitaryOps } from '../src/sim/applyUnitaryOps.js';

function dimer(t: number, U: number): FermionModel {
  const n = 4;
  const T: ComplexMatrix = { n, re: new Float64Array(n * n), im: new Float64Array(n * n) };
  for (const b of [0, 2]) {
    T.re[b * n + b + 1] = T.re[(b + 1) * n + b] = -t;
    T.re[b * n + b] = T.re[(b + 1) * n + b + 1] = -U / 2;
  }
  return {
    name: 'hubbard-dimer', modes: n, electrons: 2, spinBlocks: { up: [0, 1], down: [2, 3] }, oneBody: T,
    oneBodyInB: { n, re: new Float64Array(n * n), im: new Float64Array(n * n) },
    twoBody: [{ i: 0, j: 2, k: 0, l: 2, re: U, im: 0 }, { i: 2, j: 0, k: 2, l: 0, re: U, im: 0 }, { i: 1, j: 3, k: 1, l: 3, re: U, im: 0 }, { i: 3, j: 1, k: 3, l: 1, re: U, im: 0 }],
    broadening: 0.1, grid: { from: -4, to: 4, points: 9 },
  };
}

/** Ground energy of the N-electron sector: the lowest eigenvalue of H + 100 (N̂ − N)² on the Fock space. */
function groundEnergy(model: FermionModel): number {
  const H = ladderSumMatrix(modelHamiltonian(model), model.modes);
  for (let s = 0; s < H.n; s++) {
    let count = 0;
    for (let v = s; v !== 0; v &= v - 1) count++;
    H.re[s * H.n + s]! += 100 * (count - model.electrons) ** 2;
  }
  return hermitianEigen(H).values[0]!;
}

const model = dimer(1, 2);
const E0 = groundEnergy(model);
const etas = process.argv.slice(2).map(Number);
for (const eta of etas.length > 0 ? etas : [0.5, 0.1]) {
  for (const route of ['direct', 'preconditioned'] as const) {
    const w = { re: E0, im: eta };
    let start = performance.now();
    const encoding = resolventEncoding(model, w, { route, precision: 1e-2 });
    const buildMs = performance.now() - start;
    const counts = blockCounts(encoding.block);
    const r = encoding.report;
    start = performance.now();
    const state = StateVector.basis(encoding.block.qubits, 0b0111);
    applyUnitaryOps(state, [call(encoding.block, Array.from({ length: encoding.block.qubits }, (_, k) => k))]);
    const columnMs = performance.now() - start;
    console.log(JSON.stringify({
      eta, route, degree: r.degree, delta: r.delta, K: r.conditionBound, alphaM: r.alphas.M, alpha: r.alphas.total, qubits: r.qubits,
      gates: totalGates(counts), cx: counts.get('cx') ?? 0, errorBound: r.errorBound, errorBoundOperator: r.errorBoundOperator,
      buildMs: Math.round(buildMs), oneColumnMs: Math.round(columnMs),
    }));
  }
}
