// Low- and high-temperature limits of the ideal-gas Cp from the molecule graph (RMG's rule):
// Cp0 = 4R (3.5R linear, 2.5R one atom); CpInf = Cp0 + (N_vib + N_rot/2)·R, with N_rot the
// acyclic single bonds between two atoms that each have another neighbour.
import { R_GAS } from '../../constants';
import type { MolGraph } from './mol-graph';

export function isLinear(mol: MolGraph): boolean {
  if (mol.size === 2) return true;
  if (mol.size < 2) return false;
  for (let i = 0; i < mol.size; i += 1) {
    const ns = mol.neighbours[i]!;
    if (ns.length > 2) return false;
    if (ns.length === 2) {
      const orders = ns.map((n) => mol.order(i, n));
      const sp = orders.includes(3) || orders.every((o) => o === 2);
      if (!sp) return false;
    }
  }
  return true;
}

export function rotorCount(mol: MolGraph): number {
  let n = 0;
  for (let a = 0; a < mol.size; a += 1) {
    for (const b of mol.neighbours[a]!) {
      if (b <= a || mol.order(a, b) !== 1) continue;
      const inRingBond = mol.rings.some((r) => r.includes(a) && r.includes(b));
      if (!inRingBond && mol.neighbours[a]!.length > 1 && mol.neighbours[b]!.length > 1) n += 1;
    }
  }
  return n;
}

export function cpLimits(mol: MolGraph): { Cp0: number; CpInf: number } {
  if (mol.size === 1) return { Cp0: 2.5 * R_GAS, CpInf: 2.5 * R_GAS };
  const linear = isLinear(mol);
  const Cp0 = (linear ? 3.5 : 4) * R_GAS;
  const rotors = rotorCount(mol);
  const vib = 3 * mol.size - (linear ? 5 : 6) - rotors;
  return { Cp0, CpInf: Cp0 + (vib + 0.5 * rotors) * R_GAS };
}
