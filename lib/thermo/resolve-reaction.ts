// Equation text → library species with signed stoichiometric numbers, or a clear error:
// unknown species (with the closest library keys) or an unbalanced equation (with a balance).
// Successful resolutions are memoised per lookup object; see resolveReaction.
import { balanceEquation, checkBalance, describeImbalance, isBalanced } from './balance';
import { BoundedMemo } from './bounded-memo';
import { formatEquation, parseEquation, type ParsedEquation } from './equation';
import { ThermoError, isThermoError } from './errors';
import type { ReactionSpecies } from './reaction-thermo';
import { lookupParseOptions } from './lookup-parse-options';
import type { SpeciesRef } from './notation';
import type { SpeciesLookup } from './species-library';

export interface ResolvedReaction {
  parsed: ParsedEquation;
  /** normalised text with library keys and ⇌ */
  equation: string;
  /** the same, species known by structure written by name, for people */
  equationDisplay: string;
  /** frozen: memo hits share it */
  species: readonly ReactionSpecies[];
}

function withField(err: ThermoError, field: string): ThermoError {
  return new ThermoError(err.code, err.message, {
    field: err.field ?? field,
    ...(err.position !== undefined ? { position: err.position } : {}),
    ...(err.hint !== undefined ? { hint: err.hint } : {}),
    ...(err.details !== undefined ? { details: err.details } : {}),
  });
}

function parse(text: string, lookup: SpeciesLookup): ParsedEquation {
  try {
    return parseEquation(text, lookupParseOptions(lookup, true));
  } catch (err) {
    throw isThermoError(err) ? withField(err, 'equation') : err;
  }
}

/** Species by name where their key is a structure key ({InChIKey}(phase)), as people read an equation. */
export function readableLabel(lookup: SpeciesLookup): (species: SpeciesRef) => string {
  return (s) => {
    if (!s.key.startsWith('{')) return s.key;
    const r = lookup.get(s.key);
    return r ? `${r.name}(${r.phase})` : s.key;
  };
}

function unbalancedError(parsed: ParsedEquation, lookup: SpeciesLookup): ThermoError {
  const report = checkBalance(parsed);
  let balanced: string | null = null;
  let why = '';
  try {
    balanced = formatEquation(balanceEquation(parsed), readableLabel(lookup));
  } catch (err) {
    if (!isThermoError(err)) throw err;
    why = err.message;
  }
  const offer = balanced ? `; balanced: ${balanced}` : why ? `; ${why}` : '';
  return new ThermoError('UNBALANCED', `The equation is not balanced (${describeImbalance(report)})${offer}`, {
    field: 'equation',
    hint: balanced ? `use ${balanced}` : 'check the formulas and charges',
    details: { elementSurplus: report.elementSurplus, chargeSurplus: report.chargeSurplus, balanced },
  });
}

interface ParsedEntry {
  parsed: ParsedEquation;
  equation: string;
  balanced: boolean;
}

export const MEMO_CAPACITY = 1000;

// Text-only memo, for equations with no species written by name: their parse never consulted
// the lookup, so it holds for every lookup. Named species depend on the lookup's aliases.
const parsedByText = new BoundedMemo<string, ParsedEntry>(MEMO_CAPACITY);
// Full results per lookup object: a team lookup may shadow built-ins, so it never shares entries.
let resolvedByLookup = new WeakMap<SpeciesLookup, BoundedMemo<string, ResolvedReaction>>();

function parsedEntry(text: string, lookup: SpeciesLookup): ParsedEntry {
  const hit = parsedByText.get(text);
  if (hit) return hit;
  const parsed = parse(text, lookup);
  const entry = { parsed, equation: formatEquation(parsed), balanced: isBalanced(parsed) };
  const byName = [...parsed.reactants, ...parsed.products].some((t) => t.species.alias !== null);
  if (!byName) parsedByText.set(text, entry);
  return entry;
}

function resolveUncached(text: string, lookup: SpeciesLookup): ResolvedReaction {
  const { parsed, equation, balanced } = parsedEntry(text, lookup);
  const terms = [
    ...parsed.reactants.map((t) => ({ t, sign: -1 })),
    ...parsed.products.map((t) => ({ t, sign: 1 })),
  ];
  const unknown = terms.filter(({ t }) => lookup.get(t.species.key) === undefined).map(({ t }) => t.species);
  if (unknown.length > 0) {
    const items = unknown.map((ref) => ({ species: ref.raw, key: ref.key, suggestions: lookup.suggest(ref.key, 5, ref.elements) }));
    const text = items
      .map((i) => `${i.species}${i.suggestions.length ? ` (closest: ${i.suggestions.join(', ')})` : ''}`)
      .join('; ');
    throw new ThermoError('UNKNOWN_SPECIES', `Not in the species library: ${text}`, {
      field: 'equation',
      hint: items[0]!.suggestions.length ? `did you mean ${items[0]!.suggestions[0]}?` : 'check the formula and phase',
      details: { unknown: items },
    });
  }
  if (!balanced) throw unbalancedError(parsed, lookup);

  const byKey = new Map<string, ReactionSpecies>();
  for (const { t, sign } of terms) {
    const existing = byKey.get(t.species.key);
    if (existing) existing.nu += sign * t.value;
    else byKey.set(t.species.key, { key: t.species.key, asWritten: t.species.raw, nu: sign * t.value, record: lookup.get(t.species.key)! });
  }
  // Shared by every later call with this text and lookup, so nobody may change it.
  const species = Object.freeze([...byKey.values()].map((s) => Object.freeze(s)));
  const equationDisplay = species.some((s) => s.key.startsWith('{')) ? formatEquation(parsed, readableLabel(lookup)) : equation;
  return Object.freeze({ parsed, equation, equationDisplay, species });
}

/** Resolves the equation against the lookup; a repeat call with the same text and lookup object is a memo hit. */
export function resolveReaction(text: string, lookup: SpeciesLookup): ResolvedReaction {
  let memo = resolvedByLookup.get(lookup);
  const hit = memo?.get(text);
  if (hit) return hit;
  const resolved = resolveUncached(text, lookup);
  if (!memo) {
    memo = new BoundedMemo(MEMO_CAPACITY);
    resolvedByLookup.set(lookup, memo);
  }
  memo.set(text, resolved);
  return resolved;
}

/** Empties both memos; for tests. */
export function clearReactionMemo(): void {
  parsedByText.clear();
  resolvedByLookup = new WeakMap();
}
