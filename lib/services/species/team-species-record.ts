import 'server-only';
import type { TeamSpecies } from '../../../db/models/team-species';
import type { SpeciesProvenanceInput } from '../../schemas/species';
import { provenanceLabel, type BuiltSpecies } from '../../species/build-species';
import type { LibraryPhase, SpeciesRecord } from '../../thermo/species-types';

export function provenanceOf(row: Pick<TeamSpecies, 'provenanceKind' | 'provenanceText' | 'fitId'>): SpeciesProvenanceInput {
  if (row.provenanceKind === 'citation') return { kind: 'citation', citation: row.provenanceText };
  if (row.provenanceKind === 'measured') return { kind: 'measured', reference: row.provenanceText, fitId: row.fitId };
  return { kind: 'estimated', method: row.provenanceText };
}

/** A species known by structure: canonical SMILES and InChIKey (both null for one known by formula only). */
export interface StoredStructure {
  smiles: string | null;
  inchikey: string | null;
}

/** The stored columns for a built species (create and edit write the same ones); the structure only when given. */
export function columnsOf(s: BuiltSpecies, structure?: StoredStructure) {
  const p = s.provenance;
  return {
    ...(structure ? { smiles: structure.smiles, inchikey: structure.inchikey } : {}),
    key: s.key, formula: s.formula, phase: s.phase, form: s.form, name: s.name, aliases: s.aliases, elements: s.elements, charge: s.charge,
    dfhKj: s.dfH_kJ, dfgKj: s.dfG_kJ, dfgDerived: s.dfGDerived, sJPerK: s.S_J_per_K, cpJPerK: s.Cp_J_per_K, cpTminK: s.cpTmin_K, cpTmaxK: s.cpTmax_K,
    sigmaDfhKj: s.sigmaDfH_kJ, sigmaDfgKj: s.sigmaDfG_kJ, sigmaSJPerK: s.sigmaS_J_per_K,
    provenanceKind: p.kind, provenanceText: p.kind === 'citation' ? p.citation : p.kind === 'measured' ? p.reference : p.method,
    fitId: p.kind === 'measured' ? p.fitId : null, notes: s.notes,
  };
}

type RecordSource = Pick<TeamSpecies, 'id' | 'version'> & ReturnType<typeof columnsOf> & Partial<StoredStructure>;

/** The engine's view of a team species: constant Cp° over its range, or none. */
export function toSpeciesRecord(row: RecordSource): SpeciesRecord {
  const provenance = provenanceOf(row);
  const hasSigma = row.sigmaDfhKj !== null || row.sigmaDfgKj !== null || row.sigmaSJPerK !== null;
  return {
    key: row.key,
    name: row.name,
    aliases: row.aliases,
    phase: row.phase as LibraryPhase,
    form: row.form,
    formula: row.formula,
    elements: row.elements,
    charge: row.charge,
    dfH_kJ: row.dfhKj,
    dfG_kJ: row.dfgKj,
    S_J_per_K: row.sJPerK,
    Cp_J_per_K: row.cpJPerK,
    uncertainty: { dfH_kJ: row.sigmaDfhKj, dfG_kJ: row.sigmaDfgKj, S_J_per_K: row.sigmaSJPerK },
    uncertaintyRef: hasSigma ? provenanceLabel(provenance) : null,
    compilationDifference: null,
    source: provenanceLabel(provenance),
    sourceRef: `team species #${row.id}, version ${row.version}`,
    flags: row.dfgDerived ? ['dfGDerived'] : [],
    cp: row.cpJPerK === null ? null : { kind: 'constant', value: row.cpJPerK, Tmin: row.cpTminK ?? 198.15, Tmax: row.cpTmaxK ?? 398.15 },
    otherStateRecords: [],
    ...(row.smiles && row.inchikey ? { structure: { smiles: row.smiles, inchikey: row.inchikey, cas: null } } : {}),
    // A saved estimate from a structure stays an estimate wherever it is used (the board marks it); the method is
    // its provenance text. A hand-entered team estimate without a structure keeps origin "team", as before.
    ...(row.smiles && provenance.kind === 'estimated'
      ? { estimate: { method: provenance.method, groups: [], confidence: 'normal' as const, notes: [`Saved as team species #${row.id}.`] } }
      : {}),
  };
}
