import { fraction, type Fraction } from 'mathjs';
import { ThermoError, parseError } from './errors';
import { isPhaseContent, parseSpecies, type AliasResolver, type KeyDescriber, type NameSuggester, type SpeciesRef } from './notation';

export type Arrow = '->' | '→' | '=' | '<=>' | '⇌';

export interface Term {
  coefficient: Fraction;
  value: number;
  species: SpeciesRef;
}

export interface ParsedEquation {
  reactants: Term[];
  products: Term[];
  arrow: Arrow;
  raw: string;
}

export interface ParseEquationOptions {
  resolveAlias?: AliasResolver;
  /** consulted only for a name resolveAlias does not know */
  suggestNames?: NameSuggester;
  describeKey?: KeyDescriber;
  resolveLabel?: (label: string) => string | undefined;
}

// Longest first, so "<=>" is not read as "=".
export const ARROWS: readonly Arrow[] = ['<=>', '⇌', '->', '→', '='];

const ARROW_HINT = 'separate reactants and products with exactly one arrow: ->, →, =, <=> or ⇌';
const TERM_HINT = 'join species with " + ", each with its phase, e.g. 2 H2(g) + O2(g) -> 2 H2O(l)';
const COEFFICIENT_HINT = 'coefficients are positive numbers such as 2, 0.5 or 1/2, written before the species';

