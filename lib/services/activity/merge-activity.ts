// The feed's one order and its keyset window. Pure: the sources query with `windowFor`, this merges their rows.
import type { ActivityItem, ActivityKind, ActivityPosition } from '../../schemas/activity';

/** One feed item with its place in the order: the time in ms and the row id of its own table. */
export interface ActivityEntry {
  item: ActivityItem;
  at: number;
  seq: number;
}

// Ties in time go to the later write first: a save writes its revision before its move, a clear writes its comment before the flag.
// Kinds that share a rank come from one table, so their row ids never collide.
export const KIND_RANK: Record<ActivityKind, number> = {
  revision: 1,
  transition: 2,
  comment: 3,
  flag_cleared: 4,
  flag_raised: 5,
  thread_resolved: 6,
  thread_reopened: 6,
};

const rankOfPosition = (p: ActivityPosition) => (p.kind === null ? 0 : KIND_RANK[p.kind]);

/** Newest first: later time, then higher rank, then higher row id. */
export function compareNewestFirst(a: ActivityEntry, b: ActivityEntry): number {
  return b.at - a.at || KIND_RANK[b.item.kind] - KIND_RANK[a.item.kind] || b.seq - a.seq;
}

/** True when the entry comes after the position in the newest-first order (is older than it). */
export function isOlderThan(entry: ActivityEntry, position: ActivityPosition): boolean {
  if (entry.at !== position.at) return entry.at < position.at;
  const rank = KIND_RANK[entry.item.kind];
  const cut = rankOfPosition(position);
  return rank !== cut ? rank < cut : entry.seq < position.seq;
}

/**
 * The rows of one table (all of one rank) that can follow the position, as a query condition:
 * up to and including its time, strictly before it, or at its time only below its row id.
 */
export type SourceWindow = { mode: 'atOrBefore'; at: Date } | { mode: 'before'; at: Date } | { mode: 'beforeOrTie'; at: Date; seq: number };

export function windowFor(rank: number, position: ActivityPosition | undefined): SourceWindow | null {
  if (!position) return null;
  const at = new Date(position.at);
  const cut = rankOfPosition(position);
  if (rank < cut) return { mode: 'atOrBefore', at };
  if (rank > cut) return { mode: 'before', at };
  return { mode: 'beforeOrTie', at, seq: position.seq };
}

export function positionOf(entry: ActivityEntry): { at: number; kind: ActivityKind; seq: number } {
  return { at: entry.at, kind: entry.item.kind, seq: entry.seq };
}

/**
 * Merges the sources into one newest-first page. Each source must hold at least its newest
 * `limit + 1` entries past the position (or all it has), so the page and `hasMore` are exact.
 */
export function mergeActivity(sources: ActivityEntry[][], { before, limit }: { before?: ActivityPosition; limit: number }): { page: ActivityEntry[]; last: ActivityEntry | null; hasMore: boolean } {
  const all = sources.flat().filter((e) => !before || isOlderThan(e, before));
  all.sort(compareNewestFirst);
  const page = all.slice(0, limit);
  return { page, last: page.at(-1) ?? null, hasMore: all.length > limit };
}
