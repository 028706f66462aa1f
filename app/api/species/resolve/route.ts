// GET/POST /api/species/resolve: one species by SMILES, molfile, name or key for this team: identity, source or estimate with its groups, values at T (POST carries a molfile in its body)
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { SpeciesResolveSchema } from '@/lib/schemas/species-resolve';
import { resolveSpecies } from '@/lib/services/species/resolve-species';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const GET = withRoute({ access: 'team', permission: 'team.read', query: SpeciesResolveSchema }, async ({ team, query }) => resolveSpecies({ teamId: team.id, request: query }));

// Reads only; a POST because a pasted molfile is too long and multi-line for a query string.
export const POST = withRoute({ access: 'team', permission: 'team.read', body: SpeciesResolveSchema }, async ({ team, body }) => resolveSpecies({ teamId: team.id, request: body }));

export const { PUT, PATCH, DELETE, OPTIONS } = refuseOtherMethods({ GET, POST });
