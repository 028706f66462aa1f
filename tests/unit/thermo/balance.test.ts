import { describe, expect, it } from 'vitest';
import { fraction } from 'mathjs';
import { balanceEquation, checkBalance, describeImbalance, nullSpace, toSmallestIntegers } from '@/lib/thermo/balance';
import { formatEquation, parseEquation } from '@/lib/thermo/equation';
import { expectThermoError } from './expect-thermo-error';

const balance = (text: string): string => formatEquation(balanceEquation(parseEquation(text)));

describe('checkBalance', () => {
  it('accepts a balanced equation', () => {
    expect(checkBalance(parseEquation('2 H2(g) + O2(g) -> 2 H2O(l)'))).toEqual({
      isBalanced: true,
      elementSurplus: {},
      chargeSurplus: 0,
    });
  });

  it('lists left-minus-right surpluses, non-zero only', () => {
    expect(checkBalance(parseEquation('H2(g) + O2(g) -> H2O(l)'))).toEqual({
      isBalanced: false,
      elementSurplus: { O: 1 },
      chargeSurplus: 0,
    });
    expect(checkBalance(parseEquation('CH4(g) -> CO2(g) + H2O(l)')).elementSurplus).toEqual({ H: 2, O: -3 });
  });

  it('counts charge', () => {
    const report = checkBalance(parseEquation('Fe+3(aq) -> Fe+2(aq)'));
    expect(report).toEqual({ isBalanced: false, elementSurplus: {}, chargeSurplus: 1 });
    expect(checkBalance(parseEquation('2 Fe+3(aq) + Zn(s) -> 2 Fe+2(aq) + Zn+2(aq)')).isBalanced).toBe(true);
  });

  it('sums exactly where floating point would not', () => {
    // In floats 0.1*2 + 0.2*2 is 0.6000000000000001, not 0.6.
    expect(checkBalance(parseEquation('0.1 H2(g) + 0.2 H2(g) -> 0.3 H2(g)')).isBalanced).toBe(true);
    expect(checkBalance(parseEquation('1/3 O3(g) -> 1/2 O2(g)')).isBalanced).toBe(true);
    expect(checkBalance(parseEquation('1/3 O3(g) -> 0.5 O2(g) + 0.0001 O(g)')).isBalanced).toBe(false);
  });
});

describe('describeImbalance', () => {
  it('says which side has more of what', () => {
    expect(describeImbalance({ isBalanced: false, elementSurplus: { H: 2, O: -1 }, chargeSurplus: 0 })).toBe(
      'H: 2 more on the left than the right; O: 1 more on the right than the left',
    );
  });

  it('includes charge and writes fractions as fractions', () => {
    expect(describeImbalance({ isBalanced: false, elementSurplus: { O: 0.5 }, chargeSurplus: -2 })).toBe(
      'O: 1/2 more on the left than the right; charge: 2 more positive on the right than the left',
    );
  });

  it('describes a real report', () => {
    expect(describeImbalance(checkBalance(parseEquation('H2(g) + O2(g) -> H2O(l)')))).toBe(
      'O: 1 more on the left than the right',
    );
    expect(describeImbalance(checkBalance(parseEquation('2 H2(g) + O2(g) -> 2 H2O(l)')))).toMatch(/^balanced/);
  });
});

