// The "<number> <unit>" fast path must return exactly what mathjs returns, bit for bit.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  fastQuantity,
  parseQuantity,
  parseQuantitySlow,
  quantityKindOf,
  type QuantityKind,
} from '@/lib/thermo/units';

const TABLE: readonly (readonly [string, QuantityKind])[] = [
  ['K', 'temperature'],
  ['degC', 'temperature'],
  ['degF', 'temperature'],
  ['bar', 'pressure'],
  ['atm', 'pressure'],
  ['kPa', 'pressure'],
  ['Pa', 'pressure'],
  ['mmHg', 'pressure'],
  ['psi', 'pressure'],
  ['mol/L', 'concentration'],
  ['mmol/L', 'concentration'],
  ['M', 'concentration'],
  ['mol', 'amount'],
  ['mmol', 'amount'],
  ['kmol', 'amount'],
  ['J', 'energy'],
  ['kJ', 'energy'],
  ['kcal', 'energy'],
  ['L', 'volume'],
  ['mL', 'volume'],
];

/** Outcome of a parse, comparable with Object.is on the value and equality on the error. */
function outcome(fn: () => number): { value?: number; error?: string } {
  try {
    return { value: fn() };
  } catch (err) {
    return { error: err instanceof Error ? `${err.name}: ${err.message}` : String(err) };
  }
}

function expectSame(text: string, kind: QuantityKind): void {
  const fast = outcome(() => parseQuantity(text, kind, 'f'));
  const slow = outcome(() => parseQuantitySlow(text, kind, 'f'));
  expect(fast.error).toBe(slow.error);
  if (slow.value !== undefined) expect(Object.is(fast.value, slow.value), `${text}: ${fast.value} vs ${slow.value}`).toBe(true);
}

// Number spellings mathjs reads: signs, leading/trailing dots, exponents.
const numberText = fc.oneof(
  fc.double({ noNaN: true, noDefaultInfinity: true }).map(String),
  fc.double({ noNaN: true, noDefaultInfinity: true, min: -1e6, max: 1e6 }).map((x) => x.toExponential(6)),
  fc.stringMatching(/^[+-]?(\d{1,7}(\.\d{0,7})?|\.\d{1,7})([eE][+-]?\d{1,3})?$/),
);
const unitRow = fc.constantFrom(...TABLE);

describe('quantity fast path', () => {
  it('takes every unit of the table', () => {
    for (const [unit, kind] of TABLE) {
      expect(fastQuantity(`2.5 ${unit}`, kind), unit).toBeDefined();
      expect(quantityKindOf(`2.5 ${unit}`)).toBe(kind);
    }
  });

  it('returns bit-identical values to mathjs for any number and unit of the table', () => {
    fc.assert(
      fc.property(numberText, unitRow, (n, [unit, kind]) => {
        const text = `${n} ${unit}`;
        const fast = fastQuantity(text, kind);
        const slow = outcome(() => parseQuantitySlow(text, kind, 'f'));
        // The fast path declines only overflow, which mathjs then reports.
        if (fast === undefined) expect(slow.error).toMatch(/not a finite number/);
        else expect(Object.is(fast, slow.value), `${text}: ${fast} vs ${slow.value}`).toBe(true);
        expectSame(text, kind);
      }),
      { numRuns: 3000 },
    );
  });

  it('gives the same value or the same error as mathjs for any kind asked', () => {
    const kinds: QuantityKind[] = ['temperature', 'pressure', 'concentration', 'amount', 'volume', 'energy'];
    fc.assert(
      fc.property(numberText, unitRow, fc.constantFrom(...kinds), (n, [unit], kind) => expectSame(`${n} ${unit}`, kind)),
      { numRuns: 1000 },
    );
  });

  it('leaves other spellings to mathjs, with the same result', () => {
    const cases: [string, QuantityKind][] = [
      ['2bar', 'pressure'],
      ['2  bar', 'pressure'],
      [' 2 bar ', 'pressure'],
      ['25 °C', 'temperature'],
      ['25 celsius', 'temperature'],
      ['\u22125 degC', 'temperature'],
      ['1e400 bar', 'pressure'],
      ['0.5 m^3', 'volume'],
      ['2 kg', 'pressure'],
      ['2', 'pressure'],
      ['abc', 'pressure'],
      ['+3 mol', 'amount'],
      ['-0 K', 'temperature'],
      ['1. L', 'volume'],
      ['.5 M', 'concentration'],
    ];
    for (const [text, kind] of cases) expectSame(text, kind);
  });

  it('reports the kind of a string as mathjs does, or none', () => {
    expect(quantityKindOf('0.1 mol/L')).toBe('concentration');
    expect(quantityKindOf('2bar')).toBe('pressure');
    expect(quantityKindOf('2 kg')).toBeUndefined();
    expect(quantityKindOf('nonsense')).toBeUndefined();
  });
});
