// Words for where a value came from, shared by the origin mark, its tooltip and the step panel's sentences. Pure.
import { withTrueMinus } from '@/lib/format/numbers';

export type ValueOrigin = 'library' | 'team' | 'estimated';

export interface OriginFacts {
  origin: ValueOrigin;
  /** the publication or compilation (library), the team's provenance (team) */
  source?: string | null;
  /** the estimation method (estimated) */
  method?: string | null;
  /** σ(ΔfG°) at 298.15 K, kJ/mol; null when none is known, left out when the caller has no σ to say */
  sigma_kJ?: number | null;
}

export const ORIGIN_LABEL: Record<ValueOrigin, string> = { library: 'Library', team: 'Team', estimated: 'Estimate' };

/** "4.2 kJ/mol", with one decimal below 10 and none above, as a σ is known to no better. */
export function formatSigma(sigma_kJ: number): string {
  return `${sigma_kJ < 10 ? sigma_kJ.toFixed(1) : sigma_kJ.toFixed(0)} kJ/mol`;
}

function sigmaWords(sigma_kJ: number | null | undefined): string {
  if (sigma_kJ === undefined) return '';
  if (sigma_kJ === null || !Number.isFinite(sigma_kJ)) return '; no uncertainty is known';
  if (sigma_kJ === 0) return '; exact by definition (a reference state)';
  return `; uncertain by about ${formatSigma(sigma_kJ)} (one standard deviation of ΔfG°)`;
}

/** One sentence: whose value it is, from where, and how far to trust it. */
export function describeOrigin(f: OriginFacts): string {
  const trimmed = f.source?.trim().replace(/\.+$/, '');
  const source = trimmed === undefined ? undefined : withTrueMinus(trimmed);
  if (f.origin === 'estimated') {
    const method = f.method?.trim() || source?.replace(/^Estimated:?\s*/i, '') || 'group contribution';
    return `Estimated from the structure by ${method}, not measured${sigmaWords(f.sigma_kJ)}.`;
  }
  if (f.origin === 'team') return `Your team’s value${source ? `: ${source}` : ''}${sigmaWords(f.sigma_kJ)}.`;
  return `Published value from ${source || 'the built-in library'}${sigmaWords(f.sigma_kJ)}.`;
}
