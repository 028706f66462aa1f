// PUT /api/fits/data-sets/[dataSetId]/exclusions: the points left out of the fit, each with its reason
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { ExclusionsInput } from '@/lib/schemas/fit-data';
import { setExclusions } from '@/lib/services/fits/update-data-set';

export const runtime = 'nodejs';

export const PUT = withRoute({ access: 'team', permission: 'fit.edit', body: ExclusionsInput }, async ({ team, user, params, body }) =>
  setExclusions({ teamId: team.id, userId: user.id, dataSetId: Number(params.dataSetId) || 0, input: body }),
);

export const { GET, POST, PATCH, DELETE, OPTIONS } = refuseOtherMethods({ PUT });
