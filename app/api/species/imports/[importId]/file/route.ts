// GET /api/species/imports/[importId]/file: the original file exactly as uploaded, with its SHA-256
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { readImportFile } from '@/lib/services/species/upload-species-import';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const GET = withRoute({ access: 'team', permission: 'team.read' }, async ({ team, params }) => {
  const { row, bytes } = await readImportFile({ teamId: team.id, importId: Number(params.importId) || 0 });
  return new Response(new Uint8Array(bytes), {
    headers: {
      'content-type': 'text/csv; charset=utf-8',
      'content-disposition': `attachment; filename="${row.fileName.replace(/"/g, '')}"`,
      'x-content-sha256': row.checksum,
    },
  });
});

export const { POST, PUT, PATCH, DELETE, OPTIONS } = refuseOtherMethods({ GET });
