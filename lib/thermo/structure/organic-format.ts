// The organic library's file (lib/thermo/data/organic-library.json, built by scripts/build-organic-library.ts)
// and the key every species known by structure gets: its InChIKey and phase, "{XEKOWRVHYACXOJ-UHFFFAOYSA-N}(l)".
// Braces keep the key apart from formulas and names, and it holds no character the equation syntax uses.
import type { SpeciesRecord, SpeciesUncertainty, StructureIdentity } from '../species-types';

export function organicKey(inchikey: string, phase: string): string {
  return `{${inchikey}}(${phase})`;
}

const KEY = /^\{([A-Z]{14}-[A-Z]{10}-[A-Z])\}\(([a-z]+)\)$/;

/** InChIKey and phase of a structure key, or null for any other key. */
export function parseOrganicKey(key: string): { inchikey: string; phase: string } | null {
  const m = KEY.exec(key);
  return m ? { inchikey: m[1]!, phase: m[2]! } : null;
}

export function isStructureKey(text: string): boolean {
  return text.startsWith('{');
}

/** A row of the organic library that is a substance the NBS/NASA library already has. */
export interface OrganicAnnotation {
  key: string;
  structure: StructureIdentity;
  /** newer evaluated values that replace the NBS 1982 ones */
  newer?: {
    dfH_kJ: number;
    S_J_per_K: number;
    dfG_kJ: number;
    uncertainty: SpeciesUncertainty;
    uncertaintyRef: string | null;
    compilationDifference: { dfH_kJ: number; against: string };
    note: string;
  };
}

export interface OrganicLibraryFile {
  meta: {
    generatedBy: string;
    standardPressure_bar: number;
    referenceTemperature_K: number;
    counts: { records: number; annotations: number; newerEvaluations: number; skipped: Record<string, number> };
    notes: string[];
  };
  records: SpeciesRecord[];
  annotations: OrganicAnnotation[];
}
