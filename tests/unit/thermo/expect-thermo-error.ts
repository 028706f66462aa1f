import { expect } from 'vitest';
import type { ThermoError, ThermoErrorCode } from '@/lib/thermo/errors';
import { thermoErrorOf } from './thermo-error-of';

/** Runs `fn`, insists it throws a ThermoError with this code (and position), and that the hint says something. */
export function expectThermoError(fn: () => unknown, code: ThermoErrorCode, position?: number): ThermoError {
  const err = thermoErrorOf(fn);
  expect(err.code).toBe(code);
  if (position !== undefined) expect(err.position).toBe(position);
  expect(err.hint ?? '').not.toBe('');
  expect(err.message.length).toBeGreaterThan(10);
  return err;
}
