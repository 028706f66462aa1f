import 'server-only';
import type { Transaction } from 'sequelize';
import { getDb } from '../../../db';
import { AppError } from '../../api/errors';
import { forUpdate } from '../row-lock';
import { invitationStatus, type InvitationStatus } from './invitation-dto';
import { hashInvitationToken } from './token';

export interface InvitationView {
  status: InvitationStatus;
  email: string;
  role: string;
  teamName: string;
  hasAccount: boolean;
}

// Read inside a transaction only to accept it, so the row is held: one link, one acceptance.
export async function findInvitationRow({ token, transaction }: { token: string; transaction?: Transaction }) {
  const options = transaction ? forUpdate(transaction) : {};
  const row = await getDb().models.Invitation.findOne({ where: { tokenHash: hashInvitationToken(token) }, ...options });
  if (!row) throw new AppError('NOT_FOUND', 'This invitation link is not valid. Ask your team lead for a new one.');
  return row;
}

export async function viewInvitation({ token }: { token: string }): Promise<InvitationView> {
  const { Team, User } = getDb().models;
  const row = await findInvitationRow({ token });
  const [team, user] = await Promise.all([Team.findByPk(row.teamId), User.findOne({ where: { email: row.email } })]);
  return { status: invitationStatus(row), email: row.email, role: row.role, teamName: team?.name ?? 'a team', hasAccount: Boolean(user) };
}

export const STATUS_MESSAGES: Record<Exclude<InvitationStatus, 'pending'>, string> = {
  accepted: 'This invitation has already been used. Sign in to reach your team.',
  expired: 'This invitation has expired (links last 7 days). Ask your team lead to send a new one.',
  revoked: 'This invitation was withdrawn or replaced by a newer one. Ask your team lead for a new link.',
};
