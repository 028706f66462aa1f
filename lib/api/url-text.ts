import { AppError } from './errors';

const NUL = '\u0000';
const MESSAGE = 'May not contain the NUL character (%00).';

// A decoded path segment or query value holding NUL would reach SQL as text: PostgreSQL refuses it and SQLite's
// statements end at it, so such a request is bad input (400), not a server fault. Bodies are checked in read-body.ts.
export function refuseNulInUrl(params: Record<string, string>, query: URLSearchParams): void {
  const fields: Record<string, string> = {};
  for (const [name, value] of Object.entries(params)) if (value.includes(NUL)) fields[name] = MESSAGE;
  for (const [name, value] of query) if (name.includes(NUL) || value.includes(NUL)) fields[name.replaceAll(NUL, '%00') || '_'] = MESSAGE;
  if (Object.keys(fields).length) throw new AppError('VALIDATION', 'The address of the request contains a NUL character (%00).', { fields });
}
