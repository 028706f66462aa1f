import 'server-only';
import { getDb } from '../../../db';
import { toInvitationDto } from './invitation-dto';

export async function listInvitations({ teamId }: { teamId: number }) {
  const rows = await getDb().models.Invitation.findAll({ where: { teamId }, order: [['created_at', 'DESC']], limit: 200 });
  return rows.map(toInvitationDto);
}
