// One unknown species of a fitted reaction, solved from the fit's ΔrH°, ΔrS° and the library values
// of the others: ΔfX°(unknown) = (ΔrX° − Σ others ν ΔfX°) / ν(unknown), for ΔfH°, ΔfG° and S°.
// The fit's ΔH° and ΔS° are taken as 298.15 K values (ΔCp = 0): the fit's temperature range applies.
import { T_REF } from '../thermo/constants';
import { parseEquation } from '../thermo/equation';
import { ThermoError } from '../thermo/errors';
import { lookupParseOptions } from '../thermo/lookup-parse-options';
import type { SpeciesRef } from '../thermo/notation';
import type { SpeciesLookup } from '../thermo/species-library';
import type { FitResult } from './analyse-fit';

export interface SolvedSpecies {
  ref: SpeciesRef;
  nu: number;
  dfH_kJ: number;
  dfG_kJ: number;
  S_J_per_K: number;
  /** from the fit's standard errors only; the other species' uncertainties are not included */
  sigma_dfH_kJ: number;
  sigma_dfG_kJ: number;
  sigma_S_J_per_K: number;
  /** a built-in species of the same key, which the new team species would shadow */
  shadows: boolean;
  /** the other species and the library values used */
  others: { key: string; nu: number; dfH_kJ: number; dfG_kJ: number; S_J_per_K: number; source: string }[];
}

function netStoichiometry(equation: string, lookup: SpeciesLookup): Map<string, { ref: SpeciesRef; nu: number }> {
  const parsed = parseEquation(equation, lookupParseOptions(lookup));
  const out = new Map<string, { ref: SpeciesRef; nu: number }>();
  for (const [terms, sign] of [[parsed.reactants, -1], [parsed.products, 1]] as const) {
    for (const t of terms) {
      const entry = out.get(t.species.key) ?? { ref: t.species, nu: 0 };
      entry.nu += sign * t.value;
      out.set(t.species.key, entry);
    }
  }
  return out;
}

export function solveSpeciesFromFit(args: { equation: string; species: string; fit: FitResult; lookup: SpeciesLookup }): SolvedSpecies {
  const { equation, fit, lookup } = args;
  const net = netStoichiometry(equation, lookup);
  const wanted = [...net.values()].find((e) => e.ref.key === args.species || e.ref.raw === args.species);
  if (!wanted) throw new ThermoError('INVALID_VALUE', `${args.species} is not a species of ${equation}`, { field: 'species' });
  if (wanted.nu === 0) throw new ThermoError('INVALID_VALUE', `${wanted.ref.key} appears on both sides equally, so the fit says nothing about it`, { field: 'species' });
  let sumH = 0;
  let sumG = 0;
  let sumS = 0;
  const others: SolvedSpecies['others'] = [];
  for (const { ref, nu } of net.values()) {
    if (ref.key === wanted.ref.key || nu === 0) continue;
    const record = lookup.get(ref.key);
    if (!record) {
      throw new ThermoError('UNKNOWN_SPECIES', `${ref.key} is not in the library; only one species of the reaction may be unknown`, { field: 'species' });
    }
    sumH += nu * record.dfH_kJ;
    sumG += nu * record.dfG_kJ;
    sumS += nu * record.S_J_per_K;
    others.push({ key: ref.key, nu, dfH_kJ: record.dfH_kJ, dfG_kJ: record.dfG_kJ, S_J_per_K: record.S_J_per_K, source: record.source });
  }
  const nu = wanted.nu;
  const dG_reaction = fit.deltaH0_kJ - (T_REF * fit.deltaS0_J_per_K) / 1000;
  // var(ΔH − TΔS/1000) with the covariance of the two fitted values.
  const varG = fit.stderr_deltaH0_kJ ** 2 + (T_REF / 1000) ** 2 * fit.stderr_deltaS0_J_per_K ** 2 - 2 * (T_REF / 1000) * fit.covariance_HS;
  return {
    ref: wanted.ref,
    nu,
    dfH_kJ: (fit.deltaH0_kJ - sumH) / nu,
    dfG_kJ: (dG_reaction - sumG) / nu,
    S_J_per_K: (fit.deltaS0_J_per_K - sumS) / nu,
    sigma_dfH_kJ: fit.stderr_deltaH0_kJ / Math.abs(nu),
    sigma_dfG_kJ: Math.sqrt(Math.max(varG, 0)) / Math.abs(nu),
    sigma_S_J_per_K: fit.stderr_deltaS0_J_per_K / Math.abs(nu),
    shadows: lookup.get(wanted.ref.key) !== undefined,
    others,
  };
}
