import 'server-only';
import { col, fn, type Transaction } from 'sequelize';
import { getDb } from '../../../db';
import { isThermoError } from '../../thermo/errors';
import { resolveReaction } from '../../thermo/resolve-reaction';
import { stepLabels } from '../../route-editor/step-label';
import type { SpeciesLookup } from '../../thermo/species-library';
import { isStructureLookup, type SpeciesDefinition } from '../../thermo/structure/structure-lookup-type';

export interface SpeciesUse {
  routeId: number;
  routeName: string;
  archived: boolean;
  /** the steps whose equation has the species */
  stepKeys: string[];
  /** the same steps as people name them: place in route order (1-based, as the board numbers it), equation, and label */
  steps: { number: number; equation: string; label: string }[];
}

// Reading every step of a large team is the slow part, so the whole index is kept per lookup (lookups are
// replaced, never changed) and per state of the team's routes (every save or delete moves the stamp).
const indexes = new WeakMap<SpeciesLookup, Map<number, { stamp: string; index: Map<string, SpeciesUse[]> }>>();

// Every write to a route raises its version, so SUM(version) moves even when two saves share one updated_at
// (PostgreSQL hands MAX(updated_at) back as a Date, which prints to whole seconds).
async function routesStamp(teamId: number): Promise<string> {
  const row = (await getDb().models.Route.findOne({
    attributes: [[fn('COUNT', col('id')), 'n'], [fn('SUM', col('version')), 'versions'], [fn('MAX', col('updated_at')), 'at'], [fn('MAX', col('id')), 'last']],
    where: { teamId, deletedAt: null },
    raw: true,
  })) as unknown as { n: number; versions: number | string | null; at: Date | string | null; last: number | null } | null;
  if (!row) return '0';
  const at = row.at instanceof Date ? row.at.toISOString() : row.at;
  return `${row.n}|${row.versions}|${at}|${row.last}`;
}

/** The team's routes (not deleted) whose steps use each species key, read through the team's lookup. */
export async function speciesUses({ teamId, lookup, keys, transaction }: { teamId: number; lookup: SpeciesLookup; keys?: ReadonlySet<string>; transaction?: Transaction }): Promise<Map<string, SpeciesUse[]>> {
  // Inside a transaction the rows may be uncommitted: read them fresh and keep nothing.
  if (transaction) return pick(await buildIndex(teamId, lookup, transaction), keys);
  const stamp = await routesStamp(teamId);
  const perTeam = indexes.get(lookup) ?? new Map<number, { stamp: string; index: Map<string, SpeciesUse[]> }>();
  indexes.set(lookup, perTeam);
  const hit = perTeam.get(teamId);
  if (hit && hit.stamp === stamp) return pick(hit.index, keys);
  const index = await buildIndex(teamId, lookup);
  perTeam.set(teamId, { stamp, index });
  return pick(index, keys);
}

function pick(index: Map<string, SpeciesUse[]>, keys?: ReadonlySet<string>): Map<string, SpeciesUse[]> {
  if (!keys) return index;
  return new Map([...keys].filter((k) => index.has(k)).map((k) => [k, index.get(k)!]));
}

async function buildIndex(teamId: number, lookup: SpeciesLookup, transaction?: Transaction): Promise<Map<string, SpeciesUse[]>> {
  const { Route, Step, StepLink } = getDb().models;
  const routes = await Route.findAll({
    where: { teamId, deletedAt: null },
    attributes: ['id', 'name', 'archivedAt'],
    include: [
      { model: Step, as: 'steps', attributes: ['stepKey', 'equation', 'sortOrder', 'conditions'] },
      // The links give the route order that numbers the steps (lib/route-editor/step-label.ts).
      { model: StepLink, as: 'links', attributes: ['id', 'fromKey', 'toKey'] },
    ],
    order: [['name', 'ASC'], ['id', 'ASC']],
    transaction,
  });
  const out = new Map<string, SpeciesUse[]>();
  for (const route of routes) {
    const byKey = new Map<string, { key: string; number: number; equation: string; label: string }[]>();
    type StepRow = { stepKey: string; equation: string; sortOrder: number; conditions: { species?: Record<string, SpeciesDefinition> } | null };
    const steps = ((route.get('steps') as StepRow[]) ?? []).sort((a, b) => a.sortOrder - b.sortOrder);
    const links = ((route.get('links') as { id: number; fromKey: string; toKey: string }[]) ?? []).sort((a, b) => a.id - b.id);
    const names = stepLabels(steps.map((s) => ({ id: s.stepKey, equation: s.equation })), links.map((l) => ({ from: l.fromKey, to: l.toKey })));
    for (const step of steps) {
      let speciesKeys: string[];
      try {
        // A step may name species by labels bound to a structure ("Boc-AMP" → SMILES); read it as the engine does.
        const labels = step.conditions?.species;
        const stepLookup = labels && Object.keys(labels).length && isStructureLookup(lookup) ? lookup.withLabels(labels) : lookup;
        speciesKeys = resolveReaction(step.equation, stepLookup).species.map((s) => s.key);
      } catch (error) {
        // A step the engine cannot read uses nothing; its route shows the error where it is edited.
        if (isThermoError(error)) continue;
        throw error;
      }
      for (const key of speciesKeys) {
        const name = names.get(step.stepKey)!;
        byKey.set(key, [...(byKey.get(key) ?? []), { key: step.stepKey, number: name.number, equation: step.equation, label: name.full }]);
      }
    }
    for (const [key, used] of byKey) {
      used.sort((a, b) => a.number - b.number);
      out.set(key, [...(out.get(key) ?? []), {
        routeId: route.id, routeName: route.name, archived: route.archivedAt !== null, stepKeys: used.map((u) => u.key), steps: used.map(({ number, equation, label }) => ({ number, equation, label })),
      }]);
    }
  }
  return out;
}
