// How a species picked from the search enters a step: which text goes into the equation, and which label the step's
// species map binds to a structure. Library keys written as formulas go in as they are ("CH3OH(l)"); anything known
// by structure goes in under a short label bound to its SMILES ("ethylacetate(l)" → { smiles, phase, name }), so the
// step names exactly the compound that was picked, whatever else shares its name. Pure, for the unit tests.
import type { SpeciesSearchHit } from '@/lib/queries/species-search';
import type { StepInput } from '@/lib/schemas/route';

export type Phase = 'g' | 'l' | 's' | 'aq';
export type Side = 'reactants' | 'products';
type SpeciesMap = NonNullable<StepInput['species']>;
type Definition = SpeciesMap[string];

export const PHASE_WORDS: Record<Phase, string> = { g: 'gas', l: 'liquid', s: 'solid', aq: 'aqueous' };

// Liquids first: most steps of a synthesis run in the liquid phase; a solid is never estimated, so it comes last.
const PREFERENCE: readonly Phase[] = ['l', 'g', 'aq', 's'];

/** The phase to use when the user has not chosen one: one with data, liquid first; a liquid estimate otherwise. */
export function defaultPhase(hit: Pick<SpeciesSearchHit, 'phases'>): Phase {
  for (const p of PREFERENCE) if (hit.phases.some((x) => x.phase === p)) return p;
  return 'l';
}

/** A label from the name: letters, digits, ' and - only, starting with a letter, at most 24 characters, with its phase. */
export function labelFor(name: string, phase: Phase, taken: ReadonlySet<string>): string {
  let base = name.replace(/[^A-Za-z0-9'-]/g, '').slice(0, 24);
  if (!/^[A-Za-z]/.test(base)) base = `S${base}`.slice(0, 24);
  let label = `${base}(${phase})`;
  for (let n = 2; taken.has(label); n += 1) label = `${base}${n}(${phase})`;
  return label;
}

function sameDefinition(a: Definition, b: Definition): boolean {
  if ('smiles' in a && 'smiles' in b) return a.smiles === b.smiles && a.phase === b.phase && a.estimate === b.estimate;
  if ('key' in a && 'key' in b) return a.key === b.key;
  return false;
}

export interface Insertion {
  /** what the equation gets */
  term: string;
  /** the step's species map after the insertion (unchanged when the term needs no label) */
  species: SpeciesMap | undefined;
}

/** The equation text and map entry for a picked species in a phase; an existing label for the same structure is reused. */
export function insertionFor(hit: Pick<SpeciesSearchHit, 'name' | 'smiles' | 'phases'>, phase: Phase, species: SpeciesMap | undefined, equation: string): Insertion {
  const data = hit.phases.find((p) => p.phase === phase);
  if (data && !data.key.startsWith('{')) return { term: data.key, species };
  const definition: Definition | null = hit.smiles ? { smiles: hit.smiles, phase, name: hit.name.slice(0, 120) } : data ? { key: data.key } : null;
  // Nothing to bind: the name and phase, as the equation accepts them.
  if (!definition) return { term: `${hit.name}(${phase})`, species };
  const existing = Object.entries(species ?? {}).find(([, d]) => sameDefinition(d, definition));
  if (existing) return { term: existing[0], species };
  const taken = new Set([...Object.keys(species ?? {}), ...equationTerms(equation)]);
  const label = labelFor(hit.name, phase, taken);
  return { term: label, species: { ...(species ?? {}), [label]: definition } };
}

const ARROW = /<=>|⇌|->|→|=/;

function equationTerms(equation: string): string[] {
  return equation
    .split(ARROW)
    .flatMap((side) => side.split(/\s+\+\s+/))
    .map((t) => t.trim().replace(/^\d+(?:\.\d+)?(?:\/\d+)?\s+/, ''))
    .filter(Boolean);
}

/** The equation with `term` added to one side; an equation without an arrow gets one when a product is added. */
export function addTerm(equation: string, side: Side, term: string): string {
  const match = ARROW.exec(equation);
  const join = (text: string) => (text.trim() ? `${text.trim().replace(/\s*\+\s*$/, '')} + ${term}` : term);
  if (!match) return side === 'reactants' ? join(equation) : `${equation.trim()} -> ${term}`.trimStart();
  const left = equation.slice(0, match.index);
  const right = equation.slice(match.index + match[0].length);
  return side === 'reactants' ? `${join(left)} ${match[0]} ${right.trim()}`.trimEnd() : `${left.trim()} ${match[0]} ${join(right)}`.trimStart();
}

function escapeRegExp(text: string): string {
  return text.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
}

/** The equation with every writing of `name(phase)` (any case, spaces before the phase) replaced by `term`. */
export function replaceNamed(equation: string, name: string, phase: string, term: string): string {
  const pattern = new RegExp(`(^|[\\s+>=→⇌])${escapeRegExp(name.trim()).replace(/ +/g, '\\s+')}\\s*\\(${escapeRegExp(phase)}\\)(?=$|[\\s+<=→⇌-])`, 'gi');
  return equation.replace(pattern, (_m, lead: string) => `${lead}${term}`);
}
