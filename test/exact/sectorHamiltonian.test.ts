// sectorHamiltonian: products agree with the dense Jordan–Wigner matrix of an independent reference;
// products (plain and fused Lanczos steps) split among the workers of the shared pool (src/core/workerPool.ts) give the
// same bytes as on one thread.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { fockSector, type FockSector } from '../../src/exact/fockSector.js';
import { groundSectorSpec, shiftedSpec } from '../../src/exact/internal/modelSectors.js';
import { randomVector } from '../../src/exact/internal/randomVector.js';
import { closeExactWorkers } from '../../src/exact/internal/rowThreads.js';
import { SHARED_LENGTH, sharedFloat32, zeroVec, type CVec } from '../../src/exact/internal/vec.js';
import type { FermionModel } from '../../src/model/FermionModel.js';
import { sectorHamiltonian } from '../../src/exact/sectorHamiltonian.js';
import { sectorIndex } from '../../src/exact/sectorIndex.js';
import { denseHamiltonian, sectorStates } from '../helpers/denseFock.js';
import { hubbard, randomModel } from '../helpers/models.js';

/** The model without hops between the halves and with density–density interactions only (no generic terms). */
function separable(model: FermionModel): FermionModel {
  const n = model.modes;
  const h = n / 2;
  const re = model.oneBody.re.map((v, e) => ((Math.floor(e / n) < h) === (e % n < h) ? v : 0));
  const im = model.oneBody.im.map((v, e) => ((Math.floor(e / n) < h) === (e % n < h) ? v : 0));
  const twoBody = model.twoBody.filter((t) => t.i === t.k && t.j === t.l && t.im === 0);
  return { ...model, oneBody: { n, re, im }, twoBody };
}

/** y = H x with H the dense reference matrix, in the sector's own ordering. */
function denseProduct(model: FermionModel, electrons: number, sector: FockSector, x: CVec): { re: number[]; im: number[] } {
  const states = sectorStates(model.modes, electrons);
  const dense = denseHamiltonian(model, electrons);
  const index = states.map((s) => sectorIndex(sector, s));
  const re = new Array<number>(states.length).fill(0);
  const im = new Array<number>(states.length).fill(0);
  states.forEach((_, row) => {
    states.forEach((__, col) => {
      const { re: hr, im: hi } = dense[row]![col]!;
      const xr = x.re[index[col]!]!;
      const xi = x.im === null ? 0 : x.im[index[col]!]!;
      re[index[row]!]! += hr * xr - hi * xi;
      im[index[row]!]! += hr * xi + hi * xr;
    });
  });
  return { re, im };
}

describe('sectorHamiltonian(model, sector).apply', () => {
  // 10 modes, 5 electrons: blocks of 10 low rows (one group of eight plus a tail) with six low hops
  // per row, so every unrolled path of the real kernel runs; complex models take the complex path,
  // cross-half hops and general two-body terms the generic one.
  it('equals the dense matrix of H built entry by entry from the Jordan–Wigner rules', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 10_000 }), fc.boolean(), fc.boolean(), (seed, complex, general) => {
        const random = randomModel(seed, 10, 5, complex, 0.02);
        const model = general ? random : separable(random);
        const sector = fockSector(groundSectorSpec(model));
        const h = sectorHamiltonian(model, sector, { threads: 1 });
        expect(h.real).toBe(!complex);
        expect(h.steps === null).toBe(complex || general);
        const x = randomVector(sector.dimension, complex, seed);
        const expected = denseProduct(model, 5, sector, x);
        const y = zeroVec(sector.dimension, complex);
        h.apply(x, y);
        const fused = zeroVec(sector.dimension, complex);
        h.steps?.step(x, 1, fused, 0, x);
        for (let k = 0; k < sector.dimension; k++) {
          expect(y.re[k]).toBeCloseTo(expected.re[k]!, 10);
          if (complex) expect(y.im![k]).toBeCloseTo(expected.im[k]!, 10);
          if (h.steps !== null) expect(fused.re[k]).toBeCloseTo(expected.re[k]!, 10);
        }
        h.release();
      }),
      { numRuns: 16 },
    );
  });
});

