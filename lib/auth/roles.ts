export const ROLES = ['reviewer', 'designer', 'lead'] as const;
export type Role = (typeof ROLES)[number];

export const ROLE_LABELS: Record<Role, string> = {
  lead: 'Group lead',
  designer: 'Route designer',
  reviewer: 'Reviewer',
};
