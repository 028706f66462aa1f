import type { Role } from '../../auth/roles';
import type { Invitation } from '../../../db/models/invitation';

export type InvitationStatus = 'pending' | 'accepted' | 'expired' | 'revoked';

export interface InvitationDto {
  id: number;
  email: string;
  role: Role;
  status: InvitationStatus;
  expiresAt: string;
  createdAt: string;
}

export function invitationStatus(row: Invitation, now = new Date()): InvitationStatus {
  if (row.acceptedAt) return 'accepted';
  if (row.revokedAt) return 'revoked';
  if (row.expiresAt.getTime() <= now.getTime()) return 'expired';
  return 'pending';
}

export function toInvitationDto(row: Invitation): InvitationDto {
  return {
    id: row.id,
    email: row.email,
    role: row.role,
    status: invitationStatus(row),
    expiresAt: row.expiresAt.toISOString(),
    createdAt: row.createdAt.toISOString(),
  };
}
