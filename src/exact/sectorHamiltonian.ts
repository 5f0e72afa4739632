/**
 * sectorHamiltonian: H restricted to a Fock sector, applied matrix-free. Hops inside the low modes
 * and inside the high modes act as Kronecker factors (row and column sweeps over contiguous memory);
 * densities form a stored diagonal; all other terms go through a per-state bit-operation path.
 */
import type { FermionModel } from '../model/FermionModel.js';
import { applyLadders } from './internal/bits.js';
import { hamiltonianTerms, type HamiltonianTerms, type Hop } from './internal/hamiltonianTerms.js';
import type { CVec } from './internal/vec.js';
import type { FockSector } from './fockSector.js';
import { sectorIndex } from './sectorIndex.js';

/** Sparse transitions between patterns of one popcount: dst += coef · src. */
interface HopTable {
  readonly src: Int32Array;
  readonly dst: Int32Array;
  readonly re: Float64Array;
  readonly im: Float64Array;
}

export interface SectorHamiltonian {
  readonly sector: FockSector;
  /** True when H has only real matrix elements in this basis (vectors may then be real). */
  readonly real: boolean;
  /** H's diagonal in this basis. */
  readonly diagonal: Float64Array;
  /** y = H x (y is overwritten; x and y must not alias; y complex whenever x is or H is complex). */
  apply(x: CVec, y: CVec): void;
}

function hopTable(patterns: Int32Array, rank: Int32Array, hops: readonly Hop[]): HopTable {
  const src: number[] = [];
  const dst: number[] = [];
  const re: number[] = [];
  const im: number[] = [];
  for (let r = 0; r < patterns.length; r++) {
    const p = patterns[r]!;
    for (const hop of hops) {
      const [q, sign] = applyLadders(p, [[hop.i, true], [hop.j, false]]);
      if (sign === 0) continue;
      src.push(r);
      dst.push(rank[q]!);
      re.push(sign * hop.re);
      im.push(sign * hop.im);
    }
  }
  return { src: Int32Array.from(src), dst: Int32Array.from(dst), re: Float64Array.from(re), im: Float64Array.from(im) };
}

function blockDiagonal(terms: HamiltonianTerms, sector: FockSector, out: Float64Array): void {
  const h = terms.lowModes;
  const nHigh = terms.modes - h;
  const cross = new Float64Array(nHigh);
  for (const block of sector.blocks) {
    const D = block.highPatterns.length;
    const highDiag = new Float64Array(D);
    for (let r = 0; r < D; r++) {
      const q = block.highPatterns[r]!;
      let s = 0;
      for (let m = 0; m < nHigh; m++) if ((q >>> m) & 1) s += terms.onsite[h + m]!;
      for (const d of terms.densities) {
        if (d.i >= h && (q >>> (d.i - h)) & 1 && (q >>> (d.j - h)) & 1) s += d.w;
      }
      highDiag[r] = s;
    }
    for (let lr = 0; lr < block.lowPatterns.length; lr++) {
      const p = block.lowPatterns[lr]!;
      let lowPart = 0;
      for (let m = 0; m < h; m++) if ((p >>> m) & 1) lowPart += terms.onsite[m]!;
      cross.fill(0);
      for (const d of terms.densities) {
        if (d.j < h) {
          if ((p >>> d.i) & 1 && (p >>> d.j) & 1) lowPart += d.w;
        } else if (d.i < h && (p >>> d.i) & 1) {
          cross[d.j - h]! += d.w;
        }
      }
      const base = block.offset + lr * D;
      for (let r = 0; r < D; r++) {
        let q = block.highPatterns[r]!;
        let s = lowPart + highDiag[r]!;
        while (q !== 0) {
          const m = 31 - Math.clz32(q & -q);
          s += cross[m]!;
          q &= q - 1;
        }
        out[base + r] = s;
      }
    }
  }
}

