import type { RouteRevision } from '../../../db/models/route-revision';
import { readableSummary } from './revision-labels';
import type { RevisionState, RouteSnapshot } from './revision-snapshot';

export interface RevisionSummaryDto {
  id: number;
  routeId: number;
  version: number;
  summary: string;
  author: { id: number | null; name: string };
  overallDeltaG_kJ: number | null;
  restoredFromId: number | null;
  createdAt: string;
}

export interface RevisionDto extends RevisionSummaryDto {
  snapshot: RouteSnapshot;
  /** ΔG per mol of reaction as written, by step key */
  stepDeltaG: Record<string, number | null>;
}

// The author's name comes from an `author` include, or is passed in when the row was just written.
// `summary` is the stored one made readable (revision-labels.ts) when the caller has done so.
export function toRevisionSummary(row: RouteRevision, authorName?: string, summary?: string): RevisionSummaryDto {
  return {
    id: row.id,
    routeId: row.routeId,
    version: row.version,
    summary: summary ?? row.summary,
    author: { id: row.authorId, name: authorName ?? (row.get('author') as { name: string } | null | undefined)?.name ?? '—' },
    overallDeltaG_kJ: row.overallDgKj,
    restoredFromId: row.restoredFromId,
    createdAt: row.createdAt.toISOString(),
  };
}

export function toRevisionState(row: RouteRevision): RevisionState {
  return { snapshot: JSON.parse(row.snapshot) as RouteSnapshot, stepDeltaG: row.stepDg ?? {}, overallDeltaG_kJ: row.overallDgKj };
}

export function toRevision(row: RouteRevision): RevisionDto {
  const state = toRevisionState(row);
  return { ...toRevisionSummary(row, undefined, readableSummary(row.summary, state.snapshot)), snapshot: state.snapshot, stepDeltaG: state.stepDeltaG };
}
