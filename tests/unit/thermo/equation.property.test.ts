import fc from 'fast-check';
import { fraction } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { ThermoError } from '@/lib/thermo/errors';
import { formatEquation, parseEquation, type ParsedEquation } from '@/lib/thermo/equation';
import { parseSpecies, type AliasResolver } from '@/lib/thermo/notation';

// Species as people write them, in non-canonical spellings where there is one.
const SPECIES = [
  'H2(g)', 'O2(g)', 'H2O(l)', 'H2O (g)', 'Fe3+(aq)', 'Fe+2(aq)', 'SO4^2-(aq)', 'SO4-2(aq)', 'NH4+(aq)', 'Cl-(aq)',
  'OH-(aq)', 'H+(aq)', 'I3^-(aq)', 'CuSO4*5H2O(cr)', 'CuSO4.5H2O(s)', 'C(graphite)', 'C(diamond)', 'CaCO3(aragonite)',
  'Ca(OH)2(s)', '(NH4)2SO4(s)', '[Cu(NH3)4]+2(aq)', 'Fe(OH)+2(aq)', 'C2H5OH(l)', 'CH3OCH3(g)', 'ethanol(l)', '1-butene(g)',
];
const NAMES: Record<string, string> = { ethanol: 'C2H5OH(l)', '1-butene': 'CH2CHCH2CH3(g)' };
const resolveAlias: AliasResolver = (name) => NAMES[name];
const ARROWS = ['->', '→', '=', '<=>', '⇌'];

const coefficientArb = fc.oneof(
  fc.constant(''),
  fc.integer({ min: 1, max: 30 }).map(String),
  fc.tuple(fc.integer({ min: 1, max: 30 }), fc.integer({ min: 1, max: 8 })).map(([n, d]) => `${n}/${d}`),
  fc.tuple(fc.integer({ min: 0, max: 9 }), fc.integer({ min: 1, max: 99 })).map(([i, f]) => `${i}.${f}`),
);
const termArb = fc.tuple(coefficientArb, fc.constantFrom(' ', ''), fc.constantFrom(...SPECIES)).map(([c, gap, s]) =>
  // A name starting with a digit needs the space after its coefficient.
  c === '' ? s : `${c}${/^\d/.test(s) ? ' ' : gap}${s}`,
);
const sideArb = fc.array(termArb, { minLength: 1, maxLength: 4 });
const joinArb = fc.constantFrom(' + ', '+', '  +  ');
const equationArb = fc
  .tuple(sideArb, sideArb, joinArb, fc.constantFrom(...ARROWS))
  .map(([l, r, j, a]) => `${l.join(j)} ${a} ${r.join(j)}`);

const summary = (eq: ParsedEquation) =>
  [eq.reactants, eq.products].map((side) =>
    side.map((t) => ({ c: t.coefficient.toFraction(), key: t.species.key, el: t.species.elements, q: t.species.charge })),
  );

describe('format and parse', () => {
  it('parse(format(eq)) gives back the same terms, and formatting is stable', () => {
    fc.assert(
      fc.property(equationArb, (text) => {
        const eq = parseEquation(text, { resolveAlias });
        const formatted = formatEquation(eq);
        const again = parseEquation(formatted);
        expect(summary(again)).toEqual(summary(eq));
        expect(formatEquation(again)).toBe(formatted);
      }),
      { numRuns: 1000 },
    );
  });

  it('reads every generated coefficient exactly', () => {
    fc.assert(
      fc.property(coefficientArb.filter((c) => c !== ''), (c) => {
        const eq = parseEquation(`${c} H2(g) -> ${c} H2(g)`);
        expect(eq.reactants[0]!.coefficient.equals(fraction(c))).toBe(true);
      }),
      { numRuns: 300 },
    );
  });
});

/** Any failure must be a ThermoError with a usable position and hint. */
function onlyThermoErrors(text: string, parse: (t: string) => unknown): boolean {
  try {
    parse(text);
    return true;
  } catch (err) {
    expect(err).toBeInstanceOf(ThermoError);
    const e = err as ThermoError;
    if (e.code === 'PARSE_ERROR' || e.code === 'UNKNOWN_SPECIES') {
      expect(Number.isInteger(e.position)).toBe(true);
      expect(e.position!).toBeGreaterThanOrEqual(0);
      expect(e.position!).toBeLessThanOrEqual(text.length);
    }
    expect(e.hint ?? '').not.toBe('');
    return false;
  }
}

const TOKENS = [
  'H', 'O2', 'Xx', '2', '3', '1/2', '0.5', '0', '-1', '(', ')', '[', ']', '(g)', '(aq)', '(diamond)', '(liquid)',
  '+', '-', '^', '^2-', '3+', '·5H2O', '.', '*', ' ', ' + ', '->', '=', '⇌', 'e-', 'ethanol', '−', '',
];
const editArb = fc.record({ at: fc.nat(), cut: fc.integer({ min: 0, max: 3 }), insert: fc.constantFrom(...TOKENS) });

/** Valid text with a few random cuts and insertions: the inputs most likely to reach deep parser paths. */
function nearMiss(base: fc.Arbitrary<string>): fc.Arbitrary<string> {
  return fc.tuple(base, fc.array(editArb, { maxLength: 3 })).map(([text, edits]) =>
    edits.reduce((t, e) => {
      const i = e.at % (t.length + 1);
      return t.slice(0, i) + e.insert + t.slice(i + e.cut);
    }, text),
  );
}

const parsers: [string, (t: string) => unknown, fc.Arbitrary<string>][] = [
  ['parseEquation', (t) => parseEquation(t, { resolveAlias }), nearMiss(equationArb)],
  ['parseSpecies', (t) => parseSpecies(t, { resolveAlias }), nearMiss(fc.constantFrom(...SPECIES))],
];

describe.each(parsers)('%s on arbitrary text', (_name, parse, nearMissArb) => {
  it('throws only ThermoError on fc.string()', () => {
    fc.assert(fc.property(fc.string({ maxLength: 60 }), (t) => void onlyThermoErrors(t, parse)), { numRuns: 2000 });
  });

  // fast-check 4 replaced fc.fullUnicodeString() with fc.string({ unit: 'binary' }): any code point.
  it('throws only ThermoError on full-Unicode strings', () => {
    fc.assert(fc.property(fc.string({ unit: 'binary', maxLength: 60 }), (t) => void onlyThermoErrors(t, parse)), {
      numRuns: 2000,
    });
  });

  it('throws only ThermoError on near-miss notation, and some of it still parses', () => {
    let parsed = 0;
    fc.assert(
      fc.property(nearMissArb, (t) => {
        if (onlyThermoErrors(t, parse)) parsed++;
      }),
      { numRuns: 3000 },
    );
    expect(parsed).toBeGreaterThan(0);
  });
});
