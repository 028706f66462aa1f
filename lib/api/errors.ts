export const ERROR_STATUS = {
  VALIDATION: 400,
  BAD_REQUEST: 400,
  UNAUTHENTICATED: 401,
  FORBIDDEN: 403,
  NOT_FOUND: 404,
  METHOD_NOT_ALLOWED: 405,
  CONFLICT: 409,
  GONE: 410,
  PAYLOAD_TOO_LARGE: 413,
  UNSUPPORTED_MEDIA_TYPE: 415,
  UNPROCESSABLE: 422,
  RATE_LIMITED: 429,
  INTERNAL: 500,
  UNAVAILABLE: 503,
} as const;

export type ErrorCode = keyof typeof ERROR_STATUS;

export interface ErrorBody {
  error: { code: string; message: string; fields?: Record<string, string>; details?: Record<string, unknown> };
}

export class AppError extends Error {
  readonly code: ErrorCode;
  readonly fields?: Record<string, string>;
  readonly headers?: Record<string, string>;
  readonly details?: Record<string, unknown>;

  constructor(
    code: ErrorCode,
    message: string,
    opts: { fields?: Record<string, string>; headers?: Record<string, string>; details?: Record<string, unknown> } = {},
  ) {
    super(message);
    this.name = 'AppError';
    this.code = code;
    this.fields = opts.fields;
    this.headers = opts.headers;
    this.details = opts.details;
  }

  get status(): number {
    return ERROR_STATUS[this.code];
  }
}

export function errorBody(code: string, message: string, fields?: Record<string, string>, details?: Record<string, unknown>): ErrorBody {
  const error: ErrorBody['error'] = { code, message };
  if (fields && Object.keys(fields).length > 0) error.fields = fields;
  if (details) error.details = details;
  return { error };
}
