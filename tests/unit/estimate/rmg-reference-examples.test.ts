// The 15 worked molecules shipped with the RMG-database group files
// (lib/thermo/data/source/estimation/rmg-groups/reference_examples.json; 9 of them from RMG-Py's own
// unit tests): atom types, the contribution labels, ΔH298, intrinsic S298, the 7 Cp points, the
// Cp limits and the Wilhoit (B = 1000 K) coefficients.
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { cpLimits } from '@/lib/thermo/estimate/rmg/cp-limits';
import { groupAdditivity } from '@/lib/thermo/estimate/rmg/group-sum';
import { buildMolecule } from '@/lib/thermo/estimate/rmg/rdkit-graph';
import { loadRmgDatabase, type RmgDatabase } from '@/lib/thermo/estimate/rmg/rmg-database';
import { CP_TEMPERATURES_K } from '@/lib/thermo/estimate/rmg/thermo-values';
import { fitWilhoit, wilhoitCp } from '@/lib/thermo/estimate/wilhoit';
import { type Chem, loadChem } from '@/lib/thermo/structure/chem';

interface Example {
  name: string;
  smiles: string;
  heavy_atom_types: string[];
  contributions: string[];
  H298_kJ_mol: number;
  S298_intrinsic_J_molK: number;
  Cp_J_molK: number[];
  Cp0_CpInf_J_molK: [number, number];
  wilhoit_B1000_a0_a3: number[];
  Cp298_wilhoit_J_molK: number;
}

const examples = (
  JSON.parse(readFileSync(path.join(process.cwd(), 'lib/thermo/data/source/estimation/rmg-groups/reference_examples.json'), 'utf8')) as {
    examples: Example[];
  }
).examples;

/** "[bicyclic estimate: polycyclic(a) -ring(b) +ring(c)]" lists its terms; expand it to match ours. */
function expectedTerms(list: string[]): string[] {
  return list
    .flatMap((c) => (c.startsWith('[bicyclic estimate:') ? c.slice(19, -1).trim().split(/\s+/) : [c]))
    .map((c) => c.replace(/^\+/, ''))
    .sort();
}

let chem: Chem;
let db: RmgDatabase;
beforeAll(async () => {
  chem = await loadChem();
  db = loadRmgDatabase();
});

describe('RMG group additivity reproduces reference_examples.json', () => {
  it('has the 15 examples', () => expect(examples).toHaveLength(15));

  for (const ex of examples) {
    it(`${ex.name} (${ex.smiles})`, () => {
      const { graph, heavyCount } = buildMolecule(chem, ex.smiles, db.atomTypes);
      expect(graph.atoms.slice(0, heavyCount).map((a) => a.type)).toEqual(ex.heavy_atom_types);
      const sum = groupAdditivity(db, graph);
      expect(sum.unplaced).toEqual([]);
      const terms = sum.contributions.map((c) => `${c.sign < 0 ? '-' : ''}${c.file}(${c.label})`).sort();
      expect(terms).toEqual(expectedTerms(ex.contributions));
      expect(sum.values.H).toBeCloseTo(ex.H298_kJ_mol, 2);
      expect(sum.values.S).toBeCloseTo(ex.S298_intrinsic_J_molK, 2);
      sum.values.Cp.forEach((cp, i) => expect(cp).toBeCloseTo(ex.Cp_J_molK[i]!, 2));

      const { Cp0, CpInf } = cpLimits(graph);
      expect(Cp0).toBeCloseTo(ex.Cp0_CpInf_J_molK[0], 3);
      expect(CpInf).toBeCloseTo(ex.Cp0_CpInf_J_molK[1], 3);
      const w = fitWilhoit(CP_TEMPERATURES_K, sum.values.Cp, Cp0, CpInf, 1000);
      w.a.forEach((a, i) => expect(a).toBeCloseTo(ex.wilhoit_B1000_a0_a3[i]!, 2));
      expect(wilhoitCp(w, 298.15)).toBeCloseTo(ex.Cp298_wilhoit_J_molK, 2);
    });
  }
});
