// GET /api/fits/data-sets/[dataSetId]/analysis: the van 't Hoff fit of the set as it stands (not saved), with residuals and band
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { analyseDataSet } from '@/lib/services/fits/analyse-data-set';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const GET = withRoute({ access: 'team', permission: 'team.read' }, async ({ team, params }) => analyseDataSet({ teamId: team.id, dataSetId: Number(params.dataSetId) || 0 }));

export const { POST, PUT, PATCH, DELETE, OPTIONS } = refuseOtherMethods({ GET });
