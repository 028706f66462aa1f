import 'server-only';
import { analyseFit, type FitAnalysis } from '../../fits/analyse-fit';
import { findDataSetRow } from './read-data-set';

// The fit of the data set as it stands (not saved); engine errors (too few points, one T) answer 400.
export async function analyseDataSet({ teamId, dataSetId }: { teamId: number; dataSetId: number }): Promise<FitAnalysis> {
  const row = await findDataSetRow({ teamId, dataSetId });
  return analyseFit({ points: row.points, temperatureUnit: row.temperatureUnit, valueKind: row.valueKind });
}
