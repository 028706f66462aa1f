// Species search over the whole identifier list (about 72,000 compounds) plus the library, as the step editor's
// typeahead asks it: names being typed (every prefix from 3 letters), whole names and synonyms, CAS numbers,
// formulas and names with a typing slip. Times each query through the index, after building it once.
// Prints figures, asserts nothing. Target (issue "molecules by structure"): p95 ≤ 50 ms.
import { builtinSpecies } from '../lib/thermo/species-library';
import { identifierIndex } from '../lib/thermo/structure/identifiers';
import { buildLibrarySearch, searchSpecies } from '../lib/thermo/structure/species-search';
import type { Figures } from './support/figures';
import { percentile, round } from './support/stats';

type Kind = 'typing' | 'name' | 'synonym' | 'cas' | 'formula' | 'slip';

/** A neighbouring pair of letters swapped in the middle of the name: the commonest typing slip. */
function slip(name: string): string {
  const i = Math.floor(name.length / 2);
  return name.slice(0, i - 1) + name[i] + name[i - 1] + name.slice(i + 1);
}

export async function runSpeciesSearchBench(): Promise<Figures> {
  const figures: Figures = {};
  const t0 = performance.now();
  const identifiers = identifierIndex();
  figures.identifier_table_load_ms = round(performance.now() - t0, 0);
  // With --expose-gc the heap figure is what the index keeps; without it, garbage of the build is counted too.
  const gc = (globalThis as { gc?: () => void }).gc;
  gc?.();
  const heapBefore = process.memoryUsage().heapUsed;
  const t1 = performance.now();
  const library = buildLibrarySearch(identifiers, builtinSpecies());
  figures.search_index_build_ms = round(performance.now() - t1, 0);
  gc?.();
  figures.search_index_heap_mb = round((process.memoryUsage().heapUsed - heapBefore) / 1e6, 0);
  figures.search_index_entries = library.size;

  // Every 150th compound of the table: a spread of short and long, common and obscure names.
  const sample = identifiers.compounds.filter((_, i) => i % 150 === 0);
  const queries: { kind: Kind; q: string }[] = [];
  for (const c of sample) {
    const name = c.name.slice(0, 100);
    for (let n = 3; n < Math.min(name.length, 14); n += 2) queries.push({ kind: 'typing', q: name.slice(0, n) });
    queries.push({ kind: 'name', q: name });
    if (c.synonyms[0]) queries.push({ kind: 'synonym', q: c.synonyms[0].slice(0, 100) });
    if (c.cas) queries.push({ kind: 'cas', q: c.cas });
    queries.push({ kind: 'formula', q: c.formula });
    if (name.length >= 6) queries.push({ kind: 'slip', q: slip(name) });
  }

  for (const { q } of queries.slice(0, 200)) searchSpecies({ query: q, limit: 8, library });
  const times: number[] = [];
  const byKind = new Map<Kind, number[]>();
  for (const { kind, q } of queries) {
    const t = performance.now();
    searchSpecies({ query: q, limit: 8, library });
    const ms = performance.now() - t;
    times.push(ms);
    const list = byKind.get(kind);
    if (list) list.push(ms);
    else byKind.set(kind, [ms]);
  }
  figures.name_search_queries = times.length;
  figures.name_search_p50_ms = round(percentile(times, 50), 3);
  figures.name_search_p95_ms = round(percentile(times, 95), 3);
  figures.name_search_p99_ms = round(percentile(times, 99), 3);
  figures.name_search_max_ms = round(Math.max(...times), 1);
  for (const [kind, list] of byKind) figures[`name_search_${kind}_p95_ms`] = round(percentile(list, 95), 3);
  return figures;
}

if (process.argv[1]?.endsWith('species-search.bench.ts')) {
  runSpeciesSearchBench().then(
    (f) => console.log(f),
    (e: unknown) => {
      console.error(e);
      process.exit(1);
    },
  );
}
