import 'server-only';
import type { Transaction } from 'sequelize';
import { getDb } from '../../../db';
import { isThermoError } from '../../thermo/errors';
import { resolveReaction } from '../../thermo/resolve-reaction';
import type { SpeciesLookup } from '../../thermo/species-library';

export interface SpeciesUse {
  routeId: number;
  routeName: string;
  archived: boolean;
  /** the steps whose equation has the species */
  stepKeys: string[];
}

/** The team's routes (not deleted) whose steps use each species key, read through the team's lookup. */
export async function speciesUses({ teamId, lookup, keys, transaction }: { teamId: number; lookup: SpeciesLookup; keys?: ReadonlySet<string>; transaction?: Transaction }): Promise<Map<string, SpeciesUse[]>> {
  const { Route, Step } = getDb().models;
  const routes = await Route.findAll({
    where: { teamId, deletedAt: null },
    attributes: ['id', 'name', 'archivedAt'],
    include: [{ model: Step, as: 'steps', attributes: ['stepKey', 'equation', 'sortOrder'] }],
    order: [['name', 'ASC'], ['id', 'ASC']],
    transaction,
  });
  const out = new Map<string, SpeciesUse[]>();
  for (const route of routes) {
    const byKey = new Map<string, string[]>();
    const steps = ((route.get('steps') as { stepKey: string; equation: string; sortOrder: number }[]) ?? []).sort((a, b) => a.sortOrder - b.sortOrder);
    for (const step of steps) {
      let speciesKeys: string[];
      try {
        speciesKeys = resolveReaction(step.equation, lookup).species.map((s) => s.key);
      } catch (error) {
        // A step the engine cannot read uses nothing; its route shows the error where it is edited.
        if (isThermoError(error)) continue;
        throw error;
      }
      for (const key of speciesKeys) {
        if (keys && !keys.has(key)) continue;
        byKey.set(key, [...(byKey.get(key) ?? []), step.stepKey]);
      }
    }
    for (const [key, stepKeys] of byKey) {
      out.set(key, [...(out.get(key) ?? []), { routeId: route.id, routeName: route.name, archived: route.archivedAt !== null, stepKeys }]);
    }
  }
  return out;
}
