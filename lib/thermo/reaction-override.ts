// ΔH° and ΔS° of a step taken from elsewhere (a saved van 't Hoff fit) instead of the species library.
// ΔCp = 0: ΔG°(T) = ΔH° − T·ΔS°, good only over the temperatures the values were fitted on.
import type { EvaluateRequest } from '../schemas/evaluate';
import { R_GAS } from './constants';
import { ThermoError } from './errors';
import { gasMoleChange, type ReactionSpecies, type ReactionThermo } from './reaction-thermo';
import { resolveReaction } from './resolve-reaction';
import type { SpeciesLookup } from './species-library';
import type { UncertaintyResult } from './uncertainty';
import { fmt, type EngineWarning } from './warnings';

export type ReactionOverride = NonNullable<EvaluateRequest['override']>;

export interface OverrideSummary {
  source: string;
  /** the step's equation = factor × the fitted reaction */
  factor: number;
  deltaH0_kJ: number;
  deltaS0_J_per_K: number;
  range_K: [number, number] | null;
}

export interface AppliedOverride {
  thermo: ReactionThermo;
  crossover_K: number | null;
  summary: OverrideSummary;
  warning: EngineWarning;
  uncertainty(decisive_kJ: number): UncertaintyResult;
}

// The step must be the fitted reaction or a multiple of it (reversed counts, with a negative factor).
function factorOf(step: readonly ReactionSpecies[], fitted: readonly ReactionSpecies[]): number | null {
  const a = new Map(step.filter((s) => s.nu !== 0).map((s) => [s.key, s.nu]));
  const b = new Map(fitted.filter((s) => s.nu !== 0).map((s) => [s.key, s.nu]));
  if (a.size !== b.size || a.size === 0) return null;
  const [key, nu] = [...b.entries()][0]!;
  const factor = (a.get(key) ?? 0) / nu;
  if (factor === 0) return null;
  for (const [k, v] of b) {
    const mine = a.get(k);
    if (mine === undefined || Math.abs(mine - factor * v) > 1e-9 * Math.max(1, Math.abs(mine))) return null;
  }
  return factor;
}

export function applyOverride(
  override: ReactionOverride,
  species: readonly ReactionSpecies[],
  T: number,
  opts: { lookup: SpeciesLookup; standardPressure_bar: number },
): AppliedOverride {
  const fitted = resolveReaction(override.equation, opts.lookup).species;
  const factor = factorOf(species, fitted);
  if (factor === null) {
    throw new ThermoError('INVALID_VALUE', `The step's equation is not ${override.source}'s reaction (${override.equation}) or a multiple of it`, {
      field: 'override',
      hint: `write the step as ${override.equation}, or use the library values`,
    });
  }
  const dH = factor * override.deltaH0_kJ;
  let dS = factor * override.deltaS0_J_per_K;
  // The fitted K is taken on the 1 bar basis, as the library is; 1 atm shifts each gas as in reactionThermoAt.
  const p = opts.standardPressure_bar;
  if (p !== 1) dS -= gasMoleChange(species) * R_GAS * Math.log(p);
  const dG = dH - (T * dS) / 1000;
  const crossover = dS !== 0 ? (dH * 1000) / dS : null;
  const range = override.range_K ?? null;
  const outside = range !== null && (T < range[0] || T > range[1]);
  const scaled = factor === 1 ? '' : ` × ${fmt(factor)}`;
  const warning: EngineWarning = {
    code: 'FITTED_VALUES',
    message:
      `ΔH° and ΔS° from ${override.source}${scaled} (ΔCp = 0), not from the species library` +
      (range ? `; fitted over ${fmt(range[0])}–${fmt(range[1])} K${outside ? `, so ${fmt(T)} K is an extrapolation` : ''}` : ''),
  };
  const se = override.stderr;
  return {
    thermo: { deltaH0_kJ: dH, deltaS0_J_per_K: dS, deltaG0_kJ: dG, ghsMismatch_kJ: 0 },
    crossover_K: crossover !== null && crossover > 0 && Number.isFinite(crossover) ? crossover : null,
    summary: { source: override.source, factor, deltaH0_kJ: override.deltaH0_kJ, deltaS0_J_per_K: override.deltaS0_J_per_K, range_K: range },
    warning,
    uncertainty(decisive_kJ) {
      if (!se) return { deltaG0_kJ: null, signUncertain: false, sources: [{ species: override.source, sigma_kJ: null, from: 'none' }] };
      const t = T / 1000;
      const variance = se.deltaH0_kJ ** 2 + t * t * se.deltaS0_J_per_K ** 2 - 2 * t * se.covariance_HS;
      const sigma = Math.abs(factor) * Math.sqrt(Math.max(variance, 0));
      return { deltaG0_kJ: sigma, signUncertain: Math.abs(decisive_kJ) <= sigma, sources: [{ species: override.source, sigma_kJ: sigma, from: 'fit' }] };
    },
  };
}
