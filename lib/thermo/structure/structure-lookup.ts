// A species lookup that knows molecules by structure: it wraps the library + team lookup, resolves names through
// the identifier table and SMILES through RDKit, matches species by InChIKey and phase, and estimates by group
// contribution whatever has no data. Estimates are marked as such on the record and in `origin`.
import { BoundedMemo } from '../bounded-memo';
import { ThermoError } from '../errors';
import type { Phase } from '../notation';
import type { SpeciesLookup, SpeciesOrigin } from '../species-library';
import type { LibraryPhase, SpeciesRecord } from '../species-types';
import type { Chem, ParsedStructure } from './chem';
import { estimateSpecies } from './estimated-species';
import { identifierIndex, type IdentifiedCompound } from './identifiers';
import { ambiguousName, unknownName } from './name-errors';
import type { SpeciesDefinition, StructureLookup } from './structure-lookup-type';

export { isStructureLookup, type SpeciesDefinition, type StructureLookup } from './structure-lookup-type';

/** `species.EtOAc` + `smiles` → `species.EtOAc.smiles`; a bare request names the field alone. */
const at = (field: string, sub: string): string => (field ? `${field}.${sub}` : sub);

// Estimates depend only on the structure and phase, so they are shared by every lookup in the process.
const estimates = new BoundedMemo<string, SpeciesRecord>(5000);

const forcedKey = (inchikey: string, phase: string) => `{${inchikey}|estimate}(${phase})`;

class StructureAwareLookup implements StructureLookup {
  private readonly own = new Map<string, SpeciesRecord>();
  resolveLabel?: (label: string) => string | undefined;

  constructor(
    private readonly base: SpeciesLookup,
    readonly chem: Chem,
  ) {}

  get(key: string): SpeciesRecord | undefined {
    return this.base.get(key) ?? this.own.get(key);
  }

  origin(key: string): SpeciesOrigin {
    if (!this.base.get(key) && this.own.has(key)) return 'estimated';
    return this.base.origin?.(key) ?? 'library';
  }

  shadowed(key: string): SpeciesRecord | undefined {
    return this.base.shadowed?.(key);
  }

  findStructure(inchikey: string, phase: string): string | undefined {
    return this.base.findStructure?.(inchikey, phase);
  }

  resolveAlias(name: string, phaseOrForm: string): string | undefined {
    const known = this.base.resolveAlias(name, phaseOrForm);
    if (known !== undefined) return known;
    if (!['g', 'l', 's', 'aq'].includes(phaseOrForm)) return undefined;
    const compound = this.compoundNamed(name, phaseOrForm as Phase, 'equation', false);
    return compound ? this.keyForStructure(this.chem.parse(compound.smiles), phaseOrForm as LibraryPhase, compound.name, false, { structure: 'equation', phase: 'equation' }) : undefined;
  }

  suggest(key: string, limit = 5, elements?: Record<string, number>): string[] {
    const phase = /\(([a-z]+)\)$/.exec(key)?.[1] ?? 'g';
    // Species known by structure are offered by name, as people can write them; the phase asked for first.
    const writable = (k: string): string => {
      const r = k.startsWith('{') ? this.get(k) : undefined;
      return r ? `${r.name}(${r.phase})` : k;
    };
    const fromBase = this.base.suggest(key, 3 * limit, elements);
    const formula = elements ? hill(elements) : null;
    const isIsomer = (k: string) => formula !== null && this.get(k) !== undefined && hill(this.get(k)!.elements) === formula;
    const inPhase = (k: string) => k.endsWith(`(${phase})`);
    // Isomers first: the library's in the phase asked for, then same-formula compounds of the identifier table in
    // that phase (they would be estimated), then the library's in other phases, then spellings close to the key.
    const isomers = formula ? identifierIndex().withFormula(formula).slice(0, limit).map((c) => `${c.name}(${phase})`) : [];
    const ordered = [
      ...fromBase.filter((k) => isIsomer(k) && inPhase(k)).map(writable),
      ...isomers,
      ...fromBase.filter((k) => isIsomer(k) && !inPhase(k)).map(writable),
      ...fromBase.filter((k) => !isIsomer(k)).map(writable),
    ];
    return [...new Set(ordered)].slice(0, limit);
  }

  suggestName(name: string, phaseOrForm: string, limit = 5): string[] {
    const own = this.base.suggestName?.(name, phaseOrForm, limit) ?? [];
    const byPrefix = identifierIndex().prefix(name, limit).map((m) => `${m.compound.name}(${phaseOrForm})`);
    return [...new Set([...own, ...byPrefix])].slice(0, limit);
  }

