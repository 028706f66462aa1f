// Finding species as people type them: over the identifier table (about 72,000 compounds), the built-in library and a
// team's own species. Exact names, synonyms, CAS numbers and InChIKeys come first, then formulas, then names that
// start with the text, then names holding its words, then names a typing slip away. Hash maps answer the exact
// kinds, a sorted name list the whole-name prefixes, and a MiniSearch word index the rest. Pure: no database; the
// library index is built once per process (about 2 s), a team's whenever its species change.
import { builtinSpecies } from '../species-library';
import type { SpeciesRecord } from '../species-types';
import { identifierIndex, type IdentifiedCompound, type IdentifierIndex } from './identifiers';
import { displayName, entryNames, groupRecords, hasData, toHit, type SearchEntry, type SearchMatch, type SpeciesSearchHit } from './species-search-entries';
import { asCas, asFormula, asInchikey, normaliseQuery } from './species-search-query';
import { NameWordIndex } from './species-search-text';
import { MAX_QUERY_LENGTH } from './species-search-limits';
import { SortedNames } from './species-search-prefix';

export type { SearchMatch, SearchOrigin, SearchPhase, SpeciesSearchHit } from './species-search-entries';

/** A hit with its place in the ranking: tier (exact, formula, prefix, word, fuzzy), then an order inside it. */
export interface RankedHit {
  /** described only for the hits that make the list */
  hit: () => SpeciesSearchHit;
  tier: number;
  order: number;
}

const TIER: Record<SearchMatch, number> = { name: 0, cas: 0, inchikey: 0, synonym: 0, formula: 1, prefix: 2, word: 3, fuzzy: 4 };
// How many whole-name prefix candidates of the identifier table to rank before cutting; the library's own names
// (short lists, sourced data) are ranked ahead of them anyway.
const PREFIX_POOL = 60;

export class SpeciesSearchIndex {
  private readonly ids = new WeakMap<IdentifiedCompound, number>();
  private readonly byName = new Map<string, { id: number; primary: boolean; text: string }[]>();
  private readonly byFormula = new Map<string, number[]>();
  private readonly byCas = new Map<string, number[]>();
  private readonly byInchikey = new Map<string, number[]>();
  private readonly names: SortedNames;
  private readonly words: NameWordIndex;
  private readonly nameLength: Uint16Array;

  /**
   * `entries` may start with one entry per compound of `identifiers`, in its order; their names, formulas and
   * numbers are then read from that index rather than copied. Other entries are indexed here.
   */
  constructor(
    private readonly entries: readonly SearchEntry[],
    private readonly identifiers: IdentifierIndex | null = null,
  ) {
    this.nameLength = new Uint16Array(entries.length);
    const own: { text: string; id: number }[] = [];
    entries.forEach((entry, id) => {
      this.nameLength[id] = Math.min(displayName(entry).length, 65535);
      if (entry.compound && identifiers) this.ids.set(entry.compound, id);
      // Compounds are found through the identifier index; what else answers to names is indexed here.
      const names = entry.compound && identifiers ? entry.records.flatMap((r) => [r.name, ...r.aliases, ...(r.key.startsWith('{') ? [] : [r.key.replace(/\([^()]*\)$/, '')])]) : entryNames(entry);
      names.forEach((text, i) => {
        const key = normaliseQuery(text);
        if (!key) return;
        const list = this.byName.get(key) ?? [];
        if (!list.some((e) => e.id === id)) list.push({ id, primary: i === 0 && !(entry.compound && identifiers), text });
        this.byName.set(key, list);
        own.push({ text: key, id });
      });
      if (!(entry.compound && identifiers)) {
        const formula = entry.compound?.formula ?? entry.records[0]?.formula;
        if (formula) push(this.byFormula, formula, id);
        const cas = entry.compound?.cas ?? entry.records.find((r) => r.structure?.cas)?.structure?.cas;
        if (cas) push(this.byCas, cas, id);
      }
      const inchikey = entry.compound?.inchikey ?? entry.records.find((r) => r.structure)?.structure?.inchikey;
      if (inchikey && !(entry.compound && identifiers)) push(this.byInchikey, inchikey, id);
    });
    this.names = new SortedNames(own);
    this.words = new NameWordIndex(
      entries.map((entry, id) => ({ id, names: entryNames(entry) })),
      (id) => (hasData(entries[id]!) ? 3 : 1) * (24 / (24 + this.nameLength[id]!)),
    );
  }

