// GET /api/palette?species=X: equations to drag onto the board (the team's recent ones, and library reactions with X)
import { z } from 'zod';
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { listRecentEquations } from '@/lib/services/routes/list-recent-equations';
import { searchLibraryReactions } from '@/lib/services/routes/search-library-reactions';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

const PaletteQuery = z.object({ species: z.string().trim().max(120).optional() });

export const GET = withRoute({ access: 'team', permission: 'route.read', query: PaletteQuery }, async ({ team, query }) => ({
  recent: await listRecentEquations({ teamId: team.id }),
  library: searchLibraryReactions({ species: query.species }),
}));

export const { POST, PUT, PATCH, DELETE, OPTIONS } = refuseOtherMethods({ GET });
