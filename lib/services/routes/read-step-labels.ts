import 'server-only';
import { Op, type Transaction } from 'sequelize';
import { getDb } from '../../../db';
import { stepLabels, type StepLabel } from '../../route-editor/step-label';

/**
 * Each route's step labels ("Step 3 (ethanol dehydrogenation)") from its saved steps and links, for text that
 * names a step outside the board: notifications, mails, the species pages. Two queries for any number of routes.
 */
export async function readStepLabels(routeIds: Iterable<number>, transaction?: Transaction): Promise<Map<number, Map<string, StepLabel>>> {
  const ids = [...new Set(routeIds)];
  const out = new Map<number, Map<string, StepLabel>>();
  if (ids.length === 0) return out;
  const { Step, StepLink } = getDb().models;
  const [steps, links] = await Promise.all([
    Step.findAll({ where: { routeId: { [Op.in]: ids } }, attributes: ['routeId', 'stepKey', 'equation', 'sortOrder'], order: [['routeId', 'ASC'], ['sortOrder', 'ASC']], transaction }),
    StepLink.findAll({ where: { routeId: { [Op.in]: ids } }, attributes: ['routeId', 'fromKey', 'toKey'], order: [['id', 'ASC']], transaction }),
  ]);
  for (const id of ids) {
    out.set(
      id,
      stepLabels(
        steps.filter((s) => s.routeId === id).map((s) => ({ id: s.stepKey, equation: s.equation })),
        links.filter((l) => l.routeId === id).map((l) => ({ from: l.fromKey, to: l.toKey })),
      ),
    );
  }
  return out;
}

/** One step's full label, or null when the route no longer has that step. */
export async function readStepLabel({ routeId, stepKey, transaction }: { routeId: number; stepKey: string; transaction?: Transaction }): Promise<string | null> {
  return (await readStepLabels([routeId], transaction)).get(routeId)?.get(stepKey)?.full ?? null;
}
