// A light, client-side reading of an equation for handles and condition inputs only: the engine
// (server-side) stays the judge of what an equation means.

export type SpeciesPhase = 'g' | 'aq' | 'l' | 's' | 'unknown';

export interface EquationSpecies {
  reactants: string[];
  products: string[];
}

// Longest first, as the engine reads them, so "<=>" is not taken for "=".
const ARROW = /<=>|⇌|->|→|=/;
const TERM_SPLIT = /\s+\+\s+/;
const COEFFICIENT = /^(?:\d+(?:\.\d+)?(?:\/\d+)?|\.\d+)\s*(?=[A-Za-z([])/;

function sideSpecies(side: string): string[] {
  const out: string[] = [];
  // A trailing " +" is someone still typing the next term.
  for (const raw of side.replace(/\s+\+\s*$/, '').split(TERM_SPLIT)) {
    const name = raw.trim().replace(COEFFICIENT, '').replace(/\s+/g, '');
    if (name && !out.includes(name)) out.push(name);
  }
  return out;
}

export function equationSpecies(equation: string): EquationSpecies {
  const match = ARROW.exec(equation);
  if (!match) return { reactants: sideSpecies(equation), products: [] };
  return {
    reactants: sideSpecies(equation.slice(0, match.index)),
    products: sideSpecies(equation.slice(match.index + match[0].length)),
  };
}

/** Species compare without spaces, so "H2 (g)" and "H2(g)" are one species. */
export function sameSpecies(a: string, b: string): boolean {
  return a.replace(/\s+/g, '') === b.replace(/\s+/g, '');
}

export function speciesPhase(species: string): SpeciesPhase {
  const phase = /\(([a-z]+)\)$/i.exec(species.trim())?.[1]?.toLowerCase();
  if (phase === 'g' || phase === 'aq' || phase === 'l') return phase;
  if (phase === 's' || phase === 'cr') return 's';
  return 'unknown';
}
