// Team species and CSV imports for the species tests and the role matrix. Invented values, never thermodynamic claims.
import type { TeamSpeciesInput } from '@/lib/schemas/species';

let seq = 0;

/** A species of its own key each call (an alkane-like CnH2n+2 gas); ΔfG° left to be derived. */
export function speciesInput(overrides: Partial<TeamSpeciesInput> = {}): TeamSpeciesInput {
  seq += 1;
  const n = 20 + seq;
  return {
    formula: `C${n}H${2 * n + 2}`, phase: 'g', name: `test chain ${n}`, dfH: -200 - seq, dfG: null, S: 400 + seq,
    provenance: { kind: 'estimated', method: 'Group additivity, Kestrel Ridge worksheet' },
    ...overrides,
  };
}

export const CSV_HEADER = 'formula,phase,name,dfH (kJ/mol),dfG (kJ/mol),S (J/(mol K)),provenance,reference';

/** One good row per call, with a key no other call uses. */
export function csvRow(): string {
  seq += 1;
  const n = 40 + seq;
  return `C${n}H${2 * n + 2},g,import chain ${n},${-250 - seq},,${500 + seq},estimated,Benson groups (Kestrel Ridge notebook KR-${seq})`;
}

export async function uploadCsv(teamId: number, userId: number, text: string, fileName = 'species.csv') {
  const { uploadSpeciesImport } = await import('@/lib/services/species/upload-species-import');
  return uploadSpeciesImport({ teamId, userId, fileName, bytes: Buffer.from(text, 'utf8'), text });
}
