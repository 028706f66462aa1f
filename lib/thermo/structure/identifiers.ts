// The identifier table (about 72,000 compounds: InChIKey, SMILES, formula, CAS, name and synonyms, from PubChem
// via the organic library's build) as a name index: exact names, prefixes, formulas and CAS numbers. Loaded from
// lib/thermo/data/source/organics/identifiers.csv on first use (about a second), then kept.
import Papa from 'papaparse';
import { readDataText } from '../data/data-files';

export interface IdentifiedCompound {
  inchikey: string;
  smiles: string;
  formula: string;
  charge: number;
  cas: string | null;
  name: string;
  synonyms: string[];
  /** phases the sourced library has data for ("g;l"), empty when none */
  inLibrary: string;
}

interface Row {
  inchikey: string;
  smiles: string;
  formula: string;
  charge: string;
  cas: string;
  name: string;
  synonyms: string;
  in_species_csv: string;
}

export function normaliseCompoundName(name: string): string {
  return name.trim().toLowerCase().replace(/\s+/g, ' ');
}

export interface NameMatch {
  compound: IdentifiedCompound;
  /** the name or synonym that matched, as stored */
  matched: string;
  /** whether it matched the compound's main name (preferred over a synonym) */
  primary: boolean;
}

export class IdentifierIndex {
  readonly compounds: IdentifiedCompound[];
  private readonly byName = new Map<string, { index: number; primary: boolean; text: string }[]>();
  private readonly byFormula = new Map<string, number[]>();
  private readonly byCas = new Map<string, number>();
  private readonly byInchikey = new Map<string, number>();
  /** every normalised name, sorted, for prefix search */
  private readonly sortedNames: string[];

  constructor(compounds: IdentifiedCompound[]) {
    this.compounds = compounds;
    compounds.forEach((c, index) => {
      const names = [c.name, ...c.synonyms];
      names.forEach((text, i) => {
        const key = normaliseCompoundName(text);
        if (!key) return;
        const list = this.byName.get(key) ?? [];
        if (!list.some((e) => e.index === index)) list.push({ index, primary: i === 0, text });
        this.byName.set(key, list);
      });
      const f = this.byFormula.get(c.formula) ?? [];
      f.push(index);
      this.byFormula.set(c.formula, f);
      if (c.cas) this.byCas.set(c.cas, index);
      this.byInchikey.set(c.inchikey, index);
    });
    this.sortedNames = [...this.byName.keys()].sort();
  }

  /** Compounds whose name or synonym is exactly this (case and spacing ignored); main names first. */
  exact(name: string): NameMatch[] {
    const hits = this.byName.get(normaliseCompoundName(name)) ?? [];
    return hits
      .map((h) => ({ compound: this.compounds[h.index]!, matched: h.text, primary: h.primary }))
      .sort((a, b) => Number(b.primary) - Number(a.primary));
  }

  byInchiKey(inchikey: string): IdentifiedCompound | undefined {
    const i = this.byInchikey.get(inchikey);
    return i === undefined ? undefined : this.compounds[i];
  }

  withFormula(formula: string): IdentifiedCompound[] {
    return (this.byFormula.get(formula) ?? []).map((i) => this.compounds[i]!);
  }

  withCas(cas: string): IdentifiedCompound | undefined {
    const i = this.byCas.get(cas.trim());
    return i === undefined ? undefined : this.compounds[i];
  }

  /** Names starting with `prefix`, by binary search over the sorted names; one hit per compound. */
  prefix(prefix: string, limit = 20): NameMatch[] {
    const p = normaliseCompoundName(prefix);
    if (!p) return [];
    let lo = 0;
    let hi = this.sortedNames.length;
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if (this.sortedNames[mid]! < p) lo = mid + 1;
      else hi = mid;
    }
    const out: NameMatch[] = [];
    const seen = new Set<number>();
    for (let i = lo; i < this.sortedNames.length && this.sortedNames[i]!.startsWith(p) && out.length < limit; i++) {
      for (const h of this.byName.get(this.sortedNames[i]!)!) {
        if (seen.has(h.index)) continue;
        seen.add(h.index);
        out.push({ compound: this.compounds[h.index]!, matched: h.text, primary: h.primary });
      }
    }
    return out.slice(0, limit);
  }
}

let index: IdentifierIndex | undefined;

export function identifierIndex(): IdentifierIndex {
  if (!index) {
    const parsed = Papa.parse<Row>(readDataText('source/organics/identifiers.csv'), { header: true, skipEmptyLines: true });
    index = new IdentifierIndex(
      parsed.data.map((r) => ({
        inchikey: r.inchikey,
        smiles: r.smiles,
        formula: r.formula,
        charge: Number(r.charge) || 0,
        cas: r.cas || null,
        name: r.name,
        synonyms: r.synonyms ? r.synonyms.split('|') : [],
        inLibrary: r.in_species_csv,
      })),
    );
  }
  return index;
}
