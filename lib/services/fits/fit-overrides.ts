import 'server-only';
import type { Transaction } from 'sequelize';
import { AppError } from '../../api/errors';
import { fitToOverride } from '../../fits/fit-override';
import type { ReactionOverride } from '../../thermo/reaction-override';
import { fitsByIds } from './read-fits';

export type FitOverrides = ReadonlyMap<number, ReactionOverride>;

/** The saved fits a route's steps take their ΔH° and ΔS° from; a fit of another team (or none) is 404 on that step. */
export async function fitOverrides({ teamId, steps, transaction }: { teamId: number; steps: readonly { fitId?: number | null }[]; transaction?: Transaction }): Promise<FitOverrides> {
  const ids = [...new Set(steps.map((s) => s.fitId).filter((id): id is number => typeof id === 'number'))];
  const rows = await fitsByIds({ teamId, ids, transaction });
  const fields: Record<string, string> = {};
  steps.forEach((s, i) => {
    if (typeof s.fitId !== 'number') return;
    const row = rows.get(s.fitId);
    if (!row) fields[`steps.${i}.fitId`] = `No such fit: #${s.fitId}.`;
    else if (row.equation === '') fields[`steps.${i}.fitId`] = `Fit #${row.id} is not linked to a reaction, so no step can use it.`;
  });
  const problems = Object.values(fields);
  if (problems.length) {
    const notFound = problems.some((m) => m.startsWith('No such fit'));
    throw new AppError(notFound ? 'NOT_FOUND' : 'VALIDATION', problems[0]!, { fields });
  }
  return new Map([...rows.values()].map((r) => [r.id, fitToOverride(r)]));
}
