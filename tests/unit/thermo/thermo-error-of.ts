// Test helper: runs fn, insists it throws a ThermoError, and returns it for field/code checks.
import { expect } from 'vitest';
import { ThermoError } from '@/lib/thermo/errors';

export function thermoErrorOf(fn: () => unknown): ThermoError {
  let caught: unknown;
  try {
    fn();
  } catch (err) {
    caught = err;
  }
  expect(caught, 'expected a ThermoError to be thrown').toBeInstanceOf(ThermoError);
  return caught as ThermoError;
}
