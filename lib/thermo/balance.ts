import { fraction, type Fraction } from 'mathjs';
import { ThermoError } from './errors';
import { formatEquation, makeTerm, type ParsedEquation, type Term } from './equation';

/** Surpluses are left minus right; only non-zero entries are listed. */
export interface BalanceReport {
  isBalanced: boolean;
  elementSurplus: Record<string, number>;
  chargeSurplus: number;
}

const ZERO = fraction(0);

/** Exact left-minus-right totals per element, plus the charge. */
export function exactSurplus(eq: ParsedEquation): { elements: Map<string, Fraction>; charge: Fraction } {
  const elements = new Map<string, Fraction>();
  let charge = ZERO;
  const add = (terms: readonly Term[], sign: 1 | -1): void => {
    for (const t of terms) {
      const c = sign === 1 ? t.coefficient : t.coefficient.neg();
      for (const [el, n] of Object.entries(t.species.elements)) {
        elements.set(el, (elements.get(el) ?? ZERO).add(c.mul(n)));
      }
      charge = charge.add(c.mul(t.species.charge));
    }
  };
  add(eq.reactants, 1);
  add(eq.products, -1);
  return { elements, charge };
}

export function checkBalance(eq: ParsedEquation): BalanceReport {
  const { elements, charge } = exactSurplus(eq);
  const elementSurplus: Record<string, number> = {};
  for (const [el, v] of elements) if (!v.equals(0)) elementSurplus[el] = v.valueOf();
  const chargeSurplus = charge.equals(0) ? 0 : charge.valueOf();
  return { isBalanced: Object.keys(elementSurplus).length === 0 && chargeSurplus === 0, elementSurplus, chargeSurplus };
}

/**
 * Same verdict as checkBalance(eq).isBalanced. With whole-number coefficients the sums are exact
 * in doubles while they stay safe integers, so only other equations need the rational path.
 */
export function isBalanced(eq: ParsedEquation): boolean {
  const totals = new Map<string, number>();
  let charge = 0;
  const add = (terms: readonly Term[], sign: 1 | -1): boolean => {
    for (const t of terms) {
      if (t.coefficient.d !== 1n || !Number.isSafeInteger(t.value)) return false;
      const c = sign * t.value;
      for (const el of Object.keys(t.species.elements)) {
        const atoms = c * t.species.elements[el]!;
        const v = (totals.get(el) ?? 0) + atoms;
        if (!Number.isSafeInteger(atoms) || !Number.isSafeInteger(v)) return false;
        totals.set(el, v);
      }
      const q = c * t.species.charge;
      charge += q;
      if (!Number.isSafeInteger(q) || !Number.isSafeInteger(charge)) return false;
    }
    return true;
  };
  if (!add(eq.reactants, 1) || !add(eq.products, -1)) return checkBalance(eq).isBalanced;
  if (charge !== 0) return false;
  for (const v of totals.values()) if (v !== 0) return false;
  return true;
}

function amount(v: number): string {
  const size = Math.abs(v);
  return Number.isInteger(size) ? String(size) : fraction(size).toFraction();
}

/** E.g. "H: 2 more on the left than the right; O: 1 more on the right than the left". */
export function describeImbalance(report: BalanceReport): string {
  const sides = (v: number): string => (v > 0 ? 'the left than the right' : 'the right than the left');
  const parts = Object.entries(report.elementSurplus).map(([el, v]) => `${el}: ${amount(v)} more on ${sides(v)}`);
  if (report.chargeSurplus !== 0) {
    parts.push(`charge: ${amount(report.chargeSurplus)} more positive on ${sides(report.chargeSurplus)}`);
  }
  return parts.length === 0 ? 'balanced: every element and the charge are conserved' : parts.join('; ');
}

/** Basis of { x : A x = 0 } by exact Gauss-Jordan elimination. */
export function nullSpace(matrix: readonly (readonly Fraction[])[], columns: number): Fraction[][] {
  const m = matrix.map((row) => row.slice());
  const pivots: number[] = [];
  let r = 0;
  for (let col = 0; col < columns && r < m.length; col++) {
    let p = r;
    while (p < m.length && m[p]![col]!.equals(0)) p++;
    if (p === m.length) continue;
    [m[r], m[p]] = [m[p]!, m[r]!];
    const inv = m[r]![col]!.inverse();
    const pivotRow = m[r]!.map((x) => x.mul(inv));
    m[r] = pivotRow;
    for (let k = 0; k < m.length; k++) {
      const f = m[k]![col]!;
      if (k !== r && !f.equals(0)) m[k] = m[k]!.map((x, j) => x.sub(f.mul(pivotRow[j]!)));
    }
    pivots.push(col);
    r++;
  }
  const basis: Fraction[][] = [];
  for (let free = 0; free < columns; free++) {
    if (pivots.includes(free)) continue;
    const v = Array.from({ length: columns }, () => ZERO);
    v[free] = fraction(1);
    pivots.forEach((pc, i) => {
      v[pc] = m[i]![free]!.neg();
    });
    basis.push(v);
  }
  return basis;
}

