import 'server-only';
import { getDb } from '../../../db';
import { AppError } from '../../api/errors';
import type { CreateFlagInput, FlagDto } from '../../schemas/flag';
import { recordEvent } from '../audit/record-event';
import { loadRouteContext, userNames } from '../comments/comment-context';
import { flagUserIds, toFlagDto } from './flag-dto';

// Marks one step of the route as weak, with a category and a reason.
export async function createFlag({ teamId, routeId, userId, input }: { teamId: number; routeId: number; userId: number; input: CreateFlagInput }): Promise<FlagDto> {
  const { sequelize, models } = getDb();
  const flag = await sequelize.transaction(async (transaction) => {
    const ctx = await loadRouteContext({ teamId, routeId, transaction });
    if (!ctx.fingerprints.has(input.stepKey)) throw new AppError('VALIDATION', `This route has no step "${input.stepKey}".`, { fields: { stepKey: 'No such step in this route.' } });
    const row = await models.StepFlag.create({ teamId, routeId, stepKey: input.stepKey, category: input.category, reason: input.reason, createdById: userId }, { transaction });
    await recordEvent({ teamId, actorId: userId, action: 'flag.created', targetType: 'step_flag', targetId: row.id, data: { routeId, stepKey: input.stepKey, category: input.category } }, transaction);
    return row;
  });
  return toFlagDto(flag, await userNames(flagUserIds([flag])));
}
