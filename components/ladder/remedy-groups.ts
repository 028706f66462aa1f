// Pure helpers for the remedies panel: remedies grouped by kind (read defensively, since a response may come
// from an older or newer engine), the ±50 K samples, the words for actions and warning codes, and cautions.
import type { ConditionsAction, ConditionsRemedy, CouplingRemedy, RouteStepResult, TemperatureRemedy, TemperatureSample } from '@/lib/thermo/route';
import { withTrueMinus } from '@/lib/format/numbers';

export interface UnknownRemedy {
  kind: string;
  summary: string;
}

export interface RemedyGroups {
  temperature: TemperatureRemedy[];
  conditions: ConditionsRemedy[];
  coupling: CouplingRemedy[];
  /** kinds this panel does not know; shown by their summary sentence alone */
  other: UnknownRemedy[];
}

function isRecord(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null;
}

export function groupRemedies(remedies: readonly unknown[] | null | undefined): RemedyGroups {
  const groups: RemedyGroups = { temperature: [], conditions: [], coupling: [], other: [] };
  for (const r of remedies ?? []) {
    if (!isRecord(r) || typeof r.kind !== 'string') continue;
    const summary = typeof r.summary === 'string' ? r.summary : '';
    if (r.kind === 'temperature') groups.temperature.push(r as unknown as TemperatureRemedy);
    else if (r.kind === 'conditions') groups.conditions.push(r as unknown as ConditionsRemedy);
    else if (r.kind === 'coupling') groups.coupling.push(r as unknown as CouplingRemedy);
    else if (summary) groups.other.push({ kind: r.kind, summary });
  }
  return groups;
}

export function hasAnyRemedy(groups: RemedyGroups): boolean {
  return groups.temperature.length + groups.conditions.length + groups.coupling.length + groups.other.length > 0;
}

export const SAMPLE_OFFSET_K = 50;

/** The engine's samples at the current temperature and 50 K either side (null where outside the data). */
export function samplesAround(remedy: Pick<TemperatureRemedy, 'current_K' | 'samples'>, offset_K = SAMPLE_OFFSET_K) {
  const near = (T: number): TemperatureSample | null =>
    (Array.isArray(remedy.samples) ? remedy.samples : []).find((s) => Math.abs(s.T_K - T) < 1e-6 * Math.max(1, T)) ?? null;
  return { below: near(remedy.current_K - offset_K), at: near(remedy.current_K), above: near(remedy.current_K + offset_K) };
}

/** ΔG of a sample at the step's conditions, or ΔG° when the step gives none. */
export function sampleDeltaG(s: TemperatureSample): { value_kJ: number; isStandard: boolean } {
  return s.deltaG_kJ === null ? { value_kJ: s.deltaG0_kJ, isStandard: true } : { value_kJ: s.deltaG_kJ, isStandard: false };
}

export const CONDITIONS_ACTION_TEXT: Record<ConditionsAction, string> = {
  'product-pressure': 'Keep a gaseous product’s pressure down',
  'remove-product': 'Remove a dissolved product as it forms',
  'reactant-excess': 'Use a reactant in excess',
  'out-of-reach': 'No single change within practical bounds',
};

export function conditionsActionText(action: string): string {
  return (CONDITIONS_ACTION_TEXT as Record<string, string>)[action] ?? action;
}

/** ln Q as the exponent of ten, which reads better for chemists: ln Q = 4.6 → "2.0" (Q = 10^2.0). */
export function lnQExponent(lnQ: number): string | null {
  if (!Number.isFinite(lnQ)) return null;
  const p = lnQ / Math.LN10;
  return (Math.abs(p) < 0.05 ? 0 : p).toFixed(1).replace('-', '−');
}

const WARNING_WORDS: Record<string, string> = {
  T_OUT_OF_RANGE: 'outside a species’ data range',
  PHASE_CHANGE: 'a species changes phase',
  CONSTANT_CP: 'heat capacity taken as constant',
  GHS_INCONSISTENT: 'tabulated values disagree slightly',
  DEFAULT_ACTIVITY: 'some activities defaulted to the standard state',
  OVERRIDE: 'a team value replaces a built-in one',
  FROM_MEMORY: 'a value is not yet checked against its source',
  EQUILIBRIUM_LIMIT: 'equilibrium limits the conversion',
  INERT_SPECIES: 'an inert species is present',
  SOLVENT_IN_EXCESS: 'solvent taken in excess',
};

export function warningWords(codes: readonly string[] | null | undefined): string[] {
  return [...new Set(codes ?? [])].map((c) => WARNING_WORDS[c] ?? c);
}

export interface Caution {
  key: string;
  title: string;
  message: string;
}

/** Heat-release and gas-evolution notes first (process safety), then the engine's own warnings. */
export function stepCautions(step: Pick<RouteStepResult, 'notes' | 'result'>): Caution[] {
  const out: Caution[] = [];
  (step.notes ?? []).forEach((n, i) => {
    const title = n.code === 'HEAT_RELEASE' ? 'Heat release' : n.code === 'GAS_EVOLUTION' ? 'Gas evolution' : 'Note';
    out.push({ key: `note-${i}-${n.code}`, title, message: withTrueMinus(n.message) });
  });
  // The engine writes plain ASCII numbers; people read the true minus.
  (step.result?.warnings ?? []).forEach((w, i) => out.push({ key: `warn-${i}-${w.code}`, title: 'Engine warning', message: withTrueMinus(w.message) }));
  return out;
}
