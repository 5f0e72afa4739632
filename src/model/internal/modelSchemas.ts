// Zod schemas of the four model-file forms: shapes and the absolute ranges of modelLimits.ts; ranges that
// depend on other fields (mode counts, the grid against the energy scale, dimensions) are checked later.
import { z } from 'zod';
import {
  MAX_BROADENING, MAX_CHARGE, MAX_ENERGY, MAX_EXTERNAL_CHARGES, MAX_GRID_POINTS, MAX_LENGTH, MAX_MODES, MIN_BROADENING,
} from '../modelLimits.js';

const integer = z.number().int();
const count = integer.min(0).max(MAX_MODES);
const energy = z.number().min(-MAX_ENERGY).max(MAX_ENERGY);

const sharedKeys = {
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
};

const commonKeys = {
  ...sharedKeys,
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

const lengths = z.array(z.number().positive().max(MAX_LENGTH)).min(1).max(3);

/** The continuum preset fixes its split (A = kinetic, B = external + interaction), so it takes no `split`. */
export const continuumSchema = z.strictObject({
  ...sharedKeys,
  continuum: z.strictObject({
    dimension: integer.min(1).max(3),
    points: z.array(integer.min(1).max(MAX_MODES / 2)).min(1).max(3),
    box: lengths,
    interaction: z.union([z.enum(['coulomb', 'none']), z.strictObject({ contact: energy })], {
      error: `expected "coulomb", "none" or { "contact": g } with |g| ≤ ${MAX_ENERGY}`,
    }),
    external: z
      .array(
        z.strictObject({
          position: z.array(z.number().min(-MAX_LENGTH).max(MAX_LENGTH)).min(1).max(3),
          charge: z.number().min(-MAX_CHARGE).max(MAX_CHARGE),
        }),
      )
      .max(MAX_EXTERNAL_CHARGES)
      .optional(),
  }),
  spin: integer.min(-MAX_MODES).max(MAX_MODES).optional(),
});

export type ExplicitInput = z.infer<typeof explicitSchema>;
export type HubbardInput = z.infer<typeof hubbardSchema>;
export type ImpurityInput = z.infer<typeof impuritySchema>;
export type ContinuumInput = z.infer<typeof continuumSchema>;
/** The keys every form has (name, electrons, broadening, grid). */
export type CommonInput = ExplicitInput | HubbardInput | ImpurityInput | ContinuumInput;
