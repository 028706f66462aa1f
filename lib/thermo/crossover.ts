// Temperature where ΔrG°(T) changes sign, searched only where every species has data.
import { reactionThermoAt, type ReactionSpecies, type ThermoOptions } from './reaction-thermo';
import { rangeHigh, rangeLow } from './species-state';

const SCAN_STEPS = 64;
const BISECTIONS = 60;

/** Intersection of all species' data ranges, or null when they do not overlap. */
export function commonRange(species: readonly ReactionSpecies[]): [number, number] | null {
  let lo = 0;
  let hi = Number.POSITIVE_INFINITY;
  for (const s of species) {
    lo = Math.max(lo, rangeLow(s.record));
    hi = Math.min(hi, rangeHigh(s.record));
  }
  return lo < hi ? [lo, hi] : null;
}

/**
 * Lowest T in the common range where ΔrG°(T) = 0, or null. A scan finds the first sign change
 * (steps evenly spaced in ln T, as ΔG varies smoothly on that scale), bisection refines it.
 */
export function findCrossover(species: readonly ReactionSpecies[], opts: ThermoOptions = {}): number | null {
  const range = commonRange(species);
  // Nothing reacts (every ν nets to zero): ΔG° ≡ 0 has no crossover to report.
  if (!range || species.every((s) => s.nu === 0)) return null;
  const g = (T: number): number => reactionThermoAt(species, T, opts).deltaG0_kJ;
  const [lo, hi] = range;
  const step = Math.log(hi / lo) / SCAN_STEPS;
  let tPrev = lo;
  let gPrev = g(lo);
  if (gPrev === 0) return lo;
  for (let i = 1; i <= SCAN_STEPS; i++) {
    const t = i === SCAN_STEPS ? hi : lo * Math.exp(step * i);
    const gt = g(t);
    if (gt === 0) return t;
    if (Math.sign(gt) !== Math.sign(gPrev)) return bisect(g, tPrev, t, gPrev);
    tPrev = t;
    gPrev = gt;
  }
  return null;
}

const memo = new WeakMap<readonly ReactionSpecies[], Map<string, number | null>>();

/**
 * findCrossover remembered per species array and options. Only frozen arrays (those that
 * resolveReaction hands out) are remembered, as only they cannot change.
 */
export function memoCrossover(species: readonly ReactionSpecies[], opts: Required<ThermoOptions>): number | null {
  if (!Object.isFrozen(species)) return findCrossover(species, opts);
  let byOpts = memo.get(species);
  if (!byOpts) {
    byOpts = new Map();
    memo.set(species, byOpts);
  }
  const key = `${opts.heatCapacity}|${opts.standardPressure_bar}`;
  let T = byOpts.get(key);
  if (T === undefined) {
    T = findCrossover(species, opts);
    byOpts.set(key, T);
  }
  return T;
}

function bisect(g: (T: number) => number, a: number, b: number, ga: number): number {
  let lo = a;
  let hi = b;
  let glo = ga;
  for (let i = 0; i < BISECTIONS && hi - lo > 1e-9 * hi; i++) {
    const mid = 0.5 * (lo + hi);
    const gm = g(mid);
    if (gm === 0) return mid;
    if (Math.sign(gm) === Math.sign(glo)) {
      lo = mid;
      glo = gm;
    } else {
      hi = mid;
    }
  }
  return 0.5 * (lo + hi);
}
