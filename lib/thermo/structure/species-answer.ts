// One species as the `species` command and GET /api/species/resolve answer it: identity, where the numbers come
// from, and ΔfH°, ΔfG°, S°, Cp at the temperature asked (standard state 1 bar), with σ.
import { T_REF } from '../constants';
import { ThermoError } from '../errors';
import { reactionThermoAt, type ReactionSpecies } from '../reaction-thermo';
import { nbsSpecies } from '../species-library';
import { cpAtTemperature, speciesRange, speciesStateAt } from '../species-state';
import type { LibraryPhase, SpeciesRecord } from '../species-types';
import { speciesSigma } from '../uncertainty';
import { parseTemperature } from '../units';
import type { SpeciesDefinition, StructureLookup } from './structure-lookup-type';

export interface SpeciesRequest {
  smiles?: string;
  name?: string;
  key?: string;
  phase?: LibraryPhase;
  temperature?: string;
  estimate?: boolean;
}

export interface SpeciesAnswer {
  key: string;
  smiles: string | null;
  inchikey: string | null;
  formula: string;
  charge: number;
  name: string;
  phase: LibraryPhase;
  origin: 'library' | 'team' | 'estimated';
  source?: string;
  method?: string;
  groups?: { label: string; count: number; source: string }[];
  confidence?: 'normal' | 'low';
  notes?: string[];
  temperature_K: number;
  dfH_kJ: number;
  dfG_kJ: number;
  S_J_per_K: number;
  Cp_J_per_K: number | null;
  sigma_dfH_kJ: number | null;
  sigma_dfG_kJ: number | null;
  cpRange_K: [number, number];
  warnings: string[];
}

// Elements in their reference states, from the NBS/NASA rows flagged as such (graphite, H2(g), O2(g), …).
const REFERENCE_KEYS = new Map<string, string>();
for (const r of nbsSpecies()) {
  const symbols = Object.keys(r.elements);
  if (r.flags.includes('elementReference') && symbols.length === 1 && r.charge === 0) REFERENCE_KEYS.set(symbols[0]!, r.key);
}

function formationTerms(record: SpeciesRecord, lookup: StructureLookup): ReactionSpecies[] {
  const terms: ReactionSpecies[] = [{ key: record.key, asWritten: record.key, nu: 1, record }];
  for (const [el, n] of Object.entries(record.elements)) {
    const refKey = REFERENCE_KEYS.get(el);
    const ref = refKey ? lookup.get(refKey) : undefined;
    if (!ref) throw new ThermoError('MISSING_DATA', `No reference-state record for ${el}, so ΔfG°(T) of ${record.key} cannot be formed.`, { field: 'key' });
    if (ref.key === record.key) return [];
    terms.push({ key: ref.key, asWritten: ref.key, nu: -n / ref.elements[el]!, record: ref });
  }
  return terms;
}


function definitionOf(req: SpeciesRequest): SpeciesDefinition {
  const given = [req.smiles, req.name, req.key].filter((v) => v !== undefined).length;
  if (given !== 1) throw new ThermoError('INVALID_VALUE', 'Give exactly one of smiles, name or key.', { field: 'smiles' });
  if (req.key !== undefined) return { key: req.key, ...(req.estimate ? { estimate: true } : {}) };
  if (!req.phase) throw new ThermoError('INVALID_VALUE', 'Give the phase: g, l, s or aq.', { field: 'phase' });
  if (req.smiles !== undefined) return { smiles: req.smiles, phase: req.phase, ...(req.estimate ? { estimate: true } : {}) };
  return { name: req.name!, phase: req.phase, ...(req.estimate ? { estimate: true } : {}) };
}

export function describeSpecies(lookup: StructureLookup, req: SpeciesRequest): SpeciesAnswer {
  const key = lookup.resolveDefinition(definitionOf(req), '');
  const record = lookup.get(key)!;
  const T = req.temperature === undefined ? T_REF : parseTemperature(req.temperature, 'temperature');
  const [lo, hi] = speciesRange(record);
  const warnings: string[] = [];
  if (T < lo || T > hi) warnings.push(`${T} K is outside the data range ${lo}–${hi} K of ${record.name}; the values are extrapolated.`);
  const terms = formationTerms(record, lookup);
  const formation = terms.length ? reactionThermoAt(terms, T, { heatCapacity: true, standardPressure_bar: 1 }) : { deltaH0_kJ: 0, deltaG0_kJ: 0 };
  const state = speciesStateAt(record, T, true);
  const sigma = speciesSigma(record);
  const estimated = record.estimate !== undefined;
  const origin = estimated ? 'estimated' : lookup.origin?.(key) === 'team' ? 'team' : 'library';
  return {
    key,
    smiles: record.structure?.smiles ?? null,
    inchikey: record.structure?.inchikey ?? null,
    formula: record.formula,
    charge: record.charge,
    name: record.name,
    phase: record.phase,
    origin,
    ...(estimated
      ? { method: record.estimate!.method, groups: record.estimate!.groups, confidence: record.estimate!.confidence, notes: record.estimate!.notes }
      : { source: record.source }),
    temperature_K: T,
    dfH_kJ: formation.deltaH0_kJ,
    dfG_kJ: formation.deltaG0_kJ,
    S_J_per_K: state.S_J_per_K,
    // Without a Cp model, the 298.15 K value says nothing about other temperatures.
    Cp_J_per_K: record.cp === null && T !== T_REF ? null : cpAtTemperature(record, T),
    sigma_dfH_kJ: estimated ? record.uncertainty.dfH_kJ : (sigma.from === 'none' ? null : Math.max(record.uncertainty.dfH_kJ ?? 0, record.compilationDifference?.dfH_kJ ?? 0, record.sourceSpread?.dfH_kJ ?? 0) || null),
    sigma_dfG_kJ: sigma.sigma_kJ,
    cpRange_K: [lo, hi],
    warnings: [...warnings, ...(T !== T_REF && record.cp === null ? [`No Cp data for ${record.name}: values at ${T} K take ΔCp = 0.`] : [])],
  };
}
