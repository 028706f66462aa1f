// GET/PUT/DELETE /api/fits/data-sets/[dataSetId]: one data set; edit its rows and reaction; delete it while no fit is saved from it
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { DataSetUpdate } from '@/lib/schemas/fit-data';
import { getDataSet } from '@/lib/services/fits/read-data-set';
import { deleteDataSet, updateDataSet } from '@/lib/services/fits/update-data-set';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

const idOf = (params: Record<string, string>) => Number(params.dataSetId) || 0;

export const GET = withRoute({ access: 'team', permission: 'team.read' }, async ({ team, params }) => getDataSet({ teamId: team.id, dataSetId: idOf(params) }));

export const PUT = withRoute({ access: 'team', permission: 'fit.edit', body: DataSetUpdate }, async ({ team, user, params, body }) =>
  updateDataSet({ teamId: team.id, userId: user.id, dataSetId: idOf(params), input: body }),
);

export const DELETE = withRoute({ access: 'team', permission: 'fit.edit' }, async ({ team, user, params }) =>
  deleteDataSet({ teamId: team.id, userId: user.id, dataSetId: idOf(params) }),
);

export const { POST, PATCH, OPTIONS } = refuseOtherMethods({ GET, PUT, DELETE });
