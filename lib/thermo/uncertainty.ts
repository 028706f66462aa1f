// σ(ΔrG°) = sqrt(Σ (ν σ_i)²) from per-species uncertainties of ΔfG°.
// σ_i is a published uncertainty when the row has one; otherwise, where the NBS and NASA
// compilations both have the species, |ΔfH°(NASA) − ΔfH°(NBS)| stands in for it — our own
// convention (a spread between evaluations, not a published σ). Else the species has none.
import { T_REF } from './constants';
import type { ReactionSpecies } from './reaction-thermo';
import type { SpeciesRecord } from './species-types';

export type SigmaOrigin = 'published' | 'compilation difference' | 'fit' | 'none';

export interface SigmaSource {
  species: string;
  sigma_kJ: number | null;
  from: SigmaOrigin;
  note?: string;
}

export interface UncertaintyResult {
  /** null when no species in the reaction has any σ */
  deltaG0_kJ: number | null;
  signUncertain: boolean;
  sources: SigmaSource[];
}

function isReferenceState(r: SpeciesRecord): boolean {
  return r.flags.includes('elementReference') || r.key === 'H+(aq)';
}

export function speciesSigma(r: SpeciesRecord): SigmaSource {
  if (isReferenceState(r)) {
    return { species: r.key, sigma_kJ: 0, from: 'none', note: 'reference state: ΔfH° = ΔfG° = 0 by definition' };
  }
  const u = r.uncertainty;
  if (u.dfG_kJ !== null) return { species: r.key, sigma_kJ: u.dfG_kJ, from: 'published' };
  if (u.dfH_kJ !== null) {
    // σ(ΔfG°)² ≈ σ(ΔfH°)² + (T σ(S°))², entropy term only when published.
    const sS = u.S_J_per_K === null ? 0 : (T_REF * u.S_J_per_K) / 1000;
    return { species: r.key, sigma_kJ: Math.hypot(u.dfH_kJ, sS), from: 'published' };
  }
  const diff = r.compilationDifference;
  // Identical values in two compilations usually mean one copied the other: no information.
  if (diff && diff.dfH_kJ > 0) {
    return { species: r.key, sigma_kJ: diff.dfH_kJ, from: 'compilation difference', note: diff.against };
  }
  return { species: r.key, sigma_kJ: null, from: 'none' };
}

/** `decisive` is ΔG when conditions were given, else ΔG°, kJ/mol. */
export function reactionUncertainty(species: readonly ReactionSpecies[], decisive_kJ: number): UncertaintyResult {
  const sources: SigmaSource[] = [];
  let sumSq = 0;
  let any = false;
  for (const s of species) {
    if (s.nu === 0) continue;
    const src = speciesSigma(s.record);
    sources.push(src);
    if (src.sigma_kJ !== null && src.from !== 'none') {
      sumSq += (s.nu * src.sigma_kJ) ** 2;
      any = true;
    }
  }
  const sigma = any ? Math.sqrt(sumSq) : null;
  return { deltaG0_kJ: sigma, signUncertain: sigma !== null && Math.abs(decisive_kJ) <= sigma, sources };
}
