// Splits a formula or library key ("SO4-2(aq)", "CuSO4·5H2O(s)") into runs to typeset: counts as subscripts,
// the charge as a superscript ("2−"), the phase in plain text. Structure keys ("{InChIKey}(l)") are never shown:
// the species' name (or its formula) stands in. Pure, so the unit tests and every view share it.

export type FormulaPartKind = 'text' | 'sub' | 'sup' | 'phase' | 'name';

export interface FormulaPart {
  kind: FormulaPartKind;
  text: string;
}

const MINUS = '\u2212';

// Every element symbol, so "Boc" or "DMF" stay plain text rather than becoming fake formulas.
const ELEMENTS = new Set(
  ('H He Li Be B C N O F Ne Na Mg Al Si P S Cl Ar K Ca Sc Ti V Cr Mn Fe Co Ni Cu Zn Ga Ge As Se Br Kr Rb Sr Y Zr Nb Mo ' +
    'Tc Ru Rh Pd Ag Cd In Sn Sb Te I Xe Cs Ba La Ce Pr Nd Pm Sm Eu Gd Tb Dy Ho Er Tm Yb Lu Hf Ta W Re Os Ir Pt Au Hg ' +
    'Tl Pb Bi Po At Rn Fr Ra Ac Th Pa U Np Pu Am Cm Bk Cf Es Fm Md No Lr Rf Db Sg Bh Hs Mt Ds Rg Cn Nh Fl Mc Lv Ts Og D T').split(' '),
);

/** A phase or form in parentheses at the end, in lower case: "(g)", "(aq)", "(diamond)". Groups like "(OH)2" have capitals. */
const PHASE = /^(.*?)(\([a-z][a-z ,-]*\))$/;
/** An engine structure key, "{InChIKey}" or "{InChIKey|estimate}". */
const STRUCTURE_KEY = /^\{[^{}]+\}$/;
/** A charge written the library's way, sign then size: "+", "-2", "+3". */
const CHARGE = /^(.*?)([+-])(\d*)$/;
const HYDRATE_DOTS = /[·.*•]/;

/** Splits off a trailing phase: ["CH3OH", "(g)"], or [text, ""] when there is none. */
export function splitPhase(text: string): [string, string] {
  const m = PHASE.exec(text.trim());
  return m && m[1] ? [m[1], m[2]!] : [text.trim(), ''];
}

export function isStructureKey(text: string): boolean {
  return STRUCTURE_KEY.test(splitPhase(text)[0]);
}

function push(parts: FormulaPart[], kind: FormulaPartKind, text: string): void {
  if (!text) return;
  const last = parts[parts.length - 1];
  if (last && last.kind === kind) last.text += text;
  else parts.push({ kind, text });
}

/** One hydrate component ("5H2O", "CuSO4", "(NH4)2SO4"), or null when it is not a formula. */
function componentParts(text: string, leading: boolean): FormulaPart[] | null {
  const parts: FormulaPart[] = [];
  let i = 0;
  // "5H2O" after a dot: the 5 counts water molecules and stays full size.
  const coefficient = leading ? null : /^\d+/.exec(text);
  if (coefficient) {
    push(parts, 'text', coefficient[0]);
    i = coefficient[0].length;
  }
  let depth = 0;
  let atoms = 0;
  while (i < text.length) {
    const rest = text.slice(i);
    const element = /^([A-Z][a-z]?)(\d*)/.exec(rest);
    if (element) {
      if (!ELEMENTS.has(element[1]!)) return null;
      push(parts, 'text', element[1]!);
      push(parts, 'sub', element[2]!);
      atoms += 1;
      i += element[0].length;
      continue;
    }
    const open = /^[([]/.exec(rest);
    if (open) {
      depth += 1;
      push(parts, 'text', open[0]);
      i += 1;
      continue;
    }
    const close = /^([)\]])(\d*)/.exec(rest);
    if (close && depth > 0) {
      depth -= 1;
      push(parts, 'text', close[1]!);
      push(parts, 'sub', close[2]!);
      i += close[0].length;
      continue;
    }
    return null;
  }
  return depth === 0 && atoms > 0 ? parts : null;
}

/** The body of a formula without its phase: components joined by "·", then a charge; null when it is not a formula. */
function bodyParts(body: string): FormulaPart[] | null {
  const charge = CHARGE.exec(body);
  const core = charge && charge[1] ? charge[1] : body;
  const components = core.split(HYDRATE_DOTS);
  const parts: FormulaPart[] = [];
  for (const [index, component] of components.entries()) {
    const own = componentParts(component, index === 0);
    if (!own) return null;
    if (index > 0) push(parts, 'text', '·');
    for (const p of own) push(parts, p.kind, p.text);
  }
  if (charge && charge[1]) push(parts, 'sup', `${charge[3] ?? ''}${charge[2] === '-' ? MINUS : '+'}`);
  return parts;
}

export interface FormulaOptions {
  /** the species' name, shown in place of a structure key */
  name?: string | null;
  /** the species' formula (Hill order), typeset in place of a structure key when no name is given */
  formula?: string | null;
}

/**
 * Runs to typeset for a formula or a species key. Text that is not a formula (a name, "ethyl acetate(l)") comes back
 * as one plain run with its phase; a structure key becomes the name, else the typeset formula, else "structure".
 */
export function formulaParts(value: string, options: FormulaOptions = {}): FormulaPart[] {
  const [body, phase] = splitPhase(value);
  let parts: FormulaPart[];
  if (STRUCTURE_KEY.test(body)) {
    const name = options.name?.trim();
    const fromFormula = options.formula ? bodyParts(splitPhase(options.formula)[0]) : null;
    parts = name ? [{ kind: 'name', text: name }] : (fromFormula ?? [{ kind: 'name', text: 'structure' }]);
    if (name && phase) return [...parts, { kind: 'phase', text: ` ${phase}` }];
  } else {
    parts = bodyParts(body) ?? [{ kind: 'text', text: body }];
  }
  return phase ? [...parts, { kind: 'phase', text: phase }] : parts;
}

/** Plain text for alt text, titles and sentences: a formula key as written ("SO4-2(aq)"), a structure key by name. */
export function formulaPlain(value: string, options: FormulaOptions = {}): string {
  if (!isStructureKey(value)) return value.trim();
  return formulaParts(value, options)
    .map((p) => p.text)
    .join('');
}
