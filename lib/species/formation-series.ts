// Cp°(T) and ΔfG°(T) of one species over its data range, for the detail plot. ΔfG°(T) is the engine's
// ΔrG°(T) of the formation reaction from the elements in their reference states (ions against H+(aq) and H2(g)),
// so it meets the tabulated ΔfG° at 298.15 K exactly.
import { T_REF } from '../thermo/constants';
import { reactionThermoAt, type ReactionSpecies } from '../thermo/reaction-thermo';
import type { SpeciesLookup } from '../thermo/species-library';
import { cpAtTemperature as cpAt, speciesRange } from '../thermo/species-state';
import type { SpeciesRecord } from '../thermo/species-types';
import { elementEntropies } from './consistency';

export interface SeriesPoint {
  T_K: number;
  /** null where the species has no Cp° data */
  Cp_J_per_K: number | null;
  /** null when an element has no reference-state record */
  dfG_kJ: number | null;
}

export interface FormationSeries {
  range_K: [number, number];
  points: SeriesPoint[];
  /** how Cp° is known: a NASA polynomial, one constant value, or not at all (ΔCp = 0) */
  cpBasis: 'nasa9' | 'constant' | 'form' | 'none';
}

const REFERENCES = elementEntropies();

function formationTerms(record: SpeciesRecord, lookup: SpeciesLookup): ReactionSpecies[] | null {
  const terms: ReactionSpecies[] = [{ key: record.key, asWritten: record.key, nu: 1, record }];
  for (const [el, n] of Object.entries(record.elements)) {
    const ref = REFERENCES.get(el);
    const refRecord = ref ? lookup.get(ref.from) : undefined;
    if (!ref || !refRecord) return null;
    if (refRecord.key === record.key) return null; // an element in its reference state: ΔfG° is 0 at every T
    terms.push({ key: refRecord.key, asWritten: refRecord.key, nu: -n / refRecord.elements[el]!, record: refRecord });
  }
  if (record.charge !== 0) {
    const proton = lookup.get('H+(aq)');
    const h2 = lookup.get('H2(g)');
    if (!proton || !h2) return null;
    // Hydrogen from the formula and from the charge balance fold into one H2 term.
    const existing = terms.find((t) => t.key === h2.key);
    if (existing) existing.nu += record.charge / 2;
    else terms.push({ key: h2.key, asWritten: h2.key, nu: record.charge / 2, record: h2 });
    terms.push({ key: proton.key, asWritten: proton.key, nu: -record.charge, record: proton });
  }
  return terms;
}


export function formationSeries(record: SpeciesRecord, lookup: SpeciesLookup, count = 41): FormationSeries {
  const [lo, hi] = speciesRange(record);
  const terms = formationTerms(record, lookup);
  const isElement = Object.keys(record.elements).length === 1 && record.flags.includes('elementReference');
  const points: SeriesPoint[] = [];
  for (let i = 0; i < count; i += 1) {
    const T = i === 0 ? lo : i === count - 1 ? hi : lo + ((hi - lo) * i) / (count - 1);
    const dfG = isElement ? 0 : terms ? reactionThermoAt(terms, T, { heatCapacity: true, standardPressure_bar: 1 }).deltaG0_kJ : null;
    points.push({ T_K: T, Cp_J_per_K: cpAt(record, T), dfG_kJ: dfG });
  }
  // The reference temperature itself, so the plot passes through the tabulated value.
  if (lo < T_REF && hi > T_REF && !points.some((p) => p.T_K === T_REF)) {
    const dfG = isElement ? 0 : terms ? reactionThermoAt(terms, T_REF, { heatCapacity: true, standardPressure_bar: 1 }).deltaG0_kJ : null;
    points.push({ T_K: T_REF, Cp_J_per_K: cpAt(record, T_REF), dfG_kJ: dfG });
    points.sort((a, b) => a.T_K - b.T_K);
  }
  return { range_K: [lo, hi], points, cpBasis: record.cp?.kind ?? 'none' };
}
