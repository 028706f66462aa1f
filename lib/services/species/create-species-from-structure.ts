import 'server-only';
import type { Transaction } from 'sequelize';
import type { z } from 'zod';
import { getDb } from '../../../db';
import { AppError } from '../../api/errors';
import { fitSource } from '../../fits/fit-override';
import { solveSpeciesFromFit } from '../../fits/species-from-fit';
import type { TeamSpeciesInput } from '../../schemas/species';
import type { TeamSpeciesFromStructure } from '../../schemas/species-structure';
import type { ParsedStructure } from '../../thermo/structure/chem';
import { organicKey } from '../../thermo/structure/organic-format';
import { fmt } from '../../thermo/warnings';
import { recordEvent } from '../audit/record-event';
import { findFitRow } from '../fits/read-fits';
import { invalidateAfter, readTeamSpecies } from './create-team-species';
import { enteredFormula, readStructure } from './read-structure';
import { libraryStructure } from './species-structure-key';
import { toTeamSpeciesDto } from './species-dto';
import { teamLookup } from './team-lookup';
import { columnsOf } from './team-species-record';

type Request = z.output<typeof TeamSpeciesFromStructure>;
type Values = Omit<TeamSpeciesInput, 'formula' | 'phase' | 'name' | 'aliases' | 'notes'>;

/** The engine's estimate for the structure: values, σ and the method, read on the server (never from the request). */
async function estimateValues(teamId: number, structure: ParsedStructure, req: Request, transaction: Transaction): Promise<{ values: Values; groups: string }> {
  const lookup = await teamLookup(teamId, transaction);
  const key = lookup.resolveDefinition({ smiles: structure.smiles, phase: req.phase, name: req.name, estimate: true }, '');
  const record = lookup.get(key)!;
  const estimate = record.estimate!;
  const groups = estimate.groups.map((g) => `${g.label} ×${g.count} (${g.source})`).join('; ');
  const method = `${estimate.method}${estimate.confidence === 'low' ? ', low confidence' : ''}`.slice(0, 500);
  return {
    groups,
    values: {
      dfH: record.dfH_kJ, dfG: record.dfG_kJ, S: record.S_J_per_K,
      // The team record keeps Cp° as a constant: the estimate's 298.15 K value over the usual ±100 K.
      Cp: record.Cp_J_per_K, cpTmin_K: null, cpTmax_K: null,
      sigmaDfH: record.uncertainty.dfH_kJ, sigmaDfG: record.uncertainty.dfG_kJ, sigmaS: record.uncertainty.S_J_per_K,
      provenance: { kind: 'estimated', method },
    },
  };
}

/** ΔfH°, ΔfG° and S° solved from a saved fit of this team; the fit's species must have the structure's formula. */
async function fitValues(teamId: number, structure: ParsedStructure, source: { fitId: number; species: string }, transaction: Transaction): Promise<{ values: Values; note: string }> {
  const fit = await findFitRow({ teamId, fitId: source.fitId, transaction });
  if (fit.equation === '') throw new AppError('UNPROCESSABLE', 'This fit is not linked to a reaction, so no species can be solved from it.', { fields: { 'source.fitId': 'Choose a fit of a reaction.' } });
  const solved = solveSpeciesFromFit({ equation: fit.equation, species: source.species, fit: fit.result, lookup: await teamLookup(teamId, transaction) });
  const same = JSON.stringify(Object.entries(solved.ref.elements).sort()) === JSON.stringify(Object.entries(structure.elements).sort()) && solved.ref.charge === structure.charge;
  if (!same) {
    throw new AppError('VALIDATION', `${source.species} in ${fit.equation} is ${solved.ref.formula}, but the structure is ${structure.formula}.`, {
      fields: { 'source.species': `Not this structure: ${solved.ref.formula} ≠ ${structure.formula}.` },
    });
  }
  const [lo, hi] = fit.result.range_K;
  return {
    note: `Solved from ${fit.equation} with the fitted ΔrH° and ΔrS° taken as 298.15 K values (ΔCp = 0); σ from the fit alone.`,
    values: {
      dfH: solved.dfH_kJ, dfG: solved.dfG_kJ, S: solved.S_J_per_K, Cp: null, cpTmin_K: null, cpTmax_K: null,
      sigmaDfH: solved.sigma_dfH_kJ, sigmaDfG: solved.sigma_dfG_kJ, sigmaS: solved.sigma_S_J_per_K,
      provenance: { kind: 'measured', reference: `${fitSource(fit)} of data set “${fit.rawData.dataSetName}” (${fit.result.n} points, ${fmt(lo)}–${fmt(hi)} K)`, fitId: fit.id },
    },
  };
}

