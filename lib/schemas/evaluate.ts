// Request schema for evaluating one synthesis step; shared by the CLI and the API route.
import { z } from 'zod';
import { MAX_MAP_ENTRIES, PositiveFinite, QuantityString, safeRecord, speciesMap } from './quantity';

const Phase = z.enum(['g', 'l', 's', 'aq'], { message: 'A phase is g, l, s or aq.' });

/** What a label in the equation stands for: a structure, a name, or a library key (lib/thermo/structure). */
export const SpeciesDefinitionSchema = z.union([
  z.strictObject({ smiles: z.string().trim().min(1).max(600), phase: Phase, name: z.string().trim().min(1).max(120).optional(), estimate: z.boolean().optional() }),
  z.strictObject({ name: z.string().trim().min(1).max(200), phase: Phase, estimate: z.boolean().optional() }),
  z.strictObject({ key: z.string().trim().min(1).max(120), estimate: z.boolean().optional() }),
], { message: 'Define a species by { smiles, phase }, { name, phase } or { key }.' });

// A label is a term of the equation: no "+", arrows or "=" (which split an equation), at most 60 characters.
export const SpeciesLabel = z.string().regex(/^[^\s+=<>→⇌][^+=<>→⇌]{0,59}$/, { message: 'A label has 1–60 characters and no +, =, <, > or arrows.' });

export const SpeciesDefinitions = safeRecord(SpeciesLabel, SpeciesDefinitionSchema).refine((m) => Object.keys(m).length <= MAX_MAP_ENTRIES, { message: `at most ${MAX_MAP_ENTRIES} species` });

export const EvaluateRequestSchema = z.strictObject({
  equation: z.string().trim().min(1).max(500),
  /** labels used in the equation (and in pressures, concentrations, initial) → structure, name or key */
  species: SpeciesDefinitions.optional(),
  /** default "298.15 K" */
  temperature: QuantityString.optional(),
  /** default "1 bar" */
  standardPressure: z.enum(['1 bar', '1 atm']).optional(),
  /** default true; false = constant ΔH°, ΔS° */
  heatCapacity: z.boolean().optional(),
  pressures: speciesMap(QuantityString).optional(),
  concentrations: speciesMap(QuantityString).optional(),
  /** amounts ("1 mol") or, for solutes, concentrations ("0.1 mol/L") */
  initial: speciesMap(QuantityString).optional(),
  /** for the equilibrium; default = standard pressure */
  totalPressure: QuantityString.optional(),
  /** solution volume for the equilibrium; default "1 L" */
  volume: QuantityString.optional(),
  electrons: PositiveFinite.max(1000).optional(),
  fugacityCoefficients: speciesMap(PositiveFinite).optional(),
  activityCoefficients: speciesMap(PositiveFinite).optional(),
  /** ΔH°, ΔS° for this reaction from elsewhere (a saved fit) instead of the library; ΔCp = 0 */
  override: z
    .strictObject({
      /** the reaction the values are for; the step must be it or a multiple of it */
      equation: z.string().trim().min(1).max(500),
      deltaH0_kJ: z.number().finite(),
      deltaS0_J_per_K: z.number().finite(),
      /** named in the answer and its warning, e.g. fit #3 “N2O4 dissociation” */
      source: z.string().trim().min(1).max(200),
      /** the temperatures the values were fitted over */
      range_K: z.tuple([PositiveFinite, PositiveFinite]).optional(),
      stderr: z.strictObject({ deltaH0_kJ: z.number().finite().nonnegative(), deltaS0_J_per_K: z.number().finite().nonnegative(), covariance_HS: z.number().finite() }).optional(),
    })
    .optional(),
});

export type EvaluateRequest = z.infer<typeof EvaluateRequestSchema>;
