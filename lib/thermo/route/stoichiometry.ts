// Net stoichiometric numbers of a step as written (products +, reactants −), exact, read by parsing
// alone, so that a step the engine rejects (unknown species, unbalanced) still passes its extent on.
import { fraction, type Fraction } from 'mathjs';
import { BoundedMemo } from '../bounded-memo';
import { parseEquation } from '../equation';
import { isThermoError, type ThermoError } from '../errors';
import { lookupParseOptions } from '../lookup-parse-options';
import { parseSpecies } from '../notation';
import type { SpeciesLookup } from '../species-library';

export type Stoichiometry = Map<string, Fraction>;

const ZERO = fraction(0);

export function speciesKey(text: string, lookup: SpeciesLookup): string {
  return parseSpecies(text, lookupParseOptions(lookup)).key;
}

export function nuOf(nu: Stoichiometry, key: string): number {
  return nu.get(key)?.valueOf() ?? 0;
}

type StoichiometryRead = { nu: Stoichiometry | null; error: ThermoError | null };

// Per lookup, because a team's species can shadow built-in ones. Callers never mutate the maps.
const memos = new WeakMap<SpeciesLookup, BoundedMemo<string, StoichiometryRead>>();

export function readStoichiometry(equation: string, lookup: SpeciesLookup): StoichiometryRead {
  let memo = memos.get(lookup);
  if (!memo) {
    memo = new BoundedMemo(1000);
    memos.set(lookup, memo);
  }
  const hit = memo.get(equation);
  if (hit) return hit;
  const read = parseStoichiometry(equation, lookup);
  memo.set(equation, read);
  return read;
}

function parseStoichiometry(equation: string, lookup: SpeciesLookup): StoichiometryRead {
  try {
    const eq = parseEquation(equation, lookupParseOptions(lookup));
    const nu: Stoichiometry = new Map();
    for (const t of eq.reactants) nu.set(t.species.key, (nu.get(t.species.key) ?? ZERO).sub(t.coefficient));
    for (const t of eq.products) nu.set(t.species.key, (nu.get(t.species.key) ?? ZERO).add(t.coefficient));
    return { nu, error: null };
  } catch (err) {
    if (isThermoError(err)) return { nu: null, error: err };
    throw err;
  }
}

/**
 * Σ f_i ν_i, exact. Extents arrive as floats; each becomes the simplest fraction near it, so the sum of
 * balanced equations stays exactly balanced and intermediates cancel exactly.
 */
export function combineStoichiometry(parts: readonly { nu: Stoichiometry; factor: number | Fraction }[]): Stoichiometry {
  const net: Stoichiometry = new Map();
  for (const { nu, factor } of parts) {
    const f = typeof factor === 'number' ? fraction(factor) : factor;
    for (const [key, v] of nu) net.set(key, (net.get(key) ?? ZERO).add(v.mul(f)));
  }
  for (const [key, v] of net) if (v.equals(0)) net.delete(key);
  return net;
}

/** "a A + b B -> c C" with exact fractions, or null when one side is empty. */
export function formatStoichiometry(nu: Stoichiometry): string | null {
  const side = (sign: 1 | -1): string =>
    [...nu]
      .filter(([, v]) => v.compare(0) === sign)
      .map(([key, v]) => {
        const a = v.abs();
        return a.equals(1) ? key : `${a.toFraction()} ${key}`;
      })
      .join(' + ');
  const left = side(-1);
  const right = side(1);
  return left && right ? `${left} -> ${right}` : null;
}
