// GET /api/species/imports/[importId]: one import and its rows, checked again against the team's species as they are now
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { getSpeciesImport } from '@/lib/services/species/upload-species-import';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const GET = withRoute({ access: 'team', permission: 'team.read' }, async ({ team, params }) =>
  getSpeciesImport({ teamId: team.id, importId: Number(params.importId) || 0 }),
);

export const { POST, PUT, PATCH, DELETE, OPTIONS } = refuseOtherMethods({ GET });
