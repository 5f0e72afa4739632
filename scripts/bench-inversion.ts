// bench-inversion: cost of the fast inverse (w − A)⁻¹ versus the direct LCU of w − H for a Hubbard ring whose one-body part
// is scaled by s — α, register width, gate and Toffoli-relevant counts. Run: npx tsx scripts/bench-inversion.ts
import { blockCounts, totalGates, type GateCounts } from '../src/circuit/gateCounts.js';
import { standardGate } from '../src/circuit/standardGates.js';
import { directShift } from '../src/inversion/directShift.js';
import { fastInverse } from '../src/inversion/fastInverse.js';
import type { ComplexMatrix } from '../src/linalg/ComplexMatrix.js';
import type { FermionModel, TwoBodyTerm } from '../src/model/FermionModel.js';

/** Hubbard ring of L sites (both spins, up modes first), hopping −s·t, on-site level −s·μ, interaction U (not scaled). */
function ring(L: number, s: number, t = 1.013719, mu = 0.413731, U = 1): FermionModel {
  const n = 2 * L;
  const T: ComplexMatrix = { n, re: new Float64Array(n * n), im: new Float64Array(n * n) };
  for (const b of [0, L]) {
    for (let i = 0; i < L; i++) {
      const j = (i + 1) % L;
      T.re[(b + i) * n + b + j] = T.re[(b + j) * n + b + i] = -s * t;
      T.re[(b + i) * n + b + i] = -s * mu;
    }
  }
  const twoBody: TwoBodyTerm[] = [];
  for (let i = 0; i < L; i++) {
    twoBody.push({ i, j: L + i, k: i, l: L + i, re: U, im: 0 }, { i: L + i, j: i, k: L + i, l: i, re: U, im: 0 });
  }
  const up = Array.from({ length: L }, (_, k) => k);
  return {
    name: `ring-${L}`, modes: n, electrons: L, spinBlocks: { up, down: up.map((k) => k + L) }, oneBody: T,
    oneBodyInB: { n, re: new Float64Array(n * n), im: new Float64Array(n * n) }, twoBody, broadening: 0.1, grid: { from: -2, to: 2, points: 5 },
  };
}

/** Gates with ≥ 2 controls, and a Toffoli estimate: k-controlled X = 2k − 3, other k-controlled gates 2(k − 1) (Nielsen & Chuang §4.3, from memory). */
function toffoliCounts(counts: GateCounts): { multiControlled: number; toffoli: number } {
  let multiControlled = 0;
  let toffoli = 0;
  for (const [kind, count] of counts) {
    const parts = kind.split(' @ ');
    const name = parts[parts.length - 1]!;
    let k = standardGate(name)?.controls ?? 0;
    for (const p of parts.slice(0, -1)) {
      const m = /^(neg)?ctrl(?:\((\d+)\))?$/.exec(p);
      if (m) k += Number(m[2] ?? 1);
    }
    if (k < 2) continue;
    multiControlled += count;
    const isX = name === 'x' || name === 'cx' || name === 'ccx';
    toffoli += count * (isX ? 2 * k - 3 : 2 * (k - 1));
  }
  return { multiControlled, toffoli };
}

const w = { re: 0.37, im: 0.1 };
const precision = 2e-2;
console.log(`w = ${w.re} + ${w.im}i, precision ${precision}, window N = L, pruned flag rotation; fast inverse uses the QFT adder unless noted`);
console.log(['L', 'modes', 's', 'adder', 'alpha fast', 'alpha direct', 'alpha^2 direct/fast', 'm', 'flag rot.', 'gates fast', 'ccx fast', 'mc fast', 'Toffoli est. fast', 'gates direct', 'mc direct', 'Toffoli est. direct', 'bound'].join(' | '));
for (const L of [2, 4, 8]) {
  for (const s of [1, 10, 100, 1000, 10000]) {
    const model = ring(L, s);
    const direct = directShift(model, w);
    const directCounts = blockCounts(direct.block);
    for (const adder of L === 4 ? (['qft', 'ripple'] as const) : (['qft'] as const)) {
      const fast = fastInverse(model.oneBody, w, { precision, maxBits: 24, electrons: L, adder, flagRotation: 'pruned' });
      const fastCounts = blockCounts(fast.block);
      const f = toffoliCounts(fastCounts);
      const d = toffoliCounts(directCounts);
      console.log([
        L, 2 * L, s, adder, fast.alpha.toFixed(3), direct.alpha.toFixed(1), ((direct.alpha / fast.alpha) ** 2).toExponential(2), fast.registerBits, fast.flagRotations,
        totalGates(fastCounts), fastCounts.get('ccx') ?? 0, f.multiControlled, f.toffoli, totalGates(directCounts), d.multiControlled, d.toffoli,
        fast.quantisationBound.toExponential(2) + (fast.bitsCapped ? ' (capped)' : ''),
      ].join(' | '));
    }
  }
}
