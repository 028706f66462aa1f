// Labels the steps' species maps define, offered to the route's target and links. On the board a link carries the
// species as written in the equations ("AcPPD"), and a saved route has no route-level map, so without this a link
// between labelled species could not be read and a labelled product could not be the target.
import type { RouteStep } from '../../schemas/route-evaluate';
import { isThermoError } from '../errors';
import type { SpeciesLookup } from '../species-library';
import { isStructureLookup, type SpeciesDefinition } from '../structure/structure-lookup-type';

/**
 * Labels every step that defines them defines alike (the same definition, field for field). A label two steps
 * bind to different species is left out: the target or link naming it stays unreadable and says so.
 */
export function sharedStepLabels(steps: readonly Pick<RouteStep, 'species'>[]): Map<string, SpeciesDefinition> {
  const seen = new Map<string, { def: SpeciesDefinition; text: string } | null>();
  for (const step of steps) {
    for (const [label, def] of Object.entries(step.species ?? {})) {
      const key = label.trim();
      const text = JSON.stringify(Object.entries(def).sort(([a], [b]) => a.localeCompare(b)));
      const before = seen.get(key);
      if (before === undefined) seen.set(key, { def, text });
      else if (before !== null && before.text !== text) seen.set(key, null);
    }
  }
  const out = new Map<string, SpeciesDefinition>();
  for (const [label, entry] of seen) if (entry) out.set(label, entry.def);
  return out;
}

/**
 * `lookup` with the steps' shared labels under it, for the target and links only (each step keeps its own map).
 * A definition that fails is skipped here: its step reports the error where it belongs.
 */
export function withStepLabels(lookup: SpeciesLookup, steps: readonly Pick<RouteStep, 'species'>[]): SpeciesLookup {
  if (!isStructureLookup(lookup)) return lookup;
  let out: SpeciesLookup = lookup;
  for (const [label, def] of sharedStepLabels(steps)) {
    // A label the route's own map defines keeps that meaning.
    if (out.resolveLabel?.(label) !== undefined) continue;
    try {
      out = (out as typeof lookup).withLabels({ [label]: def }, 'steps');
    } catch (err) {
      if (!isThermoError(err)) throw err;
    }
  }
  return out;
}
