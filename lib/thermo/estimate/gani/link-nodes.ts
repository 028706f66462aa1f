// Expands a ChemAxon link node in a linear SMARTS chain: atom i repeated k times. The seven Gani
// 3rd-order groups that use one are all chains of bracket atoms, so a token split at top-level
// brackets is enough; anything else is rejected rather than guessed.

/** Splits "[A]#[B][C]" into atoms ["[A]","[B]","[C]"] and the bonds before each atom ["", "#", ""]. */
function splitChain(smarts: string): { atoms: string[]; bonds: string[] } {
  const atoms: string[] = [];
  const bonds: string[] = [];
  let bond = '';
  let i = 0;
  while (i < smarts.length) {
    const ch = smarts[i]!;
    if (ch === '[') {
      let depth = 0;
      let j = i;
      for (; j < smarts.length; j++) {
        if (smarts[j] === '[') depth++;
        else if (smarts[j] === ']' && --depth === 0) break;
      }
      if (depth !== 0) throw new Error(`unbalanced brackets in link-node SMARTS ${smarts}`);
      atoms.push(smarts.slice(i, j + 1));
      bonds.push(bond);
      bond = '';
      i = j + 1;
    } else if ('-=#~:@!'.includes(ch)) {
      bond += ch;
      i++;
    } else {
      throw new Error(`link-node SMARTS is not a chain of bracket atoms: ${smarts}`);
    }
  }
  return { atoms, bonds };
}

/** The SMARTS with atom `atom` (0-based) repeated `times` times, bonded as it was to its predecessor. */
export function expandLinkNode(smarts: string, atom: number, times: number): string {
  const { atoms, bonds } = splitChain(smarts);
  if (atom <= 0 || atom >= atoms.length - 1) throw new Error(`link node ${atom} is not inside the chain ${smarts}`);
  const repeated = Array.from({ length: times }, (_, k) => (k === 0 ? '' : (bonds[atom] ?? '')) + atoms[atom]!).join('');
  return atoms.map((a, k) => (bonds[k] ?? '') + (k === atom ? repeated : a)).join('');
}
