// parseModel on the continuum form: mode order and split, the kinetic spectrum {k_ν²/2}, the free-particle Green's
// function, one electron bound by a charge against a dense diagonalisation written here, the Coulomb pair energy counted
// once per pair, the contact term, A's orbital rotation (Fourier in 1D), size limits and errors naming their field.
import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/core/InputError.js';
import { solveExact } from '../../src/exact/solveExact.js';
import { oneBodyOfA } from '../../src/inversion/oneBodyOfA.js';
import type { ComplexMatrix } from '../../src/linalg/ComplexMatrix.js';
import { hermitianEigen } from '../../src/linalg/hermitianEigen.js';
import { parseModel } from '../../src/model/parseModel.js';
import { ladderSumMatrix } from '../../src/operators/ladderSumMatrix.js';
import { modelHamiltonian } from '../../src/operators/modelHamiltonian.js';
import { oneBodyRotation } from '../../src/rotations/oneBodyRotation.js';
import { reciprocalFrequencies as frequencies } from '../helpers/reciprocalFrequencies.js';
import { expectClose, expectComplexClose } from '../helpers/close.js';

const kSquared = (nu: readonly number[], box: readonly number[]): number => nu.reduce((s, v, d) => s + ((2 * Math.PI * v) / box[d]!) ** 2, 0);

/** The spin-up block (first `size` modes) of a 2·size × 2·size matrix. */
function upBlock(m: ComplexMatrix, size: number): ComplexMatrix {
  const re = new Float64Array(size * size);
  const im = new Float64Array(size * size);
  for (let p = 0; p < size; p++) {
    for (let q = 0; q < size; q++) {
      re[p * size + q] = m.re[p * m.n + q]!;
      im[p * size + q] = m.im[p * m.n + q]!;
    }
  }
  return { n: size, re, im };
}

function continuum(fields: Record<string, unknown>, rest: Record<string, unknown> = {}): unknown {
  return { continuum: { dimension: 1, points: [4], box: [6], interaction: 'none', ...fields }, electrons: 1, ...rest };
}

function messageOf(input: unknown): string {
  try {
    parseModel(input, 'wire.json');
  } catch (error) {
    expect(error).toBeInstanceOf(InputError);
    return (error as InputError).message;
  }
  return expect.fail('parseModel accepted the input');
}

describe('parseModel(continuum form): modes, spin blocks and split', () => {
  it('numbers spin-up grid points first (first dimension fastest), then spin-down; A = kinetic T, B = U (oneBodyInB)', () => {
    const model = parseModel(continuum({ dimension: 2, points: [2, 3], box: [1, 2], external: [{ position: [0.3, 0.4], charge: 1 }] }, { spin: 1 }), 'w.json');
    const size = 6;
    expect(model.modes).toBe(12);
    expect(model.spinBlocks).toEqual({ up: [0, 1, 2, 3, 4, 5], down: [6, 7, 8, 9, 10, 11] });
    expect(model.spinPolarization).toBe(1);
    expect(model.form).toEqual({ kind: 'continuum', dimension: 2, points: [2, 3], box: [1, 2] });
    const n = model.modes;
    for (let i = 0; i < n; i++) {
      for (let j = 0; j < n; j++) {
        const e = i * n + j;
        expect(model.oneBody.im[e]).toBe(0);
        // No term mixes the spins; the two spin blocks are equal.
        if ((i < size) !== (j < size)) expect(model.oneBody.re[e]).toBe(0);
        else expect(model.oneBody.re[e]).toBe(model.oneBody.re[(i % size) * n + (j % size)]);
        // B holds the diagonal external potential only, exactly the part of T beyond the kinetic diagonal.
        if (i !== j) expect(model.oneBodyInB.re[e]).toBe(0);
      }
    }
    const A = oneBodyOfA(model);
    for (let p = 0; p < size; p++) expect(A.re[p * n + p]).toBe(A.re[0]);
    expect(model.oneBodyInB.re[0]).toBeLessThan(0);
  });

  it('has the kinetic spectrum {k_ν²/2} over the reciprocal grid, for odd, even and mixed grids in 1D, 2D and 3D', () => {
    // Plane waves diagonalise a translation-invariant operator on a periodic grid (textbook Fourier analysis, from memory).
    for (const [points, box] of [[[5], [4]], [[4], [6]], [[2, 3], [1.5, 2]], [[2, 2, 3], [1, 2, 3]]] as const) {
      const model = parseModel(continuum({ dimension: points.length, points, box }), 'w.json');
      const size = points.reduce((a: number, b: number) => a * b, 1);
      const values = hermitianEigen(upBlock(oneBodyOfA(model), size)).values;
      const expected = frequencies(points).map((nu) => kSquared(nu, box) / 2).sort((a, b) => a - b);
      expected.forEach((e, k) => expectClose(values[k]!, e, 1e-10, `${points.join('×')}: level ${k}`));
    }
  });

  it('A’s orbital rotation takes the fermionic Fourier route per spin block in 1D with 2^k points, Givens in 2D', () => {
    const line = parseModel(continuum({ points: [8], box: [5], external: [{ position: [1], charge: 1 }] }), 'w.json');
    expect(oneBodyRotation(oneBodyOfA(line)).method).toBe('fourier');
    const plane = parseModel(continuum({ dimension: 2, points: [4, 2], box: [2, 2] }), 'w.json');
    expect(oneBodyRotation(oneBodyOfA(plane)).method).toBe('givens');
  });
});

