// The built-in species library: loaded once per process from the committed JSON,
// indexed by key (constant-time lookup) and by common name per phase.
import libraryJson from './data/species-library.json';
import { editDistance } from './edit-distance';
import type { SpeciesLibraryFile, SpeciesRecord } from './species-types';
import { mergeOrganicLibrary, readOrganicLibrary } from './structure/library-merge';

export interface SpeciesLookup {
  get(key: string): SpeciesRecord | undefined;
  /** common name + phase or form → library key */
  resolveAlias(name: string, phaseOrForm: string): string | undefined;
  /** closest keys; `elements` adds keys with the same composition */
  suggest(key: string, limit?: number, elements?: Record<string, number>): string[];
  /** the built-in record a team species shadows, if any */
  shadowed?(key: string): SpeciesRecord | undefined;
  /** where the record `get(key)` returns comes from; absent means the built-in library */
  origin?(key: string): SpeciesOrigin;
  /** closest writable names ("ethanol(l)") or keys for an unknown name; same phase first on ties */
  suggestName?(name: string, phaseOrForm: string, limit?: number): string[];
  /** the key of the species with this InChIKey in this phase, if the lookup has one */
  findStructure?(inchikey: string, phase: string): string | undefined;
  /** a label of the request's species map ("EtOAc") → key; labels are written without a phase */
  resolveLabel?(label: string): string | undefined;
}

export type SpeciesOrigin = 'library' | 'team' | 'estimated';

interface NameCandidate {
  /** as the user would write it: "ethanol(l)", or the key itself */
  text: string;
  lower: string;
  key: string;
  phase: string;
}

const library = libraryJson as unknown as SpeciesLibraryFile;

export const libraryMeta = library.meta;

const PHASE_WORDS: Record<string, string> = {
  g: 'g', gas: 'g', vapour: 'g', vapor: 'g',
  l: 'l', liquid: 'l', liq: 'l',
  s: 's', solid: 's', cr: 's', c: 's',
  aq: 'aq', aqueous: 'aq',
};

export function normaliseName(name: string): string {
  return name.trim().toLowerCase().replace(/\s+/g, ' ');
}

function aliasKey(name: string, phaseOrForm: string): string {
  const p = normaliseName(phaseOrForm);
  return `${normaliseName(name)}|${PHASE_WORDS[p] ?? p}`;
}

function compositionKey(elements: Record<string, number>): string {
  return Object.keys(elements)
    .filter((e) => elements[e] !== 0)
    .sort()
    .map((e) => `${e}${elements[e]}`)
    .join('');
}

class MapLookup implements SpeciesLookup {
  private readonly byKey = new Map<string, SpeciesRecord>();
  private readonly byAlias = new Map<string, string>();
  private readonly byComposition = new Map<string, string[]>();
  private readonly byStructure = new Map<string, string>();
  private names: NameCandidate[] | undefined;

  constructor(records: readonly SpeciesRecord[]) {
    for (const r of records) {
      this.byKey.set(r.key, r);
      if (r.structure) this.byStructure.set(`${r.structure.inchikey}|${r.phase}`, r.key);
      for (const a of r.aliases) this.byAlias.set(aliasKey(a, r.form ?? r.phase), r.key);
      const c = compositionKey(r.elements);
      const list = this.byComposition.get(c) ?? [];
      list.push(r.key);
      this.byComposition.set(c, list);
    }
  }

  get(key: string): SpeciesRecord | undefined {
    return this.byKey.get(key);
  }

  resolveAlias(name: string, phaseOrForm: string): string | undefined {
    return this.byAlias.get(aliasKey(name, phaseOrForm));
  }

  findStructure(inchikey: string, phase: string): string | undefined {
    return this.byStructure.get(`${inchikey}|${phase}`);
  }

  keys(): IterableIterator<string> {
    return this.byKey.keys();
  }

  suggest(key: string, limit = 5, elements?: Record<string, number>): string[] {
    return rankSuggestions(key, [...this.byKey.keys()], elements ? this.compositionMatches(elements) : [], limit);
  }

  compositionMatches(elements: Record<string, number>): string[] {
    return this.byComposition.get(compositionKey(elements)) ?? [];
  }

  suggestName(name: string, phaseOrForm: string, limit = 5): string[] {
    return rankNames(name, phaseOrForm, this.nameCandidates(), limit);
  }