describe('sectorHamiltonian(model, sector, { threads })', () => {
  it('gives bit-identical products with 1, 2 and 3 threads (rows are owned by one thread each)', () => {
    const model = hubbard({ sites: 8, hopping: 1, interaction: 4, chemicalPotential: 2, ring: true, spin: 0 });
    const sector = fockSector(groundSectorSpec(model));
    expect(sector.dimension).toBe(4900);
    const x = randomVector(sector.dimension, false, 7);
    expect(x.re.buffer).toBeInstanceOf(SharedArrayBuffer);
    const outputs = [1, 2, 3].map((threads) => {
      const h = sectorHamiltonian(model, sector, { threads });
      const y = zeroVec(sector.dimension, false);
      h.apply(x, y);
      h.apply(x, y);
      h.release();
      return Buffer.from(y.re.buffer);
    });
    expect(outputs[0]!.some((b) => b !== 0)).toBe(true);
    expect(outputs[1]!.equals(outputs[0]!)).toBe(true);
    expect(outputs[2]!.equals(outputs[0]!)).toBe(true);
  });

  it('gives bit-identical Lanczos step operations (steps) with 1, 2 and 3 threads, matching plain loops', () => {
    const model = hubbard({ sites: 8, hopping: 1, interaction: 4, chemicalPotential: 2, ring: true, spin: 0 });
    const sector = fockSector(groundSectorSpec(model));
    const n = sector.dimension;
    const x = randomVector(n, false, 7);
    const z = randomVector(n, false, 8);
    const q = randomVector(n, false, 9);
    const plain = zeroVec(n, false);
    sectorHamiltonian(model, sector, { threads: 1 }).apply(x, plain);
    const outputs = [1, 2, 3].map((threads) => {
      const h = sectorHamiltonian(model, sector, { threads });
      const y = zeroVec(n, false);
      const dot = h.steps!.step(x, 0.5, y, 0.75, z);
      const afterStep = Float64Array.from(y.re);
      const copy = { re: sharedFloat32(n), im: null, scale: 1 };
      const projection = h.steps!.update([{ re: 0.3, im: 0, v: x }, { re: -0.2, im: 0, v: z }], y, [q, x], copy);
      h.release();
      return { dot, afterStep, projection, bytes: Buffer.from(y.re.buffer), copy };
    });
    const first = outputs[0]!;
    let expectedDot = 0;
    for (let k = 0; k < n; k++) {
      expect(first.afterStep[k]).toBeCloseTo(0.5 * plain.re[k]! - 0.75 * z.re[k]!, 12);
      expectedDot += x.re[k]! * first.afterStep[k]!;
    }
    expect(first.dot).toBeCloseTo(expectedDot, 9);
    const w = Array.from({ length: n }, (_, k) => first.afterStep[k]! - 0.3 * x.re[k]! + 0.2 * z.re[k]!);
    const sum = (f: (k: number) => number): number => w.reduce((acc, _, k) => acc + f(k), 0);
    expect(first.projection.normSquared).toBeCloseTo(sum((k) => w[k]! * w[k]!), 8);
    expect(first.projection.overlaps[0]![0]).toBeCloseTo(sum((k) => q.re[k]! * w[k]!), 9);
    expect(first.projection.overlaps[1]![0]).toBeCloseTo(sum((k) => x.re[k]! * w[k]!), 9);
    for (let k = 0; k < n; k += 97) expect(first.copy.re[k]).toBe(Math.fround(w[k]!));
    for (const other of outputs.slice(1)) {
      expect(other.bytes.equals(first.bytes)).toBe(true);
      expect(other.dot).toBe(first.dot);
      expect(other.projection).toEqual(first.projection);
      expect(Buffer.from(other.copy.re.buffer).equals(Buffer.from(first.copy.re.buffer))).toBe(true);
    }
  });

  it('shares the worker pool between sectors: interleaved products and a release leave the others exact', () => {
    const model = hubbard({ sites: 10, hopping: 1, interaction: 4, chemicalPotential: 2, ring: true, spin: 0 });
    const ground = fockSector(groundSectorSpec(model));
    const added = fockSector(shiftedSpec(groundSectorSpec(model), 1, [0]));
    expect(Math.min(ground.dimension, added.dimension)).toBeGreaterThanOrEqual(SHARED_LENGTH);
    const reference = [ground, added].map((sector) => {
      const h = sectorHamiltonian(model, sector, { threads: 1 });
      const y = zeroVec(sector.dimension, false);
      h.apply(randomVector(sector.dimension, false, 5), y);
      return Buffer.from(y.re.buffer);
    });
    const threaded = [ground, added].map((sector) => sectorHamiltonian(model, sector, { threads: 2 }));
    const product = (k: number): Buffer => {
      const sector = k === 0 ? ground : added;
      const y = zeroVec(sector.dimension, false);
      threaded[k]!.apply(randomVector(sector.dimension, false, 5), y);
      return Buffer.from(y.re.buffer);
    };
    expect(product(0).equals(reference[0]!)).toBe(true);
    expect(product(1).equals(reference[1]!)).toBe(true);
    threaded[0]!.release();
    expect(product(1).equals(reference[1]!)).toBe(true);
    expect(product(0).equals(reference[0]!)).toBe(true);
    threaded[1]!.release();
  });

  it('goes on on the calling thread with the same bytes after closeExactWorkers, and starts new workers for a new sector', async () => {
    const model = hubbard({ sites: 10, hopping: 1, interaction: 4, chemicalPotential: 2, ring: true, spin: 0 });
    const sector = fockSector(groundSectorSpec(model));
    const x = randomVector(sector.dimension, false, 5);
    const product = (h: ReturnType<typeof sectorHamiltonian>): Buffer => {
      const y = zeroVec(sector.dimension, false);
      h.apply(x, y);
      return Buffer.from(y.re.buffer);
    };
    const reference = product(sectorHamiltonian(model, sector, { threads: 1 }));
    const live = sectorHamiltonian(model, sector, { threads: 2 });
    expect(product(live).equals(reference)).toBe(true);
    await closeExactWorkers();
    expect(product(live).equals(reference)).toBe(true);
    live.release();
    const fresh = sectorHamiltonian(model, sector, { threads: 2 });
    expect(product(fresh).equals(reference)).toBe(true);
    fresh.release();
  });
});
