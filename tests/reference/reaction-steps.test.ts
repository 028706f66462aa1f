// Realistic reaction steps, ideal gas at 298.15 K and 1 bar, given by SMILES as a route designer would, against
// ΔrG° = Σν ΔfG° from the published rows of the organic library (lib/thermo/data/source/organics/species.csv: ATcT 1.112,
// JANAF 1998, NASA TM-4513, NIST WebBook, API TDB and CRC, the source named per row there). Two checks:
// - with the library allowed, the engine's ΔrG° is within 2 kJ/mol of the published-data value;
// - with every organic species (C–H bonds) estimated by group additivity, each step is within 3σ of its own
//   reported σ, and the mean absolute error over the steps is at most 5 kJ/mol.
import { readFileSync } from 'node:fs';
import path from 'node:path';
import Papa from 'papaparse';
import { beforeAll, describe, expect, it } from 'vitest';
import { evaluateStep } from '@/lib/thermo/evaluate';
import { builtinLookup } from '@/lib/thermo/species-library';
import { loadChem } from '@/lib/thermo/structure/chem';
import { structureLookup, type StructureLookup } from '@/lib/thermo/structure/structure-lookup';

interface Row { smiles: string; inchikey: string; phase: string; dfG_kJ_per_mol: string; name: string; dfG_source: string; dfH_source: string }
const rows = Papa.parse<Row>(readFileSync(path.resolve(__dirname, '../../lib/thermo/data/source/organics/species.csv'), 'utf8'), { header: true, skipEmptyLines: true }).data;

// [label, { SMILES: ν }] — products positive, reactants negative; every species a gas.
const STEPS: [string, Record<string, number>][] = [
  ['acetone hydrogenation to isopropanol', { 'CC(C)=O': -1, '[HH]': -1, 'CC(C)O': 1 }],
  ['nitrobenzene hydrogenation to aniline', { 'O=[N+]([O-])c1ccccc1': -1, '[HH]': -3, 'Nc1ccccc1': 1, 'O': 2 }],
  ['ethanol dehydrogenation to acetaldehyde', { CCO: -1, 'CC=O': 1, '[HH]': 1 }],
  ['esterification of acetic acid with ethanol', { 'CC(=O)O': -1, 'CCO': -1, 'CCOC(C)=O': 1, 'O': 1 }],
  ['methanol carbonylation to acetic acid', { CO: -1, '[C-]#[O+]': -1, 'CC(=O)O': 1 }],
  ['benzene hydrogenation to cyclohexane', { c1ccccc1: -1, '[HH]': -3, 'C1CCCCC1': 1 }],
  ['cyclohexanol dehydrogenation to cyclohexanone', { OC1CCCCC1: -1, 'O=C1CCCCC1': 1, '[HH]': 1 }],
  ['ethylbenzene dehydrogenation to styrene', { CCc1ccccc1: -1, 'C=Cc1ccccc1': 1, '[HH]': 1 }],
  ['isobutene hydration to tert-butanol', { 'C=C(C)C': -1, 'O': -1, 'CC(C)(C)O': 1 }],
  ['propene hydration to isopropanol', { 'C=CC': -1, 'O': -1, 'CC(C)O': 1 }],
  ['methyl acetate from methanol and acetic acid', { CO: -1, 'CC(=O)O': -1, 'COC(C)=O': 1, 'O': 1 }],
  ['dimethyl ether from methanol', { CO: -2, 'COC': 1, 'O': 1 }],
  ['butyraldehyde hydrogenation to 1-butanol', { 'CCCC=O': -1, '[HH]': -1, 'CCCCO': 1 }],
  ['cumene dealkylation to benzene and propene', { 'CC(C)c1ccccc1': -1, 'c1ccccc1': 1, 'C=CC': 1 }],
  ['butadiene hydrogenation to 1-butene', { 'C=CC=C': -1, '[HH]': -1, 'C=CCC': 1 }],
  ['acetic anhydride hydrolysis', { 'CC(=O)OC(C)=O': -1, 'O': -1, 'CC(=O)O': 2 }],
  ['cyclohexene hydrogenation', { 'C1=CCCCC1': -1, '[HH]': -1, 'C1CCCCC1': 1 }],
  ['toluene hydrodealkylation', { Cc1ccccc1: -1, '[HH]': -1, 'c1ccccc1': 1, 'C': 1 }],
  ['furan hydrogenation to tetrahydrofuran', { c1ccoc1: -1, '[HH]': -2, 'C1CCOC1': 1 }],
];

let chem: Awaited<ReturnType<typeof loadChem>>;
let lookup: StructureLookup;
const byInchikey = new Map<string, Row>();
beforeAll(async () => {
  chem = await loadChem();
  lookup = structureLookup(builtinLookup, chem);
  for (const r of rows) if (r.phase === 'g') byInchikey.set(r.inchikey, r);
});

function published(nus: Record<string, number>): number {
  let dG = 0;
  for (const [smiles, nu] of Object.entries(nus)) {
    const row = byInchikey.get(chem.parse(smiles).inchikey);
    if (!row) throw new Error(`no published gas row for ${smiles}`);
    dG += nu * Number(row.dfG_kJ_per_mol);
  }
  return dG;
}

function requestFor(nus: Record<string, number>, estimateOrganics: boolean) {
  const labels = Object.keys(nus).map((_, i) => `S${i}`);
  const side = (sign: number) => Object.entries(nus).map(([, nu], i) => [nu, labels[i]!] as const).filter(([nu]) => Math.sign(nu) === sign).map(([nu, l]) => `${Math.abs(nu)} ${l}`).join(' + ');
  const species = Object.fromEntries(Object.keys(nus).map((smiles, i) => {
    const { elements } = chem.parse(smiles);
    const organic = (elements.C ?? 0) > 0 && (elements.H ?? 0) > 0;
    return [labels[i]!, { smiles, phase: 'g' as const, ...(estimateOrganics && organic ? { estimate: true } : {}) }];
  }));
  return { equation: `${side(-1)} -> ${side(1)}`, species };
}

describe('ΔrG° of realistic steps against published data (gas, 298.15 K)', () => {
  it('has at least 15 steps', () => expect(STEPS.length).toBeGreaterThanOrEqual(15));

  it.each(STEPS)('library allowed: %s within 2 kJ/mol', (_label, nus) => {
    const r = evaluateStep(requestFor(nus, false), { lookup });
    expect(Math.abs(r.deltaG0_kJ - published(nus))).toBeLessThanOrEqual(2);
  });

  it.each(STEPS)('every organic species estimated: %s within 3σ', (_label, nus) => {
    const r = evaluateStep(requestFor(nus, true), { lookup });
    expect(r.species.some((s) => s.origin === 'estimated')).toBe(true);
    expect(Math.abs(r.deltaG0_kJ - published(nus))).toBeLessThanOrEqual(3 * r.uncertainty.deltaG0_kJ!);
  });

  it('every organic species estimated: mean absolute error ≤ 5 kJ/mol over the steps', () => {
    const errors = STEPS.map(([, nus]) => Math.abs(evaluateStep(requestFor(nus, true), { lookup }).deltaG0_kJ - published(nus)));
    const mae = errors.reduce((a, b) => a + b, 0) / errors.length;
    expect(mae).toBeLessThanOrEqual(5);
  });
});
