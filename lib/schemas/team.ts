import { z } from 'zod';
import { ROLES } from '../auth/roles';

export const RoleSchema = z.enum(ROLES);

export const InviteInput = z.strictObject({
  email: z.string().trim().toLowerCase().max(254).pipe(z.email({ message: 'Enter a valid e-mail address.' })),
  role: RoleSchema,
});
export type InviteInput = z.infer<typeof InviteInput>;

export const ChangeRoleInput = z.strictObject({ role: RoleSchema });
export type ChangeRoleInput = z.infer<typeof ChangeRoleInput>;

export const TeamIdParam = z.coerce.number().int().positive();
