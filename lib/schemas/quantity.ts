// Shared zod pieces for thermo requests: quantity strings and species-keyed maps.
import { z } from 'zod';

export const MAX_MAP_ENTRIES = 40;

/** "700 K", "2 bar"; units are checked by the engine, which names the field on failure. */
export const QuantityString = z.string().trim().min(1).max(64);

export const SpeciesName = z.string().trim().min(1).max(120);

// Names that are properties of every JavaScript object: as a map key they would be dropped or change the object's
// prototype instead of being read, so a key the user typed could silently vanish.
export const RESERVED_KEYS: ReadonlySet<string> = new Set(['__proto__', 'constructor', 'prototype']);

export function isReservedKey(key: string): boolean {
  return RESERVED_KEYS.has(key);
}

/** z.record that refuses reserved keys by name, checked on the raw input before the record is rebuilt. */
export function safeRecord<K extends z.ZodType<string, string>, V extends z.ZodType>(key: K, value: V) {
  return z
    .unknown()
    .superRefine((raw, ctx) => {
      if (raw === null || typeof raw !== 'object' || Array.isArray(raw)) return;
      for (const k of Object.keys(raw)) {
        if (isReservedKey(k)) ctx.addIssue({ code: 'custom', path: [k], message: `"${k}" cannot be used as a name here.` });
      }
    })
    .pipe(z.record(key, value));
}

export function speciesMap<T extends z.ZodType>(value: T) {
  return safeRecord(SpeciesName, value).refine((m) => Object.keys(m).length <= MAX_MAP_ENTRIES, { message: `at most ${MAX_MAP_ENTRIES} species` });
}

export const PositiveFinite = z.number().finite().positive();
