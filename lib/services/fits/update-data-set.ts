import 'server-only';
import { getDb } from '../../../db';
import { AppError } from '../../api/errors';
import { setErrors } from '../../fits/read-rows';
import type { DataSetUpdate, ExclusionsInput } from '../../schemas/fit-data';
import { recordEvent } from '../audit/record-event';
import { teamLookup } from '../species/team-lookup';
import { carryExclusions, checkLinkedEquation, pointsFromRows } from './data-set-input';
import { findDataSetRow, getDataSet } from './read-data-set';

// Edits name, reaction, units and rows; saved fits keep the data they were made from.
export async function updateDataSet({ teamId, userId, dataSetId, input }: { teamId: number; userId: number; dataSetId: number; input: DataSetUpdate }) {
  const fresh = pointsFromRows(input.rows, input.temperatureUnit, input.valueKind);
  checkLinkedEquation(input.equation, await teamLookup(teamId));
  const { sequelize } = getDb();
  return sequelize.transaction(async (transaction) => {
    const row = await findDataSetRow({ teamId, dataSetId, transaction });
    const points = carryExclusions(row.points, fresh);
    const problem = setErrors(points, input.temperatureUnit);
    if (problem.rows) throw new AppError('VALIDATION', problem.rows, { fields: problem });
    await row.update(
      { name: input.name, equation: input.equation, temperatureUnit: input.temperatureUnit, valueKind: input.valueKind, note: input.note, points, version: row.version + 1, updatedById: userId },
      { transaction },
    );
    await recordEvent({ teamId, actorId: userId, action: 'fit_data_set.updated', targetType: 'fit_data_set', targetId: row.id }, transaction);
    return getDataSet({ teamId, dataSetId, transaction });
  });
}

// Replaces the set of left-out points; each carries the reason it is left out.
export async function setExclusions({ teamId, userId, dataSetId, input }: { teamId: number; userId: number; dataSetId: number; input: ExclusionsInput }) {
  const { sequelize } = getDb();
  return sequelize.transaction(async (transaction) => {
    const row = await findDataSetRow({ teamId, dataSetId, transaction });
    const reasons = new Map<number, string>();
    for (const e of input.exclusions) {
      if (e.index >= row.points.length) {
        throw new AppError('VALIDATION', `There is no point ${e.index + 1}; the set has ${row.points.length}.`, { fields: { exclusions: 'Pick points of this data set.' } });
      }
      reasons.set(e.index, e.reason);
    }
    const points = row.points.map((p, i) => ({ ...p, excluded: reasons.has(i), reason: reasons.get(i) ?? null }));
    const problem = setErrors(points, row.temperatureUnit);
    if (problem.rows) throw new AppError('VALIDATION', problem.rows, { fields: { exclusions: problem.rows } });
    await row.update({ points, version: row.version + 1, updatedById: userId }, { transaction });
    await recordEvent({ teamId, actorId: userId, action: 'fit_data_set.exclusions', targetType: 'fit_data_set', targetId: row.id, data: { excluded: [...reasons.keys()] } }, transaction);
    return getDataSet({ teamId, dataSetId, transaction });
  });
}

export async function deleteDataSet({ teamId, userId, dataSetId }: { teamId: number; userId: number; dataSetId: number }) {
  const { sequelize, models } = getDb();
  return sequelize.transaction(async (transaction) => {
    const row = await findDataSetRow({ teamId, dataSetId, transaction });
    const fits = await models.Fit.count({ where: { dataSetId, teamId }, transaction });
    if (fits > 0) throw new AppError('CONFLICT', `This data set has ${fits} saved fit${fits === 1 ? '' : 's'}, which point back to it; it stays.`);
    await row.destroy({ transaction });
    await recordEvent({ teamId, actorId: userId, action: 'fit_data_set.deleted', targetType: 'fit_data_set', targetId: dataSetId }, transaction);
    return { deleted: dataSetId };
  });
}
