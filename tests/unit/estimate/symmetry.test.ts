// Rotational symmetry numbers (external × internal, free-rotor convention) and chirality from the
// graph. Expected values are the standard point-group values σ_ext × Π σ_int, from memory
// (statistical-thermodynamics texts; Benson, Thermochemical Kinetics, 1976, uses the same
// convention), each written as its product so it can be checked by eye.
import { beforeAll, describe, expect, it } from 'vitest';
import { buildMolecule } from '@/lib/thermo/estimate/rmg/rdkit-graph';
import { loadRmgDatabase, type RmgDatabase } from '@/lib/thermo/estimate/rmg/rmg-database';
import { molecularSymmetry } from '@/lib/thermo/estimate/symmetry';
import { type Chem, loadChem } from '@/lib/thermo/structure/chem';

let chem: Chem;
let db: RmgDatabase;
beforeAll(async () => {
  chem = await loadChem();
  db = loadRmgDatabase();
});

function symmetry(smiles: string) {
  const built = buildMolecule(chem, smiles, db.atomTypes);
  return molecularSymmetry(built.graph, built.rdkitAromatic);
}

// [name, SMILES, σ, how σ arises] — from memory
const CASES: [string, string, number, string][] = [
  ['methane', 'C', 12, 'Td'],
  ['water', 'O', 2, 'C2v'],
  ['ammonia', 'N', 3, 'C3v'],
  ['carbon dioxide', 'O=C=O', 2, 'D∞h'],
  ['acetylene', 'C#C', 2, 'D∞h'],
  ['hydrogen cyanide', 'C#N', 1, 'C∞v'],
  ['ethylene', 'C=C', 4, 'D2h'],
  ['formaldehyde', 'C=O', 2, 'C2v'],
  ['ethane', 'CC', 18, 'D3d 6 × CH3 rotor 3'],
  ['propane', 'CCC', 18, 'C2v 2 × 3 × 3'],
  ['isobutane', 'CC(C)C', 81, 'C3v 3 × 3³'],
  ['neopentane', 'CC(C)(C)C', 972, 'Td 12 × 3⁴ (not 324)'],
  ['methanol', 'CO', 3, 'CH3 rotor'],
  ['dimethyl ether', 'COC', 18, 'C2v 2 × 3 × 3'],
  ['acetone', 'CC(C)=O', 18, 'C2v 2 × 3 × 3'],
  ['acetic acid', 'CC(O)=O', 3, 'CH3 rotor'],
  ['methylamine', 'CN', 3, 'CH3 rotor; pyramidal N'],
  ['dimethyl sulfoxide', 'CS(C)=O', 9, 'Cs 1 × 3 × 3; pyramidal S'],
  ['N,N-dimethylformamide', 'CN(C)C=O', 9, '3 × 3'],
  ['urea', 'NC(N)=O', 2, 'C2'],
  ['nitromethane', 'C[N+](=O)[O-]', 6, 'CH3 3 × NO2 2'],
  ['isobutene', 'C=C(C)C', 18, 'C2v 2 × 3 × 3'],
  ['trans-2-butene', 'C/C=C/C', 18, 'C2h 2 × 3 × 3'],
  ['cis-2-butene', 'C/C=C\\C', 18, 'C2v 2 × 3 × 3'],
  ['benzene', 'c1ccccc1', 12, 'D6h'],
  ['toluene', 'Cc1ccccc1', 6, 'ring flip 2 × CH3 3'],
  ['p-xylene', 'Cc1ccc(C)cc1', 36, 'D2h 4 × 3 × 3'],
  ['phenol', 'Oc1ccccc1', 2, 'ring flip 2'],
  ['aniline', 'Nc1ccccc1', 2, 'C2v-like, pyramidal N'],
  ['naphthalene', 'c1ccc2ccccc2c1', 4, 'D2h'],
  ['pyridine', 'c1ccncc1', 2, 'C2v'],
  ['pyrrole', 'c1cc[nH]c1', 2, 'C2v'],
  ['cyclohexane', 'C1CCCCC1', 6, 'chair D3d'],
  ['1,4-dioxane', 'C1COCCO1', 2, 'chair C2h'],
  ['tetrahydrofuran', 'C1CCOC1', 2, 'C2 (pseudorotation; planar-graph C2v)'],
  ['1,3-dioxolane', 'C1COCO1', 2, 'C2 (pseudorotation; planar-graph C2v)'],
  ['1,3,5-trioxane', 'C1OCOCO1', 3, 'chair C3v'],
  ['dimethoxymethane', 'COCOC', 18, 'C2 2 × 3 × 3'],
  ['chloroethane', 'CCCl', 3, 'Cs 1 × CH3 3'],
  ['1,1,1-trichloroethane', 'CC(Cl)(Cl)Cl', 9, 'C3v 3 × CH3 3'],
  ['cyclopentane', 'C1CCCC1', 10, 'D5h (pseudorotation)'],
  ['adamantane', 'C1C2CC3CC1CC(C2)C3', 12, 'Td'],
  ['carbon tetrachloride', 'ClC(Cl)(Cl)Cl', 12, 'Td'],
  ['dichloromethane', 'ClCCl', 2, 'C2v'],
  ['chloroform', 'ClC(Cl)Cl', 3, 'C3v'],
];

describe('symmetry number σ', () => {
  for (const [name, smiles, sigma, why] of CASES) {
    it(`${name}: ${sigma} (${why})`, () => expect(symmetry(smiles).symmetryNumber).toBe(sigma));
  }
});

describe('optical isomers', () => {
  it('2-butanol is chiral: n_opt 2, σ = 3 × 3', () => expect(symmetry('CCC(C)O')).toEqual({ symmetryNumber: 9, opticalIsomers: 2 }));
  it('alanine is chiral', () => expect(symmetry('CC(N)C(=O)O').opticalIsomers).toBe(2));
  it('2-propanol is not', () => expect(symmetry('CC(C)O').opticalIsomers).toBe(1));
  it('an amine N with three different groups is not (it inverts quickly)', () => expect(symmetry('CCN(C)Cc1ccccc1').opticalIsomers).toBe(1));
  it('a sulfoxide with two different groups is (pyramidal S is configurationally stable)', () => expect(symmetry('CCS(C)=O').opticalIsomers).toBe(2));
  it('methylcyclohexane is not', () => expect(symmetry('CC1CCCCC1').opticalIsomers).toBe(1));
  it('ethylene, benzene, methane are not', () => {
    for (const s of ['C=C', 'c1ccccc1', 'C']) expect(symmetry(s).opticalIsomers).toBe(1);
  });
});
