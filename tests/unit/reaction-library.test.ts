import { describe, expect, it } from 'vitest';
import { nbsLookup } from '@/lib/thermo/species-library';
import reactionLibrary from '@/lib/thermo/data/reaction-library.json';
import { evaluateStep } from '@/lib/thermo/evaluate';

describe('palette reaction library', () => {
  it.each(reactionLibrary.reactions)('$name parses, balances and uses library species', ({ equation }) => {
    const result = evaluateStep({ equation }, { lookup: nbsLookup });
    expect(result.balanced).toBe(true);
    expect(Number.isFinite(result.deltaG0_kJ)).toBe(true);
  });

  it('has unique ids', () => {
    const ids = reactionLibrary.reactions.map((r) => r.id);
    expect(new Set(ids).size).toBe(ids.length);
  });
});
