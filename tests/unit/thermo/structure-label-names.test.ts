// A name a step gives a structure (a SMILES label with a name) is that step's own: the server's memo of estimates is
// shared by every team, so another request for the same structure must never read it under that name.
import { beforeAll, describe, expect, it } from 'vitest';
import { builtinLookup } from '@/lib/thermo/species-library';
import { loadChem, type Chem } from '@/lib/thermo/structure/chem';
import { structureLookup } from '@/lib/thermo/structure/structure-lookup';

let chem: Chem;
beforeAll(async () => {
  chem = await loadChem();
});

// An invented intermediate (a Boc-protected amino ester): in no table, so the engine estimates it.
const SMILES = 'CCOC(=O)C(C)(C)NC(=O)OC(C)(C)C';

describe('names given to a structure by a step', () => {
  it('show in that step’s lookup only, never in the shared memo', () => {
    const lookup = structureLookup(builtinLookup, chem);
    const labelled = lookup.withLabels({ KRX: { smiles: SMILES, phase: 'l', name: 'KR-9 private intermediate' } });
    const key = labelled.resolveLabel!('KRX')!;
    expect(labelled.get(key)?.name).toBe('KR-9 private intermediate');

    const other = lookup.resolveDefinition({ smiles: SMILES, phase: 'l' }, 'species.X');
    expect(other).toBe(key);
    expect(lookup.get(other)?.name).not.toBe('KR-9 private intermediate');
    expect(lookup.withLabels({ Y: { smiles: SMILES, phase: 'l' } }).get(key)?.name).not.toBe('KR-9 private intermediate');
  });
});
