import 'server-only';
import type { Transaction } from 'sequelize';
import { getDb } from '../../../db';

export async function recordEvent(
  event: { teamId: number | null; actorId: number | null; action: string; targetType?: string; targetId?: string | number; data?: Record<string, unknown> },
  transaction?: Transaction,
): Promise<void> {
  const { AuditEvent } = getDb().models;
  await AuditEvent.create(
    {
      teamId: event.teamId,
      actorId: event.actorId,
      action: event.action,
      targetType: event.targetType ?? null,
      targetId: event.targetId === undefined ? null : String(event.targetId),
      data: event.data ?? null,
    },
    { transaction },
  );
}
