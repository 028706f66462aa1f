import 'server-only';
import { getDb } from '../../../db';
import type { DataSetInput } from '../../schemas/fit-data';
import { recordEvent } from '../audit/record-event';
import { teamLookup } from '../species/team-lookup';
import { checkLinkedEquation, pointsFromRows, rowsFromText } from './data-set-input';
import { getDataSet } from './read-data-set';

// A data set from an uploaded CSV, pasted text or the typed grid; any bad cell refuses the whole set (nothing stored).
export async function createDataSet({ teamId, userId, input }: { teamId: number; userId: number; input: DataSetInput }) {
  const rows = input.source === 'grid' ? input.rows! : rowsFromText(input.text!);
  const points = pointsFromRows(rows, input.temperatureUnit, input.valueKind);
  checkLinkedEquation(input.equation, await teamLookup(teamId));
  const { sequelize, models } = getDb();
  return sequelize.transaction(async (transaction) => {
    const row = await models.FitDataSet.create(
      {
        teamId, name: input.name, equation: input.equation, temperatureUnit: input.temperatureUnit, valueKind: input.valueKind,
        source: input.source, note: input.note, points, createdById: userId, updatedById: userId,
      },
      { transaction },
    );
    await recordEvent({ teamId, actorId: userId, action: 'fit_data_set.created', targetType: 'fit_data_set', targetId: row.id, data: { points: points.length } }, transaction);
    return getDataSet({ teamId, dataSetId: row.id, transaction });
  });
}
