// Experimental (and some COSMO-RS computed) Abraham descriptors of the RMG solute library, used before
// group additivity as RMG does. Keyed by RDKit canonical SMILES.
import { readDataJson } from '../../data/data-files';
import type { Chem } from '../../structure/chem';
import type { SoluteDescriptors } from './solute-database';

interface LibraryJson {
  entries: { label: string; smiles: string; solute: SoluteDescriptors & { V: number }; source: string }[];
}

export interface LibrarySolute {
  label: string;
  descriptors: SoluteDescriptors;
  V: number;
  source: string;
  /** true for the COSMO-RS entries (calculations, not experiments) */
  computed: boolean;
}

let cache: Map<string, LibrarySolute> | undefined;

export function soluteLibrary(chem: Chem): Map<string, LibrarySolute> {
  if (!cache) {
    cache = new Map();
    for (const e of readDataJson<LibraryJson>('source/estimation/rmg-groups/solvation/solutes.json').entries) {
      let key: string;
      try {
        key = chem.parse(e.smiles).smiles;
      } catch {
        continue;
      }
      const { V, ...descriptors } = e.solute;
      if (!cache.has(key)) cache.set(key, { label: e.label, descriptors, V, source: e.source, computed: /COSMO/i.test(e.source) });
    }
  }
  return cache;
}
