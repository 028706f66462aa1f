// GET /api/species/search: species by name, synonym, formula, CAS number or InChIKey, for the step editor's typeahead
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { SpeciesSearchQuery } from '@/lib/schemas/species-search';
import { searchSpeciesForTeam } from '@/lib/services/species/search-species';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const GET = withRoute({ access: 'team', permission: 'team.read', query: SpeciesSearchQuery }, async ({ team, query }) => searchSpeciesForTeam({ teamId: team.id, query }));

export const { POST, PUT, PATCH, DELETE, OPTIONS } = refuseOtherMethods({ GET });
