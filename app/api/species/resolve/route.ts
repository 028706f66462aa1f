// GET /api/species/resolve: one species by SMILES, name or key for this team: identity, source or estimate with its groups, values at T
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { SpeciesResolveSchema } from '@/lib/schemas/species-resolve';
import { resolveSpecies } from '@/lib/services/species/resolve-species';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const GET = withRoute({ access: 'team', permission: 'team.read', query: SpeciesResolveSchema }, async ({ team, query }) => resolveSpecies({ teamId: team.id, request: query }));

export const { POST, PUT, PATCH, DELETE, OPTIONS } = refuseOtherMethods({ GET });
