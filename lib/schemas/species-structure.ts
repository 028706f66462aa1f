// A team species made from a structure (SMILES or molfile): saved as the engine's estimate, with values the team
// measured or cited, or solved from a saved van 't Hoff fit. Shared by the "new species from a structure" page and
// POST /api/species/team.
import { z } from 'zod';
import { SPECIES_PHASES, SpeciesProvenanceInput, TeamSpeciesInput } from './species';

export const MAX_MOLFILE_CHARS = 100_000;

const smiles = z.string().trim().min(1, { message: 'Paste a SMILES.' }).max(600, { message: 'A SMILES may be at most 600 characters.' });
const molfile = z.string().min(1, { message: 'Paste a molfile.' }).max(MAX_MOLFILE_CHARS, { message: `A molfile may be at most ${MAX_MOLFILE_CHARS.toLocaleString('en')} characters.` });

/** The values typed for a structure: the same fields and checks as any team species (formula comes from the structure). */
export const EnteredValues = TeamSpeciesInput.pick({
  energyUnit: true, entropyUnit: true, dfH: true, dfG: true, S: true, Cp: true, cpTmin_K: true, cpTmax_K: true, sigmaDfH: true, sigmaDfG: true, sigmaS: true,
});

export const StructureValuesSource = z.discriminatedUnion('kind', [
  /** the engine's estimate as it stands: values, method and σ are taken on the server, never from the request */
  z.strictObject({ kind: z.literal('estimate') }),
  /** values the team measured or found in print */
  z.strictObject({ kind: z.literal('entered'), values: EnteredValues, provenance: SpeciesProvenanceInput }),
  /** ΔfH°, ΔfG° and S° solved from a saved fit of a reaction that has this species */
  z.strictObject({
    kind: z.literal('fit'),
    fitId: z.number({ message: 'Choose a saved fit.' }).int().positive(),
    /** the species of the fitted reaction this structure is, as written in its equation */
    species: z.string().trim().min(1, { message: 'Say which species of the fitted reaction this is.' }).max(120),
  }),
]);
export type StructureValuesSource = z.infer<typeof StructureValuesSource>;

export const TeamSpeciesFromStructure = z
  .strictObject({
    smiles: smiles.optional(),
    molfile: molfile.optional(),
    phase: z.enum(SPECIES_PHASES, { message: 'Choose a phase: g, l, s or aq.' }),
    name: TeamSpeciesInput.shape.name,
    aliases: TeamSpeciesInput.shape.aliases,
    notes: TeamSpeciesInput.shape.notes,
    source: StructureValuesSource,
    /** the library has this structure with sourced data; the team's own values are meant to replace it */
    overrideLibrary: z.boolean().default(false),
  })
  .superRefine((v, ctx) => {
    if ((v.smiles === undefined) === (v.molfile === undefined)) ctx.addIssue({ code: 'custom', path: ['smiles'], message: 'Give a SMILES or a molfile (one of them).' });
  });
export type TeamSpeciesFromStructure = z.input<typeof TeamSpeciesFromStructure>;

/** The version the caller saw, so a delete never removes a species someone changed since. */
export const TeamSpeciesDelete = z.strictObject({ version: z.coerce.number().int().positive({ message: 'Send the version you saw.' }) });
export type TeamSpeciesDelete = z.infer<typeof TeamSpeciesDelete>;

/** The "values" step of the page: entered values with one provenance text whose meaning follows the kind. */
export const EnteredValuesForm = EnteredValues.extend({
  provenanceKind: z.enum(['citation', 'measured'], { message: 'Say where the values come from.' }),
  provenanceText: z.string().trim().min(3, { message: 'Say where the values come from: a citation, or the data set or notebook page.' }).max(500),
});
export type EnteredValuesForm = z.input<typeof EnteredValuesForm>;

export function toEnteredSource(form: z.output<typeof EnteredValuesForm>): StructureValuesSource {
  const { provenanceKind, provenanceText, ...values } = form;
  const provenance: SpeciesProvenanceInput =
    provenanceKind === 'citation' ? { kind: 'citation', citation: provenanceText } : { kind: 'measured', reference: provenanceText, fitId: null };
  return { kind: 'entered', values, provenance };
}

/** The save step of the page as one form: name and notes, and the values by the chosen way. */
const saveCommon = {
  name: TeamSpeciesInput.shape.name,
  /** other names, comma-separated as typed */
  aliasesText: z.string().max(1000).default(''),
  notes: TeamSpeciesInput.shape.notes,
};
export const StructureSaveForm = z.discriminatedUnion('choice', [
  z.object({ choice: z.literal('estimate'), ...saveCommon }),
  EnteredValuesForm.extend({ choice: z.literal('entered'), ...saveCommon, overrideLibrary: z.boolean().default(false) }),
  z.object({
    choice: z.literal('fit'),
    ...saveCommon,
    fitId: z.number({ message: 'Choose a saved fit.' }).int().positive({ message: 'Choose a saved fit.' }),
    fitSpecies: z.string().trim().min(1, { message: 'Say which species of the fitted reaction this structure is.' }).max(120),
    overrideLibrary: z.boolean().default(false),
  }),
]);
export type StructureSaveForm = z.input<typeof StructureSaveForm>;

/** The API body for a filled-in save form and the structure it is for. */
export function toStructureRequest(form: z.output<typeof StructureSaveForm>, structure: { smiles: string } | { molfile: string }, phase: (typeof SPECIES_PHASES)[number]): TeamSpeciesFromStructure {
  const aliases = [...new Set(form.aliasesText.split(',').map((a) => a.trim()).filter(Boolean))].slice(0, 12);
  const common = { ...structure, phase, name: form.name, aliases, notes: form.notes };
  if (form.choice === 'estimate') return { ...common, source: { kind: 'estimate' } };
  if (form.choice === 'fit') return { ...common, overrideLibrary: form.overrideLibrary, source: { kind: 'fit', fitId: form.fitId, species: form.fitSpecies } };
  const { choice: _c, name: _n, aliasesText: _a, notes: _t, overrideLibrary, ...values } = form;
  return { ...common, overrideLibrary, source: toEnteredSource(values) };
}
