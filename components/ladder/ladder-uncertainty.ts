// Words for values that are estimates and for signs the data cannot decide, shared by the ladder's tooltip, its
// accessible names, its exported notes and the canvas nodes. Pure, so sighted readers, screen readers and tests
// get the same sentences.
import type { RouteOverall, RouteStepResult } from '@/lib/thermo/route';
import { stepEstimates } from '@/lib/thermo/route/step-estimates';
import { energyFromKJ, energyUnitLabel, type EnergyUnit } from './energy-format';

/** Our mark for "uses estimated values": a dotted ring (the species panels mark an estimate with a dashed ring), always with the word beside or behind it. */
export const ESTIMATE_GLYPH = '◌';
export const ESTIMATE_WORD = 'estimated';

/** σ as a size: "14.4 kJ/mol" (per mol of reaction) or "39.4 kJ" (for the route). */
export function sigmaText(sigma_kJ: number, unit: EnergyUnit, perMol = true): string {
  return `${energyFromKJ(Math.abs(sigma_kJ), unit).toFixed(1)} ${energyUnitLabel(unit)}${perMol ? '/mol' : ''}`;
}

/** "sign uncertain: |ΔG| ≤ σ = 14.4 kJ/mol" for one step, per mol of reaction as written. */
export function stepSignUncertainText(sigma_kJ: number | null, unit: EnergyUnit): string {
  return sigma_kJ === null ? 'sign uncertain: |ΔG| ≤ σ' : `sign uncertain: |ΔG| ≤ σ = ${sigmaText(sigma_kJ, unit)}`;
}

/** Words for the route total, or null when its σ is unknown; "sign uncertain: …" when |ΔG| ≤ σ. */
export function totalSigmaText(overall: Pick<RouteOverall, 'overallSigma_kJ' | 'overallSignUncertain' | 'overallSigmaUpperBound'> | undefined, unit: EnergyUnit, basis: string): string | null {
  const sigma = overall?.overallSigma_kJ;
  if (sigma === null || sigma === undefined || !Number.isFinite(sigma)) return null;
  const size = `${sigmaText(sigma, unit, false)} ${basis}`.trim();
  const bound = overall!.overallSigmaUpperBound ? ', an upper bound' : '';
  return overall!.overallSignUncertain ? `sign uncertain: |ΔG| ≤ σ = ${size}${bound}` : `σ = ${size}${bound}`;
}

/** "◌ estimated: acetophenone, acetone" — the step's estimated species; null when it uses none. */
export function estimatedSpeciesText(result: RouteStepResult['result']): string | null {
  const e = stepEstimates(result);
  if (!e) return null;
  return `${ESTIMATE_GLYPH} ${ESTIMATE_WORD}: ${[...new Set(e.species.map((s) => s.label))].join(', ')}`;
}

export interface EstimateFact {
  term: string;
  value: string;
}

/** The tooltip's lines about estimates: which species, by which method, and σ(ΔrG°) of the step. */
export function estimateFacts(result: RouteStepResult['result'], unit: EnergyUnit): EstimateFact[] {
  const e = stepEstimates(result);
  if (!e) return [];
  const sigma = e.sigma_kJ === null ? 'not known' : `${sigmaText(e.sigma_kJ, unit)}${e.upperBound ? ' (an upper bound: estimates on both sides share errors)' : ''}`;
  return [
    { term: 'Values', value: estimatedSpeciesText(result)! },
    { term: 'Method', value: e.methods.join('; ') },
    { term: 'σ(ΔrG°)', value: sigma },
  ];
}

/** Spoken after a riser's or node's name: "uses estimated values for X (method); σ(ΔrG°) 14.4 kJ/mol". */
export function estimateSpoken(result: RouteStepResult['result'], unit: EnergyUnit): string | null {
  const e = stepEstimates(result);
  if (!e) return null;
  const names = [...new Set(e.species.map((s) => s.label))].join(', ');
  const sigma = e.sigma_kJ === null ? '' : `; σ(ΔrG°) ${sigmaText(e.sigma_kJ, unit)}`;
  return `uses ${ESTIMATE_WORD} values for ${names} (${e.methods.join('; ')})${sigma}`;
}
