import 'server-only';
import { fn, col, Op, type Transaction } from 'sequelize';
import { getDb } from '../../../db';
import { AppError } from '../../api/errors';
import { forUpdate } from '../row-lock';
import { toDataSetDto, type DataSetDto } from './fit-dto';

const withUpdatedBy = () => [{ model: getDb().models.User, as: 'updatedBy', attributes: ['name'] }];

/** The team's data set row, or 404 (a foreign team's id looks exactly like a missing one). Inside a transaction the row is held for the write that follows. */
export async function findDataSetRow({ teamId, dataSetId, transaction }: { teamId: number; dataSetId: number; transaction?: Transaction }) {
  const { FitDataSet } = getDb().models;
  const options = transaction ? forUpdate(transaction, FitDataSet) : {};
  const row = await FitDataSet.findOne({ where: { id: dataSetId, teamId }, include: withUpdatedBy(), ...options });
  if (!row) throw new AppError('NOT_FOUND', 'No such data set.');
  return row;
}

async function fitCounts(ids: number[], transaction?: Transaction): Promise<Map<number, number>> {
  if (ids.length === 0) return new Map();
  const rows = (await getDb().models.Fit.findAll({
    attributes: ['dataSetId', [fn('COUNT', col('id')), 'n']],
    where: { dataSetId: { [Op.in]: ids } },
    group: ['dataSetId'],
    raw: true,
    transaction,
  })) as unknown as { dataSetId: number; n: number }[];
  return new Map(rows.map((r) => [r.dataSetId, Number(r.n)]));
}

export async function getDataSet({ teamId, dataSetId, transaction }: { teamId: number; dataSetId: number; transaction?: Transaction }): Promise<DataSetDto> {
  const row = await findDataSetRow({ teamId, dataSetId, transaction });
  return toDataSetDto(row, (await fitCounts([row.id], transaction)).get(row.id) ?? 0);
}

export async function listDataSets({ teamId }: { teamId: number }): Promise<DataSetDto[]> {
  const rows = await getDb().models.FitDataSet.findAll({ where: { teamId }, include: withUpdatedBy(), order: [['updatedAt', 'DESC'], ['id', 'DESC']], limit: 500 });
  const counts = await fitCounts(rows.map((r) => r.id));
  return rows.map((r) => toDataSetDto(r, counts.get(r.id) ?? 0));
}
