// The activities a step was evaluated at, rebuilt species by species from its request, so that
// remedies can say which pressure or concentration to change and hand back re-evaluable maps.
import type { EvaluateRequest } from '../../schemas/evaluate';
import { isThermoError } from '../errors';
import type { EvaluateResponse } from '../evaluate';
import type { SpeciesLookup } from '../species-library';
import type { LibraryPhase } from '../species-types';
import { parsePressure, parseConcentration } from '../units';
import type { ConditionMapsOut } from './route-types';
import { speciesKey } from './stoichiometry';

export interface SpeciesActivity {
  key: string;
  nu: number;
  phase: LibraryPhase;
  activity: number;
  /** the request's text for this species, when given */
  pressure?: string;
  concentration?: string;
  /** φ or γ (1 when not given) */
  coefficient: number;
}

const squash = (s: string): string => s.replace(/\s+/g, '');

function keyOf(mapKey: string, lookup: SpeciesLookup): string {
  try {
    return speciesKey(mapKey, lookup);
  } catch (err) {
    if (isThermoError(err)) return squash(mapKey);
    throw err;
  }
}

/** The request map re-keyed by library key (the engine accepted it, so every key names a species). */
function byKey<T>(map: Record<string, T> | undefined, lookup: SpeciesLookup, asWritten: Map<string, string>): Map<string, T> {
  const out = new Map<string, T>();
  for (const [k, v] of Object.entries(map ?? {})) out.set(asWritten.get(squash(k)) ?? keyOf(k, lookup), v);
  return out;
}

export function stepActivities(request: EvaluateRequest, result: EvaluateResponse, lookup: SpeciesLookup): SpeciesActivity[] {
  const asWritten = new Map<string, string>();
  for (const s of result.species) {
    asWritten.set(squash(s.as_written), s.key);
    asWritten.set(squash(s.key), s.key);
  }
  const pressures = byKey(request.pressures, lookup, asWritten);
  const concentrations = byKey(request.concentrations, lookup, asWritten);
  const phis = byKey(request.fugacityCoefficients, lookup, asWritten);
  const gammas = byKey(request.activityCoefficients, lookup, asWritten);
  return result.species.map((s) => {
    const phase = lookup.get(s.key)?.phase ?? 's';
    const p = pressures.get(s.key);
    const c = concentrations.get(s.key);
    const coefficient = (phase === 'g' ? phis.get(s.key) : gammas.get(s.key)) ?? 1;
    let activity = 1;
    if (p !== undefined) activity = (parsePressure(p) / result.standardPressure_bar) * coefficient;
    else if (c !== undefined) activity = parseConcentration(c) * coefficient;
    return { key: s.key, nu: s.nu, phase, activity, coefficient, ...(p !== undefined ? { pressure: p } : {}), ...(c !== undefined ? { concentration: c } : {}) };
  });
}

/** The step's pressures and concentrations keyed by library key, with `change` applied on top. */
export function conditionMaps(
  species: readonly SpeciesActivity[],
  change?: { key: string; pressure?: string; concentration?: string },
  keep: (key: string) => boolean = () => true,
): ConditionMapsOut {
  const pressures: Record<string, string> = {};
  const concentrations: Record<string, string> = {};
  for (const s of species) {
    if (!keep(s.key)) continue;
    if (s.pressure !== undefined) pressures[s.key] = s.pressure;
    if (s.concentration !== undefined) concentrations[s.key] = s.concentration;
  }
  if (change?.pressure !== undefined) pressures[change.key] = change.pressure;
  if (change?.concentration !== undefined) concentrations[change.key] = change.concentration;
  return {
    ...(Object.keys(pressures).length ? { pressures } : {}),
    ...(Object.keys(concentrations).length ? { concentrations } : {}),
  };
}

/** The step request with its pressures and concentrations replaced (φ and γ re-keyed alike). */
export function withConditions(request: EvaluateRequest, maps: ConditionMapsOut, species: readonly SpeciesActivity[]): EvaluateRequest {
  const { pressures: _p, concentrations: _c, fugacityCoefficients: _f, activityCoefficients: _a, ...rest } = request;
  const phis: Record<string, number> = {};
  const gammas: Record<string, number> = {};
  for (const s of species) {
    if (s.coefficient === 1) continue;
    if (s.phase === 'g' && maps.pressures?.[s.key] !== undefined) phis[s.key] = s.coefficient;
    if (s.phase === 'aq' && maps.concentrations?.[s.key] !== undefined) gammas[s.key] = s.coefficient;
  }
  return {
    ...rest,
    ...maps,
    ...(Object.keys(phis).length ? { fugacityCoefficients: phis } : {}),
    ...(Object.keys(gammas).length ? { activityCoefficients: gammas } : {}),
  };
}