describe('balanceEquation', () => {
  it.each([
    ['C3H8(g) + O2(g) -> CO2(g) + H2O(l)', 'C3H8(g) + 5 O2(g) ⇌ 3 CO2(g) + 4 H2O(l)'],
    ['Fe2O3(s) + CO(g) -> Fe(s) + CO2(g)', 'Fe2O3(s) + 3 CO(g) ⇌ 2 Fe(s) + 3 CO2(g)'],
    [
      'KMnO4(s) + HCl(aq) -> KCl(aq) + MnCl2(aq) + Cl2(g) + H2O(l)',
      '2 KMnO4(s) + 16 HCl(aq) ⇌ 2 KCl(aq) + 2 MnCl2(aq) + 5 Cl2(g) + 8 H2O(l)',
    ],
    [
      'MnO4-(aq) + Fe2+(aq) + H+(aq) -> Mn2+(aq) + Fe3+(aq) + H2O(l)',
      'MnO4-(aq) + 5 Fe+2(aq) + 8 H+(aq) ⇌ Mn+2(aq) + 5 Fe+3(aq) + 4 H2O(l)',
    ],
    ['Cu(s) + HNO3(aq) -> Cu(NO3)2(aq) + NO(g) + H2O(l)', '3 Cu(s) + 8 HNO3(aq) ⇌ 3 Cu(NO3)2(aq) + 2 NO(g) + 4 H2O(l)'],
    ['CO2(g) + H2O(l) -> C6H12O6(s) + O2(g)', '6 CO2(g) + 6 H2O(l) ⇌ C6H12O6(s) + 6 O2(g)'],
    ['Cr2O7-2(aq) + H+(aq) + I-(aq) -> Cr+3(aq) + I2(s) + H2O(l)', 'Cr2O7-2(aq) + 14 H+(aq) + 6 I-(aq) ⇌ 2 Cr+3(aq) + 3 I2(s) + 7 H2O(l)'],
    ['CuSO4·5H2O(s) -> CuSO4(s) + H2O(g)', 'CuSO4·5H2O(s) ⇌ CuSO4(s) + 5 H2O(g)'],
  ])('balances %s', (input, expected) => {
    expect(balance(input)).toBe(expected);
    expect(checkBalance(balanceEquation(parseEquation(input))).isBalanced).toBe(true);
  });

  it('ignores the coefficients given and keeps the arrow and species order', () => {
    const out = balanceEquation(parseEquation('7 H2(g) + 1/3 O2(g) = 5 H2O(l)'));
    expect(formatEquation(out)).toBe('2 H2(g) + O2(g) ⇌ 2 H2O(l)');
    expect(out.arrow).toBe('=');
    expect(out.reactants.map((t) => t.value)).toEqual([2, 1]);
    expect(out.raw).toBe('2 H2(g) + O2(g) ⇌ 2 H2O(l)');
  });

  it('says so when no combination conserves everything', () => {
    const err = expectThermoError(() => balanceEquation(parseEquation('NaCl(s) -> Na(s)')), 'NO_BALANCE');
    expect(err.message).toContain('no combination conserves every element and the charge');
    expectThermoError(() => balanceEquation(parseEquation('Fe+3(aq) -> Fe+2(aq)')), 'NO_BALANCE');
    expectThermoError(() => balanceEquation(parseEquation('H2(g) -> H2O(l)')), 'NO_BALANCE');
  });

  it('names a species that could take no part', () => {
    const err = expectThermoError(() => balanceEquation(parseEquation('H2O(l) -> H2(g) + O2(g) + N2(g)')), 'NO_BALANCE');
    expect(err.message).toContain('N2(g)');
  });

  it('names the species that would have to change sides', () => {
    const err = expectThermoError(() => balanceEquation(parseEquation('H2(g) + H2O(l) -> O2(g)')), 'NO_BALANCE');
    expect(err.message).toContain('move H2(g) to the products');
    expect(err.details).toEqual({ toProducts: ['H2(g)'], toReactants: [] });
    const back = expectThermoError(() => balanceEquation(parseEquation('O2(g) -> H2O(l) + H2(g)')), 'NO_BALANCE');
    expect(back.message).toContain('move H2(g) to the reactants');
  });

  it('refuses to choose between independent balances', () => {
    const err = expectThermoError(
      () => balanceEquation(parseEquation('H2(g) + Cl2(g) + N2(g) + O2(g) -> HCl(g) + NO(g)')),
      'AMBIGUOUS_BALANCE',
    );
    expect(err.message).toMatch(/more than one independent balance/i);
    expect(err.details).toEqual({ independentBalances: 2 });
    expectThermoError(() => balanceEquation(parseEquation('H2(g) + O2(g) -> H2O(l) + H2O2(l)')), 'AMBIGUOUS_BALANCE');
  });

  it('points at a species written twice when that causes the ambiguity', () => {
    const err = expectThermoError(() => balanceEquation(parseEquation('H2(g) + O2(g) -> H2O(l) + H2(g)')), 'AMBIGUOUS_BALANCE');
    expect(err.message).toContain('H2(g) is written more than once');
  });
});

describe('exact helpers', () => {
  it('finds the null space of a small integer matrix', () => {
    const f = (rows: number[][]) => rows.map((r) => r.map((x) => fraction(x)));
    // x + y - z = 0 and y - 2z = 0 leave one direction: (-1, 2, 1).
    const basis = nullSpace(f([[1, 1, -1], [0, 1, -2]]), 3);
    expect(basis.map((v) => v.map((x) => x.toFraction()))).toEqual([['-1', '2', '1']]);
    expect(nullSpace(f([[1, 0], [0, 1]]), 2)).toEqual([]);
    expect(nullSpace(f([[1, 1, 1]]), 3)).toHaveLength(2);
  });

  it('scales a rational vector to its smallest integer multiple, sign kept', () => {
    expect(toSmallestIntegers([fraction(1, 2), fraction(3, 4), fraction(-1)])).toEqual([2n, 3n, -4n]);
    expect(toSmallestIntegers([fraction(2), fraction(4), fraction(6)])).toEqual([1n, 2n, 3n]);
  });
});
