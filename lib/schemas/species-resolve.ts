// One species by structure, name or key: the `species` CLI command and GET /api/species/resolve.
import { z } from 'zod';
import { QuantityString } from './quantity';

export const SpeciesResolveSchema = z
  .strictObject({
    smiles: z.string().trim().min(1).max(600).optional(),
    /** an MDL molfile (V2000 or V3000) as pasted; read by RDKit on the server and taken as its canonical SMILES */
    molfile: z.string().min(1).max(100_000, { message: 'A molfile may be at most 100,000 characters.' }).optional(),
    name: z.string().trim().min(1).max(200).optional(),
    key: z.string().trim().min(1).max(120).optional(),
    phase: z.enum(['g', 'l', 's', 'aq'], { message: 'A phase is g, l, s or aq.' }).optional(),
    /** default "298.15 K" */
    temperature: QuantityString.optional(),
    /** force the estimator even when the library has the species, for comparison */
    estimate: z.union([z.boolean(), z.enum(['true', 'false']).transform((v) => v === 'true')]).optional(),
  })
  .superRefine((v, ctx) => {
    const given = [v.smiles, v.molfile, v.name, v.key].filter((x) => x !== undefined).length;
    if (given !== 1) ctx.addIssue({ code: 'custom', path: ['smiles'], message: 'Give exactly one of smiles, molfile, name or key.' });
    if (v.key === undefined && v.phase === undefined) ctx.addIssue({ code: 'custom', path: ['phase'], message: 'Give the phase: g, l, s or aq.' });
  });
export type SpeciesResolveRequest = z.infer<typeof SpeciesResolveSchema>;
