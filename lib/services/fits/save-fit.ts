import 'server-only';
import { getDb } from '../../../db';
import { analyseFit } from '../../fits/analyse-fit';
import type { SaveFitInput } from '../../schemas/fit-data';
import { recordEvent } from '../audit/record-event';
import { toFitDetail } from './fit-dto';
import { findDataSetRow } from './read-data-set';

// Fits the data set's included points and stores the result with a copy of the raw data, exclusions and reasons included.
export async function saveFit({ teamId, userId, input }: { teamId: number; userId: number; input: SaveFitInput }) {
  const { sequelize, models } = getDb();
  return sequelize.transaction(async (transaction) => {
    const set = await findDataSetRow({ teamId, dataSetId: input.dataSetId, transaction });
    const { result } = analyseFit({ points: set.points, temperatureUnit: set.temperatureUnit, valueKind: set.valueKind });
    const row = await models.Fit.create(
      {
        teamId, dataSetId: set.id, name: input.name, equation: set.equation,
        rawData: { dataSetName: set.name, temperatureUnit: set.temperatureUnit, valueKind: set.valueKind, note: set.note, points: set.points },
        result, deltaH0Kj: result.deltaH0_kJ, deltaS0JPerK: result.deltaS0_J_per_K, createdById: userId,
      },
      { transaction },
    );
    await recordEvent({ teamId, actorId: userId, action: 'fit.saved', targetType: 'fit', targetId: row.id, data: { dataSetId: set.id } }, transaction);
    const saved = await models.Fit.findByPk(row.id, { include: [{ model: models.User, as: 'createdBy', attributes: ['name'] }], transaction });
    return toFitDetail(saved!);
  });
}