describe('parseModel(continuum form): physics against independent references', () => {
  it('one electron in an empty box: G_pp(z) = (1/P) Σ_ν 1/(z − k_ν²/2) from the exact solver', () => {
    // Free-particle propagator, diagonal in plane waves, |<r_p|ν>|² = 1/P (textbook, from memory). The down-spin entries
    // are the particle part alone (the one electron is spin up, at k = 0, energy 0); the up-spin entries add the hole
    // part (1/P)/z, the k = 0 term removed from the particle part by Pauli blocking, so the sum is the same.
    const points = [4];
    const box = [3];
    const model = parseModel(continuum({ points, box }, { spin: 1, grid: { from: -2, to: 6, points: 9 }, broadening: 0.3 }), 'w.json');
    const solution = solveExact(model, { pairs: [[0, 0], [2, 2], [4, 4], [7, 7]] });
    expectClose(solution.groundEnergy, 0, 1e-12, 'E0');
    for (const entry of solution.green) {
      solution.frequencies.forEach((omega, f) => {
        let re = 0;
        let im = 0;
        for (const nu of frequencies(points)) {
          // 1/(z − ε) with z = ω + iη
          const a = omega - kSquared(nu, box) / 2;
          const norm = a * a + 0.09;
          re += a / norm / 4;
          im += -0.3 / norm / 4;
        }
        expectComplexClose([entry.re[f]!, entry.im[f]!], [re, im], 1e-9, `G_${entry.i}${entry.j}(${omega})`);
      });
    }
  });

  it('one electron and one charge in 1D: E0 and the one-electron levels equal a dense diagonalisation of T + diag(U)', () => {
    const points = [6];
    const L = 5;
    const charge = { position: [1.3], charge: 1.5 };
    const size = 6;
    // The grid Hamiltonian from the dual-basis formulas (Babbush et al., Phys. Rev. X 8, 011044, 2018), built here.
    const re = new Float64Array(size * size);
    const x = (p: number): number => (p * L) / size;
    for (let p = 0; p < size; p++) {
      for (let q = 0; q < size; q++) {
        for (const [nu] of frequencies(points)) {
          const k = (2 * Math.PI * nu!) / L;
          re[p * size + q] += ((k * k) / 2) * Math.cos(k * (x(p) - x(q))) / size;
          if (p === q && nu !== 0) re[p * size + p] += ((-4 * Math.PI) / L) * charge.charge * Math.cos(k * (charge.position[0]! - x(p))) / (k * k);
        }
      }
    }
    const { values, vectors } = hermitianEigen({ n: size, re, im: new Float64Array(size * size) });
    // Coulomb is on: one electron has no partner, so it must not change E0 (no self-interaction).
    const bound = parseModel(continuum({ points, box: [L], interaction: 'coulomb', external: [charge] }), 'w.json');
    expectClose(solveExact(bound, { pairs: [[0, 0]] }).groundEnergy, values[0]!, 1e-9, 'E0');
    // With no electron, G(z) = (z − h)⁻¹ exactly: every level appears as a pole with its eigenvector's weights.
    const empty = parseModel(continuum({ points, box: [L], external: [charge] }, { electrons: 0, grid: { from: -3, to: 8, points: 23 }, broadening: 0.2 }), 'w.json');
    const pairs: [number, number][] = [[0, 0], [1, 3], [5, 2]];
    const solution = solveExact(empty, { pairs });
    solution.green.forEach((entry) => {
      solution.frequencies.forEach((omega, f) => {
        let gRe = 0;
        let gIm = 0;
        for (let k = 0; k < size; k++) {
          const weight = vectors.re[entry.i * size + k]! * vectors.re[entry.j * size + k]! + vectors.im[entry.i * size + k]! * vectors.im[entry.j * size + k]!;
          const a = omega - values[k]!;
          gRe += (weight * a) / (a * a + 0.04);
          gIm += (-weight * 0.2) / (a * a + 0.04);
        }
        expectComplexClose([entry.re[f]!, entry.im[f]!], [gRe, gIm], 1e-9, `G_${entry.i}${entry.j}(${omega})`);
      });
    });
  });

  it('Coulomb: each pair of occupied spin-orbitals costs v(r_p − r_q) once, opposite spins on one point v(0), none alone', () => {
    // Two points in a box of L = 2: v(Δ) = (4π/L) cos(kΔ)/k² with k = π (ν = 1 only): v(0) = 2/π, v(1) = −2/π. The
    // paper's (2π/Ω) Σ_{(p,σ)≠(q,σ')} form counts each unordered pair once at (4π/Ω) Σ_ν cos/k² (Babbush et al. 2018).
    const model = parseModel(continuum({ points: [2], box: [2], interaction: 'coulomb' }), 'w.json');
    const B = ladderSumMatrix(modelHamiltonian(model, { part: 'B' }), 4);
    const diagonal = (state: number): number => B.re[state * 16 + state]!;
    const v0 = 2 / Math.PI;
    expectClose(diagonal(0b0001), 0, 1e-14, 'one electron');
    expectClose(diagonal(0b0101), v0, 1e-14, 'p0↑ p0↓');
    expectClose(diagonal(0b1001), -v0, 1e-14, 'p0↑ p1↓');
    expectClose(diagonal(0b0011), -v0, 1e-14, 'p0↑ p1↑');
    expectClose(diagonal(0b0111), v0 - 2 * v0, 1e-14, 'p0↑ p1↑ p0↓');
    expect(model.twoBody.length).toBe(4 * 3);
  });

  it('contact g: (g/ΔV) n_p↑ n_p↓ with ΔV = Ω/P on every point', () => {
    const model = parseModel(continuum({ dimension: 2, points: [2, 2], box: [1, 2], interaction: { contact: 0.5 } }), 'w.json');
    const B = ladderSumMatrix(modelHamiltonian(model, { part: 'B' }), 8);
    const upDownAtPoint3 = (1 << 3) | (1 << 7);
    expectClose(B.re[upDownAtPoint3 * 256 + upDownAtPoint3]!, 0.5 / (2 / 4), 1e-14, 'n_3↑ n_3↓');
    const twoPoints = (1 << 0) | (1 << 5);
    expectClose(B.re[twoPoints * 256 + twoPoints]!, 0, 1e-14, 'different points');
  });
});

