// H°(T) and S°(T) of one species, anchored on the library's 298.15 K row so that at 298.15 K
// the tabulated values come back exactly (the polynomial's own offsets never leak in).
import { T_REF } from './constants';
import { cpFromForm, formIncrements } from './cp-forms';
import { nasa9At, nasa9HSInto, nasa9Range } from './nasa9';
import type { Nasa9Cp, SpeciesRecord } from './species-types';

export type CpBasis = 'nasa9' | 'constant' | 'form' | 'none';

export interface SpeciesState {
  /** ΔfH°-based enthalpy, kJ/mol */
  H_kJ: number;
  /** absolute (or conventional ionic) entropy, J/(mol K) */
  S_J_per_K: number;
  basis: CpBasis;
  inRange: boolean;
}

// Our convention for species without a polynomial (see lib/thermo/README.md).
export const AQUEOUS_RANGE_K: readonly [number, number] = [273.15, 373.15];
export const NO_CP_RANGE_K: readonly [number, number] = [198.15, 398.15];

const anchorCache = new WeakMap<Nasa9Cp, { H_J: number; S: number }>();

function anchor(cp: Nasa9Cp): { H_J: number; S: number } {
  let a = anchorCache.get(cp);
  if (!a) {
    const p = nasa9At(cp, T_REF);
    a = { H_J: p.H_J, S: p.S_J_per_K };
    anchorCache.set(cp, a);
  }
  return a;
}

const rangeCache = new WeakMap<SpeciesRecord, readonly [number, number]>();

function rangeOf(record: SpeciesRecord): readonly [number, number] {
  let r = rangeCache.get(record);
  if (!r) {
    const cp = record.cp;
    if (cp?.kind === 'nasa9') r = nasa9Range(cp);
    else if (cp?.kind === 'constant') r = [cp.Tmin, cp.Tmax];
    else if (cp?.kind === 'form') r = [cp.model.Tmin, cp.model.Tmax];
    else r = record.phase === 'aq' ? AQUEOUS_RANGE_K : NO_CP_RANGE_K;
    rangeCache.set(record, r);
  }
  return r;
}

/** Temperatures the species' data cover, K. */
export function speciesRange(record: SpeciesRecord): [number, number] {
  const r = rangeOf(record);
  return [r[0], r[1]];
}

/** Lower end of the data range, without allocating. */
export const rangeLow = (record: SpeciesRecord): number => rangeOf(record)[0];
/** Upper end of the data range, without allocating. */
export const rangeHigh = (record: SpeciesRecord): number => rangeOf(record)[1];

/** Cp° at T from the record's Cp model; the tabulated 298.15 K value where it has none (null if neither). */
export function cpAtTemperature(record: SpeciesRecord, T: number): number | null {
  const cp = record.cp;
  if (cp?.kind === 'nasa9') return nasa9At(cp, T).Cp_J_per_K;
  if (cp?.kind === 'constant') return cp.value;
  if (cp?.kind === 'form') return cpFromForm(cp.model, T);
  return record.Cp_J_per_K;
}

export function cpBasis(record: SpeciesRecord): CpBasis {
  return record.cp?.kind ?? 'none';
}

const poly = { H_J: 0, S_J_per_K: 0 };

/** H° and S° only, written into `out`: the allocation-free core of speciesStateAt. `lnT` is Math.log(T). */
export function speciesHSInto(
  record: SpeciesRecord,
  T: number,
  heatCapacity: boolean,
  out: { H_kJ: number; S_J_per_K: number },
  lnT: number = Math.log(T),
): void {
  const cp = record.cp;
  if (!heatCapacity || T === T_REF || cp === null) {
    out.H_kJ = record.dfH_kJ;
    out.S_J_per_K = record.S_J_per_K;
  } else if (cp.kind === 'constant') {
    out.H_kJ = record.dfH_kJ + (cp.value * (T - T_REF)) / 1000;
    out.S_J_per_K = record.S_J_per_K + cp.value * Math.log(T / T_REF);
  } else if (cp.kind === 'form') {
    const inc = formIncrements(cp, T);
    out.H_kJ = record.dfH_kJ + inc.dH_J / 1000;
    out.S_J_per_K = record.S_J_per_K + inc.dS_J_per_K;
  } else {
    nasa9HSInto(cp, T, lnT, poly);
    const a = anchor(cp);
    out.H_kJ = record.dfH_kJ + (poly.H_J - a.H_J) / 1000;
    out.S_J_per_K = record.S_J_per_K + (poly.S_J_per_K - a.S);
  }
}

/** heatCapacity=false keeps H° and S° at their 298.15 K values (ΔCp = 0). */
export function speciesStateAt(record: SpeciesRecord, T: number, heatCapacity = true): SpeciesState {
  const cp = record.cp;
  const [lo, hi] = rangeOf(record);
  let inRange = T >= lo && T <= hi;
  const hs = { H_kJ: 0, S_J_per_K: 0 };
  speciesHSInto(record, T, heatCapacity, hs);
  const basis = cpBasis(record);
  if (heatCapacity && T !== T_REF && cp?.kind === 'nasa9') inRange = inRange && nasa9At(cp, T).inRange;
  return { H_kJ: hs.H_kJ, S_J_per_K: hs.S_J_per_K, basis, inRange };
}
