/**
 * parseOperatorFile: validates the parsed JSON of an operator file against the system register it is meant for and
 * returns the TargetOperator. Forms (exactly one key of the first three):
 * - `{ "matrix": [[[re, im], …], …] }` — rows of complex entries, 2^n × 2^n;
 * - `{ "pauli": [[re, im, "X0 Z1 Y3"], …], "qubits"?: n }` — Pauli strings with explicit qubit indices ("" = I);
 * - `{ "ladder": [[re, im, [[mode, "create" | "annihilate"], …]], …], "modes"?: n }` — products of ladder operators,
 *   left to right, Jordan–Wigner with mode j = qubit j (../shared/CONVENTIONS.md);
 * - a model file (explicit, Hubbard or impurity form): its H, or the split part A or B.
 * Every form may carry a `"description"` string.
 */
import type { z } from 'zod';
import { InputError } from '../core/InputError.js';
import type { ComplexMatrix } from '../linalg/ComplexMatrix.js';
import { parseModel } from '../model/parseModel.js';
import type { LadderTerm } from '../operators/LadderSum.js';
import { modelHamiltonian } from '../operators/modelHamiltonian.js';
import type { PauliTerm } from '../operators/PauliSum.js';
import { problemsError, zodFieldProblems, type FieldProblem } from './internal/fieldProblems.js';
import { ladderSchema, matrixSchema, OPERATOR_FORM_KEYS, pauliSchema } from './internal/operatorSchemas.js';
import { parsePauliLabel } from './internal/pauliLabel.js';
import type { TargetOperator } from './TargetOperator.js';

/** The register the operator must act on: its name (for messages) and qubit count. */
export interface SystemRegister {
  readonly name: string;
  readonly qubits: number;
}

export interface OperatorFileOptions {
  /** Model files only: the split part A (one-body) or B (the rest) instead of H. */
  readonly part?: 'A' | 'B';
}

const MODEL_KEYS = ['modes', 'oneBody', 'twoBody', 'lattice', 'impurity', 'continuum'];

/**
 * @param input  the value JSON.parse returned.
 * @param source the file name, the prefix of every message (`source: field.path: problem`).
 * @throws InputError listing every problem: shape, non-square or non-power-of-two matrix, unreadable Pauli label,
 *         a qubit or mode beyond `system`, a size that does not match `system`, `part` given for a non-model file.
 */
export function parseOperatorFile(input: unknown, source: string, system: SystemRegister, options: OperatorFileOptions = {}): TargetOperator {
  if (typeof input !== 'object' || input === null || Array.isArray(input)) throw problemsError(source, [{ path: [], message: 'expected a JSON object' }]);
  const forms = OPERATOR_FORM_KEYS.filter((key) => key in input);
  if (forms.length > 1) throw problemsError(source, [{ path: [], message: `keys of several operator forms are mixed (${forms.join(', ')}); use exactly one` }]);
  const form = forms[0];
  if (form === undefined) {
    if (!MODEL_KEYS.some((key) => key in input)) {
      throw problemsError(source, [{ path: [], message: 'cannot tell the operator form: give "matrix", "pauli" or "ladder", or a model file ("modes", "lattice", "impurity" or "continuum")' }]);
    }
    return modelOperator(input, source, system, options);
  }
  if (options.part !== undefined) throw new InputError(`${source}: part ${options.part} (--part) applies only to model files; this file holds a "${form}" operator`);
  if (form === 'matrix') return matrixOperator(validated(matrixSchema, input, source), source, system);
  if (form === 'pauli') return pauliOperator(validated(pauliSchema, input, source), source, system);
  return ladderOperator(validated(ladderSchema, input, source), source, system);
}

function validated<T>(schema: z.ZodType<T>, input: unknown, source: string): T {
  const result = schema.safeParse(input, { reportInput: true });
  if (!result.success) throw problemsError(source, zodFieldProblems(result.error));
  return result.data;
}

