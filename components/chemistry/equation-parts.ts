// Splits an equation as written into plain runs (coefficients, " + ", the arrow) and species terms, keeping every
// character, so a typeset equation reads exactly as it was typed apart from subscripts and charges. Pure.

export interface EquationRun {
  kind: 'text' | 'species';
  text: string;
}

// Longest first, as the engine reads them, so "<=>" is not taken for "=".
const ARROW = /\s*(?:<=>|⇌|->|→|=)\s*/;
const PLUS = /(\s+\+\s+)/;
const COEFFICIENT = /^(\s*(?:\d+(?:\.\d+)?(?:\/\d+)?|\.\d+)\s*)(?=[A-Za-z([{])/;

function sideRuns(side: string): EquationRun[] {
  const out: EquationRun[] = [];
  for (const piece of side.split(PLUS)) {
    if (!piece) continue;
    if (/^\s+\+\s+$/.test(piece)) {
      out.push({ kind: 'text', text: piece });
      continue;
    }
    const coefficient = COEFFICIENT.exec(piece)?.[1] ?? '';
    if (coefficient) out.push({ kind: 'text', text: coefficient });
    const rest = piece.slice(coefficient.length);
    const lead = /^\s*/.exec(rest)![0];
    const trail = /\s*$/.exec(rest)![0];
    const term = rest.trim();
    if (lead) out.push({ kind: 'text', text: lead });
    if (term) out.push({ kind: 'species', text: term });
    if (trail && term) out.push({ kind: 'text', text: trail });
  }
  return out;
}

export function equationRuns(equation: string): EquationRun[] {
  const match = ARROW.exec(equation);
  if (!match) return sideRuns(equation);
  return [...sideRuns(equation.slice(0, match.index)), { kind: 'text', text: match[0] }, ...sideRuns(equation.slice(match.index + match[0].length))];
}
