/**
 * verifyEncoding: checks a block-encoding against its exact operator by simulation. Up to 12 qubits in
 * total every column of <0_anc| U |0_anc> is extracted (exhaustive); above that, random system states
 * are probed: the ancilla-|0> part of U|ψ,0> is compared with M|ψ>/α.
 */
import { call } from '../circuit/ops.js';
import { seededRandom } from '../core/seededRandom.js';
import { ancillaQubits, type BlockEncoding } from '../blocks/BlockEncoding.js';
import { StateVector } from '../sim/StateVector.js';
import { applyUnitaryOps } from '../sim/applyUnitaryOps.js';
import type { SimulationOptions } from '../sim/SimulationOptions.js';

export interface VerifyOptions extends SimulationOptions {
  /** Largest total qubit count checked column by column (default 12). */
  readonly exhaustiveLimit?: number;
  /** Number of random probes above the limit (default 8). */
  readonly probes?: number;
  readonly seed?: number;
}

export interface VerifyReport {
  readonly method: 'exhaustive' | 'probe';
  /** Max |<i,0|U|j,0> − M_ij/α| (exhaustive) or max entry error of the post-selected output (probe). */
  readonly maxError: number;
  /** Max |<U e_i, U e_j> − δ_ij| over the simulated input columns (exhaustive) or |‖Uψ‖ − 1| (probe). */
  readonly unitarityDeviation: number;
  readonly probes: number;
}

function runOnState(encoding: BlockEncoding, state: StateVector, options: SimulationOptions): void {
  const qubits = Array.from({ length: encoding.block.qubits }, (_, k) => k);
  applyUnitaryOps(state, [call(encoding.block, qubits)], options);
}

export function verifyEncoding(encoding: BlockEncoding, options: VerifyOptions = {}): VerifyReport {
  const n = encoding.systemQubits;
  const total = n + ancillaQubits(encoding);
  const dim = 2 ** n;
  const M = encoding.exact();
  const scale = 1 / encoding.alpha;
  if (total <= (options.exhaustiveLimit ?? 12)) {
    const columns: StateVector[] = [];
    let maxError = 0;
    for (let j = 0; j < dim; j++) {
      const state = StateVector.basis(total, j, options);
      runOnState(encoding, state, options);
      for (let i = 0; i < dim; i++) {
        const dr = (state.re[i] as number) - (M.re[i * dim + j] as number) * scale;
        const di = (state.im[i] as number) - (M.im[i * dim + j] as number) * scale;
        maxError = Math.max(maxError, Math.hypot(dr, di));
      }
      columns.push(state);
    }
    let unitarityDeviation = 0;
    for (let a = 0; a < dim; a++) {
      for (let b = a; b < dim; b++) {
        const u = columns[a] as StateVector;
        const v = columns[b] as StateVector;
        let re = 0;
        let im = 0;
        for (let k = 0; k < u.re.length; k++) {
          re += (u.re[k] as number) * (v.re[k] as number) + (u.im[k] as number) * (v.im[k] as number);
          im += (u.re[k] as number) * (v.im[k] as number) - (u.im[k] as number) * (v.re[k] as number);
        }
        unitarityDeviation = Math.max(unitarityDeviation, Math.hypot(re - (a === b ? 1 : 0), im));
      }
    }
    return { method: 'exhaustive', maxError, unitarityDeviation, probes: dim };
  }
  const probes = options.probes ?? 8;
  const random = seededRandom(options.seed ?? 7);
  let maxError = 0;
  let unitarityDeviation = 0;
  for (let p = 0; p < probes; p++) {
    const re = new Float64Array(2 ** total);
    const im = new Float64Array(2 ** total);
    let norm = 0;
    for (let k = 0; k < dim; k++) {
      // Box–Muller Gaussian amplitudes give a uniformly random direction.
      const r = Math.sqrt(-2 * Math.log(1 - random.next()));
      const t = 2 * Math.PI * random.next();
      re[k] = r * Math.cos(t);
      im[k] = r * Math.sin(t);
      norm += r * r;
    }
    const inv = 1 / Math.sqrt(norm);
    for (let k = 0; k < dim; k++) {
      re[k] = (re[k] as number) * inv;
      im[k] = (im[k] as number) * inv;
    }
    const state = StateVector.fromAmplitudes(re, im);
    runOnState(encoding, state, options);
    for (let i = 0; i < dim; i++) {
      let er = 0;
      let ei = 0;
      for (let j = 0; j < dim; j++) {
        const mr = (M.re[i * dim + j] as number) * scale;
        const mi = (M.im[i * dim + j] as number) * scale;
        er += mr * (re[j] as number) - mi * (im[j] as number);
        ei += mr * (im[j] as number) + mi * (re[j] as number);
      }
      maxError = Math.max(maxError, Math.hypot((state.re[i] as number) - er, (state.im[i] as number) - ei));
    }
    unitarityDeviation = Math.max(unitarityDeviation, Math.abs(state.norm() - 1));
  }
  return { method: 'probe', maxError, unitarityDeviation, probes };
}
