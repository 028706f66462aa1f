// Exact cover of a molecule's heavy atoms by group matches with the fewest groups (branch and bound).
// Group-contribution methods with exclusive groups (Joback, Gani first order) need every heavy atom in
// exactly one group; when several covers use the same smallest number of groups, all of them are
// returned (up to a limit) so the caller can apply its documented tie rule.

export interface CoverCandidate {
  /** caller's key for the group this match belongs to */
  group: number;
  atoms: readonly number[];
}

export interface CoverResult {
  /** optimal covers, each a list of indices into the candidate array; empty when none exists */
  covers: number[][];
  /** atoms that no candidate covers at all */
  uncovered: number[];
}

const MAX_NODES = 2_000_000;

export function exactCovers(atomCount: number, candidates: readonly CoverCandidate[], maxCovers = 64): CoverResult {
  const byAtom: number[][] = Array.from({ length: atomCount }, () => []);
  candidates.forEach((c, i) => c.atoms.forEach((a) => byAtom[a]!.push(i)));
  const uncovered = byAtom.flatMap((list, atom) => (list.length === 0 ? [atom] : []));
  if (uncovered.length > 0) return { covers: [], uncovered };

  const largest = Math.max(1, ...candidates.map((c) => c.atoms.length));
  const used = new Uint8Array(atomCount);
  let remaining = atomCount;
  const chosen: number[] = [];
  let best = Number.POSITIVE_INFINITY;
  let covers: number[][] = [];
  let nodes = 0;

  const search = (): void => {
    if (++nodes > MAX_NODES) return;
    if (remaining === 0) {
      if (chosen.length < best) {
        best = chosen.length;
        covers = [];
      }
      if (covers.length < maxCovers) covers.push([...chosen]);
      return;
    }
    // Lower bound: even the largest group cannot cover the rest in fewer steps.
    if (chosen.length + Math.ceil(remaining / largest) > best) return;
    // Branch on the uncovered atom with the fewest fitting candidates (Knuth's Algorithm X heuristic).
    let pivot = -1;
    let pivotOptions: number[] = [];
    for (let a = 0; a < atomCount; a++) {
      if (used[a]) continue;
      const options = byAtom[a]!.filter((i) => candidates[i]!.atoms.every((x) => !used[x]));
      if (options.length === 0) return;
      if (pivot < 0 || options.length < pivotOptions.length) {
        pivot = a;
        pivotOptions = options;
        if (options.length === 1) break;
      }
    }
    // Larger groups first so a good bound is found early.
    pivotOptions.sort((i, j) => candidates[j]!.atoms.length - candidates[i]!.atoms.length || i - j);
    for (const i of pivotOptions) {
      const atoms = candidates[i]!.atoms;
      for (const x of atoms) used[x] = 1;
      remaining -= atoms.length;
      chosen.push(i);
      search();
      chosen.pop();
      remaining += atoms.length;
      for (const x of atoms) used[x] = 0;
    }
  };
  search();
  return { covers: best === Number.POSITIVE_INFINITY ? [] : covers, uncovered: [] };
}
