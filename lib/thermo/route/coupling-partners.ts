// Which driver reactions a route designer could really add to a step, and in what order. The rule:
//   Left out: a driver that is all solids beside a step with a gas, liquid or dissolved species (solids react only
//   where they touch: a thermite next to a gas-phase step shares nothing with it), and a driver that burns the step's
//   feedstock (it takes O2 and one of the step's own reactants other than O2). Drivers outside their data at the
//   step's temperature are left out before this (remedy-coupling.ts).
//   Ranked, highest first: +2 for each species the driver shares with the step (the likeliest way two reactions meet
//   in one vessel), +1 when the driver's fluid species are all in phases the step already has (same phase),
//   −1 when a driver species is not the stable state at the step's temperature. Ties: fewer new species brought into
//   the step (a smaller change to the process), then the larger estimated push.
import type { EvaluateResponse } from '../evaluate';
import type { SpeciesLookup } from '../species-library';
import type { Stoichiometry } from './stoichiometry';
import { nuOf } from './stoichiometry';

export interface PartnerFit {
  /** why the driver is left out, in words; null when it may be offered */
  excluded: string | null;
  score: number;
  /** the points the score is made of, in words ("shares CO2(g)", "same phase: gas") */
  reasons: string[];
  /** species the driver brings that the step does not have (the first tie-break: fewer is a smaller change) */
  added: number;
}

const OXYGEN = 'O2(g)';
const PHASE_WORD: Record<string, string> = { g: 'gas', l: 'liquid', aq: 'solution', s: 'solid' };

function phaseOf(key: string, lookup: SpeciesLookup): string {
  return lookup.get(key)?.phase ?? (/\((\w+)\)$/.exec(key)?.[1] ?? '');
}

const isFluid = (phase: string): boolean => phase === 'g' || phase === 'l' || phase === 'aq';
const active = (nu: Stoichiometry): string[] => [...nu.keys()].filter((k) => nuOf(nu, k) !== 0);

export function partnerFit(step: Stoichiometry, driver: Stoichiometry, driverResult: EvaluateResponse, lookup: SpeciesLookup): PartnerFit {
  const stepKeys = active(step);
  const driverKeys = active(driver);
  const stepPhases = new Set(stepKeys.map((k) => phaseOf(k, lookup)));
  const driverPhases = driverKeys.map((k) => phaseOf(k, lookup));
  const none = (excluded: string): PartnerFit => ({ excluded, score: Number.NEGATIVE_INFINITY, reasons: [], added: driverKeys.length });

  if (driverPhases.every((p) => p === 's') && [...stepPhases].some(isFluid)) {
    return none('all solids, beside a step with a gas, liquid or dissolved species');
  }
  const feedstock = stepKeys.filter((k) => nuOf(step, k) < 0 && k !== OXYGEN && nuOf(driver, k) < 0);
  if (nuOf(driver, OXYGEN) < 0 && feedstock.length > 0) return none(`burns the step’s feedstock ${feedstock.join(', ')}`);

  const reasons: string[] = [];
  let score = 0;
  const shared = driverKeys.filter((k) => stepKeys.includes(k));
  if (shared.length > 0) {
    score += 2 * shared.length;
    reasons.push(`shares ${shared.join(', ')}`);
  }
  const fluid = [...new Set(driverPhases.filter(isFluid))];
  if (fluid.length > 0 && fluid.every((p) => stepPhases.has(p))) {
    score += 1;
    reasons.push(`same phase: ${fluid.map((p) => PHASE_WORD[p]).join(' and ')}`);
  }
  if (driverResult.warnings.some((w) => w.code === 'PHASE_CHANGE')) {
    score -= 1;
    reasons.push('a species is not in its stable state at this temperature');
  }
  return { excluded: null, score, reasons, added: driverKeys.length - shared.length };
}