// Integer fraction, decimal or integer; what follows decides whether it really is a coefficient.
const COEFFICIENT = /^(?:(\d+)\/(\d+)|(\d+\.\d+|\.\d+|\d+))/;
const AFTER_COEFFICIENT = /^[\sA-Za-z([]/;

export function makeTerm(coefficient: Fraction, species: SpeciesRef): Term {
  return { coefficient, value: coefficient.valueOf(), species };
}

export function parseEquation(text: string, opts: ParseEquationOptions = {}): ParsedEquation {
  const arrows = findArrows(text);
  if (arrows.length !== 1) {
    const position = arrows.length === 0 ? text.length : arrows[1]!.index;
    const problem = arrows.length === 0 ? 'Expected an arrow' : `Found a second arrow "${arrows[1]!.arrow}"`;
    throw parseError(`${problem} at position ${position} in "${text}"`, position, ARROW_HINT);
  }
  const { arrow, index } = arrows[0]!;
  const afterArrow = index + arrow.length;
  if (text.slice(0, index).trim() === '') {
    throw parseError(`Expected reactants before the arrow at position ${index} in "${text}"`, index, TERM_HINT);
  }
  if (text.slice(afterArrow).trim() === '') {
    throw parseError(`Expected products after the arrow at position ${text.length} in "${text}"`, text.length, TERM_HINT);
  }
  const side = (from: number, to: number): Term[] =>
    splitTerms(text, from, to).map(([s, e]) => parseTerm(text, s, e, opts));
  return { reactants: side(0, index), products: side(afterArrow, text.length), arrow, raw: text.trim() };
}

function findArrows(text: string): { arrow: Arrow; index: number }[] {
  const found: { arrow: Arrow; index: number }[] = [];
  for (let i = 0; i < text.length; i++) {
    const arrow = ARROWS.find((a) => text.startsWith(a, i));
    if (arrow !== undefined) {
      found.push({ arrow, index: i });
      i += arrow.length - 1;
    }
  }
  return found;
}

const isSpace = (ch: string | undefined): boolean => ch !== undefined && /\s/.test(ch);

/**
 * Cuts one side into [start, end) term ranges. A "+" separates terms only after a phase group,
 * after a space, or at the start of a term; a "+" glued to a formula (H+, NH4+) is a charge.
 */
function splitTerms(text: string, from: number, to: number): [number, number][] {
  const ranges: [number, number][] = [];
  const opens: number[] = [];
  let termStart = from;
  let afterPhase = false;
  const close = (end: number): void => {
    if (text.slice(termStart, end).trim() === '') {
      throw parseError(`Expected a species at position ${end} in "${text}"`, end, TERM_HINT);
    }
    ranges.push([termStart, end]);
  };
  for (let i = from; i < to; i++) {
    const ch = text[i]!;
    if (isSpace(ch)) continue;
    if (ch === '+' && opens.length === 0 && (afterPhase || isSpace(text[i - 1]) || text.slice(termStart, i).trim() === '')) {
      close(i);
      termStart = i + 1;
      afterPhase = false;
      continue;
    }
    if (afterPhase) {
      throw parseError(`Expected "+" or an arrow after the phase at position ${i} in "${text}"`, i, TERM_HINT);
    }
    if (ch === '(' || ch === '[') opens.push(i);
    else if ((ch === ')' || ch === ']') && opens.length > 0) {
      const open = opens.pop()!;
      afterPhase = opens.length === 0 && ch === ')' && text[open] === '(' && isPhaseContent(text.slice(open + 1, i));
    }
  }
  close(to);
  return ranges;
}

function parseTerm(text: string, start: number, end: number, opts: ParseEquationOptions): Term {
  let i = start;
  while (isSpace(text[i])) i++;
  const tail = text.slice(i, end);
  if (/^[-\u2212]\s*[\d.]/.test(tail)) {
    throw parseError(`Negative coefficient at position ${i} in "${text}"`, i, `${COEFFICIENT_HINT}; move the species to the other side instead`);
  }
  let coefficient = fraction(1);
  const m = COEFFICIENT.exec(tail);
  if (m !== null && (m[0].length === tail.length || AFTER_COEFFICIENT.test(tail.slice(m[0].length)))) {
    if (m[0].length === tail.length) {
      throw parseError(`Expected a species after the coefficient at position ${i + m[0].length} in "${text}"`, i + m[0].length, TERM_HINT);
    }
    if (m[2] !== undefined && /^0+$/.test(m[2])) {
      throw parseError(`Division by zero in coefficient "${m[0]}" at position ${i} in "${text}"`, i, COEFFICIENT_HINT);
    }
    coefficient = m[3] !== undefined ? fraction(m[3]) : fraction(BigInt(m[1]!), BigInt(m[2]!));
    if (coefficient.equals(0)) {
      throw parseError(`Coefficient "${m[0]}" at position ${i} in "${text}" must be greater than zero`, i, `${COEFFICIENT_HINT}; leave out species that take no part`);
    }
    i += m[0].length;
  }
  const species = parseSpecies(text.slice(i, end), { ...opts, offset: i, source: text });
  return makeTerm(coefficient, species);
}

function formatSide(terms: readonly Term[], label: (species: SpeciesRef) => string): string {
  return terms
    .map((t) => (t.coefficient.equals(1) ? label(t.species) : `${t.coefficient.toFraction()} ${label(t.species)}`))
    .join(' + ');
}

/**
 * Normalised text: library keys, coefficient 1 left out, fractions as "1/2", always "⇌". `label` writes each species
 * another way, e.g. by name for people to read, where a key is an InChIKey.
 */
export function formatEquation(eq: ParsedEquation, label: (species: SpeciesRef) => string = (s) => s.key): string {
  return `${formatSide(eq.reactants, label)} ⇌ ${formatSide(eq.products, label)}`;
}

export function reverseEquation(eq: ParsedEquation): ParsedEquation {
  const reversed = { reactants: eq.products, products: eq.reactants, arrow: eq.arrow, raw: '' };
  return { ...reversed, raw: formatEquation(reversed) };
}

export function scaleEquation(eq: ParsedEquation, factor: Fraction | number): ParsedEquation {
  if (typeof factor === 'number' && !Number.isFinite(factor)) {
    throw new ThermoError('INVALID_VALUE', `Scale factor ${factor} is not a finite number`, { field: 'factor', hint: 'use a positive number such as 2 or 1/2' });
  }
  const f = typeof factor === 'number' ? fraction(factor) : factor;
  if (f.compare(0) <= 0) {
    throw new ThermoError('INVALID_VALUE', `Scale factor ${f.toFraction()} must be greater than zero`, {
      field: 'factor',
      hint: 'use a positive factor; to swap the sides use reverseEquation',
    });
  }
  const scale = (terms: readonly Term[]): Term[] => terms.map((t) => makeTerm(t.coefficient.mul(f), t.species));
  const scaled = { reactants: scale(eq.reactants), products: scale(eq.products), arrow: eq.arrow, raw: '' };
  return { ...scaled, raw: formatEquation(scaled) };
}
