// Temperature remedy: the nearest temperature in the data range where ΔG at the step's own
// pressures and concentrations drops below the goal (the route's downhill threshold, so the step
// lands downhill, not marginal), which way that is, and ΔG on either side.
import type { EvaluateRequest } from '../../schemas/evaluate';
import { R_GAS } from '../constants';
import { evaluateStep, type EvaluateResponse } from '../evaluate';
import { isThermoError } from '../errors';
import { reactionThermoAt, type ReactionSpecies } from '../reaction-thermo';
import type { SpeciesLookup } from '../species-library';
import { speciesRange } from '../species-state';
import { num } from './route-format';
import type { TemperatureRemedy, TemperatureSample } from './route-types';

// The suggestion is rounded to whole kelvin, so the root needs 1e-4 K, not machine precision.
const GRID_POINTS = 48;
const BISECTIONS = 40;
const ROOT_TOLERANCE_K = 1e-4;
const SAMPLE_OFFSET_K = 50;
const T_FLOOR_K = 10;

function reactionSpecies(result: EvaluateResponse, lookup: SpeciesLookup): ReactionSpecies[] {
  return result.species.map((s) => ({ key: s.key, asWritten: s.as_written, nu: s.nu, record: lookup.get(s.key)! }));
}

function commonRange(species: readonly ReactionSpecies[]): [number, number] | null {
  let lo = T_FLOOR_K;
  let hi = Number.POSITIVE_INFINITY;
  for (const s of species) {
    const [a, b] = speciesRange(s.record);
    lo = Math.max(lo, a);
    hi = Math.min(hi, b);
  }
  return lo < hi ? [lo, hi] : null;
}

function root(g: (T: number) => number, a: number, b: number): number {
  let [lo, hi] = a < b ? [a, b] : [b, a];
  const signLo = Math.sign(g(lo));
  for (let i = 0; i < BISECTIONS && hi - lo > ROOT_TOLERANCE_K; i++) {
    const mid = 0.5 * (lo + hi);
    if (Math.sign(g(mid)) === signLo) lo = mid;
    else hi = mid;
  }
  return 0.5 * (lo + hi);
}

function grid(lo: number, hi: number, T0: number): number[] {
  const step = Math.log(hi / lo) / (GRID_POINTS - 1);
  const points = Array.from({ length: GRID_POINTS }, (_, i) => (i === GRID_POINTS - 1 ? hi : lo * Math.exp(step * i)));
  return [...new Set([...points, T0])].sort((x, y) => x - y);
}

export function temperatureRemedy(request: EvaluateRequest, result: EvaluateResponse, goal_kJ: number, lookup: SpeciesLookup): TemperatureRemedy {
  const species = reactionSpecies(result, lookup);
  const opts = { heatCapacity: result.heatCapacity, standardPressure_bar: result.standardPressure_bar };
  const lnQ = result.lnQ;
  const dG0 = (T: number): number => reactionThermoAt(species, T, opts).deltaG0_kJ;
  const dG = (T: number): number => dG0(T) + (R_GAS * T * (lnQ ?? 0)) / 1000;
  const g = (T: number): number => dG(T) - goal_kJ;
  const T0 = result.temperature_K;
  const range = commonRange(species);
  const base: TemperatureRemedy = {
    kind: 'temperature',
    summary: '',
    direction: null,
    current_K: T0,
    goal_kJ,
    crossover_K: result.crossover_K,
    target_K: null,
    suggested_K: null,
    suggestedDeltaG_kJ: null,
    warningsAtSuggested: [],
    dataRange_K: range,
    samples: [],
  };
  const sample = (T: number): TemperatureSample => ({ T_K: T, deltaG0_kJ: dG0(T), deltaG_kJ: lnQ === null ? null : dG(T) });
  const sampleAll = (Ts: number[]): TemperatureSample[] => {
    const inRange = Ts.filter((T) => range !== null && T >= range[0] && T <= range[1]).sort((a, b) => a - b);
    // The ΔG° crossover and the target often coincide to within bisection noise: one sample each.
    return inRange.filter((T, i) => i === 0 || T - inRange[i - 1]! > 1e-3).map(sample);
  };
  const what = lnQ === null ? 'ΔG°' : 'ΔG at the step’s pressures and concentrations';
  const goalText = goal_kJ === 0 ? '0' : `${num(goal_kJ)} kJ/mol, the route’s downhill threshold`;
  if (range === null) {
    return { ...base, summary: 'The species’ data ranges do not overlap, so no temperature can be suggested' };
  }

  const points = grid(range[0], range[1], T0);
  const values = points.map(g);
  const distance = (T: number): number => Math.abs(Math.log(T / T0));
  let best = -1;
  values.forEach((v, i) => {
    if (v < 0 && (best < 0 || distance(points[i]!) < distance(points[best]!))) best = i;
  });
  if (best < 0) {
    const iMin = values.reduce((m, v, i) => (v < values[m]! ? i : m), 0);
    return {
      ...base,
      samples: sampleAll([T0 - SAMPLE_OFFSET_K, T0, T0 + SAMPLE_OFFSET_K, points[iMin]!]),
      summary: `No temperature in the data range ${num(range[0])}–${num(range[1])} K brings ${what} below ${goalText}; the lowest is ${num(values[iMin]! + goal_kJ)} kJ/mol, at ${num(points[iMin]!)} K`,
    };
  }

  const raise = points[best]! > T0;
  const neighbour = points[raise ? best - 1 : best + 1]!;
  const target = values[best] === 0 ? points[best]! : root(g, neighbour, points[best]!);
  const suggested = raise ? Math.floor(target) + 1 : Math.ceil(target) - 1;
  let check: EvaluateResponse | null = null;
  try {
    check = evaluateStep({ ...request, temperature: `${suggested} K` }, { lookup, checkFinite: false });
  } catch (err) {
    if (!isThermoError(err)) throw err;
  }
  const checked = check ? (check.deltaG_kJ ?? check.deltaG0_kJ) : null;
  const crossing = result.crossover_K === null || (lnQ === null && goal_kJ === 0) ? '' : `; ΔG° changes sign at ${num(result.crossover_K)} K`;
  const after = checked === null ? '' : `: at ${suggested} K it is ${num(checked)} kJ/mol`;
  return {
    ...base,
    direction: raise ? 'raise' : 'lower',
    target_K: target,
    suggested_K: suggested,
    suggestedDeltaG_kJ: checked,
    warningsAtSuggested: check ? [...new Set(check.warnings.map((w) => w.code))] : [],
    samples: sampleAll([
      ...[T0, target, ...(result.crossover_K === null ? [] : [result.crossover_K])].flatMap((T) => [T - SAMPLE_OFFSET_K, T, T + SAMPLE_OFFSET_K]),
    ]),
    summary: `${raise ? 'Raise' : 'Lower'} the temperature ${raise ? 'above' : 'below'} ${num(target)} K, where ${what} falls below ${goalText}${crossing}${after}`,
  };
}
