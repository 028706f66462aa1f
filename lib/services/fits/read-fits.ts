import 'server-only';
import { Op, type Transaction } from 'sequelize';
import { getDb } from '../../../db';
import { AppError } from '../../api/errors';
import { analyseFit, type FitAnalysis } from '../../fits/analyse-fit';
import { toFitDetail, toFitSummary, type FitDetailDto, type FitSummaryDto } from './fit-dto';

const withCreatedBy = () => [{ model: getDb().models.User, as: 'createdBy', attributes: ['name'] }];

export async function findFitRow({ teamId, fitId, transaction }: { teamId: number; fitId: number; transaction?: Transaction }) {
  const row = await getDb().models.Fit.findOne({ where: { id: fitId, teamId }, include: withCreatedBy(), transaction });
  if (!row) throw new AppError('NOT_FOUND', 'No such fit.');
  return row;
}

export async function listFits({ teamId }: { teamId: number }): Promise<FitSummaryDto[]> {
  const rows = await getDb().models.Fit.findAll({ where: { teamId }, include: withCreatedBy(), order: [['id', 'DESC']], limit: 500 });
  return rows.map(toFitSummary);
}

/** A saved fit with its raw data and the plot recomputed from that data (the stored result is what steps use). */
export async function getFit({ teamId, fitId }: { teamId: number; fitId: number }): Promise<FitDetailDto & { analysis: FitAnalysis }> {
  const row = await findFitRow({ teamId, fitId });
  const { points, temperatureUnit, valueKind } = row.rawData;
  return { ...toFitDetail(row), analysis: analyseFit({ points, temperatureUnit, valueKind }) };
}

/** Fits by id, only the team's; the caller decides what a missing id means. */
export async function fitsByIds({ teamId, ids, transaction }: { teamId: number; ids: number[]; transaction?: Transaction }) {
  if (ids.length === 0) return new Map<number, Awaited<ReturnType<typeof findFitRow>>>();
  const rows = await getDb().models.Fit.findAll({ where: { teamId, id: { [Op.in]: ids } }, transaction });
  return new Map(rows.map((r) => [r.id, r]));
}
