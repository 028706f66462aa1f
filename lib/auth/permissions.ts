import type { Role } from './roles';

// The one role table. Handlers, server actions and UI controls all ask `can(role, permission)`.
export const PERMISSIONS = {
  'team.read': ['reviewer', 'designer', 'lead'],
  'team.manage': ['lead'],
  'thermo.evaluate': ['reviewer', 'designer', 'lead'],
  'route.read': ['reviewer', 'designer', 'lead'],
  'route.edit': ['designer', 'lead'],
  'route.comment': ['reviewer', 'designer', 'lead'],
  'route.flag': ['reviewer', 'designer', 'lead'],
  'route.decide': ['lead'],
  'route.review': ['reviewer', 'lead'],
  'route.delete': ['designer', 'lead'],
  'species.edit': ['designer', 'lead'],
  'fit.edit': ['designer', 'lead'],
} as const satisfies Record<string, readonly Role[]>;

export type Permission = keyof typeof PERMISSIONS;

export function can(role: Role | null | undefined, permission: Permission): boolean {
  if (!role) return false;
  return (PERMISSIONS[permission] as readonly Role[]).includes(role);
}
