import 'server-only';
import { AppError } from '../../api/errors';
import { parseDataTable, TableError } from '../../fits/parse-table';
import { readRows } from '../../fits/read-rows';
import type { DataRowInput, StoredPoint, TemperatureUnit, ValueKind } from '../../schemas/fit-data';
import { checkBalance, describeImbalance, isBalanced } from '../../thermo/balance';
import { parseEquation } from '../../thermo/equation';
import { isThermoError } from '../../thermo/errors';
import { lookupParseOptions } from '../../thermo/lookup-parse-options';
import type { SpeciesLookup } from '../../thermo/species-library';

/** Table text (CSV or pasted) → rows; a table that cannot be read is one message on `text`. */
export function rowsFromText(text: string): DataRowInput[] {
  try {
    return parseDataTable(text).rows;
  } catch (error) {
    if (error instanceof TableError) throw new AppError('VALIDATION', error.message, { fields: { [error.field]: error.message } });
    throw error;
  }
}

export function pointsFromRows(rows: readonly DataRowInput[], unit: TemperatureUnit, kind: ValueKind): StoredPoint[] {
  const { points, errors } = readRows(rows, unit, kind);
  const count = Object.keys(errors).length;
  if (count > 0) {
    const first = Object.values(errors)[0]!;
    throw new AppError('VALIDATION', count === 1 ? first : `${count} cells need attention; the first: ${first}`, { fields: errors });
  }
  return points;
}

// The linked reaction must read and balance; its species may be unknown yet (a fit can create one).
export function checkLinkedEquation(equation: string, lookup: SpeciesLookup): void {
  if (equation === '') return;
  try {
    const parsed = parseEquation(equation, lookupParseOptions(lookup));
    if (!isBalanced(parsed)) {
      const message = `The equation is not balanced (${describeImbalance(checkBalance(parsed))}).`;
      throw new AppError('VALIDATION', message, { fields: { equation: message } });
    }
  } catch (error) {
    if (isThermoError(error)) throw new AppError('VALIDATION', error.message, { fields: { equation: error.message } });
    throw error;
  }
}

/** Keeps an exclusion where the point at that row is unchanged by an edit. */
export function carryExclusions(before: readonly StoredPoint[], after: StoredPoint[]): StoredPoint[] {
  return after.map((p, i) => {
    const old = before[i];
    return old && old.excluded && old.T === p.T && old.value === p.value ? { ...p, excluded: true, reason: old.reason } : p;
  });
}
