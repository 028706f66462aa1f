// Coupling remedy: step + m·driver with the smallest m (0.5 steps) that brings ΔG below the goal,
// the combined equation evaluated by the engine itself, ranked by what a designer could really add
// (coupling-partners.ts), then by combined ΔG.
import { fraction } from 'mathjs';
import type { EvaluateRequest } from '../../schemas/evaluate';
import { evaluateStep, type EvaluateResponse } from '../evaluate';
import { isThermoError } from '../errors';
import type { SpeciesLookup } from '../species-library';
import { partnerFit, type PartnerFit } from './coupling-partners';
import type { PreparedDriver } from './drivers';
import { num } from './route-format';
import type { CouplingRemedy } from './route-types';
import { conditionMaps, stepActivities, withConditions } from './step-activities';
import { combineStoichiometry, formatStoichiometry, type Stoichiometry } from './stoichiometry';

const COUPLING_NOTE =
  'Coupling is bookkeeping: the two reactions must share a real mechanism or intermediate for the driver’s free energy to be used.';
// Beyond this the "driver" is the process and the step a side note.
const MAX_MULTIPLE = 100;
const EXTRA_TRIES = 3;
// Only the most promising drivers are worked out in full: keeps a long uphill route fast and its answer small.
export const MAX_COUPLING_OPTIONS = 4;

export interface CouplingContext {
  drivers: readonly PreparedDriver[];
  lookup: SpeciesLookup;
  /** driver evaluations at one temperature and standard state, shared by all steps of a route */
  cache: Map<string, EvaluateResponse | null>;
  /** driver id → why it could not be evaluated */
  failed: Map<string, string>;
}

export function driverCacheKey(d: PreparedDriver, request: EvaluateRequest, T: number): string {
  return `${d.driver.id}|${T}|${request.heatCapacity ?? true}|${request.standardPressure ?? ''}`;
}

function driverAt(ctx: CouplingContext, d: PreparedDriver, request: EvaluateRequest, T: number): EvaluateResponse | null {
  const key = driverCacheKey(d, request, T);
  if (ctx.cache.has(key)) return ctx.cache.get(key)!;
  let r: EvaluateResponse | null = null;
  try {
    r = evaluateStep(
      {
        equation: d.driver.equation,
        temperature: `${T} K`,
        ...(request.heatCapacity !== undefined ? { heatCapacity: request.heatCapacity } : {}),
        ...(request.standardPressure !== undefined ? { standardPressure: request.standardPressure } : {}),
      },
      { lookup: ctx.lookup },
    );
  } catch (err) {
    if (!isThermoError(err)) throw err;
    ctx.failed.set(d.driver.id, err.message);
  }
  ctx.cache.set(key, r);
  return r;
}

/** The driver may eat into the step's products or add to its reactants, never swap or erase them. */
function keepsStep(step: Stoichiometry, combined: Stoichiometry): boolean {
  for (const [key, v] of step) {
    const c = combined.get(key);
    if (v.compare(0) !== 0 && (c === undefined || c.compare(0) !== v.compare(0))) return false;
  }
  return true;
}

export function couplingRemedies(
  request: EvaluateRequest,
  result: EvaluateResponse,
  stepNu: Stoichiometry,
  goal_kJ: number,
  ctx: CouplingContext,
): CouplingRemedy[] {
  const T = result.temperature_K;
  const stepDeltaG = result.deltaG_kJ ?? result.deltaG0_kJ;
  const species = stepActivities(request, result, ctx.lookup);
  // The combined reaction needs no equilibrium composition; its species differ from the step's.
  const { initial: _i, totalPressure: _t, volume: _v, electrons: _e, ...plain } = request;
  const candidates: { d: PreparedDriver; dr: EvaluateResponse; exact: number; start: number; fit: PartnerFit }[] = [];
  for (const d of ctx.drivers) {
    const dr = driverAt(ctx, d, request, T);
    // A driver outside its data at this temperature (liquid water at 1200 K) is no driver.
    if (!dr || dr.deltaG0_kJ >= 0 || dr.warnings.some((w) => w.code === 'T_OUT_OF_RANGE')) continue;
    const fit = partnerFit(stepNu, d.nu, dr, ctx.lookup);
    if (fit.excluded) continue;
    const exact = (stepDeltaG - goal_kJ) / -dr.deltaG0_kJ;
    let start = Math.max(0.5, Math.ceil(exact * 2) / 2);
    if (start === exact) start += 0.5;
    candidates.push({ d, dr, exact, start, fit });
  }
  // The most plausible partner first; among equals, the most negative estimated combined ΔG (step + m·ΔG°).
  candidates.sort((a, b) => b.fit.score - a.fit.score || a.fit.added - b.fit.added || a.start * a.dr.deltaG0_kJ - b.start * b.dr.deltaG0_kJ);
  const out: CouplingRemedy[] = [];
  for (const { d, dr, exact, start, fit } of candidates) {
    if (out.length >= MAX_COUPLING_OPTIONS) break;
    let m = start;
    for (let attempt = 0; attempt <= EXTRA_TRIES && m <= MAX_MULTIPLE; attempt++, m += 0.5) {
      const combined = combineStoichiometry([
        { nu: stepNu, factor: 1 },
        { nu: d.nu, factor: fraction(m) },
      ]);
      const equation = formatStoichiometry(combined);
      if (equation === null || !keepsStep(stepNu, combined)) break;
      const maps = conditionMaps(species, undefined, (key) => combined.has(key));
      let r: EvaluateResponse;
      try {
        r = evaluateStep(withConditions({ ...plain, equation, temperature: `${T} K` }, maps, species), { lookup: ctx.lookup, checkFinite: false });
      } catch (err) {
        if (!isThermoError(err)) throw err;
        break;
      }
      const combinedDeltaG = r.deltaG_kJ ?? r.deltaG0_kJ;
      // Shared species at non-standard activity can shift the sum; then try the next half multiple.
      if (!(combinedDeltaG < goal_kJ)) continue;
      out.push({
        kind: 'coupling',
        summary: `Couple with ${num(m)} × “${d.driver.name}” (${d.driver.equation}, ΔG° ${num(dr.deltaG0_kJ)} kJ/mol at ${num(T, 6)} K): ${equation}, combined ΔG ${num(combinedDeltaG)} kJ/mol`,
        note: COUPLING_NOTE,
        driverId: d.driver.id,
        driverName: d.driver.name,
        driverEquation: d.driver.equation,
        multiple: m,
        exactMultiple: exact,
        goal_kJ,
        stepDeltaG_kJ: stepDeltaG,
        driverDeltaG0_kJ: dr.deltaG0_kJ,
        combinedEquation: equation,
        combinedDeltaG_kJ: combinedDeltaG,
        conditions: Object.keys(maps).length ? maps : null,
        warnings: [...new Set(r.warnings.map((w) => w.code))],
        partnerScore: fit.score,
        partnerReasons: fit.reasons,
      });
      break;
    }
  }
  // Already in rank order: candidates are worked out in it.
  return out;
}
