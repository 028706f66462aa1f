// Where an evaluation problem belongs and how to say it: the engine names fields as request paths
// ("steps.1.pressures.CO(g)"); the step panel has fields ("pressure:CO(g)") and the node one short line.
// Pure, so the mapping is tested without rendering.
import type { EngineWarning } from '../thermo/warnings';
import type { StepErrorInfo } from '../thermo/route/route-types';

/** A field of the step panel: equation, temperature, yield, electrons, standard pressure, or one condition row. */
export type StepFieldKey = 'equation' | 'temperature' | 'standardPressure' | 'yieldPct' | 'electrons' | `pressure:${string}` | `concentration:${string}`;

export type ErrorCause = 'equation' | 'species' | 'temperature' | 'pressure' | 'concentration' | 'yield' | 'conditions';

/** The step-relative path: "steps.1.temperature" → "temperature"; a path already relative stays. */
export function stepRelativePath(path: string): string {
  const m = /^steps\.\d+\.(.+)$/.exec(path);
  return m ? m[1]! : path;
}

/** The step index a request path names ("steps.3.equation" → 3), or null. */
export function stepIndexOfPath(path: string | null | undefined): number | null {
  const m = path ? /^steps\.(\d+)(?:\.|$)/.exec(path) : null;
  return m ? Number(m[1]) : null;
}

/** The panel field an engine path belongs to; anything the panel has no field for goes to the equation. */
export function fieldOfPath(path: string | null | undefined): StepFieldKey {
  if (!path) return 'equation';
  const rel = stepRelativePath(path);
  const [head, ...rest] = rel.split('.');
  const species = rest.join('.');
  switch (head) {
    case 'temperature':
      return 'temperature';
    case 'pressures':
      return species ? `pressure:${species}` : 'equation';
    case 'concentrations':
      return species ? `concentration:${species}` : 'equation';
    case 'yield':
      return 'yieldPct';
    case 'electrons':
      return 'electrons';
    case 'standardPressure':
      return 'standardPressure';
    default:
      return 'equation';
  }
}

export function causeOf(error: Pick<StepErrorInfo, 'code' | 'field'>): ErrorCause {
  const field = fieldOfPath(error.field);
  if (field === 'temperature') return 'temperature';
  if (field.startsWith('pressure:') || field === 'standardPressure') return 'pressure';
  if (field.startsWith('concentration:')) return 'concentration';
  if (field === 'yieldPct') return 'yield';
  if (field === 'electrons') return 'conditions';
  if (error.code === 'UNKNOWN_SPECIES' || error.code === 'AMBIGUOUS_NAME' || error.code === 'INVALID_STRUCTURE' || error.code === 'UNSUPPORTED_STRUCTURE') return 'species';
  return 'equation';
}

/** The short word a node or ladder riser shows for a step that could not be evaluated, naming the cause. */
export const CAUSE_LABEL: Record<ErrorCause, string> = {
  equation: 'check equation',
  species: 'unknown species',
  temperature: 'check temperature',
  pressure: 'check pressure',
  concentration: 'check concentration',
  yield: 'check yield',
  conditions: 'check conditions',
};

/** The engine's message without the "temperature: " / "pressures.CO(g): " prefix the field already says. */
export function messageAtField(error: Pick<StepErrorInfo, 'message' | 'field'>): string {
  const rel = error.field ? stepRelativePath(error.field) : null;
  let text = error.message;
  if (rel && text.startsWith(`${rel}: `)) text = text.slice(rel.length + 2);
  text = text.replace(/^(steps\[\d+\]\.|steps\.\d+\.)\S*: /, '');
  return text.charAt(0).toUpperCase() + text.slice(1);
}

/** Messages by panel field for a step's error (one field, since the engine stops at the first problem). */
export function stepFieldErrors(error: StepErrorInfo | null | undefined): Partial<Record<StepFieldKey, string>> {
  if (!error) return {};
  return { [fieldOfPath(error.field)]: messageAtField(error) };
}

const RANGE = /^(.+?): ([\d.]+) K is outside its [^,]*data, ([\d.]+)–([\d.]+) K/;

/**
 * What the temperature field says when T lies outside some species' data: the species with their ranges and the span
 * every species covers, e.g. "Outside the data of CH3OH(g) (200–6000 K); all species have data for 200–6000 K;
 * values are extrapolated". Null when T is inside every range.
 */
export function temperatureRangeNote(warnings: readonly Pick<EngineWarning, 'code' | 'message'>[]): string | null {
  const out = warnings
    .filter((w) => w.code === 'T_OUT_OF_RANGE')
    .map((w) => RANGE.exec(w.message))
    .filter((m): m is RegExpExecArray => m !== null)
    .map((m) => ({ species: m[1]!, T: Number(m[2]), lo: Number(m[3]), hi: Number(m[4]) }));
  if (out.length === 0) return null;
  const lo = Math.max(...out.map((o) => o.lo));
  const hi = Math.min(...out.map((o) => o.hi));
  const each = out.map((o) => `${o.species} (${o.lo}–${o.hi} K)`).join(', ');
  const common = lo < hi ? `; the data of ${out.length === 1 ? 'this species' : 'these species'} cover ${lo}–${hi} K` : '';
  return `${out[0]!.T} K is outside the data of ${each}${common}. Values are extrapolated.`;
}
