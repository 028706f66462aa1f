// POST /api/fit: van 't Hoff fit of ΔH° and ΔS° from K measured at several temperatures (or an array of data sets)
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { FitBody } from '@/lib/schemas/thermo-batch';
import { fitBatch } from '@/lib/services/thermo/evaluate-batch';

export const runtime = 'nodejs';

export const POST = withRoute({ access: 'team', permission: 'thermo.evaluate', body: FitBody }, async ({ body }) => fitBatch(body));

export const { GET, PUT, PATCH, DELETE, OPTIONS } = refuseOtherMethods({ POST });
