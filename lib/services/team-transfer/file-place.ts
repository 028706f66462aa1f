import { AppError } from '../../api/errors';
import { rowName } from '../../csv/row-numbers';

const CELL = /^tables\.([a-z_]+)\[(\d+)\](?:\.([a-z_]+))?(.*)$/;

/** "tables.routes[1].name" → "table routes, row 2, column name": rows counted from 1, as every upload message counts them. */
export function filePlace(where: string): string {
  const m = CELL.exec(where);
  if (!m) return where.startsWith('tables.') ? `table ${where.slice('tables.'.length)}` : where;
  const [, table, index, column, rest] = m;
  return [`table ${table}`, rowName(Number(index) + 1).toLowerCase(), column ? `column ${column}${rest ?? ''}` : null].filter(Boolean).join(', ');
}

/** A bad team file: the place in words in the message (row 1 = the table's first entry), the JSON path as the field key. */
export function refuseTeamFile(where: string, message: string): never {
  const place = filePlace(where);
  const counting = CELL.test(where) ? ' (row 1 is the first entry of the table)' : '';
  throw new AppError('VALIDATION', `The team file does not hold together: ${place}${counting}: ${message}`, { fields: { [where]: message } });
}
