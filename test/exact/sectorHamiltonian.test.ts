// sectorHamiltonian: products (plain and fused Lanczos steps) split among worker threads give the
// same bytes as on one thread.
import { describe, expect, it } from 'vitest';
import { fockSector } from '../../src/exact/fockSector.js';
import { groundSectorSpec } from '../../src/exact/internal/modelSectors.js';
import { randomVector } from '../../src/exact/internal/randomVector.js';
import { zeroVec } from '../../src/exact/internal/vec.js';
import { sectorHamiltonian } from '../../src/exact/sectorHamiltonian.js';
import { hubbard } from '../helpers/models.js';

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

  it('gives bit-identical Lanczos step operations (steps) with 1, 2 and 3 threads', () => {
    const model = hubbard({ sites: 8, hopping: 1, interaction: 4, chemicalPotential: 2, ring: true, spin: 0 });
    const sector = fockSector(groundSectorSpec(model));
    const x = randomVector(sector.dimension, false, 7);
    const z = randomVector(sector.dimension, false, 8);
    const outputs = [1, 2, 3].map((threads) => {
      const h = sectorHamiltonian(model, sector, { threads });
      const y = zeroVec(sector.dimension, false);
      const dot = h.steps!.step(x, y, 0.75, z);
      const plain = zeroVec(sector.dimension, false);
      h.apply(x, plain);
      let expected = 0;
      for (let k = 0; k < sector.dimension; k++) expected += x.re[k]! * (plain.re[k]! - 0.75 * z.re[k]!);
      expect(dot).toBeCloseTo(expected, 9);
      const size = h.steps!.subtractNorm(0.3, x, y);
      h.steps!.scale(1 / size, y);
      h.release();
      return { dot, size, bytes: Buffer.from(y.re.buffer) };
    });
    expect(outputs[1]!.bytes.equals(outputs[0]!.bytes)).toBe(true);
    expect(outputs[2]!.bytes.equals(outputs[0]!.bytes)).toBe(true);
    expect(outputs[1]!.dot).toBe(outputs[0]!.dot);
    expect(outputs[2]!.dot).toBe(outputs[0]!.dot);
    expect(outputs[1]!.size).toBe(outputs[0]!.size);
    expect(outputs[2]!.size).toBe(outputs[0]!.size);
  });
});