/** Builds the species, falling back to a derived ΔfG° when the given one misses ΔfH° − TΔfS° by rounding. */
function build(input: TeamSpeciesInput, derivable: boolean) {
  try {
    return readTeamSpecies(input);
  } catch (error) {
    if (!derivable || !(error instanceof AppError) || Object.keys(error.fields ?? {}).join() !== 'dfG') throw error;
    return readTeamSpecies({ ...input, dfG: null });
  }
}

/**
 * A team species from a pasted SMILES or molfile, known by its InChIKey and phase from then on: the engine's
 * estimate (method and σ recorded), the team's own values, or values solved from a saved fit.
 * A structure the library already has with sourced data answers 409 with the library species, unless the team
 * means its own values to replace it.
 */
export async function createSpeciesFromStructure({ teamId, userId, input }: { teamId: number; userId: number; input: Request }) {
  const { structure, field } = await readStructure(input);
  const { sequelize, models } = getDb();
  return sequelize.transaction(async (transaction) => {
    const own = await models.TeamSpecies.findOne({ where: { teamId, inchikey: structure.inchikey, phase: input.phase }, transaction });
    if (own) {
      throw new AppError('CONFLICT', `Your team already has this structure in this phase: “${own.name}”. Edit that one instead.`, {
        fields: { [field]: `Already in your team as “${own.name}”.` }, details: { teamSpeciesId: own.id, name: own.name },
      });
    }
    const library = libraryStructure(structure.inchikey, input.phase);
    if (library && (!input.overrideLibrary || input.source.kind === 'estimate')) {
      throw new AppError('CONFLICT', `The library already has ${library.name} (${input.phase}) with sourced data (${library.source}); use it instead of a copy.`, {
        fields: { [field]: `In the library as ${library.name}.` }, details: { library },
      });
    }
    let values: Values;
    let note = '';
    if (input.source.kind === 'estimate') {
      const estimate = await estimateValues(teamId, structure, input, transaction);
      values = estimate.values;
      note = `Groups matched: ${estimate.groups}.`;
    } else if (input.source.kind === 'fit') {
      ({ values, note } = await fitValues(teamId, structure, input.source, transaction));
    } else {
      values = { ...input.source.values, provenance: input.source.provenance };
    }
    const notes = [input.notes, note].filter(Boolean).join('\n').slice(0, 2000);
    const built = build(
      { ...values, formula: enteredFormula(structure), phase: input.phase, name: input.name, aliases: input.aliases, notes },
      input.source.kind !== 'entered',
    );
    // Known by structure: the key is the library's when the team replaces a library species, else InChIKey + phase.
    const species = { ...built.species, key: library?.key ?? organicKey(structure.inchikey, input.phase), form: null };
    const clash = await models.TeamSpecies.findOne({ where: { teamId, key: species.key }, transaction });
    if (clash) throw new AppError('CONFLICT', `Your team already has “${clash.name}” under the same key.`, { details: { teamSpeciesId: clash.id, name: clash.name } });
    const row = await models.TeamSpecies.create(
      { teamId, ...columnsOf(species, { smiles: structure.smiles, inchikey: structure.inchikey }), importId: null, createdById: userId, updatedById: userId },
      { transaction },
    );
    await recordEvent({
      teamId, actorId: userId, action: 'species.created', targetType: 'team_species', targetId: row.id,
      data: { key: row.key, inchikey: structure.inchikey, from: input.source.kind },
    }, transaction);
    invalidateAfter(teamId, transaction);
    return { ...toTeamSpeciesDto(row), warnings: built.warnings };
  });
}
