/**
 * sectorHamiltonian: H restricted to a Fock sector, applied matrix-free. Hops inside the low modes
 * and inside the high modes act as Kronecker factors (row and column sweeps over contiguous memory);
 * densities form a stored diagonal; all other terms go through a per-state bit-operation path.
 */
import { availableParallelism } from 'node:os';
import type { FermionModel } from '../model/FermionModel.js';
import { applyLadders } from './internal/bits.js';
import { hamiltonianTerms, type HamiltonianTerms, type Hop } from './internal/hamiltonianTerms.js';
import type { CompactVec, LanczosSteps, LinearTerm, Projection } from './internal/lanczos.js';
import { applyRealRows, applyRowUpdate, type KernelBlock, type RowStep, type RowUpdate } from './internal/realKernel.js';
import { isShared, rowThreads } from './internal/rowThreads.js';
import { sharedFloat64, type CVec } from './internal/vec.js';
import type { FockSector } from './fockSector.js';
import { sectorIndex } from './sectorIndex.js';

/** Sparse transitions between patterns of one popcount, by destination (CSR): y[d] += Σ coef·x[src]. */
interface HopTable {
  /** Entries of destination d are start[d] … start[d+1]−1. */
  readonly start: Int32Array;
  readonly src: Int32Array;
  readonly re: Float64Array;
  readonly im: Float64Array;
}

/** Sectors from this dimension on use several threads (the first one starts the worker pool, ~0.1 s). */
export const PARALLEL_DIMENSION = 50_000;

export interface SectorHamiltonianOptions {
  /**
   * Threads for products of a real H (the caller plus threads − 1 workers). Default from
   * PARALLEL_DIMENSION on: POLEWRIGHT_EXACT_THREADS, else 2 (capped by the cores available); below it 1.
   * A product at dimension 853,776 takes ~15 ms on one thread; a busy core slows the split one down.
   */
  readonly threads?: number;
}

function threadsFromEnvironment(): number {
  const value = Number(process.env.POLEWRIGHT_EXACT_THREADS ?? '2');
  return Number.isInteger(value) && value >= 1 ? Math.min(value, availableParallelism()) : 1;
}

/** Largest dimension × generic-term count for which the generic terms are stored as a sparse matrix. */
const GENERIC_TABLE_LIMIT = 2e7;

export interface SectorHamiltonian {
  readonly sector: FockSector;
  /** True when H has only real matrix elements in this basis (vectors may then be real). */
  readonly real: boolean;
  /** H's diagonal in this basis. */
  readonly diagonal: Float64Array;
  /** y = H x (y is overwritten; x and y must not alias; y complex whenever x is or H is complex). */
  apply(x: CVec, y: CVec): void;
  /**
   * Lanczos step operations on real vectors, split among the threads like products (the same bytes
   * on any number of threads). Null when H is complex or has generic terms.
   */
  readonly steps: LanczosSteps | null;
  /** Lets the pool workers drop this sector's tables; later products run on the calling thread. */
  release(): void;
}

