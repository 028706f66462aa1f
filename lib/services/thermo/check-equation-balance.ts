import { balanceEquation, checkBalance, describeImbalance } from '../../thermo/balance';
import { formatEquation, parseEquation } from '../../thermo/equation';
import { isThermoError } from '../../thermo/errors';
import { builtinLookup } from '../../thermo/species-library';

export interface BalanceCheck {
  equation: string;
  isBalanced: boolean;
  message: string;
  balanced: string | null;
}

// Parse problems are answers here, not errors: the editor shows them while the user types.
export function checkEquationBalance(text: string): BalanceCheck | { error: { code: string; message: string; position: number | null } } {
  try {
    const parsed = parseEquation(text, { resolveAlias: (n, p) => builtinLookup.resolveAlias(n, p) });
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
