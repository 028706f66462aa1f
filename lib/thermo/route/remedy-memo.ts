// Remedies of one step depend only on its request, its goal and the drivers, so an editor that
// re-evaluates a route after each edit recomputes the remedies of the changed steps alone.
import { BoundedMemo } from '../bounded-memo';
import type { SpeciesLookup } from '../species-library';
import type { PreparedDriver } from './drivers';
import type { Remedy } from './route-types';

export interface RemedyEntry {
  remedies: Remedy[];
  /** driver failures met while computing them, replayed into the route's warnings on a hit */
  failed: Array<[string, string]>;
}

const MEMO_CAPACITY = 2000;
const memos = new WeakMap<SpeciesLookup, BoundedMemo<string, RemedyEntry>>();

export function driversKey(drivers: readonly PreparedDriver[]): string {
  return drivers.map((d) => `${d.driver.id}=${d.driver.equation}`).join('\n');
}

export function remedyMemo(lookup: SpeciesLookup): BoundedMemo<string, RemedyEntry> {
  let memo = memos.get(lookup);
  if (!memo) {
    memo = new BoundedMemo(MEMO_CAPACITY);
    memos.set(lookup, memo);
  }
  return memo;
}

export function remedyKey(request: unknown, goal_kJ: number | string, drivers: string): string {
  return `${goal_kJ}|${JSON.stringify(request)}|${drivers}`;
}
