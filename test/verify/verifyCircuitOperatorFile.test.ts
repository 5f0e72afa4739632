// Operator files for verify (src/operatorFile): the matrix, Pauli and ladder forms and model files, their errors
// (`file: field.path: problem`), the operators' action against the dense reference matrices, and the JSON writer.
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { ladderSumMatrix } from '../../src/operators/ladderSumMatrix.js';
import { pauliSumMatrix } from '../../src/operators/pauliSumMatrix.js';
import { loadOperatorFile } from '../../src/operatorFile/loadOperatorFile.js';
import { operatorFileJson } from '../../src/operatorFile/operatorFileJson.js';
import { parseOperatorFile } from '../../src/operatorFile/parseOperatorFile.js';
import { targetAction } from '../../src/operatorFile/targetAction.js';
import type { TargetOperator } from '../../src/operatorFile/TargetOperator.js';
import { ladderSumArb } from '../../src/testing/ladderSumArb.js';
import { pauliSumArb } from '../../src/testing/pauliSumArb.js';
import { stateVectorArb } from '../../src/testing/stateVectorArb.js';
import { expectComplexArrayClose } from '../helpers/close.js';

const two = { name: 'q', qubits: 2 };
const parse = (data: unknown, options = {}) => parseOperatorFile(data, 'op.json', two, options);

function denseProduct(M: { n: number; re: Float64Array; im: Float64Array }, x: { re: Float64Array; im: Float64Array }) {
  const re = new Float64Array(M.n);
  const im = new Float64Array(M.n);
  for (let i = 0; i < M.n; i++) {
    for (let j = 0; j < M.n; j++) {
      re[i]! += M.re[i * M.n + j]! * x.re[j]! - M.im[i * M.n + j]! * x.im[j]!;
      im[i]! += M.re[i * M.n + j]! * x.im[j]! + M.im[i * M.n + j]! * x.re[j]!;
    }
  }
  return { re, im };
}

describe('parseOperatorFile(data, file, register) errors name the file and the field', () => {
  it('a non-square matrix names the row', () => {
    expect(() => parse({ matrix: [[[1, 0], [0, 0]], [[0, 0]]] })).toThrow(/^op\.json: matrix\[1\]: row has 1 entries, expected 2 \(the matrix must be square\)$/);
  });

  it('a matrix of the wrong size names the system register', () => {
    expect(() => parse({ matrix: [[[1, 0], [0, 0]], [[0, 0], [1, 0]]] })).toThrow(/^op\.json: matrix: a 2×2 matrix acts on 1 qubit, but the system register 'q' \(2 qubits\) needs 4×4$/);
    expect(() => parse({ matrix: [[[1, 0], [0, 0], [0, 0]], [[0, 0], [1, 0], [0, 0]], [[0, 0], [0, 0], [1, 0]]] })).toThrow(/3×3 matrix is not a power of two/);
  });

  it('a Pauli index beyond the register, an unreadable label and a repeated qubit name the term', () => {
    expect(() => parse({ pauli: [[1, 0, 'X0'], [1, 0, 'X0 Z3']] })).toThrow(/^op\.json: pauli\[1\]\[2\]: qubit 3 in "X0 Z3" is beyond the system register 'q' \(2 qubits\), indices 0…1$/);
    expect(() => parse({ pauli: [[1, 0, 'X0 W1']] })).toThrow(/pauli\[0\]\[2\]: cannot read "W1"/);
    expect(() => parse({ pauli: [[1, 0, 'X1 Z1']] })).toThrow(/pauli\[0\]\[2\]: qubit 1 appears twice/);
  });

  it('shape errors come from the schema with their paths; unknown keys and mixed forms are named', () => {
    expect(() => parse({ pauli: [[1, 'a', 'X0']] })).toThrow(/^op\.json: pauli\[0\]\[1\]: expected number, got "a"$/);
    expect(() => parse({ ladder: [[1, 0, [[0, 'destroy']]]] })).toThrow(/ladder\[0\]\[2\]\[0\]\[1\]: expected one of "create", "annihilate"/);
    expect(() => parse({ pauli: [], extra: 1 })).toThrow(/^op\.json: extra: unknown key$/);
    expect(() => parse({ pauli: [], ladder: [] })).toThrow(/several operator forms are mixed \(pauli, ladder\)/);
    expect(() => parse({ nothing: 1 })).toThrow(/cannot tell the operator form/);
    expect(() => parse({ ladder: [[1, 0, [[2, 'create']]]] })).toThrow(/^op\.json: ladder\[0\]\[2\]\[0\]\[0\]: mode 2 is beyond the system register 'q'/);
    expect(() => parse({ pauli: [], qubits: 3 })).toThrow(/^op\.json: qubits: the operator is stated on 3 qubits/);
    expect(() => parse({ pauli: [] }, { part: 'A' })).toThrow(/--part\) applies only to model files/);
  });

  it('a missing file and invalid JSON are named', () => {
    expect(() => loadOperatorFile('/nonexistent/op.json', two)).toThrow(/^\/nonexistent\/op\.json: cannot read the operator file: no such file$/);
    const dir = mkdtempSync(join(tmpdir(), 'operator-file-'));
    writeFileSync(join(dir, 'bad.json'), '{ "pauli": [ }');
    expect(() => loadOperatorFile(join(dir, 'bad.json'), two)).toThrow(/bad\.json: invalid JSON: /);
    rmSync(dir, { recursive: true });
  });
});

