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

const MAX_STEP_OUT = 1e6;
const ITERATIONS = 200;

type Side = 'lo' | 'hi';

// The problem in flat arrays, so the ~60 residual evaluations of a solve allocate nothing.
// Every formula is term for term that of ln Q(ξ) − ln K, so the values do not depend on the layout.
class Problem {
  readonly count: number;
  readonly keys: string[];
  readonly nu: Float64Array;
  readonly n0: Float64Array;
  readonly lnAbsNu: Float64Array;
  /** ln φ for gases, ln γ otherwise */
  readonly lnCoefficient: Float64Array;
  readonly isGas: Uint8Array;
  readonly inQ: Uint8Array;
  readonly unlimited: Uint8Array;
  readonly bindsLo: Uint8Array;
  readonly bindsHi: Uint8Array;
  readonly ln: Float64Array;
  readonly bindingLo: string[] = [];
  readonly bindingHi: string[] = [];
  readonly lnGasScale: number;
  readonly lnV: number;
  readonly lnInert: number;
  readonly lnK: number;
  xiMin: number;
  xiMax: number;

  constructor(input: EquilibriumInput) {
    const species = input.species;
    const n = species.length;
    this.count = n;
    this.keys = new Array<string>(n);
    this.nu = new Float64Array(n);
    this.n0 = new Float64Array(n);
    this.lnAbsNu = new Float64Array(n);
    this.lnCoefficient = new Float64Array(n);
    this.isGas = new Uint8Array(n);
    this.inQ = new Uint8Array(n);
    this.unlimited = new Uint8Array(n);
    this.bindsLo = new Uint8Array(n);
    this.bindsHi = new Uint8Array(n);
    this.ln = new Float64Array(n);
    for (let i = 0; i < n; i++) {
      const s = species[i]!;
      const gas = s.record.phase === 'g';
      const pure = !gas && s.record.phase !== 'aq';
      this.keys[i] = s.key;
      this.nu[i] = s.nu;
      this.n0[i] = input.initial_mol.get(s.key) ?? 0;
      this.lnAbsNu[i] = Math.log(Math.abs(s.nu));
      this.lnCoefficient[i] = gas
        ? Math.log(input.fugacityCoefficients.get(s.key) ?? 1)
        : Math.log(input.activityCoefficients.get(s.key) ?? 1);
      this.isGas[i] = gas ? 1 : 0;
      this.unlimited[i] = input.unlimited.has(s.key) ? 1 : 0;
      this.inQ[i] = s.nu === 0 || pure || this.unlimited[i] === 1 ? 0 : 1;
    }
    // Limits: the extent at which each bounded reactant (or product, backwards) runs out.
    let reactantLimit = Number.POSITIVE_INFINITY;
    let productLimit = Number.POSITIVE_INFINITY;
    for (let i = 0; i < n; i++) {
      if (this.nu[i] === 0 || this.unlimited[i] === 1) continue;
      if (this.nu[i]! < 0) reactantLimit = Math.min(reactantLimit, this.limit(i));
      else productLimit = Math.min(productLimit, this.limit(i));
    }
    this.xiMax = reactantLimit;
    this.xiMin = -productLimit;
    for (let i = 0; i < n; i++) {
      if (this.nu[i] === 0 || this.unlimited[i] === 1) continue;
      if (this.nu[i]! < 0 && this.limit(i) === this.xiMax) {
        this.bindsHi[i] = 1;
        this.bindingHi.push(this.keys[i]!);
      } else if (this.nu[i]! > 0 && -this.limit(i) === this.xiMin) {
        this.bindsLo[i] = 1;
        this.bindingLo.push(this.keys[i]!);
      }
    }
    this.lnGasScale = Math.log(input.totalPressure_bar / input.standardPressure_bar);
    this.lnV = Math.log(input.volume_L);
    this.lnInert = input.inertGas_mol > 0 ? Math.log(input.inertGas_mol) : Number.NEGATIVE_INFINITY;
    this.lnK = input.lnK;
  }

  limit(i: number): number {
    return this.n0[i]! / Math.abs(this.nu[i]!);
  }

  /** ln n_i at ξ = anchor ± d, with d = e^t; binding species are exactly |ν|·d. */
  lnAmounts(lo: boolean, t: number, out: Float64Array): Float64Array {
    const anchor = lo ? this.xiMin : this.xiMax;
    const binds = lo ? this.bindsLo : this.bindsHi;
    const sign = lo ? 1 : -1;
    const d = Math.exp(t);
    const { nu, n0, lnAbsNu } = this;
    for (let i = 0; i < this.count; i++) {
      if (binds[i] === 1) {
        out[i] = lnAbsNu[i]! + t;
        continue;
      }
      const n = n0[i]! + nu[i]! * anchor + sign * nu[i]! * d;
      out[i] = n > 0 ? Math.log(n) : Number.NEGATIVE_INFINITY;
    }
    return out;
  }

