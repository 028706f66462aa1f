// The compared routes' steps as CSV, one row per step with where its values came from (library, team, estimated),
// σ(ΔrG°) and whether the sign is within σ, then one total row per route. Energies in kJ, named in the header.
import { ORIGIN_COLUMNS, originCells } from '@/components/chemistry/origin-columns';
import { writeCsv, type CsvCell } from '@/lib/csv/write-csv';
import type { Comparison } from '@/lib/compare/compare-types';

const round = (v: number | null | undefined, places = 3): CsvCell => (v === null || v === undefined || !Number.isFinite(v) ? '' : Number(v.toFixed(places)));

export const COMPARE_STEP_COLUMNS = ['route', 'step', 'step_id', 'equation', 'temperature_K', 'class', 'dG_kJ_per_mol_target', 'dG0_kJ_per_mol_target', ...ORIGIN_COLUMNS] as const;

export function compareStepsCsv(comparison: Comparison): string {
  const rows: CsvCell[][] = [[...COMPARE_STEP_COLUMNS]];
  for (const route of comparison.routes) {
    if (!route.ladder) {
      rows.push([route.name, '', '', '', '', 'error', '', '', 'not evaluated', '', '', '', '', '', '', '']);
      continue;
    }
    const byId = new Map(route.ladder.steps.map((s) => [s.id, s]));
    route.ladder.order.forEach((id, index) => {
      const s = byId.get(id);
      if (!s) return;
      rows.push([route.name, index + 1, s.id, s.equation, round(s.temperature_K, 2), s.class, round(s.deltaG_kJ), round(s.deltaG0_kJ), ...originCells(s.species, s.sigma_kJ, s.signUncertain)]);
    });
    const all = route.ladder.steps.flatMap((s) => s.species);
    const origin = originCells(all, null, route.ladder.overallSignUncertain === true);
    // The total's σ is per mol of target, like the total's ΔG on its row.
    rows.push([route.name, 'total', '', '', '', 'route total', round(route.metrics.overallDeltaG_kJ), round(route.metrics.overallDeltaG0_kJ), ...origin.slice(0, 6), round(route.ladder.overallSigma_kJ, 2), origin[7]!]);
  }
  return writeCsv(rows);
}
