import 'server-only';
import { getDb } from '../../../db';
import { AppError } from '../../api/errors';
import { solveSpeciesFromFit } from '../../fits/species-from-fit';
import { fitSource } from '../../fits/fit-override';
import type { SpeciesFromFitInput } from '../../schemas/fit-data';
import { fmt } from '../../thermo/warnings';
import { createTeamSpecies } from '../species/create-team-species';
import { teamLookup } from '../species/team-lookup';
import { findFitRow } from './read-fits';

// A team species whose ΔfH°, ΔfG° and S° come from a saved fit and the library values of the reaction's other species.
export async function createSpeciesFromFit({ teamId, userId, fitId, input }: { teamId: number; userId: number; fitId: number; input: SpeciesFromFitInput }) {
  const { sequelize } = getDb();
  return sequelize.transaction(async (transaction) => {
    const fit = await findFitRow({ teamId, fitId, transaction });
    if (fit.equation === '') {
      throw new AppError('UNPROCESSABLE', 'This fit is not linked to a reaction, so no species can be solved from it. Link its data set to the equation and fit again.');
    }
    const solved = solveSpeciesFromFit({ equation: fit.equation, species: input.species, fit: fit.result, lookup: await teamLookup(teamId, transaction) });
    const { ref } = solved;
    const [lo, hi] = fit.result.range_K;
    const others = solved.others.map((o) => `${o.key} (${o.source})`).join(', ');
    const species = await createTeamSpecies({
      teamId,
      userId,
      transaction,
      input: {
        formula: ref.key.replace(/\([^()]*\)$/, ''),
        phase: ref.phase,
        form: ref.form,
        name: input.name,
        dfH: solved.dfH_kJ,
        dfG: solved.dfG_kJ,
        S: solved.S_J_per_K,
        sigmaDfH: solved.sigma_dfH_kJ,
        sigmaDfG: solved.sigma_dfG_kJ,
        sigmaS: solved.sigma_S_J_per_K,
        provenance: { kind: 'measured', reference: `${fitSource(fit)} of data set “${fit.rawData.dataSetName}” (${fit.result.n} points, ${fmt(lo)}–${fmt(hi)} K)`, fitId: fit.id },
        notes:
          `Solved from ${fit.equation} with the fitted ΔrH° and ΔrS° taken as 298.15 K values (ΔCp = 0)` +
          (others ? ` and the library values of ${others}` : '') +
          '. σ values are from the fit alone; the other species’ uncertainties are not included.',
      },
    });
    return { species, solved: { key: ref.key, nu: solved.nu, shadows: solved.shadows, dfH_kJ: solved.dfH_kJ, dfG_kJ: solved.dfG_kJ, S_J_per_K: solved.S_J_per_K } };
  });
}
