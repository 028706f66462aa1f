import { balanceEquation, checkBalance, describeImbalance } from '../../thermo/balance';
import { formatEquation, parseEquation } from '../../thermo/equation';
import { isThermoError } from '../../thermo/errors';
import { lookupParseOptions } from '../../thermo/lookup-parse-options';
import type { SpeciesRef } from '../../thermo/notation';
import type { SpeciesDefinition, StructureLookup } from '../../thermo/structure/structure-lookup-type';

export interface BalanceCheck {
  equation: string;
  isBalanced: boolean;
  message: string;
  balanced: string | null;
  /** species the equation names that the library (and the team's species) lack: the step cannot be evaluated */
  unknownSpecies: string[];
}

/** "Not in the species library: X (closest: A, B)" for each species the lookup lacks; balance alone is not enough. */
function unknownOf(parsed: ReturnType<typeof parseEquation>, lookup: Pick<StructureLookup, 'get' | 'suggest'>): { keys: string[]; message: string } {
  const keys = [...new Set([...parsed.reactants, ...parsed.products].map((t) => t.species.key).filter((key) => !lookup.get(key)))];
  const message = keys
    .map((key) => {
      const closest = lookup.suggest(key, 3);
      return `${key} is not in the species library${closest.length ? ` (closest: ${closest.join(', ')})` : ''}.`;
    })
    .join(' ');
  return { keys, message };
}

// Species known by structure carry keys like "{InChIKey}(l)"; the answer writes them as the user did (label or name),
// so a one-click balance keeps the step's labels, its links and its species map working.
const asWritten = (s: SpeciesRef): string => (s.key.startsWith('{') ? s.raw : s.key);

// Parse problems are answers here, not errors: the editor shows them while the user types.
export function checkEquationBalance(text: string, base: StructureLookup, species?: Record<string, SpeciesDefinition>): BalanceCheck | { error: { code: string; message: string; position: number | null; details?: Record<string, unknown> } } {
  try {
    // The step's labels are read as the step defines them; a bad definition is an answer like a parse error.
    const lookup = species && Object.keys(species).length ? base.withLabels(species) : base;
    const parsed = parseEquation(text, lookupParseOptions(lookup));
    const report = checkBalance(parsed);
    const unknown = unknownOf(parsed, lookup);
    if (report.isBalanced) {
      const message = unknown.keys.length ? `Balanced, but ${unknown.message}` : 'Balanced.';
      return { equation: formatEquation(parsed, asWritten), isBalanced: true, message, balanced: formatEquation(parsed, asWritten), unknownSpecies: unknown.keys };
    }
    let balanced: string | null = null;
    let extra = '';
    try {
      balanced = formatEquation(balanceEquation(parsed), asWritten);
    } catch (error) {
      if (!isThermoError(error)) throw error;
      extra = ` ${error.message}`;
    }
    const unknownText = unknown.keys.length ? ` ${unknown.message}` : '';
    return { equation: formatEquation(parsed, asWritten), isBalanced: false, message: `${describeImbalance(report)}.${extra}${unknownText}`, balanced, unknownSpecies: unknown.keys };
  } catch (error) {
    if (!isThermoError(error)) throw error;
    // An ambiguous name keeps its choices, so the editor can offer them at the field.
    const details = error.code === 'AMBIGUOUS_NAME' && error.details ? { details: error.details } : {};
    return { error: { code: error.code, message: error.message, position: error.position ?? null, ...details } };
  }
}
