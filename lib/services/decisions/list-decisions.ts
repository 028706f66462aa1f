import 'server-only';
import { Op, type Transaction } from 'sequelize';
import { getDb } from '../../../db';
import type { Decision } from '../../../db/models/decision';
import { AppError } from '../../api/errors';
import type { ListDecisionsQuery } from '../../schemas/decision';
import { toDecisionDetail, toDecisionSummary, type DecisionDetailDto, type DecisionListDto, type RouteNames } from './decision-dto';

async function routeNames(teamId: number, rows: Decision[], transaction?: Transaction): Promise<RouteNames> {
  const ids = [...new Set(rows.flatMap((r) => r.routeIds))];
  if (ids.length === 0) return new Map();
  const routes = await getDb().models.Route.findAll({ where: { id: { [Op.in]: ids }, teamId }, attributes: ['id', 'name', 'deletedAt'], transaction });
  return new Map(routes.map((r) => [r.id, { name: r.name, deleted: r.deletedAt !== null }]));
}

const authorName = (row: Decision) => (row.get('author') as { name: string } | null)?.name ?? null;

/** The team's decision log, newest first. */
export async function listDecisions({ teamId, query }: { teamId: number; query: ListDecisionsQuery }): Promise<DecisionListDto> {
  const { Decision, User } = getDb().models;
  const { rows, count } = await Decision.findAndCountAll({
    where: { teamId },
    order: [['id', 'DESC']],
    limit: query.pageSize,
    offset: (query.page - 1) * query.pageSize,
    include: [{ model: User, as: 'author', attributes: ['name'] }],
  });
  const names = await routeNames(teamId, rows);
  return { items: rows.map((r) => toDecisionSummary(r, names, authorName(r))), total: count, page: query.page, pageSize: query.pageSize };
}

/** One decision of the team with its snapshot; another team's id is 404 like a missing one. */
export async function getDecision({ teamId, decisionId, transaction }: { teamId: number; decisionId: number; transaction?: Transaction }): Promise<DecisionDetailDto> {
  const { Decision, User } = getDb().models;
  const row = Number.isInteger(decisionId) && decisionId > 0
    ? await Decision.findOne({ where: { id: decisionId, teamId }, include: [{ model: User, as: 'author', attributes: ['name'] }], transaction })
    : null;
  if (!row) throw new AppError('NOT_FOUND', 'No such decision.');
  return toDecisionDetail(row, await routeNames(teamId, [row], transaction), authorName(row));
}
