import type { Sequelize } from 'sequelize';
import type { LinkInput, StepInput } from '../../lib/schemas/route';
import { evaluateRouteDocument, summariseEvaluation } from '../../lib/services/routes/evaluate-route-document';
import { stepRow } from '../../lib/services/routes/route-dto';
import { builtinLookup } from '../../lib/thermo/species-library';
import { loadChem } from '../../lib/thermo/structure/chem';
import { structureLookup } from '../../lib/thermo/structure/structure-lookup';
import type { Models } from '../models';
import { BOC_BUILDING_BLOCK, KRED_REDUCTION, type DemoRoutePlan } from './demo-estimated-routes';
import { DEMO_TEAM_NAME, DEMO_USERS } from './demo-team';

// Two invented alternatives to one target for the demo team; all numbers come from the species library.
const STEAM_REFORMING: DemoRoutePlan = {
  name: 'Methanol via steam reforming (Line 2 proposal)',
  target: 'CH3OH(g)',
  steps: [
    { id: 'reform', equation: 'CH4(g) + H2O(g) -> CO(g) + 3 H2(g)', temperature: '750 K', yieldPct: 95, notes: 'Tube reformer; temperature still to be fixed.', position: { x: 0, y: 0 } },
    {
      id: 'synthesis',
      equation: 'CO(g) + 2 H2(g) -> CH3OH(g)',
      temperature: '500 K',
      pressures: { 'CO(g)': '20 bar', 'H2(g)': '40 bar', 'CH3OH(g)': '0.5 bar' },
      yieldPct: 90,
      notes: 'Cu/ZnO loop, product condensed out.',
      position: { x: 360, y: 0 },
    },
  ],
  links: [
    { from: 'reform', to: 'synthesis', species: 'CO(g)' },
    { from: 'reform', to: 'synthesis', species: 'H2(g)' },
  ],
};

const PARTIAL_OXIDATION: DemoRoutePlan = {
  name: 'Methanol via partial oxidation (alternative)',
  target: 'CH3OH(g)',
  steps: [
    { id: 'pox', equation: 'CH4(g) + 1/2 O2(g) -> CO(g) + 2 H2(g)', temperature: '1100 K', yieldPct: 92, notes: 'Oxygen-blown; needs an air separation unit.', position: { x: 0, y: 0 } },
    { ...STEAM_REFORMING.steps[1]!, position: { x: 360, y: 0 } },
  ],
  links: [
    { from: 'pox', to: 'synthesis', species: 'CO(g)' },
    { from: 'pox', to: 'synthesis', species: 'H2(g)' },
  ],
};

/** Every demo route in the order seeded; the second methanol route is an alternative of the first. */
export const DEMO_ROUTES: readonly DemoRoutePlan[] = [STEAM_REFORMING, PARTIAL_OXIDATION, BOC_BUILDING_BLOCK, KRED_REDUCTION];
const ALTERNATIVE_OF_FIRST = new Set([PARTIAL_OXIDATION.name]);

export async function seedDemoRoutes({ sequelize, models }: { sequelize: Sequelize; models: Models }): Promise<{ created: boolean }> {
  const team = await models.Team.findOne({ where: { name: DEMO_TEAM_NAME } });
  if (!team) return { created: false };
  if ((await models.Route.count({ where: { teamId: team.id } })) > 0) return { created: false };
  const designer = await models.User.findOne({ where: { email: DEMO_USERS.find((u) => u.role === 'designer')!.email } });
  if (!designer) return { created: false };
  // Structures (species maps) need RDKit; it loads only when there is something to seed, so a re-run stays quick.
  const lookup = structureLookup(builtinLookup, await loadChem());
  await sequelize.transaction(async (transaction) => {
    let originId: number | null = null;
    for (const plan of DEMO_ROUTES) {
      const doc = demoRouteDocument(plan);
      const summary = summariseEvaluation(doc, evaluateRouteDocument(doc, lookup));
      const route: { id: number } = await models.Route.create(
        {
          teamId: team.id, name: plan.name, target: doc.target, targetAmount: doc.targetAmount,
          originRouteId: ALTERNATIVE_OF_FIRST.has(plan.name) ? originId : null, createdById: designer.id, updatedById: designer.id, ...summary,
        },
        { transaction },
      );
      await models.Step.bulkCreate(plan.steps.map((s, i) => stepRow(s, route.id, i)), { transaction });
      await models.StepLink.bulkCreate(plan.links.map((l) => ({ routeId: route.id, fromKey: l.from, toKey: l.to, species: l.species })), { transaction });
      originId ??= route.id;
    }
  });
  return { created: true };
}

/** A plan as the route document the services evaluate and save. */
export function demoRouteDocument(plan: DemoRoutePlan): { target: string; targetAmount: string; marginalThreshold_kJ: number; steps: StepInput[]; links: LinkInput[] } {
  return { target: plan.target, targetAmount: '1 mol', marginalThreshold_kJ: -17, steps: plan.steps, links: plan.links };
}
