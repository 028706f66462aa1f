// One request or an array of them, with an error object in place of each failing item: shared by the CLI and the API.
import type { z } from 'zod';
import { isThermoError } from './errors';

export interface ItemError {
  error: { code: string; message: string; field?: string; hint?: string; details?: Record<string, unknown> };
}

export function itemError(err: unknown): ItemError {
  if (isThermoError(err)) {
    return {
      error: {
        code: err.code,
        message: err.message,
        ...(err.field !== undefined ? { field: err.field } : {}),
        ...(err.hint !== undefined ? { hint: err.hint } : {}),
        ...(err.details !== undefined ? { details: err.details } : {}),
      },
    };
  }
  // Unexpected failures never leak internals into an answer.
  return { error: { code: 'INTERNAL', message: 'The evaluation failed unexpectedly.' } };
}

export function validationError(error: z.ZodError): ItemError {
  const issue = error.issues[0];
  const path = issue ? issue.path.map(String) : [];
  // An unknown key is reported on the key itself, not on its parent object.
  if (issue?.code === 'unrecognized_keys' && issue.keys[0] !== undefined) path.push(issue.keys[0]);
  const field = path.join('.');
  return { error: { code: 'VALIDATION', message: issue ? `${field || 'request'}: ${issue.message}` : 'invalid request', field } };
}

export function runItem<S extends z.ZodType, R>(schema: S, run: (req: z.infer<S>) => R, item: unknown): R | ItemError {
  const parsed = schema.safeParse(item);
  if (!parsed.success) return validationError(parsed.error);
  try {
    return run(parsed.data);
  } catch (err) {
    return itemError(err);
  }
}
