import { parseError } from './errors';

// Periodic table H (1) to Og (118), in atomic-number order.
const ELEMENT_LIST = (
  'H He Li Be B C N O F Ne Na Mg Al Si P S Cl Ar K Ca Sc Ti V Cr Mn Fe Co Ni Cu Zn Ga Ge As Se Br Kr ' +
  'Rb Sr Y Zr Nb Mo Tc Ru Rh Pd Ag Cd In Sn Sb Te I Xe Cs Ba La Ce Pr Nd Pm Sm Eu Gd Tb Dy Ho Er Tm Yb Lu ' +
  'Hf Ta W Re Os Ir Pt Au Hg Tl Pb Bi Po At Rn Fr Ra Ac Th Pa U Np Pu Am Cm Bk Cf Es Fm Md No Lr ' +
  'Rf Db Sg Bh Hs Mt Ds Rg Cn Nh Fl Mc Lv Ts Og'
).split(' ');

export const ELEMENT_SYMBOLS: ReadonlySet<string> = new Set(ELEMENT_LIST);

export function isElementSymbol(symbol: string): boolean {
  return ELEMENT_SYMBOLS.has(symbol);
}

/** Characters accepted between the parts of a hydrate or adduct; the canonical one is "·". */
export const HYDRATE_SEPARATORS: ReadonlySet<string> = new Set(['·', '•', '⋅', '*', '.']);

export interface FormulaCounts {
  /** The formula as written, hydrate separators normalised to "·" and spaces around them dropped. */
  canonical: string;
  elements: Record<string, number>;
}

// Far above any real compound; keeps every count a safe integer.
const MAX_ATOMS = 1_000_000_000;

const FORMULA_HINT =
  'write a formula from element symbols, counts and groups, e.g. H2O, Ca(OH)2, (NH4)2SO4 or CuSO4·5H2O';

interface Cursor {
  text: string;
  base: number;
  source: string;
}

function at(c: Cursor, index: number): number {
  return c.base + index;
}

function describe(ch: string): string {
  return ch === ' ' ? 'space' : `"${ch}"`;
}

function unexpected(c: Cursor, index: number, hint: string = FORMULA_HINT): never {
  const ch = String.fromCodePoint(c.text.codePointAt(index) ?? 0);
  throw parseError(`Unexpected ${describe(ch)} at position ${at(c, index)} in "${c.source}"`, at(c, index), hint);
}

function readCount(c: Cursor, index: number): { value: number; next: number } {
  let end = index;
  while (end < c.text.length && c.text[end]! >= '0' && c.text[end]! <= '9') end++;
  if (end === index) return { value: 1, next: index };
  const digits = c.text.slice(index, end);
  if (digits.startsWith('0')) {
    throw parseError(
      `Count "${digits}" at position ${at(c, index)} in "${c.source}" must be a whole number of at least 1 without leading zeros`,
      at(c, index),
      'leave the count out for 1, e.g. NaCl rather than Na1Cl1',
    );
  }
  const value = Number(digits);
  if (!Number.isSafeInteger(value) || value > MAX_ATOMS) tooMany(c, index);
  return { value, next: end };
}

function tooMany(c: Cursor, index: number): never {
  throw parseError(
    `Count at position ${at(c, index)} in "${c.source}" is too large`,
    at(c, index),
    `atom counts above ${MAX_ATOMS} are not accepted`,
  );
}

function addInto(target: Record<string, number>, source: Record<string, number>, times: number, c: Cursor, index: number): void {
  for (const [el, n] of Object.entries(source)) {
    const total = (target[el] ?? 0) + n * times;
    if (total > MAX_ATOMS) tooMany(c, index);
    target[el] = total;
  }
}

const CLOSER: Record<string, string> = { '(': ')', '[': ']' };

/**
 * Counts the atoms of a neutral formula body (no charge, no phase).
 * `base` is where `text` starts inside `source`, so error positions point into what the user typed.
 */
export function countFormula(text: string, base = 0, source: string = text): FormulaCounts {
  const c: Cursor = { text, base, source };
  if (text.length === 0) {
    throw parseError(`Expected a formula at position ${base} in "${source}"`, base, FORMULA_HINT);
  }
  const total: Record<string, number> = {};
  let canonical = '';
  let i = 0;
  let partIndex = 0;

  while (i <= text.length) {
    // One hydrate part: optional multiplier (not on the first part), then groups.
    let multiplier = 1;
    if (partIndex > 0) {
      const m = readCount(c, i);
      multiplier = m.value;
      canonical += text.slice(i, m.next);
      i = m.next;
    } else if (i < text.length && text[i]! >= '0' && text[i]! <= '9') {
      unexpected(c, i, 'a formula starts with an element symbol or "("; put coefficients in the equation, e.g. 2 H2O(l)');
    }
    const stack: { counts: Record<string, number>; opener: string; start: number }[] = [
      { counts: {}, opener: '', start: i },
    ];
    const partStart = i;
    while (i < text.length) {
      const ch = text[i]!;
      if (HYDRATE_SEPARATORS.has(ch) || ch === ' ') break;
      if (ch >= 'A' && ch <= 'Z') {
        let symbol = ch;
        const nextCh = text[i + 1];
        if (nextCh !== undefined && nextCh >= 'a' && nextCh <= 'z') symbol += nextCh;
        if (!isElementSymbol(symbol)) {
          throw parseError(
            `Unknown element symbol "${symbol}" at position ${at(c, i)} in "${source}"`,
            at(c, i),
            'element symbols start with a capital letter, e.g. Co (cobalt) versus CO (carbon + oxygen); write species names in lowercase, e.g. ethanol(l)',
          );
        }
        const count = readCount(c, i + symbol.length);
        addInto(stack[stack.length - 1]!.counts, { [symbol]: 1 }, count.value, c, i);
        i = count.next;
      } else if (ch === '(' || ch === '[') {
        stack.push({ counts: {}, opener: ch, start: i });
        i++;
      } else if (ch === ')' || ch === ']') {
        const group = stack[stack.length - 1]!;
        if (stack.length === 1 || CLOSER[group.opener] !== ch) unexpected(c, i, 'every ")" or "]" needs a matching "(" or "[" before it');
        if (Object.keys(group.counts).length === 0) unexpected(c, i, 'a group in parentheses must contain atoms, e.g. Ca(OH)2');
        stack.pop();
        const count = readCount(c, i + 1);
        addInto(stack[stack.length - 1]!.counts, group.counts, count.value, c, i);
        i = count.next;
      } else {
        unexpected(c, i);
      }
    }
    if (stack.length > 1) {
      const open = stack[stack.length - 1]!;
      throw parseError(
        `Unclosed "${open.opener}" at position ${at(c, open.start)} in "${source}"`,
        at(c, open.start),
        `close the group with "${CLOSER[open.opener]}"`,
      );
    }
    const part = stack[0]!.counts;
    if (Object.keys(part).length === 0) {
      throw parseError(
        `Expected element symbols at position ${at(c, i)} in "${source}"`,
        at(c, i),
        'each part of a hydrate needs atoms, e.g. CuSO4·5H2O',
      );
    }
    addInto(total, part, multiplier, c, partStart);
    canonical += text.slice(partStart, i);
    if (i >= text.length) break;

    // Between parts: optional spaces around exactly one separator.
    let j = i;
    while (text[j] === ' ') j++;
    if (j >= text.length || !HYDRATE_SEPARATORS.has(text[j]!)) unexpected(c, i);
    j++;
    while (text[j] === ' ') j++;
    canonical += '·';
    i = j;
    partIndex++;
  }
  return { canonical, elements: total };
}
