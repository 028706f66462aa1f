import { ThermoError, parseError } from './errors';
import { countFormula } from './formula';

export type Phase = 'g' | 'l' | 's' | 'aq';

export interface SpeciesRef {
  raw: string;
  key: string;
  formula: string;
  phase: Phase;
  form: string | null;
  charge: number;
  elements: Record<string, number>;
  alias: string | null;
}

/** Maps a species name and its phase or form (e.g. "ethanol", "l") to a canonical library key. */
export type AliasResolver = (name: string, phaseOrForm: string) => string | undefined;

/** Closest known spellings for a name the resolver does not know, best first. */
export type NameSuggester = (name: string, phaseOrForm: string) => string[];

/** What a key that is not a formula (a structure key, "{InChIKey}(l)") stands for: read from the lookup's record. */
export interface KeyDescription {
  formula: string;
  phase: Phase;
  charge: number;
  elements: Record<string, number>;
}

export type KeyDescriber = (key: string) => KeyDescription | undefined;

export interface ParseSpeciesOptions {
  resolveAlias?: AliasResolver;
  suggestNames?: NameSuggester;
  /** describes structure keys; without it they cannot be read */
  describeKey?: KeyDescriber;
  /** a label of the request's species map ("EtOAc", written without a phase) → its key */
  resolveLabel?: (label: string) => string | undefined;
  /** Index of `text` inside a larger text, so positions point into what the user typed. */
  offset?: number;
  /** The larger text, quoted in error messages when given. */
  source?: string;
}

const PHASES: Readonly<Record<string, Phase>> = { g: 'g', l: 'l', s: 's', aq: 'aq', cr: 's' };

// Words people type for a phase; reading them as a named solid form would silently misplace them.
const PHASE_WORDS: Readonly<Record<string, string>> = {
  gas: 'g', vapor: 'g', vapour: 'g', v: 'g', liquid: 'l', liq: 'l', solid: 's', c: 's', crystal: 's',
  aqueous: 'aq', aqu: 'aq', soln: 'aq', sln: 'aq', solution: 'aq',
};

// Named forms that are the standard reference form, so they share the plain "(s)" key.
const REFERENCE_FORMS: Readonly<Record<string, readonly string[]>> = {
  C: ['graphite'],
  CaCO3: ['calcite'],
  TiO2: ['rutile'],
  SiO2: ['quartz', 'alpha-quartz'],
  S: ['rhombic', 'orthorhombic'],
  P: ['white'],
  Sn: ['white'],
};

export const PHASE_HINT = 'add a phase such as (g), (l), (s) or (aq), e.g. H2O(l); a named solid form such as C(diamond) also works';

// Ambiguity rule: "<digits><sign>" at the end is a charge only right after one element symbol (Fe3+); otherwise the digits are atom counts (NO3-).
export const CHARGE_HINT =
  'write charges sign-first (Fe+3, SO4-2, NH4+) or with a caret (SO4^2-); digits before a trailing sign are a charge only after a single element symbol (Fe3+), otherwise they are atom counts (NO3- is NO3 with charge -1)';

const PHASE_CONTENT = /^[a-z][a-z0-9-]*$/;
const MAX_CHARGE = 99;

/** True when the text inside a final "(...)" names a phase or a solid form rather than an atom group. */
export function isPhaseContent(content: string): boolean {
  return PHASE_CONTENT.test(content.trim());
}