  resolveDefinition(def: SpeciesDefinition, field: string): string {
    if ('key' in def) {
      if (!this.get(def.key)) {
        throw new ThermoError('UNKNOWN_SPECIES', `Not in the species library: ${def.key}`, { field: at(field, 'key'), details: { suggestions: this.suggest(def.key) } });
      }
      if (!def.estimate) return def.key;
      const record = this.get(def.key)!;
      if (!record.structure) {
        throw new ThermoError('UNSUPPORTED_STRUCTURE', `${def.key} has no structure to estimate from; give it as SMILES to compare with an estimate.`, { field: at(field, 'estimate') });
      }
      return this.keyForStructure(this.chem.parse(record.structure.smiles, at(field, 'key')), record.phase, record.name, true, { structure: at(field, 'key'), phase: at(field, 'key') });
    }
    if ('smiles' in def) {
      const structure = this.chem.parse(def.smiles, at(field, 'smiles'));
      // The memo of estimates is shared by every team, so a name a step gives its structure stays out of it
      // (withLabels shows that name to the step's own request only).
      return this.keyForStructure(structure, def.phase, null, def.estimate === true, { structure: at(field, 'smiles'), phase: at(field, 'phase') });
    }
    if (!def.estimate) {
      const known = this.base.resolveAlias(def.name, def.phase);
      if (known !== undefined) return known;
    }
    const compound = this.compoundNamed(def.name, def.phase, at(field, 'name'), true)!;
    return this.keyForStructure(this.chem.parse(compound.smiles, at(field, 'name')), def.phase, compound.name, def.estimate === true, { structure: at(field, 'name'), phase: at(field, 'phase') });
  }

  withLabels(defs: Readonly<Record<string, SpeciesDefinition>>, fieldPrefix = 'species'): SpeciesLookup {
    const labels = new Map<string, string>();
    const givenNames = new Map<string, string>();
    for (const [label, def] of Object.entries(defs)) {
      const key = this.resolveDefinition(def, `${fieldPrefix}.${label}`);
      labels.set(label.trim(), key);
      if ('smiles' in def && def.name?.trim()) givenNames.set(key, def.name.trim());
    }
    // A step's labels sit over the route's: a label the step does not define is looked up in the route's.
    const parent = this.resolveLabel?.bind(this);
    const parentGet = this.get.bind(this);
    const resolveLabel = (label: string) => labels.get(label.trim()) ?? parent?.(label);
    // A structure the step names (SMILES with a name) reads under that name in this request's answers only.
    const get = (key: string) => {
      const record = parentGet(key);
      const name = givenNames.get(key);
      return record && name && record.estimate ? { ...record, name } : record;
    };
    return Object.assign(Object.create(this) as StructureAwareLookup, { resolveLabel, get });
  }

  /** The compound a name stands for in the identifier table; several different structures → AMBIGUOUS_NAME. */
  private compoundNamed(name: string, phase: Phase, field: string, required: boolean): IdentifiedCompound | undefined {
    const hits = identifierIndex().exact(name);
    const primary = hits.filter((h) => h.primary);
    const pool = primary.length > 0 ? primary : hits;
    const distinct = [...new Map(pool.map((h) => [h.compound.inchikey, h.compound])).values()];
    if (distinct.length > 1) throw ambiguousName(name, phase, distinct, field);
    if (distinct.length === 0) {
      if (!required) return undefined;
      throw unknownName(name, phase, this.suggestName(name, phase), field);
    }
    return distinct[0];
  }

  /** `blame` names the request fields an error belongs to: the structure (smiles, name or key) and the phase. */
  private keyForStructure(structure: ParsedStructure, phase: LibraryPhase, name: string | null, forceEstimate: boolean, blame: { structure: string; phase: string }): string {
    if (!forceEstimate) {
      const known = this.findStructure(structure.inchikey, phase);
      if (known !== undefined) return known;
    }
    if (structure.radicalElectrons > 0) {
      throw new ThermoError('UNSUPPORTED_STRUCTURE', `${structure.smiles} is a radical (${structure.radicalElectrons} unpaired electrons, or an unusual valence); only closed-shell molecules are estimated.`, { field: blame.structure });
    }
    const key = forceEstimate && this.findStructure(structure.inchikey, phase) ? forcedKey(structure.inchikey, phase) : `{${structure.inchikey}}(${phase})`;
    const cached = estimates.get(key);
    if (cached) {
      this.own.set(key, cached);
      return key;
    }
    let record: SpeciesRecord;
    try {
      // Only a new estimate needs a name from the identifier table; a library match never loads it.
      const named = name ?? identifierIndex().byInchiKey(structure.inchikey)?.name ?? null;
      record = { ...estimateSpecies(this.chem, structure, phase, named).record, key };
    } catch (err) {
      if (!(err instanceof ThermoError)) throw err;
      const field = err.field === 'phase' ? blame.phase : blame.structure;
      throw new ThermoError(err.code, err.message, { field, ...(err.details ? { details: err.details } : {}), ...(err.hint ? { hint: err.hint } : {}) });
    }
    estimates.set(key, record);
    this.own.set(key, record);
    return key;
  }
}

function hill(elements: Record<string, number>): string {
  const symbols = Object.keys(elements).filter((e) => elements[e]! > 0);
  const order = symbols.includes('C') ? ['C', ...(symbols.includes('H') ? ['H'] : []), ...symbols.filter((e) => e !== 'C' && e !== 'H').sort()] : symbols.sort();
  return order.map((e) => (elements[e] === 1 ? e : `${e}${elements[e]}`)).join('');
}

const wrapped = new WeakMap<SpeciesLookup, StructureLookup>();

/** The structure-aware view of a library (or library + team) lookup; one per base lookup, so memos stay warm. */
export function structureLookup(base: SpeciesLookup, chem: Chem): StructureLookup {
  let lookup = wrapped.get(base);
  if (!lookup) {
    lookup = new StructureAwareLookup(base, chem);
    wrapped.set(base, lookup);
  }
  return lookup;
}
