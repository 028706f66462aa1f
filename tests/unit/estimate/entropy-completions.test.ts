// S° terms completed from one parent compound each (lib/thermo/estimate/rmg/entropy-completions.ts): every
// parent's recorded S° is its row in the app's library (NIST WebBook, as the row names it), the estimate
// reproduces it, the completed term is used only for the ring it was derived for, and the source is named.
import { beforeAll, describe, expect, it } from 'vitest';
import { readDataJson } from '@/lib/thermo/data/data-files';
import { estimateGas, loadRmgDatabase, type RmgDatabase } from '@/lib/thermo/estimate/gas-estimate';
import { GROUP_ENTROPY_COMPLETIONS, RING_ENTROPY_COMPLETIONS } from '@/lib/thermo/estimate/rmg/entropy-completions';
import { type Chem, loadChem } from '@/lib/thermo/structure/chem';

let chem: Chem;
let db: RmgDatabase;
beforeAll(async () => {
  chem = await loadChem();
  db = loadRmgDatabase();
});

interface LibraryRecord {
  phase: string;
  S_J_per_K: number | null;
  source: string;
  structure?: { inchikey: string } | null;
}
const parents = [...GROUP_ENTROPY_COMPLETIONS, ...RING_ENTROPY_COMPLETIONS].map((c) => c.parent);
const est = (smiles: string) => estimateGas(chem, smiles, db);
const ringTerm = (smiles: string) => est(smiles).groups.find((g) => g.file === 'ring');

describe('each parent compound', () => {
  for (const p of parents) {
    it(`${p.name}: recorded S° ${p.S_J_per_K} is the library's gas row (${p.source}) and the estimate reproduces it`, () => {
      const key = chem.parse(p.smiles).inchikey;
      const rows = readDataJson<{ records: LibraryRecord[] }>('organic-library.json').records.filter((r) => r.phase === 'g' && r.structure?.inchikey === key);
      expect(rows.map((r) => r.S_J_per_K)).toEqual([p.S_J_per_K]);
      expect(rows[0]!.source).toMatch(/S°: NIST WebBook/);
      expect(est(p.smiles).S_J_per_K).toBeCloseTo(p.S_J_per_K, 1);
    });
  }
});

describe('where the completed terms apply', () => {
  it('the acetal carbon names dimethoxymethane as its S° source and keeps the tree ΔfH°', () => {
    const g = est('COCOCC').groups.find((x) => x.label === 'Cs-OsOsHH')!;
    expect(g.source).toMatch(/dimethoxymethane/);
    expect(g.dS_J_per_K).toBeCloseTo(28.29, 2);
    expect(g.dH_kJ).toBeCloseTo(-67.5, 1); // Paraskevas et al. 2013, as in the tree
  });
  it('a substituted THF takes the THF term; the completed term sits near the tree\'s cyclopentane term (114.2)', () => {
    expect(ringTerm('CC1CCCO1')!.dS_J_per_K).toBeCloseTo(114.73, 2);
    expect(Math.abs(ringTerm('C1CCOC1')!.dS_J_per_K - ringTerm('C1CCCC1')!.dS_J_per_K)).toBeLessThan(2);
  });
  it('γ-butyrolactone and 2,3-dihydrofuran keep their own tree entries (ring not saturated ether)', () => {
    expect(ringTerm('O=C1CCCO1')!.source).not.toMatch(/completed/);
    expect(ringTerm('C1=COCC1')!.source).not.toMatch(/completed/);
  });
  it('paraldehyde and 1,3,5-trioxane keep the tree\'s trioxane term (completion rejected: paraldehyde fits it)', () => {
    for (const smiles of ['CC1OC(C)OC(C)O1', 'C1OCOCO1']) {
      expect(ringTerm(smiles)!.label).toBe('1,3,5-Trioxane');
      expect(ringTerm(smiles)!.dS_J_per_K).toBeCloseTo(67.76, 2);
    }
  });
});
