// GET/POST /api/species/imports: the team's species CSV imports; upload one (raw CSV body, ≤ 2 MB, ≤ 5,000 rows) for a preview
import { z } from 'zod';
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { readCsvUpload } from '@/lib/services/species/read-csv-upload';
import { listSpeciesImports, uploadSpeciesImport } from '@/lib/services/species/upload-species-import';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

const UploadQuery = z.strictObject({ fileName: z.string().trim().min(1).max(255).default('species.csv') });

export const GET = withRoute({ access: 'team', permission: 'team.read' }, async ({ team }) => listSpeciesImports({ teamId: team.id }));

export const POST = withRoute({ access: 'team', permission: 'species.edit', query: UploadQuery }, async ({ req, team, user, query }) => {
  const { bytes, text } = await readCsvUpload(req);
  return Response.json(await uploadSpeciesImport({ teamId: team.id, userId: user.id, fileName: query.fileName, bytes, text }), { status: 201 });
});

export const { PUT, PATCH, DELETE, OPTIONS } = refuseOtherMethods({ GET, POST });
