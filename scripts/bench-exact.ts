// bench-exact: wall time and peak memory of the exact solver on the half-filled Hubbard ring
// (U = 4t, μ = U/2, S_z = 0): ground level plus G_00 on 400 frequencies, η = 0.1, at the default
// continued-fraction tolerance (printed). Not part of the tests.
import { resourceUsage } from 'node:process';
import { formatBytes } from '../src/core/memoryBudget.js';
import { isInputError } from '../src/core/InputError.js';
import { frequencyGrid } from '../src/exact/frequencyGrid.js';
import { DEFAULT_GREEN_TOLERANCE, greensFunction } from '../src/exact/greensFunction.js';
import { groundLevel } from '../src/exact/groundLevel.js';
import type { ComplexMatrix } from '../src/linalg/ComplexMatrix.js';
import type { FermionModel, TwoBodyTerm } from '../src/model/FermionModel.js';

function ring(L: number, t: number, U: number): FermionModel {
  const n = 2 * L;
  const T: ComplexMatrix = { n, re: new Float64Array(n * n), im: new Float64Array(n * n) };
  for (const b of [0, L]) {
    for (let s = 0; s < L; s++) {
      const r = (s + 1) % L;
      T.re[(b + s) * n + b + r]! -= t;
      T.re[(b + r) * n + b + s]! -= t;
      T.re[(b + s) * n + b + s] = -U / 2;
    }
  }
  const twoBody: TwoBodyTerm[] = [];
  for (let s = 0; s < L; s++) {
    twoBody.push({ i: s, j: L + s, k: s, l: L + s, re: U, im: 0 });
    twoBody.push({ i: L + s, j: s, k: L + s, l: s, re: U, im: 0 });
  }
  const up = Array.from({ length: L }, (_, k) => k);
  return {
    name: `ring-${L}`,
    modes: n,
    electrons: L,
    spinBlocks: { up, down: up.map((k) => k + L) },
    spinPolarization: 0,
    oneBody: T,
    oneBodyInB: { n, re: new Float64Array(n * n), im: new Float64Array(n * n) },
    twoBody,
    broadening: 0.1,
    grid: { from: -8, to: 8, points: 400 },
  };
}

function run(L: number): void {
  const model = ring(L, 1, 4);
  const start = performance.now();
  try {
    const ground = groundLevel(model);
    const t1 = performance.now();
    const z = Array.from(frequencyGrid(model.grid), (w) => ({ re: w, im: model.broadening }));
    const g = greensFunction(model, ground, { z, pairs: [[0, 0]], tolerance: DEFAULT_GREEN_TOLERANCE });
    ground.hamiltonian.release();
    const t2 = performance.now();
    const peak = resourceUsage().maxRSS * 1024;
    console.log(
      `L=${L}: dimension ${ground.sector.dimension}, E0 = ${ground.energy.toFixed(10)}, degeneracy ${ground.degeneracy}, ` +
        `gap ${ground.gap === null ? 'none' : ground.gap.toFixed(8)}, residual ${ground.residual.toExponential(2)}`,
    );
    console.log(
      `      ground ${((t1 - start) / 1000).toFixed(2)} s (${ground.applications} H products), ` +
        `G_00 ${((t2 - t1) / 1000).toFixed(2)} s (${g.applications} H products, tolerance ${DEFAULT_GREEN_TOLERANCE.toExponential(0)} of max|G|), ` +
        `total ${((t2 - start) / 1000).toFixed(2)} s, peak RSS ${formatBytes(peak)}`,
    );
  } catch (error) {
    if (!isInputError(error)) throw error;
    console.log(`L=${L}: refused: ${error.message}`);
  }
}

const sizes = process.argv.slice(2).map(Number);
for (const L of sizes.length > 0 ? sizes : [10, 12]) run(L);
