// SMARTS matching through RDKit. Query molecules are compiled once per process and kept: the group
// tables are fixed, and recompiling ~400 SMARTS per estimate would dominate the run time.
import type { MainModule as RDKitModule, Mol as JSMol } from '@rdkit/rdkit';

const compiled = new Map<string, JSMol | null>();

function query(rdkit: RDKitModule, smarts: string): JSMol | null {
  if (!compiled.has(smarts)) {
    const q = rdkit.get_qmol(smarts);
    compiled.set(smarts, q && q.is_valid() ? q : null);
  }
  return compiled.get(smarts) ?? null;
}

/**
 * Every match of `smarts` in `mol` as atom-index lists, one per distinct atom set (RDKit uniquifies).
 * Throws when the SMARTS itself does not compile, so a broken table row is never silently skipped.
 */
export function smartsMatches(rdkit: RDKitModule, mol: JSMol, smarts: string): number[][] {
  const q = query(rdkit, smarts);
  if (!q) throw new Error(`SMARTS does not compile: ${smarts}`);
  // maxMatches raised from RDKit's default 1000 so long chains are counted in full.
  const text = mol.get_substruct_matches(q, JSON.stringify({ maxMatches: 100000 }));
  const parsed: unknown = JSON.parse(text);
  // RDKit answers "{}" (not "[]") when nothing matches, else [{atoms, bonds}, …].
  return Array.isArray(parsed) ? (parsed as { atoms: number[] }[]).map((m) => m.atoms) : [];
}