  // Built on first use: only the error path needs it.
  private nameCandidates(): NameCandidate[] {
    if (!this.names) {
      const out: NameCandidate[] = [];
      for (const r of this.byKey.values()) {
        const phase = r.form ?? r.phase;
        for (const a of r.aliases) {
          out.push({ text: `${a}(${phase})`, lower: `${normaliseName(a)}(${phase})`, key: r.key, phase });
        }
        out.push({ text: r.key, lower: r.key.toLowerCase(), key: r.key, phase });
      }
      this.names = out;
    }
    return this.names;
  }
}

function rankNames(name: string, phaseOrForm: string, candidates: readonly NameCandidate[], limit: number): string[] {
  const p = normaliseName(phaseOrForm);
  const phase = PHASE_WORDS[p] ?? p;
  const typed = normaliseName(name);
  const target = `${typed}(${phase})`;
  // Typos, not guesses: about one edit in three letters of the name.
  const within = Math.max(2, Math.ceil(typed.length / 3));
  const scored = candidates
    .map((c) => ({ c, d: editDistance(target, c.lower), same: c.phase === phase ? 0 : 1 }))
    .filter((x) => x.d <= within);
  scored.sort((x, y) => x.d - y.d || x.same - y.same || x.c.text.localeCompare(y.c.text));
  // One suggestion per species: its closest spelling.
  const seen = new Set<string>();
  const out: string[] = [];
  for (const { c } of scored) {
    if (seen.has(c.key)) continue;
    seen.add(c.key);
    out.push(c.text);
    if (out.length === limit) break;
  }
  return out;
}

function rankSuggestions(key: string, candidates: string[], sameFormula: string[], limit: number): string[] {
  const target = key.toLowerCase();
  const scored = candidates.map((k) => ({ k, d: editDistance(target, k.toLowerCase()) }));
  scored.sort((x, y) => x.d - y.d || x.k.localeCompare(y.k));
  const byDistance = scored.filter((s) => s.d <= Math.max(3, Math.ceil(target.length / 2))).map((s) => s.k);
  const ordered = [...new Set([...sameFormula, ...byDistance])];
  return ordered.slice(0, limit);
}

// The NBS/NASA library with the organic library merged in (lib/thermo/structure/library-merge.ts).
const builtinRecords = mergeOrganicLibrary(library.species, readOrganicLibrary());
const builtin = new MapLookup(builtinRecords);

export const builtinLookup: SpeciesLookup = builtin;

/**
 * The NBS 1982 / NASA Glenn records alone, as tabulated (no organic library, no newer evaluations): for the
 * reference tests that check the engine's arithmetic against those tables, worked by hand.
 */
export const nbsLookup: SpeciesLookup = new MapLookup(library.species);

/** The records of nbsLookup. */
export function nbsSpecies(): readonly SpeciesRecord[] {
  return library.species;
}

export function builtinSpecies(): readonly SpeciesRecord[] {
  return builtinRecords;
}

/** Team species shadow built-ins of the same key; the evaluation warns with code OVERRIDE. */
export function layeredLookup(teamSpecies: readonly SpeciesRecord[], base: SpeciesLookup = builtinLookup): SpeciesLookup {
  const team = new MapLookup(teamSpecies);
  return {
    get: (key) => team.get(key) ?? base.get(key),
    resolveAlias: (name, phaseOrForm) => team.resolveAlias(name, phaseOrForm) ?? base.resolveAlias(name, phaseOrForm),
    suggest: (key, limit = 5, elements) => {
      const own = rankSuggestions(key, [...team.keys()], elements ? team.compositionMatches(elements) : [], limit);
      return [...new Set([...own, ...base.suggest(key, limit, elements)])].slice(0, limit);
    },
    shadowed: (key) => (team.get(key) ? base.get(key) : undefined),
    origin: (key) => (team.get(key) ? 'team' : (base.origin?.(key) ?? 'library')),
    suggestName: (name, phaseOrForm, limit = 5) => {
      const own = team.suggestName(name, phaseOrForm, limit);
      return [...new Set([...own, ...(base.suggestName?.(name, phaseOrForm, limit) ?? [])])].slice(0, limit);
    },
    findStructure: (inchikey, phase) => team.findStructure(inchikey, phase) ?? base.findStructure?.(inchikey, phase),
  };
}
