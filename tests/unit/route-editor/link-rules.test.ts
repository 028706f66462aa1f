import { describe, expect, it } from 'vitest';
import { LINK_REFUSAL, linkRefusal, suggestLinks } from '@/lib/route-editor/link-rules';

// Library reactions (lib/thermo/data/reaction-library.json): methane to formaldehyde through methanol.
const reform = { id: 'r', equation: 'CH4(g) + H2O(g) -> CO(g) + 3 H2(g)' };
const methanol = { id: 'm', equation: 'CO(g) + 2 H2(g) -> CH3OH(g)' };
const oxidation = { id: 'o', equation: 'CH3OH(g) + 1/2 O2(g) -> HCHO(g) + H2O(g)' };

describe('link refusals', () => {
  const draft = { steps: [reform, methanol, oxidation], links: [{ from: 'r', to: 'm', species: 'CO(g)' }] };

  it('accepts a product fed to a step that consumes it', () => {
    expect(linkRefusal(draft, { from: 'm', to: 'o', fromSpecies: 'CH3OH(g)', toSpecies: 'CH3OH(g)' })).toBeNull();
    expect(linkRefusal(draft, { from: 'r', to: 'm', fromSpecies: 'H2(g)', toSpecies: 'H2 (g)' })).toBeNull();
  });

  it('says why in words, naming steps by number and what they do', () => {
    expect(linkRefusal(draft, { from: 'm', to: 'm', fromSpecies: 'CH3OH(g)', toSpecies: 'CH3OH(g)' })).toBe('A step cannot feed itself.');
    expect(linkRefusal(draft, { from: 'r', to: 'o', fromSpecies: 'H2(g)', toSpecies: 'O2(g)' })).toBe(`${LINK_REFUSAL} (H2(g) is not O2(g).)`);
    expect(linkRefusal(draft, { from: 'r', to: 'o', fromSpecies: 'CO(g)', toSpecies: 'CO(g)' })).toBe('Step 3 (oxidative dehydrogenation of methanol) does not consume CO(g).');
    expect(linkRefusal(draft, { from: 'm', to: 'o', fromSpecies: 'HCHO(g)', toSpecies: 'HCHO(g)' })).toBe('Step 2 (methanol from carbon monoxide) does not produce HCHO(g).');
    expect(linkRefusal(draft, { from: 'r', to: 'm', fromSpecies: 'CO(g)', toSpecies: 'CO(g)' })).toBe(
      'CO(g) already goes from Step 1 (steam reforming of methane) to Step 2 (methanol from carbon monoxide).',
    );
    expect(linkRefusal(draft, { from: 'r', to: 'gone', fromSpecies: 'CO(g)', toSpecies: 'CO(g)' })).toBe('That step is no longer on the board.');
  });

  it('refuses a loop, however long', () => {
    const chained = { ...draft, links: [...draft.links, { from: 'm', to: 'o', species: 'CH3OH(g)' }] };
    expect(linkRefusal(chained, { from: 'o', to: 'r', fromSpecies: 'H2O(g)', toSpecies: 'H2O(g)' })).toMatch(/^That link would make a loop: Step 1 \(steam reforming of methane\) already feeds Step 3/);
  });
});

describe('link suggestions', () => {
  it('links each step to the one before that makes what it needs, and not the water back into reforming', () => {
    expect(suggestLinks({ steps: [reform, methanol, oxidation], links: [] })).toEqual([
      { from: 'r', to: 'm', species: 'CO(g)' },
      { from: 'r', to: 'm', species: 'H2(g)' },
      { from: 'm', to: 'o', species: 'CH3OH(g)' },
    ]);
  });

  it('offers only forward links when the steps were added out of order, never a by-product fed back', () => {
    expect(suggestLinks({ steps: [methanol, reform, oxidation], links: [] })).toEqual([{ from: 'm', to: 'o', species: 'CH3OH(g)' }]);
    // The oxidation makes water and the reformer takes water: a recycle is for the designer to draw, not a suggestion.
    expect(suggestLinks({ steps: [reform, oxidation], links: [] })).toEqual([]);
    // Once the reformer feeds the methanol step, route order puts it first and the rest follows.
    expect(suggestLinks({ steps: [methanol, reform, oxidation], links: [{ from: 'r', to: 'm', species: 'CO(g)' }] })).toEqual([
      { from: 'r', to: 'm', species: 'H2(g)' },
      { from: 'm', to: 'o', species: 'CH3OH(g)' },
    ]);
  });

  it('offers nothing for a species already fed, and nothing when no step makes it', () => {
    const links = [
      { from: 'r', to: 'm', species: 'CO(g)' },
      { from: 'r', to: 'm', species: 'H2(g)' },
    ];
    expect(suggestLinks({ steps: [reform, methanol, oxidation], links })).toEqual([{ from: 'm', to: 'o', species: 'CH3OH(g)' }]);
    expect(suggestLinks({ steps: [{ id: 'b', equation: '' }], links: [] })).toEqual([]);
  });

  it('takes the nearest earlier producer when two steps make the same species', () => {
    const shift = { id: 'w', equation: 'CO(g) + H2O(g) -> CO2(g) + H2(g)' };
    expect(suggestLinks({ steps: [reform, shift, methanol], links: [] }).filter((l) => l.to === 'm')).toEqual([
      { from: 'r', to: 'm', species: 'CO(g)' },
      { from: 'w', to: 'm', species: 'H2(g)' },
    ]);
  });
});
