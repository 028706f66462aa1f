// The CSV columns that say where a step's numbers came from, shared by every export that lists steps, so a
// spreadsheet can never take an estimate for measured data. Pure.
import type { CsvCell } from '@/lib/csv/write-csv';
import { stepOrigin, type StepSpeciesFacts } from './step-origin';

export const ORIGIN_COLUMNS = [
  /** library | team | estimated | mixed (several origins) | not evaluated */
  'data_origin',
  /** the species whose values are group-contribution estimates, not measurements */
  'estimated_species',
  'estimation_method',
  /** the team's own species and the provenance it recorded */
  'team_species',
  'team_provenance',
  'library_sources',
  /** σ(ΔrG°) per mol of reaction as written */
  'sigma_dG_kJ_per_mol',
  /** yes when |ΔG| ≤ σ: the data cannot decide the sign */
  'sign_within_sigma',
] as const;

const round = (v: number, places: number) => Number(v.toFixed(places));

/** The origin cells of one step; `species` null or empty means the step was not evaluated. */
export function originCells(species: readonly StepSpeciesFacts[] | null | undefined, sigma_kJ: number | null | undefined, signWithinSigma: boolean): CsvCell[] {
  const s = stepOrigin(species);
  if (s.origin === null) return ['not evaluated', '', '', '', '', '', '', ''];
  return [
    s.origin,
    s.estimated.join('; '),
    s.methods.join('; '),
    s.team.join('; '),
    s.teamSources.join('; '),
    s.sources.join('; '),
    sigma_kJ === null || sigma_kJ === undefined || !Number.isFinite(sigma_kJ) ? '' : round(sigma_kJ, 2),
    signWithinSigma ? 'yes' : 'no',
  ];
}
