// Links into "new species from a structure", carrying what the user typed, and the safe way back to where they came from.

export const FROM_STRUCTURE_PATH = '/species/from-structure';
const PHASES = new Set(['g', 'l', 's', 'aq']);

export interface StructureSeed {
  smiles?: string | null;
  name?: string | null;
  phase?: string | null;
  /** the page to go back to once the species is saved (a route of the board) */
  returnTo?: string | null;
}

export function fromStructureHref(seed: StructureSeed = {}): string {
  const params = new URLSearchParams();
  if (seed.smiles?.trim()) params.set('smiles', seed.smiles.trim());
  if (seed.name?.trim()) params.set('name', seed.name.trim());
  if (seed.phase && PHASES.has(seed.phase)) params.set('phase', seed.phase);
  const back = safeReturnPath(seed.returnTo);
  if (back) params.set('return', back);
  const query = params.toString();
  return query ? `${FROM_STRUCTURE_PATH}?${query}` : FROM_STRUCTURE_PATH;
}

/** Only a path of this site's route board; anything else (another host, a script URL) is dropped, never followed. */
export function safeReturnPath(raw: string | null | undefined): string | null {
  if (!raw) return null;
  if (!/^\/routes\/[A-Za-z0-9_-]+(?:[?#][^\s]*)?$/.test(raw) || raw.startsWith('//')) return null;
  return raw;
}

/** The seed a page receives in its search params, checked. */
export function readSeed(params: Record<string, string | string[] | undefined>): Required<StructureSeed> {
  const one = (k: string) => {
    const v = params[k];
    return (Array.isArray(v) ? v[0] : v)?.slice(0, 600) ?? null;
  };
  const phase = one('phase');
  return { smiles: one('smiles'), name: one('name')?.slice(0, 120) ?? null, phase: phase && PHASES.has(phase) ? phase : null, returnTo: safeReturnPath(one('return')) };
}
