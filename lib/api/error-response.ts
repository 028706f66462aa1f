import { NextResponse } from 'next/server';
import type { z } from 'zod';
import { ThermoError } from '../thermo/errors';
import { isRouteTooLargeError } from '../thermo/route/route-errors';
import { isDatabaseUnavailable } from './database-unavailable';
import { AppError, errorBody } from './errors';
import { isUniqueClash, isWriteCollision } from './write-collision';

export function zodFields(error: z.ZodError): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of error.issues) {
    const key = issue.path.length ? issue.path.map(String).join('.') : '_';
    fields[key] ??= issue.message;
  }
  return fields;
}

// The one place an exception becomes an HTTP answer; a 500 never carries a stack.
export function toErrorResponse(error: unknown): Response {
  if (error instanceof AppError) {
    return NextResponse.json(errorBody(error.code, error.message, error.fields, error.details), { status: error.status, headers: error.headers });
  }
  if (isRouteTooLargeError(error)) return NextResponse.json(errorBody('PAYLOAD_TOO_LARGE', error.message), { status: 413 });
  if (error instanceof ThermoError) {
    const fields = error.field ? { [error.field]: error.message } : undefined;
    // Choices for an ambiguous name, and the atoms a structure left uncovered, are for the caller to show.
    const details = error.code === 'AMBIGUOUS_NAME' || error.code === 'UNSUPPORTED_STRUCTURE' ? error.details : undefined;
    return NextResponse.json(errorBody(error.code, error.message, fields, details), { status: 400 });
  }
  // Two requests creating the same thing at once: the unique index refused the later one, nothing was written.
  // A PostgreSQL deadlock or serialization failure likewise rolled one transaction back whole.
  if (isUniqueClash(error) || isWriteCollision(error)) {
    return NextResponse.json(errorBody('CONFLICT', 'Someone else saved the same record at the same moment. Reload and try again.'), { status: 409 });
  }
  if (isDatabaseUnavailable(error)) {
    console.error('[stepwell] database unavailable:', error instanceof Error ? error.message : error);
    const message = 'The database could not be reached just now. Try again in a moment.';
    return NextResponse.json(errorBody('UNAVAILABLE', message), { status: 503, headers: { 'Retry-After': '2' } });
  }
  console.error('[stepwell] unhandled error in route handler:', error);
  return NextResponse.json(errorBody('INTERNAL', 'Something went wrong on our side. Try again.'), { status: 500 });
}
