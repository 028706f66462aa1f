import { describe, expect, it } from 'vitest';
import { EngineInvariantError, assertFiniteNumbers } from '@/lib/thermo/sanitise';

describe('response sanitiser', () => {
  it('passes plain finite numbers, nulls and strings through unchanged', () => {
    const v = { a: 1, b: [2, { c: null, d: 'x' }] };
    expect(assertFiniteNumbers(v)).toBe(v);
  });

  it.each([Number.NaN, Number.POSITIVE_INFINITY, Number.NEGATIVE_INFINITY])('throws an internal error on %s, naming the path', (bad) => {
    expect(() => assertFiniteNumbers({ equilibrium: { amounts_mol: { 'H2(g)': bad } } })).toThrow(EngineInvariantError);
    expect(() => assertFiniteNumbers({ list: [1, bad] })).toThrow(/\$\.list\[1\]/);
  });

  it('checks own properties only, as Object.entries does, and names nested array paths', () => {
    const inherited = Object.create({ ghost: Number.NaN }) as Record<string, unknown>;
    inherited.real = 1;
    expect(assertFiniteNumbers({ inherited })).toEqual({ inherited });
    expect(() => assertFiniteNumbers({ warnings: [{ n: 1 }, { n: [0, Number.NaN] }] })).toThrow(/\$\.warnings\[1\]\.n\[1\]/);
  });
});
