import 'server-only';
import { getDb } from '../../../db';
import type { DriverInput } from '../../schemas/driver';
import { evaluateStep } from '../../thermo/evaluate';
import { recordEvent } from '../audit/record-event';
import { teamLookup } from '../species/team-lookup';
import { listDrivers } from './list-drivers';

export async function createDriver({ teamId, userId, input }: { teamId: number; userId: number; input: DriverInput }) {
  // Evaluating once proves the equation parses, balances and uses known species (ThermoError → 400 otherwise).
  const check = evaluateStep({ equation: input.equation }, { lookup: await teamLookup(teamId) });
  await listDrivers({ teamId });
  const { sequelize, models } = getDb();
  return sequelize.transaction(async (transaction) => {
    const row = await models.DriverReaction.create({ teamId, name: input.name, equation: check.equation, basis: input.basis, createdById: userId }, { transaction });
    await recordEvent({ teamId, actorId: userId, action: 'driver.created', targetType: 'driver', targetId: row.id }, transaction);
    return { id: String(row.id), name: row.name, equation: row.equation, basis: row.basis, deltaG0_kJ: check.deltaG0_kJ };
  });
}
