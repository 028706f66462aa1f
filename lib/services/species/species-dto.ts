import 'server-only';
import type { TeamSpecies } from '../../../db/models/team-species';
import type { BuiltSpecies } from '../../species/build-species';
import { builtinLookup } from '../../thermo/species-library';
import type { SpeciesRecord } from '../../thermo/species-types';
import { provenanceOf } from './team-species-record';

/** One row of the species table, built-in or the team's. */
export interface SpeciesRowDto {
  key: string;
  formula: string;
  name: string;
  phase: string;
  form: string | null;
  dfH_kJ: number;
  dfG_kJ: number;
  S_J_per_K: number;
  source: string;
  origin: 'library' | 'team';
  /** a team species whose key is also a built-in one */
  overridesBuiltin: boolean;
  /** a built-in row that the team's species of the same key replaces in its evaluations */
  shadowedByTeam: boolean;
  teamSpeciesId: number | null;
}

/** A team species as the API answers it: the built values (without the element counts) and the row's bookkeeping. */
export type TeamSpeciesDto = Omit<BuiltSpecies, 'elements'> & {
  id: number;
  importId: number | null;
  version: number;
  overridesBuiltin: boolean;
  updatedAt: string;
  updatedBy: string | null;
  /** canonical SMILES and InChIKey when the species is known by structure */
  smiles: string | null;
  inchikey: string | null;
};

export function toTeamSpeciesDto(row: TeamSpecies): TeamSpeciesDto {
  const updatedBy = row.get('updatedBy') as { name: string } | null | undefined;
  return {
    id: row.id, key: row.key, formula: row.formula, phase: row.phase, form: row.form, name: row.name, aliases: row.aliases, charge: row.charge,
    dfH_kJ: row.dfhKj, dfG_kJ: row.dfgKj, dfGDerived: row.dfgDerived, S_J_per_K: row.sJPerK, Cp_J_per_K: row.cpJPerK, cpTmin_K: row.cpTminK, cpTmax_K: row.cpTmaxK,
    sigmaDfH_kJ: row.sigmaDfhKj, sigmaDfG_kJ: row.sigmaDfgKj, sigmaS_J_per_K: row.sigmaSJPerK,
    provenance: provenanceOf(row), importId: row.importId, notes: row.notes, version: row.version,
    overridesBuiltin: builtinLookup.get(row.key) !== undefined,
    updatedAt: row.updatedAt.toISOString(),
    updatedBy: updatedBy?.name ?? null,
    smiles: row.smiles ?? null,
    inchikey: row.inchikey ?? null,
  };
}

export function libraryRow(r: SpeciesRecord, shadowedByTeam: boolean): SpeciesRowDto {
  return {
    key: r.key, formula: r.formula, name: r.name, phase: r.phase, form: r.form, dfH_kJ: r.dfH_kJ, dfG_kJ: r.dfG_kJ, S_J_per_K: r.S_J_per_K,
    source: r.source, origin: 'library', overridesBuiltin: false, shadowedByTeam, teamSpeciesId: null,
  };
}

export function teamRow(r: SpeciesRecord, id: number): SpeciesRowDto {
  return {
    key: r.key, formula: r.formula, name: r.name, phase: r.phase, form: r.form, dfH_kJ: r.dfH_kJ, dfG_kJ: r.dfG_kJ, S_J_per_K: r.S_J_per_K,
    source: r.source, origin: 'team', overridesBuiltin: builtinLookup.get(r.key) !== undefined, shadowedByTeam: false, teamSpeciesId: id,
  };
}
