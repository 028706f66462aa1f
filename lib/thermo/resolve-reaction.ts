// Equation text → library species with signed stoichiometric numbers, or a clear error:
// unknown species (with the closest library keys) or an unbalanced equation (with a balance).
import { balanceEquation, checkBalance, describeImbalance } from './balance';
import { formatEquation, parseEquation, type ParsedEquation } from './equation';
import { ThermoError, isThermoError } from './errors';
import type { ReactionSpecies } from './reaction-thermo';
import type { SpeciesLookup } from './species-library';

export interface ResolvedReaction {
  parsed: ParsedEquation;
  /** normalised text with library keys and ⇌ */
  equation: string;
  species: ReactionSpecies[];
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
    return parseEquation(text, { resolveAlias: (n, p) => lookup.resolveAlias(n, p) });
  } catch (err) {
    throw isThermoError(err) ? withField(err, 'equation') : err;
  }
}

function unbalancedError(parsed: ParsedEquation): ThermoError {
  const report = checkBalance(parsed);
  let balanced: string | null = null;
  let why = '';
  try {
    balanced = formatEquation(balanceEquation(parsed));
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

export function resolveReaction(text: string, lookup: SpeciesLookup): ResolvedReaction {
  const parsed = parse(text, lookup);
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
  if (!checkBalance(parsed).isBalanced) throw unbalancedError(parsed);

  const byKey = new Map<string, ReactionSpecies>();
  for (const { t, sign } of terms) {
    const existing = byKey.get(t.species.key);
    if (existing) existing.nu += sign * t.value;
    else byKey.set(t.species.key, { key: t.species.key, asWritten: t.species.raw, nu: sign * t.value, record: lookup.get(t.species.key)! });
  }
  return { parsed, equation: formatEquation(parsed), species: [...byKey.values()] };
}
