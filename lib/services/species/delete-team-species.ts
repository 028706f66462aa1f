import 'server-only';
import { getDb } from '../../../db';
import { AppError } from '../../api/errors';
import { recordEvent } from '../audit/record-event';
import { forUpdate } from '../row-lock';
import { invalidateAfter } from './create-team-species';
import { speciesUses } from './species-usage';
import { teamLookup } from './team-lookup';

/** A route that would change if the species went, as people name it: route name, step numbers and equations. */
export interface SpeciesInUse {
  routeName: string;
  href: string;
  archived: boolean;
  steps: { number: number; equation: string }[];
}

function routeWords(uses: readonly SpeciesInUse[]): string {
  return uses.map((u) => `“${u.routeName}” (step${u.steps.length > 1 ? 's' : ''} ${u.steps.map((s) => s.number).join(', ')})`).join('; ');
}

/**
 * Deletes a team species the caller saw at `version`, only while no route of the team uses it (deleted routes do
 * not count). A used one answers 409 listing the routes, since deleting it would silently change their ΔG.
 */
export async function deleteTeamSpecies({ teamId, userId, id, version }: { teamId: number; userId: number; id: number; version: number }) {
  const { sequelize, models } = getDb();
  return sequelize.transaction(async (transaction) => {
    const row = await models.TeamSpecies.findOne({ where: { id, teamId }, ...forUpdate(transaction) });
    if (!row) throw new AppError('NOT_FOUND', 'No such team species.');
    if (row.version !== version) {
      throw new AppError('CONFLICT', `Someone saved this species since you opened it (version ${row.version}, you had ${version}). Reload before deleting it.`, {
        details: { currentVersion: row.version },
      });
    }
    const uses = (await speciesUses({ teamId, lookup: await teamLookup(teamId, transaction), keys: new Set([row.key]), transaction })).get(row.key) ?? [];
    if (uses.length > 0) {
      const routes: SpeciesInUse[] = uses.map((u) => ({
        routeName: u.routeName, href: `/routes/${u.routeId}${u.stepKeys[0] ? `?step=${encodeURIComponent(u.stepKeys[0])}` : ''}`, archived: u.archived, steps: u.steps,
      }));
      throw new AppError('CONFLICT', `“${row.name}” is used by ${routes.length === 1 ? 'a route' : `${routes.length} routes`}: ${routeWords(routes)}. Change those steps first; deleting it would change their ΔG.`, {
        details: { routes },
      });
    }
    await row.destroy({ transaction });
    await recordEvent({ teamId, actorId: userId, action: 'species.deleted', targetType: 'team_species', targetId: id, data: { key: row.key, name: row.name, version } }, transaction);
    invalidateAfter(teamId, transaction);
    return { deleted: true, key: row.key, name: row.name };
  });
}
