// A new structure is parsed by RDKit once: the resolver's parse (canonical SMILES, InChIKey) carries the molecule's
// JSON on to the group estimator, which must then give the same numbers as from the SMILES text, without asking
// RDKit for the molecule again.
import { beforeAll, describe, expect, it, vi } from 'vitest';
import { estimateGas, loadRmgDatabase, type RmgDatabase } from '@/lib/thermo/estimate/gas-estimate';
import { aqueousFromGas } from '@/lib/thermo/estimate/phase';
import { type Chem, loadChem } from '@/lib/thermo/structure/chem';

let chem: Chem;
let db: RmgDatabase;
beforeAll(async () => {
  chem = await loadChem();
  db = loadRmgDatabase();
});

const GAS = { dfH_kJ: 0, dfG_kJ: 0, S_J_per_K: 0, sigma_dfH_kJ: 0, sigma_dfG_kJ: 0, sigma_S_J_per_K: 0 };

describe('parse once, estimate from the parsed structure', () => {
  // ibuprofen, a ring-fused ketone and a chiral alcohol (SMILES from memory), written in a non-canonical order
  it.each(['OC(=O)C(C)c1ccc(CC(C)C)cc1', 'O=C1CCc2ccccc21', 'OC(C)CC'])('%s: same estimate, no second RDKit parse', (smiles) => {
    const parsed = chem.parse(smiles);
    const fromText = estimateGas(chem, parsed.smiles, db);
    const getMol = vi.spyOn(chem.rdkit, 'get_mol');
    try {
      const fromParsed = estimateGas(chem, parsed, db);
      expect(getMol).not.toHaveBeenCalled();
      expect(fromParsed.dfH_kJ).toBeCloseTo(fromText.dfH_kJ, 9);
      expect(fromParsed.S_J_per_K).toBeCloseTo(fromText.S_J_per_K, 9);
      expect(fromParsed.symmetryNumber).toBe(fromText.symmetryNumber);
      expect(fromParsed.opticalIsomers).toBe(fromText.opticalIsomers);
    } finally {
      getMol.mockRestore();
    }
  });

  it('the aqueous step reuses the parse too (no second InChI)', () => {
    const parsed = chem.parse('CC(=O)Nc1ccc(O)cc1');
    const fromText = aqueousFromGas(chem, parsed.smiles, GAS);
    const getMol = vi.spyOn(chem.rdkit, 'get_mol');
    try {
      const fromParsed = aqueousFromGas(chem, parsed, GAS);
      // the halogen-free parent check still opens a molecule; the parse and the InChI are not repeated
      expect(getMol.mock.calls.length).toBeLessThanOrEqual(1);
      expect(fromParsed.dfG_kJ).toBeCloseTo(fromText.dfG_kJ, 9);
    } finally {
      getMol.mockRestore();
    }
  });
});
