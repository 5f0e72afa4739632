// Zod schemas of the three model-file forms; shapes only — ranges that depend on other fields are checked later.
import { z } from 'zod';

const integer = z.number().int();
const count = integer.min(0);

const commonKeys = {
  name: z.string().min(1).optional(),
  electrons: count,
  broadening: z.number().positive().optional(),
  grid: z
    .strictObject({
      from: z.number(),
      to: z.number(),
      points: integer.min(1),
    })
    .optional(),
  split: z
    .strictObject({
      oneBodyInB: z.array(z.tuple([integer, integer])),
    })
    .optional(),
};

export const explicitSchema = z.strictObject({
  ...commonKeys,
  modes: integer.min(1),
  oneBody: z.array(z.array(z.number())).optional(),
  twoBody: z.array(z.array(z.number())).optional(),
});

export const hubbardSchema = z.strictObject({
  ...commonKeys,
  lattice: z.strictObject({
    shape: z.enum(['chain', 'ring', 'grid']),
    sites: integer.min(1).optional(),
    size: z.tuple([integer.min(1), integer.min(1)]).optional(),
    periodic: z.tuple([z.boolean(), z.boolean()]).optional(),
    hopping: z.number(),
  }),
  interaction: z.number(),
  chemicalPotential: z.number().optional(),
  spin: integer.optional(),
});

export const impuritySchema = z.strictObject({
  ...commonKeys,
  impurity: z.strictObject({
    level: z.number(),
    interaction: z.number(),
    bath: z.array(z.strictObject({ level: z.number(), coupling: z.number() })),
  }),
  chemicalPotential: z.number().optional(),
  spin: integer.optional(),
});

export type ExplicitInput = z.infer<typeof explicitSchema>;
export type HubbardInput = z.infer<typeof hubbardSchema>;
export type ImpurityInput = z.infer<typeof impuritySchema>;
export type CommonInput = ExplicitInput | HubbardInput | ImpurityInput;
