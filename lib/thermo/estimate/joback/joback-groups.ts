// The Joback & Reid (1987) group table, read from the committed copy at first use.
import { numberCell, readCsvTable } from '../gani/read-csv-table';

const FILE = 'source/estimation/joback/joback_groups.csv';

export const JOBACK_SOURCE = 'Joback & Reid, Chem. Eng. Commun. 57 (1987) 233';

export interface JobackGroup {
  id: number;
  name: string;
  /** ugropy's SMARTS: written for an exclusive cover, unlike the thermo 0.6.1 set */
  smarts: string;
  /** null where the table has no value (Tc of =NH; Cp and ΔfG° of -N= non-ring) */
  Tc: number | null;
  Pc: number | null;
  Vc: number | null;
  Tb: number | null;
  Tm: number | null;
  Hform: number | null;
  Gform: number | null;
  Cp: [number, number, number, number] | null;
  Hvap: number | null;
}

let cache: JobackGroup[] | undefined;

export function jobackGroups(): JobackGroup[] {
  cache ??= readCsvTable(FILE).map((row) => {
    const num = (c: string): number | null => numberCell(row, c, FILE);
    const cp = [num('Cp_a'), num('Cp_b'), num('Cp_c'), num('Cp_d')];
    return {
      id: Number(row.group_id),
      name: row.group ?? '',
      smarts: (row.smarts_ugropy ?? '').trim(),
      Tc: num('Tc'),
      Pc: num('Pc'),
      Vc: num('Vc'),
      Tb: num('Tb'),
      Tm: num('Tm'),
      Hform: num('Hform'),
      Gform: num('Gform'),
      Cp: cp.every((x) => x !== null) ? (cp as [number, number, number, number]) : null,
      Hvap: num('Hvap'),
    };
  });
  return cache;
}