const bigAbs = (x: bigint): bigint => (x < 0n ? -x : x);
const gcd = (a: bigint, b: bigint): bigint => {
  let [x, y] = [bigAbs(a), bigAbs(b)];
  while (y !== 0n) [x, y] = [y, x % y];
  return x;
};

/** Smallest integer multiple of a rational vector (sign kept). */
export function toSmallestIntegers(v: readonly Fraction[]): bigint[] {
  const lcm = v.reduce((acc, x) => (acc / gcd(acc, x.d)) * x.d, 1n);
  const ints = v.map((x) => (x.s * x.n * lcm) / x.d);
  const g = ints.reduce((acc, x) => gcd(acc, x), 0n);
  return g === 0n ? ints : ints.map((x) => x / g);
}

const list = (keys: string[]): string => (keys.length === 1 ? keys[0]! : `${keys.slice(0, -1).join(', ')} and ${keys[keys.length - 1]}`);

/**
 * Finds the smallest positive integer coefficients for the species as written (input coefficients
 * are ignored). Throws NO_BALANCE or AMBIGUOUS_BALANCE when there is no single such balance.
 */
export function balanceEquation(eq: ParsedEquation): ParsedEquation {
  const terms = [...eq.reactants, ...eq.products];
  const sign = (i: number): number => (i < eq.reactants.length ? 1 : -1);
  const elements = [...new Set(terms.flatMap((t) => Object.keys(t.species.elements)))].sort();
  const rows = elements.map((el) => terms.map((t, i) => fraction(sign(i) * (t.species.elements[el] ?? 0))));
  if (terms.some((t) => t.species.charge !== 0)) rows.push(terms.map((t, i) => fraction(sign(i) * t.species.charge)));

  const basis = nullSpace(rows, terms.length);
  if (basis.length === 0) {
    throw new ThermoError('NO_BALANCE', "These species can't be balanced: no combination conserves every element and the charge", {
      hint: 'check the formulas and charges, or add the missing species (often H2O, H+ or OH-)',
    });
  }
  if (basis.length > 1) {
    const keys = terms.map((t) => t.species.key);
    const repeated = [...new Set(keys.filter((k, i) => keys.indexOf(k) !== i))];
    const why = repeated.length > 0 ? ` (${list(repeated)} is written more than once)` : '';
    throw new ThermoError(
      'AMBIGUOUS_BALANCE',
      `More than one independent balance exists${why}; e.g. two separate reactions are mixed, so give the coefficients yourself`,
      { hint: 'write the coefficients, or split the equation into separate reactions', details: { independentBalances: basis.length } },
    );
  }

  let ints = toSmallestIntegers(basis[0]!);
  const negatives = ints.filter((x) => x < 0n).length;
  const positives = ints.filter((x) => x > 0n).length;
  if (negatives > positives || (negatives === positives && (ints[0] ?? 0n) < 0n)) ints = ints.map((x) => -x);

  const idle = terms.filter((_, i) => ints[i] === 0n).map((t) => t.species.key);
  if (idle.length > 0) {
    throw new ThermoError('NO_BALANCE', `These species can't be balanced: ${list(idle)} can take no part (its coefficient would be zero)`, {
      hint: 'remove the species that take no part, or check their formulas',
      details: { idle },
    });
  }
  const toProducts = terms.filter((_, i) => ints[i]! < 0n && sign(i) === 1).map((t) => t.species.key);
  const toReactants = terms.filter((_, i) => ints[i]! < 0n && sign(i) === -1).map((t) => t.species.key);
  if (toProducts.length + toReactants.length > 0) {
    const moves = [
      ...(toProducts.length > 0 ? [`${list(toProducts)} to the products`] : []),
      ...(toReactants.length > 0 ? [`${list(toReactants)} to the reactants`] : []),
    ];
    throw new ThermoError('NO_BALANCE', `These species can't be balanced as written: move ${moves.join(' and ')}`, {
      hint: 'a balance exists only with some species on the other side of the arrow',
      details: { toProducts, toReactants },
    });
  }
  const at = (i: number): Term => makeTerm(fraction(ints[i]!, 1n), terms[i]!.species);
  const balanced = {
    reactants: eq.reactants.map((_, i) => at(i)),
    products: eq.products.map((_, i) => at(eq.reactants.length + i)),
    arrow: eq.arrow,
    raw: '',
  };
  return { ...balanced, raw: formatEquation(balanced) };
}
