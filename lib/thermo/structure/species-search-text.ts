// The word index behind the species search (MiniSearch: an inverted index on a radix tree, with prefix and fuzzy
// matching): every name and synonym of an entry, cut into words. Chemical names split at spaces, hyphens, commas
// and brackets ("1,2-dichloroethane" → "dichloroethane"); bare locants and single letters are not indexed.
import MiniSearch, { type SearchOptions } from 'minisearch';

interface TextDoc {
  id: number;
  names: string;
}

const WORD_SPLIT = /[\s,;:|/+()[\]{}'"‘’′.-]+/u;

export function nameWords(text: string): string[] {
  return text.split(WORD_SPLIT);
}

// Catalogue codes ("stk337794", "brn 2821281") name no one's compound and only fill the index.
function indexTerm(term: string): string | null {
  const t = term.toLowerCase();
  return t.length < 2 || /^\d+$/.test(t) || /\d.*\d.*\d/.test(t) ? null : t;
}

export class NameWordIndex {
  private readonly search: MiniSearch<TextDoc>;

  /** `boost[id]` raises an entry (sourced data, a short name) among hits of equal text score. */
  constructor(
    docs: Iterable<{ id: number; names: readonly string[] }>,
    private readonly boost: (id: number) => number,
  ) {
    this.search = new MiniSearch<TextDoc>({ fields: ['names'], storeFields: [], tokenize: nameWords, processTerm: indexTerm });
    const batch: TextDoc[] = [];
    for (const d of docs) batch.push({ id: d.id, names: d.names.join(' | ') });
    this.search.addAll(batch);
  }

  /** Entries holding every word of the query; the last word may be unfinished (4 letters or more: shorter stems expand to thousands of words). */
  words(query: string, limit: number): number[] {
    return this.run(query, limit, { prefix: (term, i, terms) => i === terms.length - 1 && term.length >= 4 });
  }

  /** Entries holding every word within one edit (two for words of 9 letters or more): typing slips. */
  fuzzy(query: string, limit: number): number[] {
    return this.run(query, limit, { fuzzy: (term) => (term.length >= 9 ? 2 : term.length >= 4 ? 1 : false), prefix: false });
  }

  /** How many words the index would read in the query. */
  wordCount(query: string): number {
    return nameWords(query).filter((w) => indexTerm(w) !== null).length;
  }

  private run(query: string, limit: number, options: SearchOptions): number[] {
    const results = this.search.search(query, { ...options, combineWith: 'AND', boostDocument: (id: number) => this.boost(id) });
    return results.slice(0, limit).map((r) => r.id as number);
  }
}