describe('operator files read the operator meant', () => {
  it('a model file gives its H (or part A, B) with mode j on qubit j, and its mode count must match', () => {
    const path = new URL('../../circuits/hubbard-dimer.json', import.meta.url).pathname;
    const four = { name: 'sys', qubits: 4 };
    const whole = loadOperatorFile(path, four);
    const a = loadOperatorFile(path, four, { part: 'A' });
    const b = loadOperatorFile(path, four, { part: 'B' });
    expect('ladder' in whole && whole.modes).toBe(4);
    // A + B = H (CONVENTIONS.md: the default split), checked on a basis column through the action.
    const col = (t: TargetOperator, j: number) => targetAction(t, 4).column(j);
    for (const j of [3, 5, 10]) {
      const [h, pa, pb] = [col(whole, j), col(a, j), col(b, j)];
      expectComplexArrayClose(h, { re: pa.re.map((v, i) => v + pb.re[i]!), im: pa.im.map((v, i) => v + pb.im[i]!) }, 1e-12, `column ${j}`);
    }
    expect(() => loadOperatorFile(path, two)).toThrow(/: modes: the model has 4 modes, but the system register 'q' \(2 qubits\) differs/);
  });

  it('targetAction of a Pauli sum equals pauliSumMatrix times the vector (property)', () => {
    fc.assert(
      fc.property(pauliSumArb(3, 5), stateVectorArb(3), (sum, state) => {
        const action = targetAction({ pauli: sum }, 3);
        expectComplexArrayClose(action.apply(state), denseProduct(pauliSumMatrix(sum), state), 1e-12, 'M x');
        expectComplexArrayClose(action.column(5), denseProduct(pauliSumMatrix(sum), { re: Float64Array.from([0, 0, 0, 0, 0, 1, 0, 0]), im: new Float64Array(8) }), 1e-12, 'M e5');
      }),
      { seed: 3, numRuns: 40 },
    );
  });

  it('targetAction of a ladder sum (through Jordan–Wigner) equals ladderSumMatrix, an independent Fock-space route (property)', () => {
    fc.assert(
      fc.property(ladderSumArb(3), stateVectorArb(3), (sum, state) => {
        expectComplexArrayClose(targetAction({ ladder: sum }, 3).apply(state), denseProduct(ladderSumMatrix(sum, 3), state), 1e-12, 'M x');
      }),
      { seed: 4, numRuns: 40 },
    );
  });

  it('operatorFileJson writes what parseOperatorFile reads back (property, all three forms)', () => {
    fc.assert(
      fc.property(pauliSumArb(2, 4), ladderSumArb(2), (pauli, ladder) => {
        const again = parse(JSON.parse(JSON.stringify(operatorFileJson({ pauli }))));
        expect(again).toEqual({ pauli });
        const ladderAgain = parse(JSON.parse(JSON.stringify(operatorFileJson({ ladder, modes: 2 }))));
        expect(ladderAgain).toEqual({ ladder, modes: 2 });
        const matrix = pauliSumMatrix(pauli);
        expect(parse(JSON.parse(JSON.stringify(operatorFileJson({ matrix }))))).toEqual({ matrix });
      }),
      { seed: 5, numRuns: 30 },
    );
  });

  it('a Hubbard model file gives the hopping term −t a_0† a_1 in part A', () => {
    // Hubbard model H = −t Σ_<ij>σ a_i† a_j + … (common practice); the dimer file has t = 1, so T_01 = −1.
    const path = new URL('../../circuits/hubbard-dimer.json', import.meta.url).pathname;
    const a = loadOperatorFile(path, { name: 'q', qubits: 4 }, { part: 'A' });
    const terms = 'ladder' in a ? a.ladder.terms : [];
    const hop = terms.find((t) => t.ops.length === 2 && t.ops[0]!.mode === 0 && t.ops[0]!.dagger && t.ops[1]!.mode === 1 && !t.ops[1]!.dagger);
    expect(hop?.re).toBe(-1);
  });
});
