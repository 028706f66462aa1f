import 'server-only';
import { getDb } from '../../../db';
import type { FlagListDto, ListFlagsQuery } from '../../schemas/flag';
import { userNames } from '../comments/comment-context';
import { findRouteRow } from '../routes/get-route';
import { flagUserIds, toFlagDto } from './flag-dto';

/** The route's open flags (or all of them), newest first, with open counts per step. */
export async function listFlags({ teamId, routeId, query }: { teamId: number; routeId: number; query: ListFlagsQuery }): Promise<FlagListDto> {
  await findRouteRow({ teamId, routeId });
  const rows = await getDb().models.StepFlag.findAll({
    where: { routeId, teamId, ...(query.state === 'open' ? { clearedAt: null } : {}) },
    order: [['id', 'DESC']],
  });
  const names = await userNames(flagUserIds(rows));
  const openByStep: Record<string, number> = {};
  for (const f of rows) if (f.clearedAt == null) openByStep[f.stepKey] = (openByStep[f.stepKey] ?? 0) + 1;
  return { flags: rows.map((f) => toFlagDto(f, names)), openByStep };
}