// Names start lowercase, or with locants such as "1-", "2,2-" or "N,N-".
const NAME_START = /^(?:[a-z]|\d+(?:,\d+)*-[A-Za-z]|[A-Z](?:,[A-Z])*-[a-z])/;
const NAME_CHARS = /^[A-Za-z0-9 ,'′()[\]-]$/;
const ELECTRON = /^e(?:\^?-1?)?(?:\s*\([a-z]*\))?$/;

interface Ctx {
  pos: (index: number) => number;
  source: string;
}

export function parseSpecies(text: string, opts: ParseSpeciesOptions = {}): SpeciesRef {
  const lead = text.length - text.trimStart().length;
  const raw = text.trim();
  const base = (opts.offset ?? 0) + lead;
  const ctx: Ctx = { pos: (i) => base + i, source: opts.source ?? text };
  // U+2212 minus is the typographic charge sign; same length, so positions hold.
  const work = raw.replace(/\u2212/g, '-');

  if (work.length === 0) {
    throw parseError(`Expected a species at position ${base} in "${ctx.source}"`, base, PHASE_HINT);
  }
  const labelled = opts.resolveLabel?.(raw);
  if (labelled !== undefined) return { ...describedKey(labelled, raw, ctx, opts), alias: raw };
  if (work.startsWith('{')) return describedKey(work, raw, ctx, opts);
  if (ELECTRON.test(work)) {
    throw parseError(
      `Electrons ("${raw}") at position ${base} can't be written as a species`,
      base,
      'leave electrons out of the equation and give their number in the electrons field',
    );
  }
  const open = checkGroups(work, ctx);
  const phaseOpen = work.endsWith(')') ? open.get(work.length - 1) : undefined;
  if (phaseOpen === undefined || !isPhaseContent(work.slice(phaseOpen + 1, -1))) {
    throw parseError(`Missing phase after "${raw}" at position ${ctx.pos(work.length)}`, ctx.pos(work.length), PHASE_HINT);
  }
  const word = work.slice(phaseOpen + 1, -1).trim();
  const body = work.slice(0, phaseOpen).trimEnd();
  if (body.length === 0) {
    throw parseError(`Expected a formula before "(${word})" at position ${ctx.pos(phaseOpen)}`, ctx.pos(phaseOpen), PHASE_HINT);
  }
  if (PHASE_WORDS[word] !== undefined) {
    throw parseError(
      `Unknown phase "(${word})" at position ${ctx.pos(phaseOpen + 1)} in "${ctx.source}"`,
      ctx.pos(phaseOpen + 1),
      `write the phase as (${PHASE_WORDS[word]}); accepted phases are (g), (l), (s), (cr) and (aq)`,
    );
  }
  const phaseOrForm = PHASES[word] ?? word;

  if (NAME_START.test(body)) return resolveName(raw, body, phaseOrForm, ctx, opts);

  const { formulaText, charge } = splitCharge(body, ctx);
  const counted = countFormula(formulaText, ctx.pos(0), ctx.source);
  const formula = counted.canonical + chargeSuffix(charge, counted.canonical);
  const phase = PHASES[word];
  let form: string | null = phase === undefined ? word : null;
  if (form !== null && (REFERENCE_FORMS[formula] ?? []).includes(form)) form = null;
  return {
    raw,
    key: `${formula}(${form ?? phase ?? 's'})`,
    formula,
    phase: phase ?? 's',
    form,
    charge,
    elements: counted.elements,
    alias: null,
  };
}

/** Checks bracket pairing and returns, for each closing index, its opening index. */
function checkGroups(work: string, ctx: Ctx): Map<number, number> {
  const pairs = new Map<number, number>();
  const stack: number[] = [];
  for (let i = 0; i < work.length; i++) {
    const ch = work[i];
    if (ch === '(' || ch === '[') stack.push(i);
    else if (ch === ')' || ch === ']') {
      const o = stack.pop();
      if (o === undefined || (work[o] === '(') !== (ch === ')')) {
        throw parseError(
          `Unexpected "${ch}" at position ${ctx.pos(i)} in "${ctx.source}"`,
          ctx.pos(i),
          'every ")" or "]" needs a matching "(" or "[" before it',
        );
      }
      pairs.set(i, o);
    }
  }
  const unclosed = stack.pop();
  if (unclosed !== undefined) {
    throw parseError(
      `Unclosed "${work[unclosed]}" at position ${ctx.pos(unclosed)} in "${ctx.source}"`,
      ctx.pos(unclosed),
      `close the group with "${work[unclosed] === '(' ? ')' : ']'}"; the phase goes last, e.g. Ca(OH)2(s)`,
    );
  }
  return pairs;
}

/** A key read through the lookup rather than as a formula: structure keys, and labels that resolve to any key. */
function describedKey(key: string, raw: string, ctx: Ctx, opts: ParseSpeciesOptions): SpeciesRef {
  if (!key.startsWith('{')) return { ...parseSpecies(key, { describeKey: opts.describeKey }), raw };
  const d = opts.describeKey?.(key);
  if (!d) {
    throw new ThermoError('UNKNOWN_SPECIES', `Unknown structure key "${key}"`, {
      position: ctx.pos(0),
      hint: 'give the species by name, formula or SMILES; structure keys come from Stepwell answers',
    });
  }
  return { raw, key, formula: d.formula, phase: d.phase, form: null, charge: d.charge, elements: d.elements, alias: null };
}

function resolveName(raw: string, body: string, phaseOrForm: string, ctx: Ctx, opts: ParseSpeciesOptions): SpeciesRef {
  for (let i = 0; i < body.length; i++) {
    if (!NAME_CHARS.test(body[i]!)) {
      throw parseError(
        `Unexpected "${body[i]}" at position ${ctx.pos(i)} in species name "${raw}"`,
        ctx.pos(i),
        'species names may use letters, digits, spaces, hyphens and commas, e.g. 1-butene(g)',
      );
    }
  }
  const name = body.replace(/\s+/g, ' ');
  const key = opts.resolveAlias?.(name, phaseOrForm);
  if (key === undefined) {
    const suggestions = opts.suggestNames?.(name, phaseOrForm) ?? [];
    const closest = suggestions.length ? ` (closest: ${suggestions.join(', ')})` : '';
    throw new ThermoError('UNKNOWN_SPECIES', `Unknown species name "${raw}"${closest}`, {
      position: ctx.pos(0),
      hint: suggestions.length
        ? `did you mean ${suggestions[0]}?`
        : 'write the formula instead, e.g. C2H5OH(l), or use a name listed in the species library',
      details: opts.suggestNames ? { name, phaseOrForm, suggestions } : { name, phaseOrForm },
    });
  }
  let resolved: SpeciesRef;
  try {
    resolved = key.startsWith('{') ? describedKey(key, raw, ctx, opts) : parseSpecies(key);
  } catch (err) {
    if (!(err instanceof ThermoError)) throw err;
    throw parseError(
      `The library key "${key}" for "${name}" is not valid: ${err.message}`,
      ctx.pos(0),
      'the species library has a bad entry; write the formula instead',
    );
  }
  return { ...resolved, raw, alias: name };
}

function chargeError(message: string, at: number): never {
  throw parseError(message, at, CHARGE_HINT);
}

function magnitude(digits: string, at: number, ctx: Ctx): number {
  if (digits === '') return 1;
  const n = Number(digits);
  if (digits.startsWith('0') || n > MAX_CHARGE) {
    chargeError(`Charge "${digits}" at position ${ctx.pos(at)} in "${ctx.source}" must be a whole number from 1 to ${MAX_CHARGE}`, ctx.pos(at));
  }
  return n;
}

function splitCharge(body: string, ctx: Ctx): { formulaText: string; charge: number } {
  let formulaText = body;
  let charge = 0;
  const caret = body.indexOf('^');
  if (caret >= 0) {
    const tail = body.slice(caret + 1);
    const m = /^(\d*)([+-])$/.exec(tail) ?? /^([+-])(\d*)$/.exec(tail);
    if (m === null) chargeError(`Expected a charge such as ^2- after "^" at position ${ctx.pos(caret)} in "${ctx.source}"`, ctx.pos(caret));
    const digits = tail.replace(/[+-]/, '');
    const sign = tail.includes('-') ? -1 : 1;
    charge = sign * magnitude(digits, caret + 1, ctx);
    formulaText = body.slice(0, caret);
  } else {
    const m = /([+-])(\d*)$/.exec(body);
    if (m !== null) {
      const sign = m[1] === '-' ? -1 : 1;
      formulaText = body.slice(0, m.index);
      if (m[2] !== '') {
        charge = sign * magnitude(m[2]!, m.index + 1, ctx);
      } else {
        const d = /\d+$/.exec(formulaText);
        if (d !== null && /^[A-Z][a-z]?$/.test(formulaText.slice(0, d.index))) {
          charge = sign * magnitude(d[0], d.index, ctx);
          formulaText = formulaText.slice(0, d.index);
        } else {
          charge = sign;
        }
      }
    }
  }
  const stray = formulaText.search(/[+\-^]/);
  if (stray >= 0) {
    chargeError(`Unexpected "${formulaText[stray]}" at position ${ctx.pos(stray)} in "${ctx.source}"`, ctx.pos(stray));
  }
  if (formulaText.trim().length === 0) {
    chargeError(`Expected a formula before the charge at position ${ctx.pos(0)} in "${ctx.source}"`, ctx.pos(0));
  }
  return { formulaText, charge };
}

/** Canonical charge text: sign first, magnitude only above 1. */
export function chargeSuffix(charge: number, formula: string): string {
  if (charge === 0) return '';
  const sign = charge > 0 ? '+' : '-';
  const size = Math.abs(charge);
  // "I3-" would read back as I with charge -3, so a lone element with a count keeps its "1".
  if (size === 1 && !/^[A-Z][a-z]?\d+$/.test(formula)) return sign;
  return `${sign}${size}`;
}