  get size(): number {
    return this.entries.length;
  }

  /** Ranked hits for one query; `limit` bounds each kind of match, the caller cuts the merged list. */
  find(query: string, limit: number): RankedHit[] {
    const text = query.trim().slice(0, MAX_QUERY_LENGTH);
    if (!text) return [];
    const found = new Map<number, RankedHit>();
    // Inside a tier: the given order, then sourced data first, then the shortest matching text (the closest completion).
    const add = (id: number | undefined, match: SearchMatch, matched: string, order: number) => {
      if (id === undefined || found.has(id)) return;
      const entry = this.entries[id]!;
      const length = match === 'word' || match === 'fuzzy' ? this.nameLength[id]! : matched.length;
      found.set(id, { hit: () => toHit(entry, match, matched), tier: TIER[match], order: order + (hasData(entry) ? 0 : 0.5) + Math.min(length, 999) / 1e4 });
    };

    // Exact: a whole name or synonym, a CAS number, an InChIKey. Main names before synonyms.
    for (const m of this.identifiers?.exact(text) ?? []) add(this.ids.get(m.compound), m.primary ? 'name' : 'synonym', m.matched, m.primary ? 0 : 1);
    for (const e of this.byName.get(normaliseQuery(text)) ?? []) add(e.id, e.primary ? 'name' : 'synonym', e.text, e.primary ? 0 : 1);
    const cas = asCas(text);
    if (cas) {
      const c = this.identifiers?.withCas(cas);
      if (c) add(this.ids.get(c), 'cas', cas, 0);
      for (const id of this.byCas.get(cas) ?? []) add(id, 'cas', cas, 0);
    }
    const inchikey = asInchikey(text);
    if (inchikey) {
      const c = this.identifiers?.byInchiKey(inchikey);
      if (c) add(this.ids.get(c), 'inchikey', inchikey, 0);
      for (const id of this.byInchikey.get(inchikey) ?? []) add(id, 'inchikey', inchikey, 0);
    }

    // A formula: every compound with it, those with sourced data first.
    const formula = asFormula(text);
    if (formula) {
      for (const c of this.identifiers?.withFormula(formula) ?? []) add(this.ids.get(c), 'formula', formula, 0);
      for (const id of this.byFormula.get(formula) ?? []) add(id, 'formula', formula, 0);
    }

    // Names that start with the text: the library's own first (short lists), then the identifier table's.
    for (const m of this.names.prefix(normaliseQuery(text), PREFIX_POOL)) add(m.id, 'prefix', m.text, 0);
    for (const m of this.identifiers?.prefix(text, PREFIX_POOL) ?? []) add(this.ids.get(m.compound), 'prefix', m.matched, 0);

    // When nothing was found exactly and the prefixes leave room: words anywhere in a name (up to four: longer
    // texts are whole names, and their common words would match half the table, slowly), then names a slip away
    // (one or two words). A number or formula that was found is not also read as words.
    const exact = [...found.values()].some((r) => r.tier === 0);
    if (exact || ((cas || inchikey || formula) && found.size > 0)) return [...found.values()];
    const words = this.words.wordCount(text);
    if (found.size < Math.ceil(limit / 2) && words > 0 && words <= 4) this.words.words(text, limit).forEach((id, rank) => add(id, 'word', displayName(this.entries[id]!), rank));
    if (found.size < limit && words > 0 && words <= 2 && text.replace(/\s/g, '').length >= 4) {
      this.words.fuzzy(text, limit).forEach((id, rank) => add(id, 'fuzzy', displayName(this.entries[id]!), rank));
    }

    return [...found.values()];
  }
}