function registerText(system: SystemRegister): string {
  return `the system register '${system.name}' (${system.qubits} qubit${system.qubits === 1 ? '' : 's'})`;
}

function matrixOperator(data: z.infer<typeof matrixSchema>, source: string, system: SystemRegister): TargetOperator {
  const rows = data.matrix;
  const n = rows.length;
  const problems: FieldProblem[] = [];
  rows.forEach((row, i) => {
    if (row.length !== n) problems.push({ path: ['matrix', i], message: `row has ${row.length} entries, expected ${n} (the matrix must be square)` });
  });
  if (problems.length > 0) throw problemsError(source, problems);
  if (n !== 2 ** system.qubits) {
    const width = Math.log2(n);
    const size = Number.isInteger(width) ? `acts on ${width} qubit${width === 1 ? '' : 's'}` : `is not a power of two`;
    throw problemsError(source, [{ path: ['matrix'], message: `a ${n}×${n} matrix ${size}, but ${registerText(system)} needs ${2 ** system.qubits}×${2 ** system.qubits}` }]);
  }
  const matrix: ComplexMatrix = { n, re: new Float64Array(n * n), im: new Float64Array(n * n) };
  rows.forEach((row, i) => row.forEach(([re, im], j) => {
    matrix.re[i * n + j] = re;
    matrix.im[i * n + j] = im;
  }));
  return { matrix };
}

function pauliOperator(data: z.infer<typeof pauliSchema>, source: string, system: SystemRegister): TargetOperator {
  const problems: FieldProblem[] = [];
  if (data.qubits !== undefined && data.qubits !== system.qubits) {
    problems.push({ path: ['qubits'], message: `the operator is stated on ${data.qubits} qubits, but ${registerText(system)} differs` });
  }
  const terms: PauliTerm[] = [];
  data.pauli.forEach(([re, im, label], t) => {
    const parsed = parsePauliLabel(label);
    if ('problem' in parsed) problems.push({ path: ['pauli', t, 2], message: parsed.problem });
    else if (parsed.highest >= system.qubits) {
      problems.push({ path: ['pauli', t, 2], message: `qubit ${parsed.highest} in "${label}" is beyond ${registerText(system)}, indices 0…${system.qubits - 1}` });
    } else terms.push({ x: parsed.x, z: parsed.z, re, im });
  });
  if (problems.length > 0) throw problemsError(source, problems);
  return { pauli: { qubits: system.qubits, terms } };
}

function ladderOperator(data: z.infer<typeof ladderSchema>, source: string, system: SystemRegister): TargetOperator {
  const problems: FieldProblem[] = [];
  if (data.modes !== undefined && data.modes !== system.qubits) {
    problems.push({ path: ['modes'], message: `the operator is stated on ${data.modes} modes, but ${registerText(system)} differs (mode j is qubit j)` });
  }
  const terms: LadderTerm[] = data.ladder.map(([re, im, factors], t) => ({
    re,
    im,
    ops: factors.map(([mode, kind], f) => {
      if (mode >= system.qubits) problems.push({ path: ['ladder', t, 2, f, 0], message: `mode ${mode} is beyond ${registerText(system)}, modes 0…${system.qubits - 1}` });
      return { mode, dagger: kind === 'create' };
    }),
  }));
  if (problems.length > 0) throw problemsError(source, problems);
  return { ladder: { terms }, modes: system.qubits };
}

function modelOperator(input: object, source: string, system: SystemRegister, options: OperatorFileOptions): TargetOperator {
  const model = parseModel(input, source);
  if (model.modes !== system.qubits) {
    throw problemsError(source, [{ path: ['modes'], message: `the model has ${model.modes} modes, but ${registerText(system)} differs (mode j is qubit j)` }]);
  }
  const part = options.part === undefined ? 'all' : options.part;
  return { ladder: modelHamiltonian(model, { part }), modes: model.modes };
}
