// The built-in library as the engine uses it: the NBS/NASA records, each annotated with its structure where the
// organic library knows the substance (and with a newer evaluation where one replaced NBS 1982), followed by the
// organic library's own records.
import { readDataJson } from '../data/data-files';
import type { SpeciesRecord } from '../species-types';
import type { OrganicLibraryFile } from './organic-format';

export function mergeOrganicLibrary(base: readonly SpeciesRecord[], file: OrganicLibraryFile): SpeciesRecord[] {
  const byKey = new Map(file.annotations.map((a) => [a.key, a]));
  const annotated = base.map((record): SpeciesRecord => {
    const a = byKey.get(record.key);
    if (!a) return record;
    if (!a.newer) return { ...record, structure: a.structure };
    const n = a.newer;
    return {
      ...record,
      structure: a.structure,
      dfH_kJ: n.dfH_kJ,
      S_J_per_K: n.S_J_per_K,
      dfG_kJ: n.dfG_kJ,
      uncertainty: n.uncertainty.dfH_kJ !== null ? n.uncertainty : record.uncertainty,
      uncertaintyRef: n.uncertaintyRef ?? record.uncertaintyRef,
      compilationDifference: n.compilationDifference,
      source: `${record.source}; ${n.note}`,
      flags: [...record.flags, 'newerEvaluation'],
    };
  });
  return [...annotated, ...file.records];
}

export function readOrganicLibrary(): OrganicLibraryFile {
  return readDataJson<OrganicLibraryFile>('organic-library.json');
}
