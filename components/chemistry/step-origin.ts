// Where a step's numbers came from, summed over its species: library, team, estimated or a mix, with the estimated
// and team species named and the library sources listed. Pure and types-only, so the board, the comparison, the
// printable report and every CSV say the same thing.
import type { SpeciesProvenance } from '@/lib/thermo/evaluate';
import type { ValueOrigin } from './origin-text';
import { formulaPlain } from './formula-parts';

/** What a view needs of one species of a step (a subset of the engine's provenance entry). */
export type StepSpeciesFacts = Pick<SpeciesProvenance, 'key' | 'as_written' | 'name' | 'formula' | 'nu' | 'origin' | 'source' | 'smiles' | 'sigma_dfG_kJ'> & {
  method?: string | null;
};

export type StepDataOrigin = ValueOrigin | 'mixed';

export interface StepOriginSummary {
  /** one origin when every species shares it, else "mixed"; null when the step has no species (not evaluated) */
  origin: StepDataOrigin | null;
  /** every origin present, in the order library, team, estimated */
  origins: ValueOrigin[];
  /** the readers' names of the species whose values are estimates, each once */
  estimated: string[];
  /** the short methods of those estimates, each once */
  methods: string[];
  /** the team's own species, each once */
  team: string[];
  /** the provenance the team recorded for them, each once */
  teamSources: string[];
  /** the library's sources used, each once */
  sources: string[];
}

const CAS = /^\d{2,7}-\d{2}-\d$/;

/** How a reader knows a species: its name (unless that is only a SMILES or CAS number), else the term as written. */
export function speciesReaderName(s: Pick<StepSpeciesFacts, 'key' | 'as_written' | 'name' | 'smiles'>): string {
  const name = s.name?.trim();
  if (name && name !== s.smiles && !CAS.test(name)) return name;
  return formulaPlain(s.as_written || s.key, { name: s.name });
}

/** "Benson-type group additivity (RMG-database group tree)" → "Benson-type group additivity". */
function shortMethod(method: string): string {
  let out = method;
  for (let i = 0; i < 4 && /\([^()]*\)/.test(out); i++) out = out.replace(/\s*\([^()]*\)/g, '');
  return out.replace(/\s{2,}/g, ' ').trim() || method;
}

function once(values: string[]): string[] {
  return [...new Set(values.filter(Boolean))];
}

export function stepOrigin(species: readonly StepSpeciesFacts[] | null | undefined): StepOriginSummary {
  const list = species ?? [];
  const origins = new Set(list.map((s) => s.origin));
  const origin: StepDataOrigin | null = origins.size === 0 ? null : origins.size === 1 ? [...origins][0]! : 'mixed';
  const estimated = list.filter((s) => s.origin === 'estimated');
  return {
    origin,
    origins: (['library', 'team', 'estimated'] as const).filter((o) => origins.has(o)),
    estimated: once(estimated.map(speciesReaderName)),
    methods: once(estimated.map((s) => shortMethod(s.method?.trim() || s.source.replace(/^Estimated:?\s*/i, '') || 'group contribution'))),
    team: once(list.filter((s) => s.origin === 'team').map(speciesReaderName)),
    teamSources: once(list.filter((s) => s.origin === 'team').map((s) => s.source.trim())),
    sources: once(list.filter((s) => s.origin === 'library').map((s) => s.source.trim())),
  };
}

/** Words for a summary: "library", "estimated", "library and estimated values" are what a reader sees beside a step. */
export const STEP_ORIGIN_WORD: Record<StepDataOrigin, string> = {
  library: 'library values',
  team: 'team values',
  estimated: 'estimated values',
  mixed: 'mixed origins',
};

export interface OriginLine {
  origin: ValueOrigin;
  /** visible words, so print and a glance say it without a hover: "Estimate: acetophenone by …; σ(ΔrG°) 6.3 kJ/mol" */
  text: string;
}

/** One line per origin present in the step, in the order library, team, estimated. `sigma` is σ(ΔrG°) already formatted. */
export function stepOriginLines(summary: StepOriginSummary, sigma: string | null): OriginLine[] {
  return summary.origins.map((origin) => {
    if (origin === 'library') return { origin, text: `Library: ${summary.sources.join('; ') || 'built-in library'}` };
    if (origin === 'team') return { origin, text: `Team: ${summary.team.join(', ')}${summary.teamSources.length ? ` (${summary.teamSources.join('; ')})` : ''}` };
    return { origin, text: `Estimate: ${summary.estimated.join(', ')} by ${summary.methods.join('; ')}${sigma ? `; σ(ΔrG°) ${sigma}` : '; σ not known'}` };
  });
}
