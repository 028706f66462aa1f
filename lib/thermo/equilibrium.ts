// Equilibrium extent ξ for given initial amounts: ideal-gas mixture at a total pressure
// (mole-fraction activities) plus ideal dilute solutes (c = n/V). Solved by bisection on
// f = ln Q(ξ) − ln K, which rises monotonically with ξ; near a bound the unknown is the
// log-distance to it, so extreme K (ln K in the thousands) still resolves.
import type { ReactionSpecies } from './reaction-thermo';

export interface EquilibriumInput {
  species: readonly ReactionSpecies[];
  /** initial amounts, mol, by species key; missing = 0 */
  initial_mol: ReadonlyMap<string, number>;
  /** species treated as unlimited (solvent water), by key */
  unlimited: ReadonlySet<string>;
  /** inert gas present, mol */
  inertGas_mol: number;
  lnK: number;
  totalPressure_bar: number;
  standardPressure_bar: number;
  volume_L: number;
  fugacityCoefficients: ReadonlyMap<string, number>;
  activityCoefficients: ReadonlyMap<string, number>;
}

export interface EquilibriumResult {
  extent_mol: number;
  /** by species key */
  amounts_mol: Record<string, number>;
  /** fraction of the limiting species consumed, 0..1 (the limiting product when ξ < 0) */
  conversion: number;
  limiting: string[];
  runsInReverse: boolean;
  /** no interior root: a condensed phase is used up or no reaction is possible */
  atLimit: boolean;
}

interface Active {
  s: ReactionSpecies;
  n0: number;
  ln0: number;
  kind: 'gas' | 'solute' | 'pure';
}

const MAX_STEP_OUT = 1e6;
const ITERATIONS = 200;

function logSumExp(values: number[]): number {
  let m = Number.NEGATIVE_INFINITY;
  for (const v of values) if (v > m) m = v;
  if (m === Number.NEGATIVE_INFINITY) return m;
  let sum = 0;
  for (const v of values) sum += Math.exp(v - m);
  return m + Math.log(sum);
}

