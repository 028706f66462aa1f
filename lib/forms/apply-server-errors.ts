import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { ApiError } from '../queries/api-fetch';

// Puts the server's field errors next to their inputs; returns the message for the form banner, or null.
export function applyServerErrors<T extends FieldValues>(error: unknown, setError: UseFormSetError<T>, known: ReadonlyArray<Path<T>>): string | null {
  if (!(error instanceof ApiError)) return 'Something went wrong. Try again.';
  let placed = false;
  for (const [field, message] of Object.entries(error.fields ?? {})) {
    const name = known.find((k) => k === field);
    if (name) {
      setError(name, { type: 'server', message });
      placed = true;
    }
  }
  return placed ? null : error.message;
}
