import { ZodError } from 'zod';
import { ThermoError } from '../../thermo/errors';

export interface ItemError {
  error: { code: string; message: string; field: string | null };
}

// The per-item error shape of batch answers (API arrays and the CLI).
export function itemError(error: unknown): ItemError {
  if (error instanceof ThermoError) return { error: { code: error.code, message: error.message, field: error.field ?? null } };
  if (error instanceof ZodError) {
    const issue = error.issues[0];
    const field = issue?.path.length ? issue.path.map(String).join('.') : null;
    return { error: { code: 'VALIDATION', message: issue ? `${field ?? 'request'}: ${issue.message}` : 'Invalid request.', field } };
  }
  return { error: { code: 'INTERNAL', message: 'The evaluation failed unexpectedly.', field: null } };
}
