// Team species and the species library's queries, shared by the form, the CSV rows and the handlers.
import { z } from 'zod';
import { ENERGY_UNITS, ENTROPY_UNITS } from '../species/units';
import { safeRecord } from './quantity';

export const SPECIES_PHASES = ['g', 'l', 's', 'aq'] as const;
export const SPECIES_ORIGINS = ['library', 'team'] as const;
export const MAX_SPECIES_PAGE_SIZE = 100;

const finite = (what: string) => z.number({ message: `Enter ${what} as a number.` }).finite({ message: `${what} must be a finite number.` });
const optionalNumber = (what: string) => finite(what).nullable().default(null);
const sigma = (what: string) => finite(what).nonnegative({ message: `${what} cannot be negative.` }).nullable().default(null);

export const SpeciesProvenanceInput = z.discriminatedUnion('kind', [
  z.strictObject({ kind: z.literal('citation'), citation: z.string().trim().min(3, { message: 'Give the citation the values come from.' }).max(500) }),
  z.strictObject({
    kind: z.literal('measured'),
    reference: z.string().trim().min(3, { message: 'Name the data set or notebook page of the measurement.' }).max(500),
    /** set when a saved van 't Hoff fit produced the values */
    fitId: z.number().int().positive().nullable().default(null),
  }),
  z.strictObject({ kind: z.literal('estimated'), method: z.string().trim().min(3, { message: 'Name the estimation method.' }).max(500) }),
]);
export type SpeciesProvenanceInput = z.infer<typeof SpeciesProvenanceInput>;

/** Values as typed, with their units; the service converts to kJ/mol and J/(mol K). */
export const TeamSpeciesInput = z.strictObject({
  formula: z.string().trim().min(1, { message: 'Enter the formula, e.g. C7H6O3.' }).max(80),
  phase: z.enum(SPECIES_PHASES, { message: 'Choose a phase: g, l, s or aq.' }),
  /** a named solid form (polymorph), e.g. "diamond"; only for solids */
  form: z.string().trim().toLowerCase().regex(/^[a-z][a-z0-9-]*$/, { message: 'A form is one lower-case word, e.g. diamond.' }).max(40).nullable().default(null),
  name: z.string().trim().min(1, { message: 'Give the species a name.' }).max(120),
  aliases: z.array(z.string().trim().min(1).max(80)).max(12).default([]),
  energyUnit: z.enum(ENERGY_UNITS).default('kJ/mol'),
  entropyUnit: z.enum(ENTROPY_UNITS).default('J/(mol K)'),
  dfH: finite('ΔfH°'),
  /** null: derive ΔfG° from ΔfH° and S° with the elements' S° */
  dfG: optionalNumber('ΔfG°'),
  S: finite('S°'),
  Cp: optionalNumber('Cp°'),
  /** the temperatures the constant Cp° is good for, in K */
  cpTmin_K: optionalNumber('the lowest temperature'),
  cpTmax_K: optionalNumber('the highest temperature'),
  sigmaDfH: sigma('σ(ΔfH°)'),
  sigmaDfG: sigma('σ(ΔfG°)'),
  sigmaS: sigma('σ(S°)'),
  provenance: SpeciesProvenanceInput,
  notes: z.string().trim().max(2000).default(''),
});
export type TeamSpeciesInput = z.input<typeof TeamSpeciesInput>;
export type TeamSpeciesValues = z.output<typeof TeamSpeciesInput>;

export const TeamSpeciesUpdate = z.strictObject({
  version: z.number().int().positive(),
  species: TeamSpeciesInput,
  /** the structure as SMILES: absent keeps it, null removes it (the species is then known by its formula only) */
  smiles: z.string().trim().min(1, { message: 'Paste a SMILES, or clear the structure.' }).max(600, { message: 'A SMILES may be at most 600 characters.' }).nullable().optional(),
});
export type TeamSpeciesUpdate = z.infer<typeof TeamSpeciesUpdate>;

export const SpeciesListQuery = z.strictObject({
  q: z.string().trim().max(120).default(''),
  phase: z.enum(SPECIES_PHASES).optional(),
  origin: z.enum(SPECIES_ORIGINS).optional(),
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(1).max(MAX_SPECIES_PAGE_SIZE, { message: `At most ${MAX_SPECIES_PAGE_SIZE} a page.` }).default(25),
});
export type SpeciesListQuery = z.infer<typeof SpeciesListQuery>;

export const DUPLICATE_CHOICES = ['skip', 'override'] as const;
export type DuplicateChoice = (typeof DUPLICATE_CHOICES)[number];

export const SpeciesImportCommit = z.strictObject({
  /** per species key of a duplicate row */
  choices: safeRecord(z.string().min(1).max(120), z.enum(DUPLICATE_CHOICES)).default({}),
  /** for every duplicate without its own choice */
  otherwise: z.enum(DUPLICATE_CHOICES).nullable().default(null),
});
export type SpeciesImportCommit = z.infer<typeof SpeciesImportCommit>;

/** "What would change": the species as it would be saved, and the team species it would replace (none for a new one). */
export const SpeciesImpactRequest = z.strictObject({
  species: TeamSpeciesInput,
  teamSpeciesId: z.number().int().positive().nullable().default(null),
  /** as in TeamSpeciesUpdate: absent keeps the species' structure, null removes it */
  smiles: TeamSpeciesUpdate.shape.smiles,
});
export type SpeciesImpactRequest = z.input<typeof SpeciesImpactRequest>;

/** The form's shape: one provenance text whose meaning follows the kind; `toTeamSpeciesInput` makes the API body. */
export const TeamSpeciesForm = TeamSpeciesInput.omit({ provenance: true }).extend({
  provenanceKind: z.enum(['citation', 'measured', 'estimated'], { message: 'Say where the values come from.' }),
  provenanceText: z.string().trim().max(500),
  fitId: z.number().int().positive().nullable().default(null),
  /** editing only: the structure as SMILES; blank means the species is known by its formula alone */
  smiles: z.string().trim().max(600, { message: 'A SMILES may be at most 600 characters.' }).default(''),
}).superRefine((v, ctx) => {
  if (v.provenanceText.length >= 3) return;
  const message = { citation: 'Give the citation the values come from.', measured: 'Name the data set or notebook page of the measurement.', estimated: 'Name the estimation method.' }[v.provenanceKind];
  ctx.addIssue({ code: 'custom', path: ['provenanceText'], message });
});
export type TeamSpeciesForm = z.input<typeof TeamSpeciesForm>;

export function toTeamSpeciesInput(form: z.output<typeof TeamSpeciesForm>): TeamSpeciesInput {
  const { provenanceKind, provenanceText, fitId, smiles: _smiles, ...rest } = form;
  const provenance: SpeciesProvenanceInput =
    provenanceKind === 'citation' ? { kind: 'citation', citation: provenanceText }
      : provenanceKind === 'measured' ? { kind: 'measured', reference: provenanceText, fitId }
        : { kind: 'estimated', method: provenanceText };
  return { ...rest, provenance };
}
