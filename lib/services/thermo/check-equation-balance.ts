import { balanceEquation, checkBalance, describeImbalance } from '../../thermo/balance';
import { formatEquation, parseEquation } from '../../thermo/equation';
import { isThermoError } from '../../thermo/errors';
import { lookupParseOptions } from '../../thermo/lookup-parse-options';
import type { SpeciesDefinition, StructureLookup } from '../../thermo/structure/structure-lookup-type';

export interface BalanceCheck {
  equation: string;
  isBalanced: boolean;
  message: string;
  balanced: string | null;
}

// Parse problems are answers here, not errors: the editor shows them while the user types.
export function checkEquationBalance(text: string, base: StructureLookup, species?: Record<string, SpeciesDefinition>): BalanceCheck | { error: { code: string; message: string; position: number | null } } {
  try {
    // The step's labels are read as the step defines them; a bad definition is an answer like a parse error.
    const lookup = species && Object.keys(species).length ? base.withLabels(species) : base;
    const parsed = parseEquation(text, lookupParseOptions(lookup));
    const report = checkBalance(parsed);
    if (report.isBalanced) return { equation: formatEquation(parsed), isBalanced: true, message: 'Balanced.', balanced: formatEquation(parsed) };
    let balanced: string | null = null;
    let extra = '';
    try {
      balanced = formatEquation(balanceEquation(parsed));
    } catch (error) {
      if (!isThermoError(error)) throw error;
      extra = ` ${error.message}`;
    }
    return { equation: formatEquation(parsed), isBalanced: false, message: `${describeImbalance(report)}.${extra}`, balanced };
  } catch (error) {
    if (!isThermoError(error)) throw error;
    return { error: { code: error.code, message: error.message, position: error.position ?? null } };
  }
}
