// Shared zod pieces for thermo requests: quantity strings and species-keyed maps.
import { z } from 'zod';

export const MAX_MAP_ENTRIES = 40;

/** "700 K", "2 bar"; units are checked by the engine, which names the field on failure. */
export const QuantityString = z.string().trim().min(1).max(64);

export const SpeciesName = z.string().trim().min(1).max(120);

export function speciesMap<T extends z.ZodType>(value: T) {
  return z
    .record(SpeciesName, value)
    .refine((m) => Object.keys(m).length <= MAX_MAP_ENTRIES, { message: `at most ${MAX_MAP_ENTRIES} species` });
}

export const PositiveFinite = z.number().finite().positive();
