// The one table of review moves: from which status to which, and the permission (hence roles) each needs. Pure.
import { can, type Permission } from '../../auth/permissions';
import type { Role } from '../../auth/roles';
import { ROUTE_STATUSES, type RouteStatus } from '../../schemas/workflow';

export interface TransitionRule {
  from: RouteStatus;
  to: RouteStatus;
  permission: Permission;
}

const SHELVABLE: RouteStatus[] = ['draft', 'in_review', 'changes_requested', 'approved'];

export const TRANSITIONS: readonly TransitionRule[] = [
  { from: 'draft', to: 'in_review', permission: 'route.edit' },
  { from: 'changes_requested', to: 'in_review', permission: 'route.edit' },
  { from: 'in_review', to: 'changes_requested', permission: 'route.review' },
  { from: 'in_review', to: 'approved', permission: 'route.decide' },
  ...SHELVABLE.map((from) => ({ from, to: 'shelved' as const, permission: 'route.decide' as const })),
  { from: 'shelved', to: 'draft', permission: 'route.decide' },
];

export function isRouteStatus(value: string): value is RouteStatus {
  return (ROUTE_STATUSES as readonly string[]).includes(value);
}

export function findRule(from: string, to: string): TransitionRule | undefined {
  return TRANSITIONS.find((t) => t.from === from && t.to === to);
}

/** The moves a role may make from a status; the UI offers exactly these. */
export function allowedMoves(from: string, role: Role): RouteStatus[] {
  return TRANSITIONS.filter((t) => t.from === from && can(role, t.permission)).map((t) => t.to);
}

/** Every move out of a status, whoever may make it. */
export function movesFrom(from: string): RouteStatus[] {
  return TRANSITIONS.filter((t) => t.from === from).map((t) => t.to);
}