  /** f = ln Q − ln K near the given bound. */
  residual(side: Side, t: number): number {
    const ln = this.lnAmounts(side === 'lo', t, this.ln);
    const { isGas, inQ, nu, lnCoefficient, lnInert } = this;
    // log-sum-exp over the inert gas, then each gas in order.
    let m = lnInert;
    for (let i = 0; i < this.count; i++) if (isGas[i] === 1 && ln[i]! > m) m = ln[i]!;
    let lnGas = m;
    if (m !== Number.NEGATIVE_INFINITY) {
      // e^(−∞) is exactly 0, so skipping that call changes nothing.
      let sum = lnInert === Number.NEGATIVE_INFINITY ? 0 : Math.exp(lnInert - m);
      for (let i = 0; i < this.count; i++) if (isGas[i] === 1) sum += Math.exp(ln[i]! - m);
      lnGas = m + Math.log(sum);
    }
    let lnQ = 0;
    for (let i = 0; i < this.count; i++) {
      if (inQ[i] === 0) continue;
      const lnA = isGas[i] === 1 ? ln[i]! - lnGas + this.lnGasScale + lnCoefficient[i]! : ln[i]! - this.lnV + lnCoefficient[i]!;
      lnQ += nu[i]! * lnA;
    }
    return lnQ - this.lnK;
  }

  finish(side: Side, t: number, atLimit: boolean): EquilibriumResult {
    const lo = side === 'lo';
    const d = atLimit ? 0 : Math.exp(t);
    const xi = lo ? this.xiMin + d : this.xiMax - d;
    const ln = atLimit ? null : this.lnAmounts(lo, t, new Float64Array(this.count));
    const binds = lo ? this.bindsLo : this.bindsHi;
    const amounts_mol: Record<string, number> = {};
    for (let i = 0; i < this.count; i++) {
      if (this.unlimited[i] === 1) continue;
      amounts_mol[this.keys[i]!] = ln ? Math.exp(ln[i]!) : binds[i] === 1 ? 0 : Math.max(0, this.n0[i]! + this.nu[i]! * xi);
    }
    const reverse = xi < 0;
    const bound = reverse ? this.xiMin : this.xiMax;
    const conversion = bound === 0 || !Number.isFinite(bound) ? 0 : Math.min(1, Math.max(0, xi / bound));
    return {
      extent_mol: xi,
      amounts_mol,
      conversion,
      limiting: [...(reverse ? this.bindingLo : this.bindingHi)],
      runsInReverse: reverse,
      atLimit,
    };
  }
}

export function solveEquilibrium(input: EquilibriumInput): EquilibriumResult {
  const p = new Problem(input);
  if (!Number.isFinite(p.xiMax) && !Number.isFinite(p.xiMin)) {
    throw new RangeError('equilibrium extent is unbounded: give an initial amount for at least one species');
  }

  // One side unlimited (e.g. solvent water as the only reactant): push that bound out until
  // f changes sign, then treat it as an ordinary, non-binding bound.
  if (!Number.isFinite(p.xiMax)) {
    let d = Math.max(1, Math.abs(p.xiMin));
    while (p.residual('lo', Math.log(d)) <= 0) {
      if (d > 1e300) throw new RangeError('equilibrium extent is unbounded: the products never reach equilibrium');
      d *= 4;
    }
    p.xiMax = p.xiMin + d;
  } else if (!Number.isFinite(p.xiMin)) {
    let d = Math.max(1, Math.abs(p.xiMax));
    while (p.residual('hi', Math.log(d)) >= 0) {
      if (d > 1e300) throw new RangeError('equilibrium extent is unbounded: the reactants never reach equilibrium');
      d *= 4;
    }
    p.xiMin = p.xiMax - d;
  }
  const span = p.xiMax - p.xiMin;
  if (span <= 0) return p.finish('hi', Number.NEGATIVE_INFINITY, true);

  const tHalf = Math.log(span / 2);
  const fMid = p.residual('lo', tHalf);
  if (fMid === 0) return p.finish('lo', tHalf, false);
  // f > 0 at the midpoint → root below it (lo side, f rises with t); else above (hi side, f falls with t).
  const side: Side = fMid > 0 ? 'lo' : 'hi';
  const wantSign = side === 'lo' ? -1 : 1;
  let far = tHalf;
  let step = 1;
  for (;;) {
    far = tHalf - step;
    const f = p.residual(side, far);
    if (Math.sign(f) === wantSign || f === 0) break;
    if (step > MAX_STEP_OUT) return p.finish(side, Number.NEGATIVE_INFINITY, true);
    step *= 2;
  }
  let a = far;
  let b = tHalf;
  for (let i = 0; i < ITERATIONS; i++) {
    const m = 0.5 * (a + b);
    if (m === a || m === b) break;
    const f = p.residual(side, m);
    if (f === 0) {
      a = m;
      b = m;
      break;
    }
    if (Math.sign(f) === wantSign) a = m;
    else b = m;
  }
  return p.finish(side, 0.5 * (a + b), false);
}
