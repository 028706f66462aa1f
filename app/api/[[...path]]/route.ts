// ANY /api and /api/<unknown>: no handler serves this path; 404 in the app's error shape (Next's own answer is an HTML page).
// Every more specific route under app/api wins over this catch-all.
import { AppError } from '@/lib/api/errors';
import { withRoute } from '@/lib/api/with-route';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

const notFound = withRoute({ access: 'public' }, async () => {
  throw new AppError('NOT_FOUND', 'There is no API endpoint at this address.');
});

// OPTIONS too: Next's automatic answer would list every method as served here.
export { notFound as GET, notFound as POST, notFound as PUT, notFound as PATCH, notFound as DELETE, notFound as OPTIONS };
