// GET /api/species/[key]: one species as this team sees it: values with uncertainty and source, Cp°(T) and ΔfG°(T), routes using it
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { getSpecies } from '@/lib/services/species/get-species';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const GET = withRoute({ access: 'team', permission: 'team.read' }, async ({ team, params }) => getSpecies({ teamId: team.id, key: params.key ?? '' }));

export const { POST, PUT, PATCH, DELETE, OPTIONS } = refuseOtherMethods({ GET });
