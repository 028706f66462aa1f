// GET /api/structures/svg?smiles=&w=&h=: a structure drawn by RDKit on the server, as an SVG image for <img>
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { StructureSvgQuerySchema } from '@/lib/schemas/structure';
import { drawStructure } from '@/lib/services/structures/draw-structure';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

// The same query always draws the same picture, so browsers may keep it; private because it needs a session.
const CACHE_CONTROL = 'private, max-age=31536000, immutable';

export const GET = withRoute({ access: 'team', permission: 'team.read', query: StructureSvgQuerySchema }, async ({ query }) => {
  const drawing = await drawStructure({ smiles: query.smiles, width: query.w, height: query.h });
  return new Response(drawing.svg, { status: 200, headers: { 'Content-Type': 'image/svg+xml', 'Cache-Control': CACHE_CONTROL } });
});

export const { POST, PUT, PATCH, DELETE, OPTIONS } = refuseOtherMethods({ GET });