function hopTable(patterns: Int32Array, rank: Int32Array, hops: readonly Hop[]): HopTable {
  const rows: { src: number; re: number; im: number }[][] = Array.from({ length: patterns.length }, () => []);
  for (let r = 0; r < patterns.length; r++) {
    const p = patterns[r]!;
    for (const hop of hops) {
      const [q, sign] = applyLadders(p, [[hop.i, true], [hop.j, false]]);
      if (sign === 0) continue;
      rows[rank[q]!]!.push({ src: r, re: sign * hop.re, im: sign * hop.im });
    }
  }
  const start = new Int32Array(patterns.length + 1);
  for (let d = 0; d < rows.length; d++) start[d + 1] = start[d]! + rows[d]!.length;
  const flat = rows.flat();
  return {
    start,
    src: Int32Array.from(flat, (e) => e.src),
    re: Float64Array.from(flat, (e) => e.re),
    im: Float64Array.from(flat, (e) => e.im),
  };
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

/**
 * Builds the matrix-free sector Hamiltonian (tables cost O(2^(modes/2)·hops); diagonal O(dim)).
 * Products of a real H with SharedArrayBuffer-backed vectors (zeroVec's, for large sectors) are split
 * by rows among threads, with the same bytes out as on one thread.
 */
export function sectorHamiltonian(model: FermionModel, sector: FockSector, options: SectorHamiltonianOptions = {}): SectorHamiltonian {
  const terms = hamiltonianTerms(model, sector.spec.lowModes);
  const { modes, electrons, lowModes: h } = sector.spec;
  const feasible = Math.min(h, electrons) - Math.max(0, electrons - (modes - h)) + 1;
  if (!terms.conservesLowCount && sector.blocks.length < feasible) {
    throw new Error('sectorHamiltonian: H changes the low-mode electron count; use the electron-number sector');
  }
  const diagonal = sharedFloat64(sector.dimension);
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

  const kernelBlocks: KernelBlock[] = sector.blocks.map((block) => {
    const ht = highTables.get(sector.spec.electrons - block.lowCount)!;
    const lt = lowTables.get(block.lowCount)!;
    return {
      D: block.highPatterns.length,
      nLow: block.lowPatterns.length,
      offset: block.offset,
      hStart: ht.start,
      hSrc: ht.src,
      hRe: ht.re,
      lStart: lt.start,
      lSrc: lt.src,
      lRe: lt.re,
    };
  });
  const threads = options.threads ?? (sector.dimension >= PARALLEL_DIMENSION ? threadsFromEnvironment() : 1);
  let pool = threads >= 2 && terms.real ? rowThreads(kernelBlocks, diagonal, threads) : null;

  function applyReal(x: Float64Array, y: Float64Array, step: RowStep | null): void {
    if (pool !== null && isShared(x) && isShared(y) && (step === null || isShared(step.z))) pool.apply(x, y, step);
    else applyRealRows(kernelBlocks, diagonal, x, y, 0, 1, step);
  }

  const rowCount = kernelBlocks.reduce((rows, b) => rows + b.nLow, 0);
  /** Row sums of the step operations (rowCount × sums per row), written by every thread. */
  let partials = new Float64Array(new SharedArrayBuffer(8 * rowCount));

  function partialsFor(sums: number): Float64Array {
    if (partials.length < rowCount * sums) partials = new Float64Array(new SharedArrayBuffer(8 * rowCount * sums));
    return partials;
  }

  /** Σ over rows of sum `which` of `sums` per row. */
  function rowSum(sums: number, which: number): number {
    let sum = 0;
    for (let r = 0; r < rowCount; r++) sum += partials[r * sums + which]!;
    return sum;
  }

  function realOf(vector: CVec): Float64Array {
    if (vector.im !== null) throw new Error('sectorHamiltonian.steps: vectors must be real');
    return vector.re;
  }

  function runRows(op: RowUpdate): void {
    const vectors = [op.w, ...op.vectors, ...op.against];
    if (pool !== null && vectors.every(isShared) && (op.copy === null || isShared(op.copy))) pool.run(op);
    else applyRowUpdate(kernelBlocks, op, 0, 1);
  }

  const steps: LanczosSteps = {
    step(x: CVec, c: number, y: CVec, s: number, z: CVec): number {
      applyReal(realOf(x), realOf(y), { c, s, z: realOf(z), partials: partialsFor(1) });
      return rowSum(1, 0);
    },
    update(terms: readonly LinearTerm[], w: CVec, against: readonly CVec[], copy: CompactVec | null): Projection {
      if (terms.some((t) => t.im !== 0)) throw new Error('sectorHamiltonian.steps: coefficients must be real');
      if (copy !== null && copy.im !== null) throw new Error('sectorHamiltonian.steps: the copy must be real');
      const sums = 1 + against.length;
      runRows({
        coefs: terms.map((t) => t.re),
        vectors: terms.map((t) => realOf(t.v)),
        w: realOf(w),
        against: against.map(realOf),
        copy: copy?.re ?? null,
        partials: partialsFor(sums),
      });
      return {
        normSquared: rowSum(sums, 0),
        overlaps: against.map((_, j) => [rowSum(sums, 1 + j), 0] as const),
      };
    },
  };

  function applyComplex(xr: Float64Array, xi: Float64Array, yr: Float64Array, yi: Float64Array): void {
    for (const block of sector.blocks) {
      const D = block.highPatterns.length;
      const nLow = block.lowPatterns.length;
      const off = block.offset;
      const ht = highTables.get(sector.spec.electrons - block.lowCount)!;
      for (let r = 0; r < nLow; r++) {
        const base = off + r * D;
        for (let d = 0; d < D; d++) {
          const g = diagonal[base + d]!;
          let ar = g * xr[base + d]!;
          let ai = g * xi[base + d]!;
          const end = ht.start[d + 1]!;
          for (let e = ht.start[d]!; e < end; e++) {
            const cr = ht.re[e]!;
            const ci = ht.im[e]!;
            const a = xr[base + ht.src[e]!]!;
            const b = xi[base + ht.src[e]!]!;
            ar += cr * a - ci * b;
            ai += cr * b + ci * a;
          }
          yr[base + d] = ar;
          yi[base + d] = ai;
        }
      }
      const lt = lowTables.get(block.lowCount)!;
      for (let dr = 0; dr < nLow; dr++) {
        const d0 = off + dr * D;
        const end = lt.start[dr + 1]!;
        for (let e = lt.start[dr]!; e < end; e++) {
          const cr = lt.re[e]!;
          const ci = lt.im[e]!;
          const so = off + lt.src[e]! * D;
          for (let t = 0; t < D; t++) {
            const a = xr[so + t]!;
            const b = xi[so + t]!;
            yr[d0 + t]! += cr * a - ci * b;
            yi[d0 + t]! += cr * b + ci * a;
          }
        }
      }
    }
  }

  /** The generic terms as a sparse matrix by source state (built when small enough to store). */
  function genericTable(): HopTable | null {
    if (terms.generic.length === 0 || sector.dimension * terms.generic.length > GENERIC_TABLE_LIMIT) return null;
    const start = new Int32Array(sector.dimension + 1);
    const to: number[] = [];
    const re: number[] = [];
    const im: number[] = [];
    forEachState((state, idx) => {
      for (const term of terms.generic) {
        const [q, sign] = applyLadders(state, term.ops);
        if (sign === 0) continue;
        to.push(target(q));
        re.push(sign * term.re);
        im.push(sign * term.im);
      }
      start[idx + 1] = to.length;
    });
    return { start, src: Int32Array.from(to), re: Float64Array.from(re), im: Float64Array.from(im) };
  }

  function forEachState(visit: (state: number, index: number) => void): void {
    for (const block of sector.blocks) {
      const D = block.highPatterns.length;
      for (let lr = 0; lr < block.lowPatterns.length; lr++) {
        const p = block.lowPatterns[lr]!;
        for (let r = 0; r < D; r++) visit(p | (block.highPatterns[r]! << lowModes), block.offset + lr * D + r);
      }
    }
  }

  function target(q: number): number {
    const to = sectorIndex(sector, q);
    if (to < 0) throw new Error('sectorHamiltonian: a term leaves the sector');
    return to;
  }

  const table = genericTable();

  function applyGeneric(x: CVec, y: CVec): void {
    if (terms.generic.length === 0) return;
    const xr = x.re;
    const xi = x.im;
    const yr = y.re;
    const yi = y.im;
    if (table !== null) {
      for (let s = 0; s < sector.dimension; s++) {
        const a = xr[s]!;
        const b = xi === null ? 0 : xi[s]!;
        if (a === 0 && b === 0) continue;
        const end = table.start[s + 1]!;
        for (let e = table.start[s]!; e < end; e++) {
          const cr = table.re[e]!;
          const ci = table.im[e]!;
          const to = table.src[e]!;
          yr[to]! += cr * a - ci * b;
          if (yi !== null) yi[to]! += cr * b + ci * a;
        }
      }
      return;
    }
    forEachState((state, idx) => {
      const a = xr[idx]!;
      const b = xi === null ? 0 : xi[idx]!;
      if (a === 0 && b === 0) return;
      for (const term of terms.generic) {
        const [q, sign] = applyLadders(state, term.ops);
        if (sign === 0) continue;
        const to = target(q);
        const cr = sign * term.re;
        const ci = sign * term.im;
        yr[to]! += cr * a - ci * b;
        if (yi !== null) yi[to]! += cr * b + ci * a;
      }
    });
  }

  return {
    sector,
    real: terms.real,
    diagonal,
    steps: terms.real && terms.generic.length === 0 ? steps : null,
    apply(x: CVec, y: CVec): void {
      if (y.im === null) {
        if (x.im !== null || !terms.real) throw new Error('sectorHamiltonian.apply: complex result needs a complex y');
        applyReal(x.re, y.re, null);
      } else {
        const xi = x.im ?? new Float64Array(x.re.length);
        applyComplex(x.re, xi, y.re, y.im);
      }
      applyGeneric(x, y);
    },
    release(): void {
      pool?.release();
      pool = null;
    },
  };
}
