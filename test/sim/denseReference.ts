// A dense reference semantics of the circuit IR for tests, independent of src/sim: every operation
// becomes a 2^n × 2^n matrix (gate matrices from referenceGates.ts, controls by Kronecker products,
// blocks as matrix products, control of a block as I − P + P·B), and a circuit is their product.
import * as math from 'mathjs';
import { evaluateAngle } from '../../src/circuit/angle.js';
import type { Circuit, UnitaryOp } from '../../src/circuit/types.js';
import type { ComplexMatrix } from '../../src/linalg/ComplexMatrix.js';
import { conjTranspose, matMul } from '../helpers/complexMatrixOps.js';
import { REFERENCE_GATES, controlled, negControlled, principalPower, toComplexMatrix } from './referenceGates.js';

function identityMatrix(dim: number): ComplexMatrix {
  const re = new Float64Array(dim * dim);
  for (let i = 0; i < dim; i++) re[i * dim + i] = 1;
  return { n: dim, re, im: new Float64Array(dim * dim) };
}

/** The n-qubit operator acting as `local` on `qubits` (local bit k = global qubit qubits[k]) and as identity elsewhere. */
export function embed(local: ComplexMatrix, qubits: readonly number[], n: number): ComplexMatrix {
  const dim = 2 ** n;
  const re = new Float64Array(dim * dim);
  const im = new Float64Array(dim * dim);
  let involved = 0;
  for (const q of qubits) involved |= 1 << q;
  const localIndex = (i: number): number => qubits.reduce((acc, q, k) => acc | (((i >> q) & 1) << k), 0);
  for (let i = 0; i < dim; i++) {
    for (let j = 0; j < dim; j++) {
      if ((i & ~involved) !== (j & ~involved)) continue;
      const e = localIndex(i) * local.n + localIndex(j);
      re[i * dim + j] = local.re[e]!;
      im[i * dim + j] = local.im[e]!;
    }
  }
  return { n: dim, re, im };
}

function power(m: ComplexMatrix, k: number): ComplexMatrix {
  let result = identityMatrix(m.n);
  const base = k < 0 ? conjTranspose(m) : m;
  for (let r = 0; r < Math.abs(k); r++) result = matMul(base, result);
  return result;
}

/** I − P + P·B with P the projector onto controls = 1, negControls = 0 (B must not act on them). */
function controlFull(b: ComplexMatrix, controls: readonly number[], negControls: readonly number[]): ComplexMatrix {
  const dim = b.n;
  const re = new Float64Array(dim * dim);
  const im = new Float64Array(dim * dim);
  for (let i = 0; i < dim; i++) {
    const on = controls.every((q) => ((i >> q) & 1) === 1) && negControls.every((q) => ((i >> q) & 1) === 0);
    for (let j = 0; j < dim; j++) {
      re[i * dim + j] = on ? b.re[i * dim + j]! : i === j ? 1 : 0;
      im[i * dim + j] = on ? b.im[i * dim + j]! : 0;
    }
  }
  return { n: dim, re, im };
}

function productOf(ops: readonly UnitaryOp[], n: number, map: readonly number[], params: readonly number[]): ComplexMatrix {
  let result = identityMatrix(2 ** n);
  for (const op of ops) result = matMul(opMatrix(op, n, map, params), result);
  return result;
}

/** The matrix of one op on n qubits; `map` sends the op's scope qubits to global ones, `params` binds angles. */
export function opMatrix(op: UnitaryOp, n: number, map: readonly number[], params: readonly number[]): ComplexMatrix {
  const global = (qs: readonly number[]): number[] => qs.map((q) => map[q] as number);
  if (op.kind === 'gate') {
    const definition = REFERENCE_GATES[op.name];
    if (!definition) throw new Error(`no reference matrix for ${op.name}`);
    let g = definition.matrix(op.params.map((a) => evaluateAngle(a, params)));
    if (Number.isInteger(op.power)) {
      const base = op.power < 0 ? (math.ctranspose(g) as math.Matrix) : g;
      let r = math.identity(g.size()[0] as number) as math.Matrix;
      for (let k = 0; k < Math.abs(op.power); k++) r = math.multiply(base, r) as math.Matrix;
      g = r;
    } else {
      g = principalPower(g, op.power);
    }
    if (op.inverse) g = math.ctranspose(g) as math.Matrix;
    for (let k = op.negControls.length - 1; k >= 0; k--) g = negControlled(g);
    for (let k = op.controls.length - 1; k >= 0; k--) g = controlled(g);
    return embed(toComplexMatrix(g), global([...op.controls, ...op.negControls, ...op.qubits]), n);
  }
  const inner = global(op.qubits);
  const args = op.args.map((a) => evaluateAngle(a, params));
  const flip = op.inverse !== op.power < 0;
  const body = op.block.body;
  const raise = (m: ComplexMatrix): ComplexMatrix => power(m, flip ? -Math.abs(op.power) : Math.abs(op.power));
  if (body.kind === 'plain') {
    return controlFull(raise(productOf(body.ops, n, inner, args)), global(op.controls), global(op.negControls));
  }
  const compute = productOf(body.compute, n, inner, args);
  const action = controlFull(raise(productOf(body.action, n, inner, args)), global(op.controls), global(op.negControls));
  return matMul(conjTranspose(compute), matMul(action, compute));
}

/** The unitary of a measurement-free circuit: the product of its ops' matrices, last op leftmost. */
export function referenceMatrix(circuit: Circuit): ComplexMatrix {
  const n = circuit.qubitRegisters.reduce((s, r) => s + r.size, 0);
  const ops = circuit.ops.filter((op): op is UnitaryOp => op.kind === 'gate' || op.kind === 'call');
  return productOf(ops, n, Array.from({ length: n }, (_, k) => k), []);
}
