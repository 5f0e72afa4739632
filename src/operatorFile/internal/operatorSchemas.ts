// Zod schemas of the three operator-file forms (dense matrix, Pauli sum, ladder sum): shapes and absolute ranges only;
// squareness, Pauli labels and register sizes are checked after.
import { z } from 'zod';

/** Most qubits an operator may be stated on (the simulator's limit). */
export const MAX_OPERATOR_QUBITS = 30;

const integer = z.number().int();
const complexEntry = z.tuple([z.number(), z.number()]);
const description = z.string().max(1000).optional();

export const matrixSchema = z.strictObject({
  description,
  matrix: z.array(z.array(complexEntry)).min(1),
});

export const pauliSchema = z.strictObject({
  description,
  qubits: integer.min(1).max(MAX_OPERATOR_QUBITS).optional(),
  pauli: z.array(z.tuple([z.number(), z.number(), z.string().max(10_000)])),
});

const ladderFactor = z.tuple([integer.min(0).max(MAX_OPERATOR_QUBITS - 1), z.enum(['create', 'annihilate'])]);

export const ladderSchema = z.strictObject({
  description,
  modes: integer.min(1).max(MAX_OPERATOR_QUBITS).optional(),
  ladder: z.array(z.tuple([z.number(), z.number(), z.array(ladderFactor)])),
});

/** The key that names each operator form, in the order forms are tried. */
export const OPERATOR_FORM_KEYS = ['matrix', 'pauli', 'ladder'] as const;