function push(map: Map<string, number[]>, key: string, id: number): void {
  const list = map.get(key);
  if (list) list.push(id);
  else map.set(key, [id]);
}

/** Team hits before library hits of the same rank (a team species shadows the built-in one); at most `limit`. */
export function mergeRanked(lists: readonly (readonly RankedHit[])[], limit: number): SpeciesSearchHit[] {
  const all = lists.flatMap((list, source) => list.map((r) => ({ ...r, source })));
  all.sort((a, b) => a.tier - b.tier || a.order - b.order || a.source - b.source);
  const seen = new Set<string>();
  const out: SpeciesSearchHit[] = [];
  for (const ranked of all) {
    const hit = ranked.hit();
    const id = `${hit.origin === 'team' ? 'team' : 'lib'}|${hit.inchikey ?? `${hit.formula}|${normaliseQuery(hit.name)}|${hit.phases.map((p) => p.key).join(',')}`}`;
    if (seen.has(id)) continue;
    seen.add(id);
    out.push(hit);
    if (out.length >= limit) break;
  }
  return out;
}

/** The library's index: one entry per identifier-table compound (with the library's records for it), plus the library's substances the table lacks. */
export function buildLibrarySearch(identifiers: IdentifierIndex, records: readonly SpeciesRecord[]): SpeciesSearchIndex {
  const byInchikey = new Map<string, SpeciesRecord[]>();
  const rest: SpeciesRecord[][] = [];
  const attach = (inchikey: string, group: SpeciesRecord[]) => byInchikey.set(inchikey, [...(byInchikey.get(inchikey) ?? []), ...group]);
  for (const group of groupRecords(records)) {
    const inchikey = group[0]!.structure?.inchikey;
    if (inchikey && identifiers.byInchiKey(inchikey)) {
      attach(inchikey, group);
      continue;
    }
    // A record without a structure (an NBS aqueous row, say) joins the one compound of its name and formula.
    const same = new Set(identifiers.exact(group[0]!.name).filter((m) => m.compound.formula === group[0]!.formula).map((m) => m.compound.inchikey));
    if (same.size === 1) attach([...same][0]!, group);
    else rest.push(group);
  }
  const entries: SearchEntry[] = identifiers.compounds.map((compound) => ({ compound, records: byInchikey.get(compound.inchikey) ?? [], team: false }));
  for (const group of rest) entries.push({ compound: null, records: group, team: false });
  return new SpeciesSearchIndex(entries, identifiers);
}

/** A team's species as an index of their own; a team species with a structure is drawn from it. */
export function buildTeamSearch(records: readonly SpeciesRecord[]): SpeciesSearchIndex {
  return new SpeciesSearchIndex(groupRecords(records).map((group) => ({ compound: null, records: group, team: true })));
}

let library: SpeciesSearchIndex | undefined;
const teams = new WeakMap<readonly SpeciesRecord[], SpeciesSearchIndex>();

/** The built-in library's index, built on first use and kept for the process. */
export function librarySearchIndex(): SpeciesSearchIndex {
  return (library ??= buildLibrarySearch(identifierIndex(), builtinSpecies()));
}

/** A team's index, kept as long as the caller keeps the same records array (team lookups are cached per change). */
export function teamSearchIndex(records: readonly SpeciesRecord[]): SpeciesSearchIndex {
  let index = teams.get(records);
  if (!index) {
    index = buildTeamSearch(records);
    teams.set(records, index);
  }
  return index;
}

/** Team species first within each rank, then the library and the identifier table. */
export function searchSpecies({ query, limit, library: lib, team }: { query: string; limit: number; library: SpeciesSearchIndex; team?: SpeciesSearchIndex }): SpeciesSearchHit[] {
  const lists = [...(team ? [team.find(query, limit)] : []), lib.find(query, limit)];
  return mergeRanked(lists, limit);
}
