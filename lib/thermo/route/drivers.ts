// Driver reactions for coupling remedies: the seed list, and each driver parsed once per route.
import driversJson from '../data/driver-reactions.json';
import type { SpeciesLookup } from '../species-library';
import type { DriverReaction, RouteWarning } from './route-types';
import { readStoichiometry, type Stoichiometry } from './stoichiometry';

function checkDriver(value: unknown, i: number): DriverReaction {
  const d = value as Partial<Record<keyof DriverReaction, unknown>>;
  for (const field of ['id', 'name', 'equation', 'basis'] as const) {
    if (typeof d[field] !== 'string' || d[field] === '') throw new Error(`driver-reactions.json[${i}].${field} must be a non-empty string`);
  }
  return { id: d.id as string, name: d.name as string, equation: d.equation as string, basis: d.basis as string };
}

/** Strongly downhill reactions common in practice; their ΔG° comes from the library when used. */
export const DEFAULT_DRIVERS: readonly DriverReaction[] = Object.freeze((driversJson as unknown[]).map(checkDriver));

export interface PreparedDriver {
  driver: DriverReaction;
  nu: Stoichiometry;
}

export function prepareDrivers(drivers: readonly DriverReaction[], lookup: SpeciesLookup): { prepared: PreparedDriver[]; warnings: RouteWarning[] } {
  const prepared: PreparedDriver[] = [];
  const warnings: RouteWarning[] = [];
  for (const driver of drivers) {
    const { nu, error } = readStoichiometry(driver.equation, lookup);
    if (nu) prepared.push({ driver, nu });
    else warnings.push({ code: 'DRIVER_INVALID', message: `Driver ${driver.id}: ${error?.message ?? 'unreadable'}; not used`, steps: [] });
  }
  return { prepared, warnings };
}
