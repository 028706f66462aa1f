import 'server-only';
import { getDb } from '../../../db';
import { DEFAULT_DRIVERS, type DriverReaction } from '../../thermo/route';

export interface DriverDto extends DriverReaction {
  basis: string;
}

// A team's driver list starts as the common set the first time it is asked for; after that it is the team's to edit.
export async function listDrivers({ teamId }: { teamId: number }): Promise<DriverDto[]> {
  const { sequelize, models } = getDb();
  const team = await models.Team.findByPk(teamId, { attributes: ['id', 'driversSeededAt'] });
  if (team && !team.driversSeededAt) {
    await sequelize.transaction(async (transaction) => {
      const fresh = await models.Team.findByPk(teamId, { transaction });
      if (!fresh || fresh.driversSeededAt) return;
      await models.DriverReaction.bulkCreate(
        DEFAULT_DRIVERS.map((d) => ({ teamId, name: d.name, equation: d.equation, basis: d.basis ?? 'common practice', createdById: null })),
        { transaction },
      );
      await fresh.update({ driversSeededAt: new Date() }, { transaction });
    });
  }
  const rows = await models.DriverReaction.findAll({ where: { teamId }, order: [['id', 'ASC']] });
  return rows.map((r) => ({ id: String(r.id), name: r.name, equation: r.equation, basis: r.basis }));
}