export function solveEquilibrium(input: EquilibriumInput): EquilibriumResult {
  const active: Active[] = input.species.map((s) => ({
    s,
    n0: input.initial_mol.get(s.key) ?? 0,
    ln0: 0,
    kind: s.record.phase === 'g' ? 'gas' : s.record.phase === 'aq' ? 'solute' : 'pure',
  }));
  const limits = (a: Active): number => a.n0 / Math.abs(a.s.nu);
  const bounded = active.filter((a) => a.s.nu !== 0 && !input.unlimited.has(a.s.key));
  const reactants = bounded.filter((a) => a.s.nu < 0);
  const products = bounded.filter((a) => a.s.nu > 0);
  let xiMax = reactants.length ? Math.min(...reactants.map(limits)) : Number.POSITIVE_INFINITY;
  let xiMin = products.length ? -Math.min(...products.map(limits)) : Number.NEGATIVE_INFINITY;
  const bindingHi = new Set(reactants.filter((a) => limits(a) === xiMax).map((a) => a.s.key));
  const bindingLo = new Set(products.filter((a) => -limits(a) === xiMin).map((a) => a.s.key));
  if (!Number.isFinite(xiMax) && !Number.isFinite(xiMin)) {
    throw new RangeError('equilibrium extent is unbounded: give an initial amount for at least one species');
  }

  const lnGasScale = Math.log(input.totalPressure_bar / input.standardPressure_bar);
  const lnV = Math.log(input.volume_L);
  const lnInert = input.inertGas_mol > 0 ? Math.log(input.inertGas_mol) : Number.NEGATIVE_INFINITY;

  // ln n_i at ξ = anchor ± d, with d = e^t; binding species are exactly |ν|·d.
  const lnAmounts = (side: 'lo' | 'hi', t: number): number[] => {
    const anchor = side === 'lo' ? xiMin : xiMax;
    const binding = side === 'lo' ? bindingLo : bindingHi;
    const sign = side === 'lo' ? 1 : -1;
    const d = Math.exp(t);
    return active.map((a) => {
      if (binding.has(a.s.key)) return Math.log(Math.abs(a.s.nu)) + t;
      const n = a.n0 + a.s.nu * anchor + sign * a.s.nu * d;
      return n > 0 ? Math.log(n) : Number.NEGATIVE_INFINITY;
    });
  };

  const residual = (side: 'lo' | 'hi', t: number): number => {
    const ln = lnAmounts(side, t);
    const gasLn = [lnInert];
    active.forEach((a, i) => {
      if (a.kind === 'gas') gasLn.push(ln[i]!);
    });
    const lnGas = logSumExp(gasLn);
    let lnQ = 0;
    active.forEach((a, i) => {
      if (a.s.nu === 0 || a.kind === 'pure' || input.unlimited.has(a.s.key)) return;
      const lnA =
        a.kind === 'gas'
          ? ln[i]! - lnGas + lnGasScale + Math.log(input.fugacityCoefficients.get(a.s.key) ?? 1)
          : ln[i]! - lnV + Math.log(input.activityCoefficients.get(a.s.key) ?? 1);
      lnQ += a.s.nu * lnA;
    });
    return lnQ - input.lnK;
  };

  const finish = (side: 'lo' | 'hi', t: number, atLimit: boolean): EquilibriumResult => {
    const d = atLimit ? 0 : Math.exp(t);
    const xi = side === 'lo' ? xiMin + d : xiMax - d;
    const ln = atLimit ? null : lnAmounts(side, t);
    const amounts_mol: Record<string, number> = {};
    active.forEach((a, i) => {
      if (input.unlimited.has(a.s.key)) return;
      const binding = (side === 'lo' ? bindingLo : bindingHi).has(a.s.key);
      amounts_mol[a.s.key] = ln ? Math.exp(ln[i]!) : binding ? 0 : Math.max(0, a.n0 + a.s.nu * xi);
    });
    const reverse = xi < 0;
    const bound = reverse ? xiMin : xiMax;
    const conversion = bound === 0 || !Number.isFinite(bound) ? 0 : Math.min(1, Math.max(0, xi / bound));
    return {
      extent_mol: xi,
      amounts_mol,
      conversion,
      limiting: [...(reverse ? bindingLo : bindingHi)],
      runsInReverse: reverse,
      atLimit,
    };
  };

  // One side unlimited (e.g. solvent water as the only reactant): push that bound out until
  // f changes sign, then treat it as an ordinary, non-binding bound.
  if (!Number.isFinite(xiMax)) {
    let d = Math.max(1, Math.abs(xiMin));
    while (residual('lo', Math.log(d)) <= 0) {
      if (d > 1e300) throw new RangeError('equilibrium extent is unbounded: the products never reach equilibrium');
      d *= 4;
    }
    xiMax = xiMin + d;
  } else if (!Number.isFinite(xiMin)) {
    let d = Math.max(1, Math.abs(xiMax));
    while (residual('hi', Math.log(d)) >= 0) {
      if (d > 1e300) throw new RangeError('equilibrium extent is unbounded: the reactants never reach equilibrium');
      d *= 4;
    }
    xiMin = xiMax - d;
  }
  const span = xiMax - xiMin;
  if (span <= 0) return finish('hi', Number.NEGATIVE_INFINITY, true);

  const tHalf = Math.log(span / 2);
  const fMid = residual('lo', tHalf);
  if (fMid === 0) return finish('lo', tHalf, false);
  // f > 0 at the midpoint → root below it (lo side, f rises with t); else above (hi side, f falls with t).
  const side: 'lo' | 'hi' = fMid > 0 ? 'lo' : 'hi';
  const wantSign = side === 'lo' ? -1 : 1;
  let far = tHalf;
  let step = 1;
  for (;;) {
    far = tHalf - step;
    const f = residual(side, far);
    if (Math.sign(f) === wantSign || f === 0) break;
    if (step > MAX_STEP_OUT) return finish(side, Number.NEGATIVE_INFINITY, true);
    step *= 2;
  }
  let a = far;
  let b = tHalf;
  for (let i = 0; i < ITERATIONS; i++) {
    const m = 0.5 * (a + b);
    if (m === a || m === b) break;
    const f = residual(side, m);
    if (f === 0) {
      a = m;
      b = m;
      break;
    }
    if (Math.sign(f) === wantSign) a = m;
    else b = m;
  }
  return finish(side, 0.5 * (a + b), false);
}
