// POST /api/species/imports/[importId]/commit: write every row in one transaction (skip or override each duplicate), or nothing
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { SpeciesImportCommit } from '@/lib/schemas/species';
import { commitSpeciesImport } from '@/lib/services/species/commit-species-import';

export const runtime = 'nodejs';

export const POST = withRoute({ access: 'team', permission: 'species.edit', body: SpeciesImportCommit }, async ({ team, user, params, body }) =>
  commitSpeciesImport({ teamId: team.id, userId: user.id, importId: Number(params.importId) || 0, input: body }),
);

export const { GET, PUT, PATCH, DELETE, OPTIONS } = refuseOtherMethods({ POST });
