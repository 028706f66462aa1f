export type ThermoErrorCode =
  | 'PARSE_ERROR'
  | 'UNKNOWN_SPECIES'
  | 'UNBALANCED'
  | 'NO_BALANCE'
  | 'AMBIGUOUS_BALANCE'
  | 'INVALID_UNIT'
  | 'INVALID_VALUE'
  | 'OUT_OF_RANGE'
  | 'ZERO_ACTIVITY'
  | 'MISSING_DATA'
  | 'INVALID_STRUCTURE'
  | 'UNSUPPORTED_STRUCTURE'
  | 'AMBIGUOUS_NAME';

export interface ThermoErrorOptions {
  field?: string;
  position?: number;
  hint?: string;
  details?: Record<string, unknown>;
}

/** The one error type the engine throws, so callers can map `code` to a user message or HTTP status. */
export class ThermoError extends Error {
  readonly code: ThermoErrorCode;
  readonly field?: string;
  readonly position?: number;
  readonly hint?: string;
  readonly details?: Record<string, unknown>;

  constructor(code: ThermoErrorCode, message: string, opts: ThermoErrorOptions = {}) {
    super(message);
    this.name = 'ThermoError';
    this.code = code;
    // Assigned only when given so that `'hint' in err` and JSON output stay clean.
    if (opts.field !== undefined) this.field = opts.field;
    if (opts.position !== undefined) this.position = opts.position;
    if (opts.hint !== undefined) this.hint = opts.hint;
    if (opts.details !== undefined) this.details = opts.details;
  }
}

export function isThermoError(value: unknown): value is ThermoError {
  return value instanceof ThermoError;
}

/** Shorthand for the parse errors that every notation path raises. */
export function parseError(message: string, position: number, hint: string): ThermoError {
  return new ThermoError('PARSE_ERROR', message, { position, hint });
}
