// GET /api/palette?species=X: equations to drag onto the board (the team's recent ones, and library reactions with X),
// with the structures of each that has something to draw
import { z } from 'zod';
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { listRecentEquations } from '@/lib/services/routes/list-recent-equations';
import { recentLabels, structuresByEquation } from '@/lib/services/routes/palette-structures';
import { searchLibraryReactions } from '@/lib/services/routes/search-library-reactions';
import { teamLookup } from '@/lib/services/species/team-lookup';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

const PaletteQuery = z.object({ species: z.string().trim().max(120).optional() });

export const GET = withRoute({ access: 'team', permission: 'route.read', query: PaletteQuery }, async ({ team, query }) => {
  const recent = await listRecentEquations({ teamId: team.id });
  const library = searchLibraryReactions({ species: query.species });
  const [lookup, labels] = await Promise.all([teamLookup(team.id), recentLabels({ teamId: team.id, equations: recent })]);
  return { recent, library, structures: structuresByEquation([...recent, ...library.map((r) => r.equation)], lookup, labels), labels: Object.fromEntries(labels) };
});

export const { POST, PUT, PATCH, DELETE, OPTIONS } = refuseOtherMethods({ GET });
