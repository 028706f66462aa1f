// σ(ΔrG°) = sqrt(Σ (ν σ_i)²) from per-species σ(ΔfG°), where σ_i² = σ(ΔfH°)² + (T·σ(S°))².
// σ(ΔfH°) and σ(S°) each take the largest of what the row offers: a published uncertainty, the difference between
// the compilation we use and an older one (NBS 1982 against NASA or ATcT), or the spread between the sources the
// organic library compares. The last two are our convention (a spread between evaluations, not a published σ),
// and disputed rows keep their whole spread. An estimate carries the estimator's own σ.
import { T_REF } from './constants';
import type { ReactionSpecies } from './reaction-thermo';
import type { SpeciesRecord } from './species-types';

export type SigmaOrigin = 'published' | 'compilation difference' | 'source spread' | 'estimate' | 'fit' | 'none';

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
  /**
   * true when estimated species stand on both sides: their errors share groups and partly cancel, so the
   * quadrature sum over-states σ; it is then an upper bound.
   */
  upperBound?: boolean;
  note?: string;
}

function isReferenceState(r: SpeciesRecord): boolean {
  return r.flags.includes('elementReference') || r.key === 'H+(aq)';
}

interface Candidate {
  value: number;
  from: SigmaOrigin;
  note?: string;
}

function largest(candidates: readonly Candidate[]): Candidate | null {
  let best: Candidate | null = null;
  for (const c of candidates) if (c.value > 0 && (best === null || c.value > best.value)) best = c;
  return best;
}

export function speciesSigma(r: SpeciesRecord): SigmaSource {
  if (isReferenceState(r)) {
    return { species: r.key, sigma_kJ: 0, from: 'none', note: 'reference state: ΔfH° = ΔfG° = 0 by definition' };
  }
  const u = r.uncertainty;
  if (r.estimate) {
    const sG = u.dfG_kJ ?? Math.hypot(u.dfH_kJ ?? 0, (T_REF * (u.S_J_per_K ?? 0)) / 1000);
    return { species: r.key, sigma_kJ: sG, from: 'estimate', note: r.estimate.method };
  }
  const spread = r.sourceSpread;
  const diff = r.compilationDifference;
  const h = largest([
    ...(u.dfH_kJ !== null ? [{ value: u.dfH_kJ, from: 'published' as const, ...(r.uncertaintyRef ? { note: r.uncertaintyRef } : {}) }] : []),
    // Identical values in two compilations usually mean one copied the other: no information.
    ...(diff && diff.dfH_kJ > 0 ? [{ value: diff.dfH_kJ, from: 'compilation difference' as const, note: diff.against }] : []),
    ...(spread?.dfH_kJ ? [{ value: spread.dfH_kJ, from: 'source spread' as const, note: spread.values }] : []),
  ]);
  const sS = Math.max(u.S_J_per_K ?? 0, spread?.S_J_per_K ?? 0);
  const sG_fromParts = Math.hypot(h?.value ?? 0, (T_REF * sS) / 1000);
  if (u.dfG_kJ !== null && u.dfG_kJ >= sG_fromParts) return { species: r.key, sigma_kJ: u.dfG_kJ, from: 'published' };
  if (h === null && sS === 0) return { species: r.key, sigma_kJ: null, from: 'none' };
  const from = h?.from ?? 'source spread';
  const note = [h?.note, sS > 0 ? `σ(S°) ${sS.toFixed(2)} J/(mol K)` : ''].filter(Boolean).join('; ');
  return { species: r.key, sigma_kJ: sG_fromParts, from, ...(note ? { note } : {}) };
}

/** `decisive` is ΔG when conditions were given, else ΔG°, kJ/mol. */
export function reactionUncertainty(species: readonly ReactionSpecies[], decisive_kJ: number): UncertaintyResult {
  const sources: SigmaSource[] = [];
  let sumSq = 0;
  let any = false;
  const estimatedSides = new Set<number>();
  for (const s of species) {
    if (s.nu === 0) continue;
    const src = speciesSigma(s.record);
    sources.push(src);
    if (src.from === 'estimate') estimatedSides.add(Math.sign(s.nu));
    if (src.sigma_kJ !== null && src.from !== 'none') {
      sumSq += (s.nu * src.sigma_kJ) ** 2;
      any = true;
    }
  }
  const sigma = any ? Math.sqrt(sumSq) : null;
  const upperBound = estimatedSides.size === 2;
  return {
    deltaG0_kJ: sigma,
    signUncertain: sigma !== null && Math.abs(decisive_kJ) <= sigma,
    sources,
    ...(upperBound
      ? { upperBound, note: 'Estimated species stand on both sides; their group errors partly cancel, so this σ is an upper bound.' }
      : {}),
  };
}
