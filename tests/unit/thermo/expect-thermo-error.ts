import { expect } from 'vitest';
import { ThermoError, type ThermoErrorCode } from '@/lib/thermo/errors';

/** Runs `fn`, insists it throws a ThermoError with this code (and position), and that the hint says something. */
export function expectThermoError(fn: () => unknown, code: ThermoErrorCode, position?: number): ThermoError {
  let caught: unknown;
  try {
    fn();
  } catch (err) {
    caught = err;
  }
  expect(caught, 'expected a ThermoError to be thrown').toBeInstanceOf(ThermoError);
  const err = caught as ThermoError;
  expect(err.code).toBe(code);
  if (position !== undefined) expect(err.position).toBe(position);
  expect(err.hint ?? '').not.toBe('');
  expect(err.message.length).toBeGreaterThan(10);
  return err;
}
