// Matches a table of exclusive groups on a molecule and finds the covers of all heavy atoms with the
// fewest groups. A molecule the table cannot cover is refused with the atoms left over named: a
// number built from part of the molecule would look like an estimate and is not one.
import type { MainModule as RDKitModule, Mol as JSMol } from '@rdkit/rdkit';
import { ThermoError } from '../../errors';
import { ELEMENT_SYMBOLS } from '../../formula';
import { exactCovers, type CoverCandidate } from './exact-cover';
import { smartsMatches } from './smarts-matcher';

export interface ExclusiveGroup {
  id: number;
  smarts: string;
}

export interface ExclusiveCovers {
  candidates: CoverCandidate[];
  /** each optimal cover as indices into `candidates` */
  covers: number[][];
}

const ELEMENTS_BY_Z = ['', ...ELEMENT_SYMBOLS];

interface MolJson {
  molecules: { atoms: { z?: number }[] }[];
  defaults: { atom: { z: number } };
}

export function heavyAtomSymbols(mol: JSMol): string[] {
  const json = JSON.parse(mol.get_json()) as MolJson;
  return json.molecules.flatMap((m) => m.atoms).map((a) => ELEMENTS_BY_Z[a.z ?? json.defaults.atom.z] ?? '?');
}

export function describeAtoms(symbols: readonly string[], atoms: readonly number[]): string {
  return atoms.map((a) => `${symbols[a] ?? '?'}${a + 1}`).join(', ');
}

/** Greedy disjoint packing, largest groups first: only used to name the atoms left over when no exact cover exists. */
function leftOverAtoms(atomCount: number, candidates: readonly CoverCandidate[]): number[] {
  const used = new Uint8Array(atomCount);
  for (const c of [...candidates].sort((a, b) => b.atoms.length - a.atoms.length)) {
    if (c.atoms.every((a) => !used[a])) c.atoms.forEach((a) => (used[a] = 1));
  }
  return Array.from(used).flatMap((u, i) => (u ? [] : [i]));
}

export function exclusiveCovers(rdkit: RDKitModule, mol: JSMol, groups: readonly ExclusiveGroup[], method: string): ExclusiveCovers {
  const symbols = heavyAtomSymbols(mol);
  const candidates: CoverCandidate[] = [];
  for (const g of groups) {
    if (!g.smarts) continue;
    for (const atoms of smartsMatches(rdkit, mol, g.smarts)) candidates.push({ group: g.id, atoms: [...atoms].sort((a, b) => a - b) });
  }
  const { covers, uncovered } = exactCovers(symbols.length, candidates);
  if (covers.length > 0) return { candidates, covers };
  const left = uncovered.length > 0 ? uncovered : leftOverAtoms(symbols.length, candidates);
  const why = uncovered.length > 0 ? 'no group of the method matches' : 'the groups that match overlap, so no exclusive cover exists for';
  throw new ThermoError('UNSUPPORTED_STRUCTURE', `${method} cannot fragment this structure: ${why} atom(s) ${describeAtoms(symbols, left)}.`, {
    field: 'smiles',
    hint: `${method} has no group for this part of the molecule; no partial estimate is given.`,
    details: { method, uncoveredAtoms: left.map((a) => ({ index: a, element: symbols[a] })) },
  });
}