/** Builds the matrix-free sector Hamiltonian (tables cost O(2^(modes/2)·hops); diagonal O(dim)). */
export function sectorHamiltonian(model: FermionModel, sector: FockSector): SectorHamiltonian {
  const terms = hamiltonianTerms(model, sector.spec.lowModes);
  const { modes, electrons, lowModes: h } = sector.spec;
  const feasible = Math.min(h, electrons) - Math.max(0, electrons - (modes - h)) + 1;
  if (!terms.conservesLowCount && sector.blocks.length < feasible) {
    throw new Error('sectorHamiltonian: H changes the low-mode electron count; use the electron-number sector');
  }
  const diagonal = new Float64Array(sector.dimension);
  blockDiagonal(terms, sector, diagonal);
  const lowTables = new Map<number, HopTable>();
  const highTables = new Map<number, HopTable>();
  for (const block of sector.blocks) {
    const k = block.lowCount;
    const hc = sector.spec.electrons - k;
    if (!lowTables.has(k)) lowTables.set(k, hopTable(block.lowPatterns, sector.lowRank, terms.lowHops));
    if (!highTables.has(hc)) highTables.set(hc, hopTable(block.highPatterns, sector.highRank, terms.highHops));
  }
  const lowModes = sector.spec.lowModes;

  function applyReal(x: Float64Array, y: Float64Array): void {
    for (let s = 0; s < y.length; s++) y[s] = diagonal[s]! * x[s]!;
    for (const block of sector.blocks) {
      const D = block.highPatterns.length;
      const nLow = block.lowPatterns.length;
      const off = block.offset;
      const lt = lowTables.get(block.lowCount)!;
      for (let e = 0; e < lt.src.length; e++) {
        const c = lt.re[e]!;
        const so = off + lt.src[e]! * D;
        const d0 = off + lt.dst[e]! * D;
        for (let t = 0; t < D; t++) y[d0 + t]! += c * x[so + t]!;
      }
      const ht = highTables.get(sector.spec.electrons - block.lowCount)!;
      const hs = ht.src;
      const hd = ht.dst;
      const hr = ht.re;
      const ne = hs.length;
      for (let r = 0; r < nLow; r++) {
        const base = off + r * D;
        for (let e = 0; e < ne; e++) y[base + hd[e]!]! += hr[e]! * x[base + hs[e]!]!;
      }
    }
  }

  function applyComplex(xr: Float64Array, xi: Float64Array, yr: Float64Array, yi: Float64Array): void {
    for (let s = 0; s < yr.length; s++) {
      yr[s] = diagonal[s]! * xr[s]!;
      yi[s] = diagonal[s]! * xi[s]!;
    }
    for (const block of sector.blocks) {
      const D = block.highPatterns.length;
      const nLow = block.lowPatterns.length;
      const off = block.offset;
      const lt = lowTables.get(block.lowCount)!;
      for (let e = 0; e < lt.src.length; e++) {
        const cr = lt.re[e]!;
        const ci = lt.im[e]!;
        const so = off + lt.src[e]! * D;
        const d0 = off + lt.dst[e]! * D;
        for (let t = 0; t < D; t++) {
          const a = xr[so + t]!;
          const b = xi[so + t]!;
          yr[d0 + t]! += cr * a - ci * b;
          yi[d0 + t]! += cr * b + ci * a;
        }
      }
      const ht = highTables.get(sector.spec.electrons - block.lowCount)!;
      for (let r = 0; r < nLow; r++) {
        const base = off + r * D;
        for (let e = 0; e < ht.src.length; e++) {
          const cr = ht.re[e]!;
          const ci = ht.im[e]!;
          const a = xr[base + ht.src[e]!]!;
          const b = xi[base + ht.src[e]!]!;
          yr[base + ht.dst[e]!]! += cr * a - ci * b;
          yi[base + ht.dst[e]!]! += cr * b + ci * a;
        }
      }
    }
  }

  function applyGeneric(x: CVec, y: CVec): void {
    if (terms.generic.length === 0) return;
    for (const block of sector.blocks) {
      const D = block.highPatterns.length;
      for (let lr = 0; lr < block.lowPatterns.length; lr++) {
        const p = block.lowPatterns[lr]!;
        for (let r = 0; r < D; r++) {
          const s = p | (block.highPatterns[r]! << lowModes);
          const idx = block.offset + lr * D + r;
          const a = x.re[idx]!;
          const b = x.im === null ? 0 : x.im[idx]!;
          if (a === 0 && b === 0) continue;
          for (const term of terms.generic) {
            const [q, sign] = applyLadders(s, term.ops);
            if (sign === 0) continue;
            const to = sectorIndex(sector, q);
            if (to < 0) throw new Error('sectorHamiltonian: a term leaves the sector');
            const cr = sign * term.re;
            const ci = sign * term.im;
            y.re[to]! += cr * a - ci * b;
            if (y.im !== null) y.im[to]! += cr * b + ci * a;
          }
        }
      }
    }
  }

  return {
    sector,
    real: terms.real,
    diagonal,
    apply(x: CVec, y: CVec): void {
      if (y.im === null) {
        if (x.im !== null || !terms.real) throw new Error('sectorHamiltonian.apply: complex result needs a complex y');
        applyReal(x.re, y.re);
      } else {
        const xi = x.im ?? new Float64Array(x.re.length);
        applyComplex(x.re, xi, y.re, y.im);
      }
      applyGeneric(x, y);
    },
  };
}
