// H°(T) and S°(T) of one species, anchored on the library's 298.15 K row so that at 298.15 K
// the tabulated values come back exactly (the polynomial's own offsets never leak in).
import { T_REF } from './constants';
import { nasa9At, nasa9Range } from './nasa9';
import type { Nasa9Cp, SpeciesRecord } from './species-types';

export type CpBasis = 'nasa9' | 'constant' | 'none';

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

/** Temperatures the species' data cover, K. */
export function speciesRange(record: SpeciesRecord): [number, number] {
  const cp = record.cp;
  if (cp?.kind === 'nasa9') return nasa9Range(cp);
  if (cp?.kind === 'constant') return [cp.Tmin, cp.Tmax];
  const r = record.phase === 'aq' ? AQUEOUS_RANGE_K : NO_CP_RANGE_K;
  return [r[0], r[1]];
}

export function cpBasis(record: SpeciesRecord): CpBasis {
  return record.cp?.kind ?? 'none';
}

/** heatCapacity=false keeps H° and S° at their 298.15 K values (ΔCp = 0). */
export function speciesStateAt(record: SpeciesRecord, T: number, heatCapacity = true): SpeciesState {
  const cp = record.cp;
  const [lo, hi] = speciesRange(record);
  const inRange = T >= lo && T <= hi;
  if (!heatCapacity || T === T_REF || cp === null) {
    return { H_kJ: record.dfH_kJ, S_J_per_K: record.S_J_per_K, basis: cpBasis(record), inRange };
  }
  if (cp.kind === 'constant') {
    return {
      H_kJ: record.dfH_kJ + (cp.value * (T - T_REF)) / 1000,
      S_J_per_K: record.S_J_per_K + cp.value * Math.log(T / T_REF),
      basis: 'constant',
      inRange,
    };
  }
  const p = nasa9At(cp, T);
  const a = anchor(cp);
  return {
    H_kJ: record.dfH_kJ + (p.H_J - a.H_J) / 1000,
    S_J_per_K: record.S_J_per_K + (p.S_J_per_K - a.S),
    basis: 'nasa9',
    inRange: inRange && p.inRange,
  };
}
