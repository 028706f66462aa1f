import 'server-only';
import { getDb } from '../../../db';

// The team owning /api/decisions/[decisionId]; withRoute checks the caller's membership in it.
export async function teamOfDecision(params: Record<string, string>): Promise<number | null> {
  const id = Number(params.decisionId);
  if (!Number.isInteger(id) || id <= 0) return null;
  const row = await getDb().models.Decision.findByPk(id, { attributes: ['teamId'] });
  return row?.teamId ?? null;
}
