// Zod schemas of the three model-file forms: shapes and the absolute ranges of modelLimits.ts; ranges that
// depend on other fields (mode counts, the grid against the energy scale) are checked later.
import { z } from 'zod';
import { MAX_BROADENING, MAX_ENERGY, MAX_GRID_POINTS, MAX_MODES, MIN_BROADENING } from '../modelLimits.js';

const integer = z.number().int();
const count = integer.min(0).max(MAX_MODES);
const energy = z.number().min(-MAX_ENERGY).max(MAX_ENERGY);

const commonKeys = {
  name: z.string().min(1).max(200).optional(),
  electrons: count,
  broadening: z.number().min(MIN_BROADENING).max(MAX_BROADENING).optional(),
  grid: z
    .strictObject({
      from: z.number(),
      to: z.number(),
      points: integer.min(1).max(MAX_GRID_POINTS),
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
  modes: integer.min(1).max(MAX_MODES),
  oneBody: z.array(z.array(z.number())).optional(),
  twoBody: z.array(z.array(z.number())).optional(),
});

export const hubbardSchema = z.strictObject({
  ...commonKeys,
  lattice: z.strictObject({
    shape: z.enum(['chain', 'ring', 'grid']),
    sites: integer.min(1).max(MAX_MODES / 2).optional(),
    size: z.tuple([integer.min(1).max(MAX_MODES / 2), integer.min(1).max(MAX_MODES / 2)]).optional(),
    periodic: z.tuple([z.boolean(), z.boolean()]).optional(),
    hopping: energy,
  }),
  interaction: energy,
  chemicalPotential: energy.optional(),
  spin: integer.min(-MAX_MODES).max(MAX_MODES).optional(),
});

export const impuritySchema = z.strictObject({
  ...commonKeys,
  impurity: z.strictObject({
    level: energy,
    interaction: energy,
    bath: z.array(z.strictObject({ level: energy, coupling: energy })).max(MAX_MODES / 2 - 1),
  }),
  chemicalPotential: energy.optional(),
  spin: integer.min(-MAX_MODES).max(MAX_MODES).optional(),
});

export type ExplicitInput = z.infer<typeof explicitSchema>;
export type HubbardInput = z.infer<typeof hubbardSchema>;
export type ImpurityInput = z.infer<typeof impuritySchema>;
export type CommonInput = ExplicitInput | HubbardInput | ImpurityInput;
