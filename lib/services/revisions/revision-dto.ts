import type { RouteRevision } from '../../../db/models/route-revision';
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
export function toRevisionSummary(row: RouteRevision, authorName?: string): RevisionSummaryDto {
  return {
    id: row.id,
    routeId: row.routeId,
    version: row.version,
    summary: row.summary,
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
  return { ...toRevisionSummary(row), snapshot: state.snapshot, stepDeltaG: state.stepDeltaG };
}
