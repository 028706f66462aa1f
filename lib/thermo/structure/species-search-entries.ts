// The things a species search can find, and how a found one is described: a compound of the identifier table (with
// the library's records for it, by InChIKey), or a library or team substance the table lacks. Pure.
import type { LibraryPhase, SpeciesRecord } from '../species-types';
import type { IdentifiedCompound } from './identifiers';
import { looksLikeCas, normaliseQuery } from './species-search-query';

/** library: sourced data in some phase; team: the team's own species; estimated: only an identifier entry, so a step would estimate it. */
export type SearchOrigin = 'library' | 'team' | 'estimated';

/** How the query met the hit, best first: the order hits are ranked in. */
export type SearchMatch = 'name' | 'synonym' | 'cas' | 'inchikey' | 'formula' | 'prefix' | 'word' | 'fuzzy';

export interface SearchPhase {
  phase: LibraryPhase;
  /** the key a step can write for this species in this phase */
  key: string;
  /** where the values come from (library) or the team's provenance */
  source: string;
}

export interface SpeciesSearchHit {
  name: string;
  /** Hill formula, charge appended for ions */
  formula: string;
  smiles: string | null;
  inchikey: string | null;
  cas: string | null;
  origin: SearchOrigin;
  /** phases with sourced (or team) data, gas first; empty when a step would estimate it */
  phases: SearchPhase[];
  match: SearchMatch;
  /** the name, synonym, formula or number that matched, as stored */
  matched: string;
}

export const PHASE_ORDER: readonly LibraryPhase[] = ['g', 'l', 's', 'aq'];

/** One searchable thing: an identifier-table compound and/or the library (or team) records of one substance. */
export interface SearchEntry {
  compound: IdentifiedCompound | null;
  records: readonly SpeciesRecord[];
  team: boolean;
}

/** Groups records by substance: by InChIKey where they carry a structure, otherwise by formula and name. */
export function groupRecords(records: readonly SpeciesRecord[]): SpeciesRecord[][] {
  const groups = new Map<string, SpeciesRecord[]>();
  for (const r of records) {
    const id = r.structure?.inchikey ? `k:${r.structure.inchikey}` : `f:${r.formula}|${normaliseQuery(r.name)}`;
    const list = groups.get(id);
    if (list) list.push(r);
    else groups.set(id, [r]);
  }
  return [...groups.values()];
}

/** Every text an entry answers to: the compound's name and synonyms, the records' names, aliases and keys (less the phase). */
export function entryNames(entry: SearchEntry): string[] {
  const out = new Set<string>();
  if (entry.compound) for (const n of [entry.compound.name, ...entry.compound.synonyms]) out.add(n);
  for (const r of entry.records) {
    out.add(r.name);
    for (const a of r.aliases) out.add(a);
    if (!r.key.startsWith('{')) out.add(r.key.replace(/\([^()]*\)$/, ''));
  }
  return [...out].filter((n) => n.trim().length > 0);
}

/** A name to show: never a CAS number standing in for one, never a structure key. */
export function displayName(entry: SearchEntry): string {
  const candidates = [entry.compound?.name, ...entry.records.map((r) => r.name), ...(entry.compound?.synonyms ?? [])];
  for (const c of candidates) if (c && c.trim() && !looksLikeCas(c) && !c.startsWith('{')) return c;
  return entry.compound?.formula ?? entry.records[0]?.formula ?? '';
}

export function hasData(entry: SearchEntry): boolean {
  return entry.records.length > 0;
}

export function toHit(entry: SearchEntry, match: SearchMatch, matched: string): SpeciesSearchHit {
  const first = entry.records[0];
  const structure = entry.records.find((r) => r.structure)?.structure;
  const phases = [...entry.records]
    .sort((a, b) => PHASE_ORDER.indexOf(a.phase) - PHASE_ORDER.indexOf(b.phase))
    .map((r) => ({ phase: r.phase, key: r.key, source: r.source }));
  return {
    name: displayName(entry),
    formula: entry.compound?.formula ?? first?.formula ?? '',
    smiles: entry.compound?.smiles ?? structure?.smiles ?? null,
    inchikey: entry.compound?.inchikey ?? structure?.inchikey ?? null,
    cas: entry.compound?.cas ?? structure?.cas ?? null,
    origin: entry.team ? 'team' : phases.length > 0 ? 'library' : 'estimated',
    phases,
    match,
    matched,
  };
}
