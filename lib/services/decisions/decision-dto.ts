import type { Decision } from '../../../db/models/decision';
import type { ComparisonSnapshot } from '../../compare/compare-types';

export interface DecisionRouteRef {
  id: number;
  name: string;
  /** the route has since been deleted (its name is the one it had then) */
  deleted: boolean;
}

export interface DecisionSummaryDto {
  id: number;
  createdAt: string;
  routes: DecisionRouteRef[];
  chosen: DecisionRouteRef | null;
  rationale: string;
  author: { id: number; name: string } | null;
  supersededById: number | null;
  shelvedRouteIds: number[];
}

export interface DecisionDetailDto extends DecisionSummaryDto {
  snapshot: ComparisonSnapshot;
}

export interface DecisionListDto {
  items: DecisionSummaryDto[];
  total: number;
  page: number;
  pageSize: number;
}

/** Current names by route id (deleted ones marked); a route missing here falls back to its name in the snapshot. */
export type RouteNames = Map<number, { name: string; deleted: boolean }>;

function refOf(id: number, names: RouteNames, snapshot: ComparisonSnapshot): DecisionRouteRef {
  const current = names.get(id);
  if (current) return { id, ...current };
  return { id, name: snapshot.routes.find((r) => r.id === id)?.name ?? `Route ${id}`, deleted: true };
}

export function toDecisionSummary(row: Decision, names: RouteNames, authorName: string | null): DecisionSummaryDto {
  const snapshot = row.snapshot;
  return {
    id: row.id,
    createdAt: row.createdAt.toISOString(),
    routes: row.routeIds.map((id) => refOf(id, names, snapshot)),
    chosen: row.chosenRouteId === null ? null : refOf(row.chosenRouteId, names, snapshot),
    rationale: row.rationale,
    author: row.authorId !== null && authorName !== null ? { id: row.authorId, name: authorName } : null,
    supersededById: row.supersededById ?? null,
    shelvedRouteIds: row.shelvedRouteIds,
  };
}

export function toDecisionDetail(row: Decision, names: RouteNames, authorName: string | null): DecisionDetailDto {
  return { ...toDecisionSummary(row, names, authorName), snapshot: row.snapshot };
}
