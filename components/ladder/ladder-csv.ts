// The route board's steps as CSV: one row per step in the ladder's order, with its ΔG per mol of reaction and for the
// route, and where its values came from (library, team, estimated), σ(ΔrG°) and whether the sign is within σ; then a
// total row. Energies in kJ whatever the reader's unit, named in the header, so a spreadsheet never guesses.
import { ORIGIN_COLUMNS, originCells } from '@/components/chemistry/origin-columns';
import { writeCsv, type CsvCell } from '@/lib/csv/write-csv';
import type { RouteEvaluateResponse } from '@/lib/thermo/route';

export const LADDER_CSV_COLUMNS = [
  'step',
  'step_id',
  'label',
  'equation',
  'temperature_K',
  'class',
  'dG_kJ_per_mol',
  'dG0_kJ_per_mol',
  'extent_mol',
  'dG_route_kJ',
  'cumulative_kJ',
  ...ORIGIN_COLUMNS,
] as const;

const round = (v: number | null | undefined, places = 3): CsvCell => (v === null || v === undefined || !Number.isFinite(v) ? '' : Number(v.toFixed(places)));

export interface LadderCsvOptions {
  /** each step's number as the board shows it (else its place in the evaluation's order) */
  slots?: ReadonlyMap<string, number>;
  /** why the totals wait, in words with step labels (else the engine's message) */
  withheldReason?: string;
}

export function ladderStepsCsv(evaluation: RouteEvaluateResponse, stepLabels: Readonly<Record<string, string>> = {}, options: LadderCsvOptions = {}): string {
  const rows: CsvCell[][] = [[...LADDER_CSV_COLUMNS]];
  const byId = new Map(evaluation.steps.map((s) => [s.id, s]));
  evaluation.order.forEach((id, index) => {
    const s = byId.get(id);
    if (!s) return;
    const r = s.result;
    rows.push([
      options.slots?.get(id) ?? index + 1,
      s.id,
      stepLabels[s.id] ?? '',
      r?.equation ?? '',
      round(r?.temperature_K, 2),
      s.class,
      round(r ? (r.deltaG_kJ ?? r.deltaG0_kJ) : null),
      round(r?.deltaG0_kJ),
      round(s.extent_mol, 6),
      round(s.deltaG_kJ),
      round(s.cumulative_kJ),
      ...originCells(r?.species, r?.uncertainty.deltaG0_kJ, s.signUncertain),
    ]);
  });
  if (evaluation.totalsWithheld) {
    rows.push(['total', '', '', '', '', `withheld: ${options.withheldReason ?? evaluation.totalsWithheld.message}`, ...Array<CsvCell>(LADDER_CSV_COLUMNS.length - 6).fill('')]);
    return writeCsv(rows);
  }
  const o = evaluation.overall;
  const all = evaluation.steps.flatMap((s) => s.result?.species ?? []);
  const origin = originCells(all, null, o.overallSignUncertain);
  // σ of the total is for the route's target amount (kJ), like dG_route_kJ on this row.
  rows.push(['total', '', '', '', '', 'route total', '', '', '', round(o.deltaG_kJ), round(o.deltaG_kJ), ...origin.slice(0, 6), round(o.overallSigma_kJ, 2), origin[7]!]);
  return writeCsv(rows);
}
