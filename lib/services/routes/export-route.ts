import 'server-only';
import { AppError } from '../../api/errors';
import { CAUTION_SHORT } from '../../safety/caution-text';
import { ROUTE_FILE_FORMAT, type StepwellHeader } from '../../schemas/route-transfer';
import { stepLabels } from '../../route-editor/step-label';
import type { RouteEvaluateRequest } from '../../thermo/route';
import { toRouteEvaluateRequest } from './evaluate-route-document';
import { getRoute } from './get-route';

export type RouteFile = RouteEvaluateRequest & { stepwell: StepwellHeader };

/** The route as the CLI's route request, plus the board's name, positions and notes under `stepwell`. */
export async function exportRoute({ teamId, routeId }: { teamId: number; routeId: number }): Promise<{ file: RouteFile; filename: string }> {
  const doc = await getRoute({ teamId, routeId });
  // People know a step by its place in route order ("Step 2"), never by its key.
  const labels = stepLabels(doc.steps, doc.links);
  const blank = doc.steps.filter((s) => s.equation.trim() === '').map((s) => labels.get(s.id)!);
  if (blank.length) {
    const named = blank.length === 1 ? blank[0]!.short : `Steps ${blank.map((l) => l.number).join(', ')}`;
    throw new AppError('UNPROCESSABLE', `${named} ${blank.length === 1 ? 'has' : 'have'} no equation yet. Finish or remove ${blank.length === 1 ? 'it' : 'them'} before exporting.`);
  }
  if (doc.steps.length === 0) throw new AppError('UNPROCESSABLE', 'This route has no steps yet, so there is nothing to export.');
  const notes = Object.fromEntries(doc.steps.filter((s) => s.notes !== '').map((s) => [s.id, s.notes]));
  const file: RouteFile = {
    ...(toRouteEvaluateRequest(doc) as RouteEvaluateRequest),
    stepwell: {
      format: ROUTE_FILE_FORMAT,
      name: doc.name,
      positions: Object.fromEntries(doc.steps.map((s) => [s.id, s.position])),
      ...(Object.keys(notes).length ? { notes } : {}),
      // The file travels without the page around it, so it carries the caution itself.
      caution: CAUTION_SHORT,
    },
  };
  const slug = doc.name.toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-|-$/g, '').slice(0, 60) || 'route';
  return { file, filename: `${slug}.route.json` };
}
