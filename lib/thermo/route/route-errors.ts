// Route limits and the one error the API maps to 413 rather than 400.
import { ThermoError } from '../errors';

export { MAX_ROUTE_LINKS, MAX_ROUTE_STEPS } from './route-limits';

/** A ThermoError (code OUT_OF_RANGE, details.tooLarge) so callers that only know ThermoError still answer 400. */
export class RouteTooLargeError extends ThermoError {
  constructor(what: 'steps' | 'links', count: number, limit: number) {
    super('OUT_OF_RANGE', `A route may have at most ${limit} ${what}; this one has ${count}`, {
      field: what,
      hint: 'split the route into parts and evaluate them separately',
      details: { tooLarge: true, limit, count },
    });
    this.name = 'RouteTooLargeError';
  }
}

export function isRouteTooLargeError(value: unknown): value is RouteTooLargeError {
  return value instanceof RouteTooLargeError;
}

export function routeError(message: string, field: string, hint: string, details?: Record<string, unknown>): ThermoError {
  return new ThermoError('INVALID_VALUE', message, { field, hint, ...(details ? { details } : {}) });
}
