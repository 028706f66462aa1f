// Alshehri, Tula, You & Gani (2022) "GC-simple" group tables (1st, 2nd, 3rd order) and constants,
// read from the committed copies at first use. SMARTS are ugropy's (Brandolín et al. 2025).
import { numberCell, readCsvTable } from './read-csv-table';

const DIR = 'source/estimation/gani';

export const GANI_SOURCE = 'Alshehri, Tula, You & Gani, AIChE J. 68 (2022) e17469 (GC-simple); SMARTS from ugropy';

export interface GaniGroup {
  number: number;
  name: string;
  order: 1 | 2 | 3;
  /** empty when the source has none (the group can never be detected) */
  smarts: string;
  /** ChemAxon link node: atom `atom` of `smarts` repeats min..max times */
  linkNode?: { atom: number; min: number; max: number };
  Hf: number;
  Gf: number;
}

export interface GaniTables {
  groups: GaniGroup[];
  byNumber: Map<number, GaniGroup>;
  b1: { Hf: number; Gf: number };
}

let cache: GaniTables | undefined;

function readOrder(file: string, order: 1 | 2 | 3): GaniGroup[] {
  const path = `${DIR}/${file}`;
  return readCsvTable(path).map((row) => {
    const raw = (row.smarts ?? '').trim();
    const ln = /^(\S+)\s+LN:(\d+):(\d+)\.(\d+)(?::\d+)*$/.exec(raw);
    return {
      number: Number(row.group_number),
      name: row.group ?? '',
      order,
      smarts: ln ? ln[1]! : raw,
      ...(ln ? { linkNode: { atom: Number(ln[2]), min: Number(ln[3]), max: Number(ln[4]) } } : {}),
      Hf: numberCell(row, 'Hf', path) ?? 0,
      Gf: numberCell(row, 'Gf', path) ?? 0,
    };
  });
}

export function ganiTables(): GaniTables {
  if (!cache) {
    const groups = [
      ...readOrder('agani_primary_groups.csv', 1),
      ...readOrder('agani_secondary_groups.csv', 2),
      ...readOrder('agani_tertiary_groups.csv', 3),
    ];
    const constants = readCsvTable(`${DIR}/agani_constants.csv`).find((r) => r.constant === 'b1');
    if (!constants) throw new Error(`${DIR}/agani_constants.csv has no b1 row`);
    cache = {
      groups,
      byNumber: new Map(groups.map((g) => [g.number, g])),
      b1: { Hf: Number(constants.Hf), Gf: Number(constants.Gf) },
    };
  }
  return cache;
}