describe('parseModel(continuum form): limits and errors', () => {
  it('accepts up to 1024 modes (too large to simulate, still a model) and refuses more, naming continuum.points', () => {
    expect(parseModel(continuum({ dimension: 2, points: [16, 32], box: [4, 4], interaction: { contact: 1 } }), 'w.json').modes).toBe(1024);
    expect(messageOf(continuum({ dimension: 3, points: [8, 8, 9], box: [4, 4, 4] })))
      .toBe('wire.json: continuum.points: 576 grid points make 1152 modes; at most 1024 modes are supported');
  });

  it('names the field of each mistake', () => {
    expect(messageOf(continuum({ dimension: 2, points: [4, 2.5], box: [1, 1] }))).toBe('wire.json: continuum.points[1]: expected an integer, got 2.5');
    expect(messageOf(continuum({ points: [0] }))).toBe('wire.json: continuum.points[0]: must be ≥ 1, got 0');
    expect(messageOf(continuum({ box: [0] }))).toBe('wire.json: continuum.box[0]: must be > 0, got 0');
    expect(messageOf(continuum({ dimension: 2 }))).toBe(
      'wire.json: continuum.points: expected 2 numbers (dimension 2), got 1\nwire.json: continuum.box: expected 2 numbers (dimension 2), got 1',
    );
    expect(messageOf(continuum({ external: [{ position: [1, 2], charge: 1 }] })))
      .toBe('wire.json: continuum.external[0].position: expected 1 number (dimension 1), got 2');
    expect(messageOf(continuum({ external: [{ position: [1], charge: Number.POSITIVE_INFINITY }] })))
      .toMatch(/^wire\.json: continuum\.external\[0\]\.charge: expected a finite number/);
    expect(messageOf(continuum({ dimension: 4 }))).toBe('wire.json: continuum.dimension: must be ≤ 3, got 4');
    expect(messageOf(continuum({ interaction: 'yukawa' }))).toMatch(/^wire\.json: continuum\.interaction: expected "coulomb", "none" or \{ "contact": g \}/);
    expect(messageOf(continuum({ spacing: 1 }))).toBe('wire.json: continuum.spacing: unknown key');
    expect(messageOf(continuum({}, { split: { oneBodyInB: [[0, 0]] } }))).toBe('wire.json: split: unknown key');
    expect(messageOf(continuum({ points: [3] }, { electrons: 7 }))).toBe('wire.json: electrons: 7 electrons do not fit in 6 modes');
    expect(messageOf(continuum({ points: [500], box: [1e-3] }))).toMatch(/^wire\.json: continuum\.box: the largest kinetic energy k²\/2 = .* exceeds 1000000/);
    expect(messageOf(continuum({ interaction: { contact: 1e6 }, box: [1e-2] }))).toMatch(/^wire\.json: continuum\.interaction\.contact: g\/ΔV = .* exceeds/);
    expect(messageOf(continuum({ external: [{ position: [0.5], charge: 1e6 }] }))).toMatch(/^wire\.json: continuum\.external: the external potential/);
  });
});
